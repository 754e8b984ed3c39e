/** Small helpers the commands share for writing to the terminal. */
import { colourModeFor, type ColourMode } from '../output/terminal-grid.ts';
import type { TaskFileError } from '../tasks/read-task.ts';

export function writeLines(lines: readonly string[]): void {
  if (lines.length > 0) process.stdout.write(lines.join('\n') + '\n');
}

export function writeJson(data: unknown): void {
  process.stdout.write(JSON.stringify(data, null, 2) + '\n');
}

export function writeError(message: string): void {
  process.stderr.write(message.endsWith('\n') ? message : message + '\n');
}

/** How grids are drawn on standard output. */
export function stdoutColourMode(): ColourMode {
  return colourModeFor(process.stdout);
}

export function taskErrorData(error: TaskFileError): { file: string; path: string; problem: string } {
  return { file: error.file, path: error.jsonPath, problem: error.problem };
}
