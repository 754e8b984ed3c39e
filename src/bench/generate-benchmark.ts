/**
 * `npm run bench:generate`: is the generated data learnable, and how fast is it made?
 *
 * 1. Draws `--count` programs from `--seed` and builds their tasks in this process (as
 *    `pithy generate` does, without writing files); reports the throughput in tasks per second
 *    of CPU time and the share of it that every shard repeats.
 * 2. Solves each task with the search, test outputs hidden, at a fixed candidate cap (so the work
 *    is the same on every run; a generous time limit is only a safety net), and counts a task as
 *    recovered when the cheapest program found costs no more bits than the generator's and
 *    reproduces the test outputs. Reports the recovery rate by program size (primitive uses).
 *
 *   npm run bench:generate -- [--seed N] [--count N] [--candidates N] [--results FILE]
 */
import { writeFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { positiveNumber } from '../cli/solve-options.ts';
import { solvePuzzle } from '../search/solve.ts';
import { puzzleOf } from '../tasks/task.ts';
import { Generation, type GeneratedTask } from '../training/generate.ts';

type Outcome = 'recovered' | 'cheaper, wrong on test' | 'dearer' | 'not found';

function cpuSeconds(since: NodeJS.CpuUsage): number {
  const used = process.cpuUsage(since);
  return (used.user + used.system) / 1e6;
}

function main(): void {
  const program = new Command()
    .name('bench:generate')
    .description('generation throughput, and the share of generated tasks the search recovers, by program size')
    .option('--seed <n>', 'seed of the generated tasks', (t) => Number(t), 1)
    .option('--count <n>', 'programs to draw (each gives at most one task to solve)', positiveNumber('--count', true), 160)
    .option('--candidates <n>', 'candidate cap per task', positiveNumber('--candidates', true), 100_000)
    .option('--time-limit <seconds>', 'safety limit per task (the cap should stop first)', positiveNumber('--time-limit', false), 60)
    .option('--results <file>', 'write one JSON line per task: name, size, bits, outcome, programs')
    .parse(process.argv);
  const o = program.opts<{ seed: number; count: number; candidates: number; timeLimit: number; results?: string }>();
  const options = { seed: o.seed, count: o.count, library: defaultLibrary };

  const started = process.cpuUsage();
  const wallStarted = performance.now();
  const generation = new Generation(options);
  const owned = generation.own();
  const sharedCpu = cpuSeconds(started);
  const tasks = owned.map((p) => generation.build(p)).filter((t): t is GeneratedTask => t !== undefined);
  const generateCpu = cpuSeconds(started);
  const counts = generation.counts;
  const generateWall = (performance.now() - wallStarted) / 1000;

  const bySize = new Map<number, Record<Outcome, number>>();
  const lines: string[] = [];
  let stoppedByTime = 0;
  const solveStarted = process.cpuUsage();
  for (const t of tasks) {
    const result = solvePuzzle(puzzleOf(t.task), { maxCandidates: o.candidates, timeLimitSeconds: o.timeLimit, attempts: 1 });
    if (result.reason === 'time') stoppedByTime++;
    const best = result.solutions[0];
    const expected = t.task.test.map((x) => x.output!);
    let outcome: Outcome = 'not found';
    if (best) {
      const rightOnTest = best.testOutputs.every((g, i) => g.equals(expected[i]!));
      outcome = best.bits > t.trace.bits ? 'dearer' : rightOnTest ? 'recovered' : 'cheaper, wrong on test';
    }
    const row = bySize.get(t.size) ?? { recovered: 0, 'cheaper, wrong on test': 0, dearer: 0, 'not found': 0 };
    row[outcome]++;
    bySize.set(t.size, row);
    lines.push(JSON.stringify({ task: t.name, size: t.size, bits: t.trace.bits, kind: t.kind, outcome, generator: t.trace.program, found: best ? { bits: best.bits, program: best.text } : null, reason: result.reason }));
    process.stderr.write('.');
  }
  process.stderr.write('\n');
  const solveCpu = cpuSeconds(solveStarted);
  if (o.results) writeFileSync(o.results, lines.join('\n') + '\n');

  const total = (r: Record<Outcome, number>) => r.recovered + r['cheaper, wrong on test'] + r.dearer + r['not found'];
  const all: Record<Outcome, number> = { recovered: 0, 'cheaper, wrong on test': 0, dearer: 0, 'not found': 0 };
  const table = ['| primitive uses | tasks | recovered | fit the demonstrations, wrong on test | only dearer programs | nothing found |', '| ---: | ---: | ---: | ---: | ---: | ---: |'];
  for (const size of [...bySize.keys()].sort((a, b) => a - b)) {
    const r = bySize.get(size)!;
    for (const k of Object.keys(all) as Outcome[]) all[k] += r[k];
    table.push(`| ${size} | ${total(r)} | ${r.recovered} (${((100 * r.recovered) / total(r)).toFixed(0)}%) | ${r['cheaper, wrong on test']} | ${r.dearer} | ${r['not found']} |`);
  }
  table.push(`| all | ${total(all)} | **${all.recovered} (${((100 * all.recovered) / Math.max(1, total(all))).toFixed(0)}%)** | ${all['cheaper, wrong on test']} | ${all.dearer} | ${all['not found']} |`);
  process.stdout.write(
    [
      `seed ${o.seed}; ${o.count} programs drawn, ${tasks.length} tasks built (dropped: ${counts.notDrawn} too big, ${counts.failsEveryProbe} failed on every probe, ${counts.changesNothing} changed nothing, ${counts.sameOutput} one output for all, ${counts.sameBehaviour} like an earlier one, ${counts.noPassingInputs} no passing inputs); one process; ${cpus()[0]?.model ?? 'unknown CPU'}`,
      `generation: ${generateCpu.toFixed(2)} CPU s (the part every shard repeats: ${sharedCpu.toFixed(2)} s, ${((100 * sharedCpu) / generateCpu).toFixed(0)}%), ${generateWall.toFixed(2)} s wall, ${(tasks.length / generateCpu).toFixed(1)} tasks per CPU second`,
      `solving: cap ${o.candidates} candidates per task, ${solveCpu.toFixed(1)} CPU s in all, ${stoppedByTime} stopped by the ${o.timeLimit} s safety limit`,
      '',
      ...table,
    ].join('\n') + '\n',
  );
}

main();
