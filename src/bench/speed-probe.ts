/**
 * `npm run bench:speed`: how many candidates the search evaluates per second of CPU time, on a
 * fixed sample of the public training set (ARC-AGI-1, F. Chollet 2019, Apache-2.0, read from
 * ../shared/datasets/arc-agi-1-training/) at a fixed candidate cap per task, in this process,
 * one task after another. A candidate cap instead of a time limit makes the work the same on
 * every run, so the figure compares two versions of the search, and the programs found can be
 * compared too (`--programs FILE` writes them as JSON lines: task, program text, bits).
 *
 * With `--pruning-at BITS` it also runs every task of the sample to that cost level (every
 * program up to BITS, no candidate cap) with observational-equivalence pruning on and then
 * off, so the two are compared at the same depth rather than in the same time.
 *
 * With `--from-results FILE` the sample is instead the tasks of an eval results file, all of
 * them or (`--which`) only those it solved or did not solve, to see what a change does to each
 * side of an earlier run.
 *
 *   npm run bench:speed -- [--tasks N] [--candidates N] [--dataset DIR] [--programs FILE] [--pruning-at BITS]
 *                          [--no-goals] [--no-intermediate-tables] [--no-case-splits] [--from-results FILE [--which solved|unsolved]]
 */
import { existsSync, writeFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Command } from 'commander';
import { readResults } from '../batch/results-file.ts';
import { positiveNumber } from '../cli/solve-options.ts';
import { solvePuzzle } from '../search/solve.ts';
import { readTaskFile, taskFiles } from '../tasks/read-task.ts';
import { puzzleOf } from '../tasks/task.ts';

const repoRoot = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const defaultDataset = resolve(repoRoot, '..', 'shared', 'datasets', 'arc-agi-1-training');

/** Every k-th task in file-name order, so the sample spreads over the whole set. */
export function spreadSample<T>(items: readonly T[], count: number): T[] {
  if (count >= items.length) return items.slice();
  const out: T[] = [];
  for (let i = 0; i < count; i++) out.push(items[Math.floor((i * items.length) / count)]!);
  return out;
}

function main(): void {
  const program = new Command()
    .name('bench:speed')
    .description('candidate evaluations per CPU second at a fixed candidate cap, one task at a time')
    .option('--tasks <n>', 'tasks in the sample (spread over the set)', positiveNumber('--tasks', true), 30)
    .option('--candidates <n>', 'candidate cap per task', positiveNumber('--candidates', true), 300_000)
    .option('--dataset <dir>', 'task directory', defaultDataset)
    .option('--programs <file>', 'write each task\'s programs as JSON lines')
    .option('--no-goals', 'switch off working back from the outputs (goals)')
    .option('--no-intermediate-tables', 'switch off learning tables from the grids the search makes')
    .option('--no-case-splits', 'switch off choosing between two kept grids by a kept condition')
    .option('--from-results <file>', 'take the sample from an eval results file instead (its task files, in its order)')
    .option('--which <part>', 'with --from-results: all, solved or unsolved tasks', 'all')
    .option('--pruning-at <bits>', 'also compare pruning on and off, running every task to this cost level', positiveNumber('--pruning-at', true))
    .parse(process.argv);
  const options = program.opts<{ tasks: number; candidates: number; dataset: string; programs?: string; pruningAt?: number; goals: boolean; intermediateTables: boolean; caseSplits: boolean; fromResults?: string; which: string }>();
  if (!existsSync(options.dataset)) {
    process.stderr.write(`${options.dataset}: not found; the speed probe needs the public training set there (see ../shared/datasets/arc-agi-1-training/SOURCE.md)\n`);
    process.exitCode = 2;
    return;
  }
  const files = options.fromResults ? filesFromResults(options.fromResults, options.which) : spreadSample(taskFiles(options.dataset), options.tasks);
  if (!files) return;
  let candidates = 0;
  let cpuSeconds = 0;
  let pruned = 0;
  let solved = 0;
  let throughGoals = 0;
  let throughTables = 0;
  let throughSplits = 0;
  const lines: string[] = [];
  for (const file of files) {
    const task = readTaskFile(file);
    const puzzle = puzzleOf(task);
    const before = process.cpuUsage();
    const result = solvePuzzle(puzzle, { maxCandidates: options.candidates, timeLimitSeconds: 3600, ...(options.goals ? {} : { goalBits: 0 }), ...(options.intermediateTables ? {} : { intermediateGrids: 0 }), ...(options.caseSplits ? {} : { caseSplits: false }) });
    const used = process.cpuUsage(before);
    cpuSeconds += (used.user + used.system) / 1e6;
    candidates += result.statistics.candidates;
    pruned += result.statistics.pruned;
    // Scoring only, after the search: the test outputs were never shown to it.
    const right = task.test.every((t, i) => t.output !== undefined && result.solutions.some((s) => s.testOutputs[i]!.equals(t.output!)));
    if (right) {
      solved++;
      const rightOnes = result.solutions.filter((s) => task.test.every((t, i) => s.testOutputs[i]!.equals(t.output!)));
      if (rightOnes.some((s) => s.throughGoal)) throughGoals++;
      if (rightOnes.some((s) => s.throughIntermediateTable)) throughTables++;
      if (rightOnes.some((s) => s.throughCaseSplit)) throughSplits++;
    }
    lines.push(JSON.stringify({ task: puzzle.name, reason: result.reason, candidates: result.statistics.candidates, programs: result.solutions.map((s) => ({ text: s.text, bits: s.bits, throughGoal: s.throughGoal, throughIntermediateTable: s.throughIntermediateTable, throughCaseSplit: s.throughCaseSplit })) }));
    process.stderr.write('.');
  }
  process.stderr.write('\n');
  if (options.programs) writeFileSync(options.programs, lines.join('\n') + '\n');
  process.stdout.write(
    [
      `tasks: ${files.length} ${options.fromResults ? `(${options.which}) from ${options.fromResults}` : `spread over ${options.dataset}`}; cap ${options.candidates} candidates per task; one process; ${cpus()[0]?.model ?? 'unknown CPU'}`,
      `candidates evaluated: ${candidates}`,
      `CPU seconds: ${cpuSeconds.toFixed(2)}`,
      `candidate evaluations per CPU second: ${Math.round(candidates / cpuSeconds)}`,
      `share pruned as equivalent: ${((100 * pruned) / Math.max(1, candidates)).toFixed(1)}%`,
      `tasks solved (every test output among the attempts): ${solved} / ${files.length}, ${throughGoals} of them by a program met through a goal${options.goals ? '' : ' (goals off)'}, ${throughTables} by a table learned from a grid the search made${options.intermediateTables ? '' : ' (off)'}, ${throughSplits} by a case split${options.caseSplits ? '' : ' (off)'}`,
    ].join('\n') + '\n',
  );
  if (options.pruningAt !== undefined) comparePruning(files, options.pruningAt);
}

