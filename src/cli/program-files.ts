/**
 * `pithy solve --programs DIR`: each program found is written as DIR/<task>.pithy, ready for
 * `pithy run` and `pithy check`. An existing file is never replaced without --force.
 */
import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { TaskReport } from '../batch/task-report.ts';
import { taskNameOf } from '../batch/solve-file.ts';

export function programPath(dir: string, taskFile: string): string {
  return join(dir, `${taskNameOf(taskFile)}.pithy`);
}

/** The program files that exist already among those the run would write. */
export function existingProgramFiles(dir: string, taskFiles: readonly string[]): string[] {
  return taskFiles.map((f) => programPath(dir, f)).filter((p) => existsSync(p));
}

/** Writes the cheapest program of a found task; returns the path, or undefined when nothing was found. */
export function writeProgramFile(dir: string, report: TaskReport): string | undefined {
  const best = report.solutions[0];
  if (report.status !== 'found' || !best) return undefined;
  mkdirSync(dir, { recursive: true });
  const path = programPath(dir, report.file);
  const header = `-- Found by pithy solve for ${report.task}: ${best.bits} bits.\n`;
  writeFileSync(path, header + best.program.trimEnd() + '\n');
  return path;
}
