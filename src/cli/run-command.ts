/**
 * `pithy run PROGRAM TASK`: runs a program on every train pair and every test pair with an
 * output; prints pass/fail per pair and, for a failure, where the answer first differs.
 */
import type { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { traceEntryData, traceEntryLines } from '../output/describe-trace.ts';
import { drawComparison } from '../output/terminal-grid.ts';
import { readTasks } from '../tasks/read-task.ts';
import { describeDifference, runOnTask, type PairResult } from '../tasks/run-on-task.ts';
import { formatProblem, loadProgramFile, ProgramFileError, type LoadedProgram } from './program-file.ts';
import { stdoutColourMode, taskErrorData, writeError, writeJson, writeLines } from './output.ts';

function pairData(r: PairResult): Record<string, unknown> {
  return {
    set: r.set,
    index: r.index,
    passed: r.passed,
    ...(r.difference ? { difference: r.difference } : {}),
    ...(r.failedStep ? { failedStep: r.failedStep } : {}),
    output: r.got ? r.got.toRows() : 'FAILURE',
    ...(r.trace ? { trace: r.trace.map(traceEntryData) } : {}),
  };
}

function pairLines(r: PairResult, trace: boolean, legend: boolean): string[] {
  const mode = stdoutColourMode();
  const label = `${r.set} ${r.index}`.padEnd(9);
  const lines = [r.passed ? `  ${label} pass` : `  ${label} FAIL  ${describeDifference(r.difference!)}`];
  if (r.failedStep) lines.push(`      step '${r.failedStep.step}' failed: ${r.failedStep.why}`);
  if (trace && r.trace) {
    for (const entry of r.trace) lines.push(...traceEntryLines(entry, mode, { legend, calls: true }).map((l) => `      ${l}`));
  }
  if (!r.passed && r.got) lines.push(...drawComparison(r.expected, r.got, mode).map((l) => `      ${l}`));
  return lines;
}

export function registerRunCommand(program: Command): void {
  program
    .command('run')
    .description('run a program on every pair of a task that has an output; exit code 1 when any pair fails, 2 on bad input')
    .argument('<program>', "file with the program text ('-' reads standard input)")
    .argument('<task>', "task JSON file or folder of them ('-' reads one task from standard input)")
    .option('--trace', "print every step's value")
    .option('--legend', 'with --trace, name the colours under every drawn grid (number and palette name)')
    .option('--json', 'print the results as JSON')
    .action((programFile: string, taskPath: string, options: { trace?: boolean; legend?: boolean; json?: boolean }) => {
      if (programFile === '-' && taskPath === '-') {
        writeError("error: only one of the program and the task can come from standard input ('-')");
        process.exitCode = 2;
        return;
      }
      let loaded: LoadedProgram;
      try {
        loaded = loadProgramFile(programFile, defaultLibrary);
      } catch (error) {
        if (!(error instanceof ProgramFileError)) throw error;
        if (options.json) writeJson({ program: programFile, ok: false, problems: error.problems });
        else writeError(error.problems.map(formatProblem).join('\n'));
        process.exitCode = 2;
        return;
      }
      const entries = readTasks([taskPath]);
      let allPassed = true;
      let badInput = false;
      let tasksPassed = 0;
      const tasks: unknown[] = [];
      const errors: ReturnType<typeof taskErrorData>[] = [];
      for (const entry of entries) {
        if (!entry.ok) {
          badInput = true;
          errors.push(taskErrorData(entry.error));
          if (!options.json) writeError(entry.error.message);
          continue;
        }
        const results = runOnTask(loaded.program, entry.task, defaultLibrary, { trace: options.trace });
        const passed = results.every((r) => r.passed);
        if (!passed) allPassed = false;
        else tasksPassed++;
        if (options.json) {
          tasks.push({ task: entry.task.name, file: entry.task.path, passed, pairs: results.map(pairData) });
          continue;
        }
        const count = results.filter((r) => r.passed).length;
        writeLines([
          `${entry.task.name} (${entry.task.path})`,
          ...results.flatMap((r) => pairLines(r, options.trace === true, options.legend === true)),
          `  ${count}/${results.length} ${results.length === 1 ? 'pair' : 'pairs'} passed`,
        ]);
      }
      if (options.json) writeJson({ program: programFile, ok: true, passed: allPassed && !badInput, tasks, errors });
      else if (entries.length > 1) {
        const bad = entries.filter((e) => !e.ok).length;
        const run = entries.length - bad;
        writeLines([`${run} ${run === 1 ? 'task' : 'tasks'} run, ${tasksPassed} passed every pair${bad > 0 ? `; ${bad} bad task file${bad === 1 ? '' : 's'}` : ''}`]);
      }
      if (badInput) process.exitCode = 2;
      else if (!allPassed) process.exitCode = 1;
    });
}