/** The task files of an eval results file (all, solved or unsolved), or undefined after an error message. */
function filesFromResults(path: string, which: string): string[] | undefined {
  if (!['all', 'solved', 'unsolved'].includes(which)) {
    process.stderr.write(`--which must be all, solved or unsolved, got '${which}'\n`);
    process.exitCode = 2;
    return undefined;
  }
  if (!existsSync(path)) {
    process.stderr.write(`${path}: not found (an eval results file was expected)\n`);
    process.exitCode = 2;
    return undefined;
  }
  let read: ReturnType<typeof readResults>;
  try {
    read = readResults(path);
  } catch (error) {
    process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 2;
    return undefined;
  }
  const lines = read.filter((l) => l.solved !== undefined && (which === 'all' || l.solved === (which === 'solved')));
  if (lines.length === 0) {
    process.stderr.write(`${path}: no ${which === 'all' ? '' : which + ' '}tasks with a score (an eval results file was expected)\n`);
    process.exitCode = 2;
    return undefined;
  }
  return lines.map((l) => l.file);
}

/** Every task to the same cost level, pruning on then off: candidates, kept, CPU seconds. */
function comparePruning(files: readonly string[], bits: number): void {
  const totals = { on: { candidates: 0, kept: 0, pruned: 0, sectionsPruned: 0, seconds: 0 }, off: { candidates: 0, kept: 0, pruned: 0, sectionsPruned: 0, seconds: 0 } };
  for (const file of files) {
    const puzzle = puzzleOf(readTaskFile(file));
    for (const pruning of [true, false]) {
      const before = process.cpuUsage();
      // Attempts beyond reach, so every task runs to the same level whether or not it is solved.
      const result = solvePuzzle(puzzle, { maxBits: bits, pruning, attempts: 1000, extraBits: 1000, goalBits: 0, intermediateGrids: 0, caseSplits: false, timeLimitSeconds: 3600, maxCandidates: 1e12, maxStoreBytes: 8e9 });
      const used = process.cpuUsage(before);
      const t = pruning ? totals.on : totals.off;
      t.candidates += result.statistics.candidates;
      t.kept += result.statistics.kept;
      t.pruned += result.statistics.pruned;
      t.sectionsPruned += result.statistics.sectionsPruned;
      t.seconds += (used.user + used.system) / 1e6;
    }
    process.stderr.write(':');
  }
  process.stderr.write('\n');
  const { on, off } = totals;
  const ratio = (a: number, b: number) => (b === 0 ? 'n/a' : (a / b).toFixed(2));
  process.stdout.write(
    [
      '',
      `every program up to ${bits} bits, pruning on and off, the same ${files.length} tasks:`,
      '',
      '| figure | pruning on | pruning off | on / off |',
      '| --- | ---: | ---: | ---: |',
      `| candidates evaluated | ${on.candidates} | ${off.candidates} | ${ratio(on.candidates, off.candidates)} |`,
      `| candidates kept | ${on.kept} | ${off.kept} | ${ratio(on.kept, off.kept)} |`,
      `| share pruned as equivalent | ${((100 * on.pruned) / Math.max(1, on.candidates)).toFixed(1)}% | ${((100 * off.pruned) / Math.max(1, off.candidates)).toFixed(1)}% | n/a |`,
      `| of which sections pruned by signature | ${on.sectionsPruned} | ${off.sectionsPruned} | n/a |`,
      `| CPU seconds | ${on.seconds.toFixed(2)} | ${off.seconds.toFixed(2)} | ${ratio(on.seconds, off.seconds)} |`,
    ].join('\n') + '\n',
  );
}

main();
