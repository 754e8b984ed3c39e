/**
 * `pithy solve PATH...`: per task, the cheapest program, its cost in bits, the time, and the
 * candidates tried and kept. Never reads test outputs.
 */
import { closeSync, existsSync, openSync, writeSync } from 'node:fs';
import type { Command } from 'commander';
import { predictionLine } from '../batch/predictions.ts';
import { solveFiles } from '../batch/solve-files.ts';
import type { TaskReport } from '../batch/task-report.ts';
import { addSolveFlags, solveOptionsFrom, type SharedSolveFlags } from './solve-options.ts';
import { expandTaskPaths } from './task-paths.ts';
import { loadPriorsOption, type PriorsOption } from './priors-option.ts';
import { writeError, writeJson, writeLines } from './output.ts';

interface SolveFlags extends SharedSolveFlags {
  json?: boolean;
  predictions?: string;
  force?: boolean;
}

export function reportLines(report: TaskReport): string[] {
  if (report.status === 'error') return [`${report.task}: error: ${report.error}`];
  const s = report.statistics!;
  const figures = `${report.seconds.toFixed(2)} s, ${s.candidates.toLocaleString('en')} candidates tried, ${s.kept.toLocaleString('en')} kept`;
  if (report.status === 'not found') return [`${report.task}: no program found (${stopWords(report.reason)}; ${figures})`];
  const lines = [`${report.task}: ${report.solutions[0]!.bits} bits (${figures})`];
  report.solutions.forEach((solution, i) => {
    if (i > 0) lines.push(`  attempt ${i + 1}, ${solution.bits} bits:`);
    lines.push(...solution.program.trimEnd().split('\n').map((l) => `    ${l}`));
  });
  return lines;
}

export function stopWords(reason: TaskReport['reason']): string {
  switch (reason) {
    case 'time':
      return 'time limit reached';
    case 'candidates':
      return 'candidate cap reached';
    case 'memory':
      return 'value store full';
    case 'exhausted':
      return 'every program up to the cost cap tried';
    case 'solved':
      return 'solved';
    case 'error':
      return 'error';
  }
}

export function registerSolveCommand(program: Command): void {
  addSolveFlags(
    program
      .command('solve')
      .description('find the shortest program for each task (files or directories); test outputs are never read')
      .argument('<paths...>', 'task JSON files or directories of them'),
  )
    .option('--predictions <file>', 'write one JSON line per task with the attempts for each test input')
    .option('--force', 'allow --predictions to replace an existing file')
    .option('--json', 'print the reports as JSON')
    .action(async (paths: string[], flags: SolveFlags) => {
      let priors: PriorsOption | undefined;
      try {
        priors = loadPriorsOption(flags.priors);
      } catch (error) {
        writeError((error as Error).message);
        process.exitCode = 2;
        return;
      }
      const { files, problems } = expandTaskPaths(paths);
      for (const p of problems) writeError(p);
      if (flags.predictions && existsSync(flags.predictions) && !flags.force) {
        writeError(`${flags.predictions}: already exists; pithy will not overwrite it (choose another name or pass --force)`);
        process.exitCode = 2;
        return;
      }
      const predictions = flags.predictions ? openSync(flags.predictions, 'w') : undefined;
      try {
        const reports = await solveFiles(files, {
          jobs: flags.jobs,
          solve: solveOptionsFrom(flags),
          ...(priors ? { priors: priors.bits } : {}),
          onReport: (report) => {
            if (!flags.json) writeLines(reportLines(report));
          },
        });
        if (predictions !== undefined) for (const r of reports) writeSync(predictions, predictionLine(r) + '\n');
        if (flags.json) writeJson(reports);
        if (problems.length > 0 || reports.some((r) => r.status === 'error')) process.exitCode = 1;
      } finally {
        if (predictions !== undefined) closeSync(predictions);
      }
    });
}
