/**
 * `npm run bench`: the solver on the public training set (ARC-AGI-1, F. Chollet 2019,
 * Apache-2.0, read from ../shared/datasets/arc-agi-1-training/) at a fixed per-task budget,
 * once with observational-equivalence pruning and once without, in one run; prints a
 * markdown table to paste into BENCHMARKS.md together with the command line.
 *
 *   npm run bench -- [--time-limit S] [--jobs N] [--limit N] [--dataset DIR]
 */
import { existsSync } from 'node:fs';
import { cpus } from 'node:os';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Command } from 'commander';
import { scoreReport } from '../batch/score.ts';
import { solveFiles } from '../batch/solve-files.ts';
import { median, secondsToSolution } from '../batch/summary.ts';
import type { TaskReport } from '../batch/task-report.ts';
import { ProgressBar } from '../output/progress-bar.ts';
import { taskFiles } from '../tasks/read-task.ts';
import { positiveNumber } from '../cli/solve-options.ts';

const repoRoot = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const defaultDataset = resolve(repoRoot, '..', 'shared', 'datasets', 'arc-agi-1-training');

interface Figures {
  readonly solved: number;
  readonly tasks: number;
  readonly medianSecondsToSolution: number | null;
  readonly candidatesPerSecond: number;
  readonly prunedShare: number;
  readonly candidates: number;
}

function figures(reports: readonly TaskReport[]): Figures {
  let solved = 0;
  let candidates = 0;
  let pruned = 0;
  let seconds = 0;
  const times: number[] = [];
  for (const r of reports) {
    if (scoreReport(r).solved) {
      solved++;
      times.push(secondsToSolution(r));
    }
    if (r.statistics) {
      candidates += r.statistics.candidates;
      pruned += r.statistics.pruned;
      seconds += r.seconds;
    }
  }
  return {
    solved,
    tasks: reports.length,
    medianSecondsToSolution: median(times),
    candidatesPerSecond: seconds > 0 ? candidates / seconds : 0,
    prunedShare: candidates > 0 ? pruned / candidates : 0,
    candidates,
  };
}

async function measure(files: readonly string[], pruning: boolean, timeLimit: number, jobs: number): Promise<TaskReport[]> {
  const bar = new ProgressBar(files.length, process.stderr);
  let solved = 0;
  process.stderr.write(`pruning ${pruning ? 'on' : 'off'}: ${files.length} tasks at ${timeLimit} s each, ${jobs} jobs\n`);
  const reports = await solveFiles(files, {
    jobs,
    solve: { timeLimitSeconds: timeLimit, attempts: 2, pruning },
    onReport: (r) => {
      if (scoreReport(r).solved) solved++;
      bar.tick(solved);
    },
  });
  bar.finish();
  return reports;
}

const fmt = (n: number | null, digits = 2): string => (n === null ? 'n/a' : n.toFixed(digits));

async function main(): Promise<void> {
  const program = new Command()
    .name('bench')
    .description('solver benchmark on the public training set, with and without observational-equivalence pruning')
    .option('--time-limit <seconds>', 'per-task budget', positiveNumber('--time-limit', false), 5)
    .option('--jobs <n>', 'tasks in parallel', positiveNumber('--jobs', true), Math.max(1, cpus().length))
    .option('--limit <n>', 'only the first N tasks (file-name order)', positiveNumber('--limit', true))
    .option('--dataset <dir>', 'task directory', defaultDataset)
    .parse(process.argv);
  const options = program.opts<{ timeLimit: number; jobs: number; limit?: number; dataset: string }>();
  if (!existsSync(options.dataset)) {
    process.stderr.write(`${options.dataset}: not found; the benchmark needs the public training set there (see ../shared/datasets/arc-agi-1-training/SOURCE.md)\n`);
    process.exitCode = 2;
    return;
  }
  const files = taskFiles(options.dataset).slice(0, options.limit);
  const on = figures(await measure(files, true, options.timeLimit, options.jobs));
  const off = figures(await measure(files, false, options.timeLimit, options.jobs));
  const ratio = (a: number | null, b: number | null) => (a === null || b === null || b === 0 ? 'n/a' : (a / b).toFixed(2));
  const lines = [
    `tasks: ${files.length} from ${options.dataset}; ${options.timeLimit} s per task; 2 attempts; ${options.jobs} jobs; ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'})`,
    '',
    '| figure | pruning on | pruning off | on / off |',
    '| --- | ---: | ---: | ---: |',
    `| tasks solved | ${on.solved} / ${on.tasks} | ${off.solved} / ${off.tasks} | ${ratio(on.solved, off.solved)} |`,
    `| median seconds to a solution | ${fmt(on.medianSecondsToSolution)} | ${fmt(off.medianSecondsToSolution)} | ${ratio(on.medianSecondsToSolution, off.medianSecondsToSolution)} |`,
    `| candidate evaluations per second | ${fmt(on.candidatesPerSecond, 0)} | ${fmt(off.candidatesPerSecond, 0)} | ${ratio(on.candidatesPerSecond, off.candidatesPerSecond)} |`,
    `| share of candidates pruned as equivalent | ${fmt(100 * on.prunedShare, 1)}% | ${fmt(100 * off.prunedShare, 1)}% | n/a |`,
  ];
  process.stdout.write(lines.join('\n') + '\n');
}

await main();
