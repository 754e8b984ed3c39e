/**
 * `npm run bench:priors`: are priors fitted on solutions worth more than the records' own bits on
 * tasks they were not fitted on? On the public training set (ARC-AGI-1, F. Chollet 2019,
 * Apache-2.0, read from ../shared/datasets/arc-agi-1-training/), split into two fixed halves by
 * the task id (src/batch/task-halves.ts), it solves each half with the default priors, fits
 * priors on each half's solutions, and solves the other half with them. It prints a markdown
 * table of both directions, the primitive-usage figures (primitives in no solution and in exactly
 * one solved task), and the `pithy` commands that give the same runs.
 *
 *   npm run bench:priors -- [--time-limit S] [--max-candidates N] [--jobs N] [--limit N] [--dataset DIR] [--out DIR]
 *
 * Every run appends to a results file in the output folder (default runs/priors-halves/), so an
 * interrupted benchmark resumes; use a fresh --out for another budget.
 */
import { existsSync, mkdirSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { basename, dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { usageFromResults, usageReport, type UsageReport } from '../batch/primitive-usage.ts';
import { readResults, ResultsWriter, type ResultLine } from '../batch/results-file.ts';
import { scoreReport } from '../batch/score.ts';
import { solveFiles } from '../batch/solve-files.ts';
import { halfOfTask, type Half } from '../batch/task-halves.ts';
import { taskNameOf } from '../batch/solve-file.ts';
import { positiveNumber } from '../cli/solve-options.ts';
import { DEFAULT_PRIORS_PARAMETERS, fitBits } from '../library/fit-priors.ts';
import { priorsFile, priorsText, readPriorsFile } from '../library/priors-file.ts';
import { ProgressBar } from '../output/progress-bar.ts';
import { taskFiles } from '../tasks/read-task.ts';

const repoRoot = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const defaultDataset = resolve(repoRoot, '..', 'shared', 'datasets', 'arc-agi-1-training');

interface Options {
  readonly timeLimit: number;
  readonly maxCandidates?: number;
  readonly jobs: number;
  readonly limit?: number;
  readonly dataset: string;
  readonly out: string;
}

interface Priors {
  readonly file: string;
  readonly hash: string;
  readonly bits: Readonly<Record<string, number>>;
}

class BenchError extends Error {}

/** Solves `files` into the results file `name`.jsonl (resuming it), as `pithy eval` would. */
async function evaluate(options: Options, name: string, files: readonly string[], priors?: Priors): Promise<ResultLine[]> {
  const path = join(options.out, `${name}.jsonl`);
  const previous = readResults(path);
  if (previous.some((l) => l.priors !== priors?.hash)) throw new BenchError(`${path}: holds results with other priors; remove it or choose another --out`);
  const known = new Map(previous.map((l) => [resolve(l.file), l]));
  const todo = files.filter((f) => !known.has(resolve(f)));
  process.stderr.write(`${name}: ${files.length} tasks, ${files.length - todo.length} already done\n`);
  const writer = new ResultsWriter(path);
  const bar = new ProgressBar(todo.length, process.stderr);
  let solved = 0;
  await solveFiles(todo, {
    jobs: options.jobs,
    solve: { timeLimitSeconds: options.timeLimit, attempts: 2, ...(options.maxCandidates !== undefined ? { maxCandidates: options.maxCandidates } : {}) },
    ...(priors ? { priors: priors.bits } : {}),
    onReport: (report) => {
      const line: ResultLine = { ...report, solved: scoreReport(report).solved, ...(priors ? { priors: priors.hash } : {}) };
      writer.append(line);
      known.set(resolve(report.file), line);
      if (line.solved) solved++;
      bar.tick(solved);
    },
  });
  bar.finish();
  return files.map((f) => known.get(resolve(f))!);
}

/** Fits priors on results files into `name`.json, as `pithy fit-priors` would, and loads them. */
function fit(options: Options, name: string, results: readonly string[]): Priors {
  const path = join(options.out, `${name}.json`);
  const usage = usageFromResults(results, defaultLibrary);
  const bits = fitBits(usage.uses, defaultLibrary, DEFAULT_PRIORS_PARAMETERS);
  const text = priorsText(priorsFile(defaultLibrary, bits, DEFAULT_PRIORS_PARAMETERS, { results: results.map((r) => basename(r)), solvedTasks: usage.solvedTasks.length, uses: usage.totalUses }));
  if (existsSync(path) && readFileSync(path, 'utf8') !== text) throw new BenchError(`${path}: exists with other priors; remove it or choose another --out`);
  writeFileSync(path, text);
  const loaded = readPriorsFile(path, defaultLibrary);
  return { file: path, hash: loaded.hash, bits: Object.fromEntries(loaded.bits) };
}

/** One folder per half holding links to its task files, so `pithy eval FOLDER` runs the same tasks. */
function halfFolders(options: Options, files: readonly string[]): Record<Half, string[]> {
  const out: Record<Half, string[]> = { A: [], B: [] };
  for (const half of ['A', 'B'] as const) mkdirSync(join(options.out, `half-${half}`), { recursive: true });
  for (const file of files) {
    const half = halfOfTask(taskNameOf(file));
    const link = join(options.out, `half-${half}`, basename(file));
    if (!existsSync(link)) symlinkSync(resolve(file), link);
    out[half].push(link);
  }
  return out;
}

const solvedSet = (lines: readonly ResultLine[]): Set<string> => new Set(lines.filter((l) => l.solved).map((l) => l.task));
const seconds = (lines: readonly ResultLine[]): number => lines.reduce((s, l) => s + l.seconds, 0);

function usageLine(label: string, r: UsageReport): string {
  return `| ${label} | ${r.solvedTasks} | ${r.unused.length} | ${r.singleTask.length} | ${r.severalTasks} |`;
}

async function main(): Promise<void> {
  const program = new Command()
    .name('bench:priors')
    .description('priors fitted on one half of the public training set, measured on the other half, in both directions')
    .option('--time-limit <seconds>', 'per-task wall time', positiveNumber('--time-limit', false), 3)
    .option('--max-candidates <n>', 'per-task cap on candidates (a budget that does not depend on the load of the machine)', positiveNumber('--max-candidates', true))
    .option('--jobs <n>', 'tasks in parallel', positiveNumber('--jobs', true), Math.max(1, cpus().length))
    .option('--limit <n>', 'only the first N tasks (file-name order), for a quick check', positiveNumber('--limit', true))
    .option('--dataset <dir>', 'task directory', defaultDataset)
    .option('--out <dir>', 'folder for the half folders, results and priors files', join(repoRoot, 'runs', 'priors-halves'))
    .parse(process.argv);
  const options = program.opts<Options>();
  if (!existsSync(options.dataset)) {
    process.stderr.write(`${options.dataset}: not found; the benchmark needs the public training set there (see ../shared/datasets/arc-agi-1-training/SOURCE.md)\n`);
    process.exitCode = 2;
    return;
  }
  const halves = halfFolders(options, taskFiles(options.dataset).slice(0, options.limit));
  const out = (name: string) => join(options.out, name);

  const defaults = { A: await evaluate(options, 'A-default', halves.A), B: await evaluate(options, 'B-default', halves.B) };
  const fromA = fit(options, 'priors-from-A', [out('A-default.jsonl')]);
  const fromB = fit(options, 'priors-from-B', [out('B-default.jsonl')]);
  const fitted = {
    B: await evaluate(options, 'B-with-priors-from-A', halves.B, fromA),
    A: await evaluate(options, 'A-with-priors-from-B', halves.A, fromB),
  };

  const budget = `${options.timeLimit} s${options.maxCandidates !== undefined ? ` and ${options.maxCandidates.toLocaleString('en')} candidates` : ''} per task`;
  const lines = [
    `tasks: ${halves.A.length + halves.B.length} from ${options.dataset}; half A: id ending in an even hexadecimal digit (${halves.A.length} tasks), half B: odd (${halves.B.length}); ${budget}; 2 attempts; ${options.jobs} jobs; ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'})`,
    '',
    '| half solved | tasks | default priors | priors fitted on the other half | gained | lost | solver seconds, default / fitted |',
    '| --- | ---: | ---: | ---: | ---: | ---: | ---: |',
  ];
  const gainedLost: string[] = [];
  for (const half of ['A', 'B'] as const) {
    const before = solvedSet(defaults[half]);
    const after = solvedSet(fitted[half]);
    const gained = [...after].filter((t) => !before.has(t)).sort();
    const lost = [...before].filter((t) => !after.has(t)).sort();
    const other = half === 'A' ? 'B' : 'A';
    lines.push(`| ${half} | ${defaults[half].length} | ${before.size} | ${after.size} (fitted on ${other}) | ${gained.length} | ${lost.length} | ${seconds(defaults[half]).toFixed(0)} / ${seconds(fitted[half]).toFixed(0)} |`);
    gainedLost.push(`half ${half}: gained ${gained.join(' ') || 'none'}; lost ${lost.join(' ') || 'none'}`);
  }
  const both = usageReport(usageFromResults([out('A-default.jsonl'), out('B-default.jsonl')], defaultLibrary), defaultLibrary);
  const usageA = usageReport(usageFromResults([out('A-default.jsonl')], defaultLibrary), defaultLibrary);
  const usageB = usageReport(usageFromResults([out('B-default.jsonl')], defaultLibrary), defaultLibrary);
  const bitsRange = (p: Priors) => {
    const values = Object.values(p.bits);
    return `${Math.min(...values)}–${Math.max(...values)}`;
  };
  const rel = (p: string) => {
    const r = relative(process.cwd(), p);
    return r === '' ? '.' : r.startsWith('..') ? p : r;
  };
  const flags = `--time-limit ${options.timeLimit}${options.maxCandidates !== undefined ? ` --max-candidates ${options.maxCandidates}` : ''} --jobs ${options.jobs}`;
  lines.push(
    '',
    ...gainedLost,
    `fitted bits: priors from A ${bitsRange(fromA)}, priors from B ${bitsRange(fromB)} (records' own bits: ${Math.min(...defaultLibrary.primitives.map((p) => p.bits))}–${Math.max(...defaultLibrary.primitives.map((p) => p.bits))})`,
    '',
    `Primitives (${both.primitives} in the library) in the cheapest programs of solved tasks, default priors:`,
    '',
    '| solutions of | solved tasks | primitives in no solution | in exactly one solved task | in two or more |',
    '| --- | ---: | ---: | ---: | ---: |',
    usageLine('half A', usageA),
    usageLine('half B', usageB),
    usageLine('both halves', both),
    '',
    `in exactly one solved task (both halves): ${both.singleTask.map((s) => `${s.primitive} (${s.task})`).join(', ') || 'none'}`,
    '',
    'The same runs from the command line:',
    '',
    '```sh',
    `pithy eval ${rel(out('half-A'))} --results ${rel(out('A-default.jsonl'))} ${flags}`,
    `pithy eval ${rel(out('half-B'))} --results ${rel(out('B-default.jsonl'))} ${flags}`,
    `pithy fit-priors ${rel(out('A-default.jsonl'))} --output ${rel(out('priors-from-A.json'))}`,
    `pithy fit-priors ${rel(out('B-default.jsonl'))} --output ${rel(out('priors-from-B.json'))}`,
    `pithy eval ${rel(out('half-B'))} --priors ${rel(out('priors-from-A.json'))} --results ${rel(out('B-with-priors-from-A.jsonl'))} ${flags}`,
    `pithy eval ${rel(out('half-A'))} --priors ${rel(out('priors-from-B.json'))} --results ${rel(out('A-with-priors-from-B.jsonl'))} ${flags}`,
    `pithy fit-priors ${rel(out('A-default.jsonl'))} ${rel(out('B-default.jsonl'))} --report`,
    '```',
  );
  process.stdout.write(lines.join('\n') + '\n');
}

try {
  await main();
} catch (error) {
  if (!(error instanceof BenchError)) throw error;
  process.stderr.write(error.message + '\n');
  process.exitCode = 2;
}
