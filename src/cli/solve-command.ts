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
import { stdoutColourMode, writeError, writeJson, writeLines } from './output.ts';
import { explainLines } from './explain.ts';
import { existingProgramFiles, writeProgramFile } from './program-files.ts';

interface SolveFlags extends SharedSolveFlags {
  json?: boolean;
  predictions?: string;
  force?: boolean;
  explain?: boolean;
  programs?: string;
}

export function reportLines(report: TaskReport): string[] {
  if (report.status === 'error') return [`${report.task}: error: ${report.error}`];
  const s = report.statistics!;
  const figures = `${report.seconds.toFixed(2)} s, ${s.candidates.toLocaleString('en')} candidate${s.candidates === 1 ? '' : 's'} tried, ${s.kept.toLocaleString('en')} kept`;
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
    .option('--programs <dir>', 'write each program found as DIR/<task>.pithy, ready for pithy run and pithy check')
    .option('--explain', "draw every step's value on the first demonstration and the predicted test outputs")
    .option('--force', 'allow --predictions and --programs to replace existing files')
    .option('--json', 'print the reports as JSON')
    .action(async (paths: string[], flags: SolveFlags) => {
      const { files, problems } = expandTaskPaths(paths);
      for (const p of problems) writeError(p);
      if (flags.predictions && existsSync(flags.predictions) && !flags.force) {
        writeError(`${flags.predictions}: already exists; pithy will not overwrite it (choose another name or pass --force)`);
        process.exitCode = 2;
        return;
      }
      const clashes = flags.programs && !flags.force ? existingProgramFiles(flags.programs, files) : [];
      if (clashes.length > 0) {
        writeError(`${clashes.join(', ')}: already exist${clashes.length === 1 ? 's' : ''}; pithy will not overwrite ${clashes.length === 1 ? 'it' : 'them'} (choose another folder or pass --force)`);
        process.exitCode = 2;
        return;
      }
      const predictions = flags.predictions ? openSync(flags.predictions, 'w') : undefined;
      try {
        const reports = await solveFiles(files, {
          jobs: flags.jobs,
          solve: solveOptionsFrom(flags),
          onReport: (report) => {
            if (!flags.json) writeLines(reportLines(report));
            if (flags.explain && !flags.json) writeLines(explainLines(report, stdoutColourMode()));
            if (flags.programs) writeProgramFile(flags.programs, report);
          },
        });
        if (predictions !== undefined) for (const r of reports) writeSync(predictions, predictionLine(r) + '\n');
        if (flags.json) writeJson(reports);
        if (problems.length > 0) process.exitCode = 2;
        else if (reports.some((r) => r.status === 'error')) process.exitCode = 1;
      } finally {
        if (predictions !== undefined) closeSync(predictions);
      }
    });
}
