/**
 * Synthetic tasks with known programs. A run has a seed and a count and goes in two stages:
 *
 * 1. Screening, the same on every machine: generation index 0, 1, 2, … draws a program by the
 *    priors (its own random stream, from the seed and the index) and runs it on a fixed set of
 *    probe inputs (one of each input kind, at most 8 by 8, drawn once from the seed). A program is dropped when
 *    it fails on every probe, changes no probe, gives every probe the same output, or behaves
 *    like a program kept before it: the same outputs on every probe (compared by a hash of
 *    them). The first `count` programs that pass get task numbers 0 … count - 1.
 * 2. Building, split between shards by task number: inputs are drawn for each numbered program
 *    (its own random stream again) from the input kinds it worked on, until every pair passes:
 *    the program succeeds on every input, every output differs from its input, and the outputs
 *    are not all the same. A program whose inputs never pass in `inputTries` draws gives no
 *    task; that too is the same in every run.
 *
 * So the same seed gives the same tasks, and the shards of one seed give together exactly the
 * tasks of one run: what depends on other indices (the behaviour check) is in stage 1, which
 * each shard repeats, and stage 1 is the cheap part.
 */
import { Grid } from '../grid/grid.ts';
import type { Program } from '../language/ast.ts';
import { isFailure } from '../language/failure.ts';
import { runProgram } from '../language/interpreter.ts';
import type { Library } from '../library/library.ts';
import type { Task } from '../tasks/task.ts';
import { INPUT_KINDS, makeInput, type InputKind, type InputSettings } from './input-makers.ts';
import { callCount, literalColours, ProgramSampler } from './program-sampler.ts';
import { deriveSeed, Random } from './random.ts';
import { shardOf, WHOLE_RUN, type Shard } from './shard.ts';
import { traceRecord, type TraceRecord } from './trace-record.ts';

export interface GenerateOptions {
  readonly seed: number;
  /** Programs to number (tasks to build, less those whose inputs never pass). */
  readonly count: number;
  readonly shard?: Shard;
  readonly library: Library;
  /** Smallest and largest height and width of an input (default 3 and 12). */
  readonly minSize?: number;
  readonly maxSize?: number;
  /** Most content colours in a task besides the background (default 4). */
  readonly colours?: number;
  /** Demonstration pairs and test pairs per task (default 3 and 1). */
  readonly trainPairs?: number;
  readonly testPairs?: number;
  /** Deepest nesting and most primitive uses of a program (default 4 and 5). */
  readonly maxDepth?: number;
  readonly maxCalls?: number;
  /** Draws of a task's inputs before giving up on its program (default 40). */
  readonly inputTries?: number;
}

/** Why stage 1 dropped programs, and how many. */
export interface ScreenCounts {
  sampled: number;
  failsEveryProbe: number;
  changesNothing: number;
  sameOutput: number;
  sameBehaviour: number;
  /** Numbered programs (at most `count`). */
  kept: number;
}

export interface NumberedProgram {
  /** Task number, 0 … count - 1. */
  readonly number: number;
  /** Generation index it was drawn at. */
  readonly index: number;
  readonly program: Program;
  /** Input kinds it succeeded on among the probes. */
  readonly kinds: readonly InputKind[];
}

export interface GeneratedTask {
  readonly number: number;
  readonly index: number;
  readonly name: string;
  readonly kind: InputKind;
  readonly task: Task;
  readonly program: Program;
  /** Primitive uses in the program. */
  readonly size: number;
  readonly trace: TraceRecord;
}

interface Resolved {
  seed: number;
  count: number;
  shard: Shard;
  library: Library;
  minSize: number;
  maxSize: number;
  colours: number;
  trainPairs: number;
  testPairs: number;
  maxDepth: number;
  maxCalls: number;
  inputTries: number;
}

function resolve(o: GenerateOptions): Resolved {
  const r: Resolved = {
    seed: o.seed,
    count: o.count,
    shard: o.shard ?? WHOLE_RUN,
    library: o.library,
    minSize: o.minSize ?? 3,
    maxSize: o.maxSize ?? 12,
    colours: o.colours ?? 4,
    trainPairs: o.trainPairs ?? 3,
    testPairs: o.testPairs ?? 1,
    maxDepth: o.maxDepth ?? 4,
    maxCalls: o.maxCalls ?? 5,
    inputTries: o.inputTries ?? 40,
  };
  if (!(r.minSize >= 1 && r.minSize <= r.maxSize)) throw new RangeError(`sizes must satisfy 1 <= smallest <= largest, got ${r.minSize} and ${r.maxSize}`);
  if (!(r.colours >= 1 && r.colours <= 9)) throw new RangeError(`colours must be from 1 to 9, got ${r.colours}`);
  return r;
}

/** The name of task number n of a seed's run: `seed7-00012`. */
export function generatedTaskName(seed: number, number: number): string {
  return `seed${seed}-${String(number).padStart(5, '0')}`;
}

interface Probe {
  readonly kind: InputKind;
  readonly grid: Grid;
}

/** Probe inputs per input kind, and their largest height and width: few and small, since every shard runs every program on them. */
const PROBES_PER_KIND = 1;
const PROBE_SIZE = 8;

function probeSet(r: Resolved): Probe[] {
  const random = new Random(deriveSeed(r.seed, 'probes'));
  const probes: Probe[] = [];
  const top = Math.min(r.maxSize, PROBE_SIZE);
  for (const kind of INPUT_KINDS) {
    for (let i = 0; i < PROBES_PER_KIND; i++) {
      const settings: InputSettings = {
        height: random.between(Math.min(r.minSize, top), top),
        width: random.between(Math.min(r.minSize, top), top),
        background: 0,
        colours: random.sample([1, 2, 3, 4, 5, 6, 7, 8, 9], 4),
      };
      probes.push({ kind, grid: makeInput(kind, random, settings) });
    }
  }
  return probes;
}

/** Stage 1 (see the file comment): the numbered programs of a run, with the screening counts. */
export function screenPrograms(options: GenerateOptions): { programs: NumberedProgram[]; counts: ScreenCounts } {
  const r = resolve(options);
  const sampler = new ProgramSampler(r.library, { maxDepth: r.maxDepth, maxCalls: r.maxCalls });
  const probes = probeSet(r);
  const seen = new Set<string>();
  const counts: ScreenCounts = { sampled: 0, failsEveryProbe: 0, changesNothing: 0, sameOutput: 0, sameBehaviour: 0, kept: 0 };
  const programs: NumberedProgram[] = [];
  const lastIndex = r.count * 500 + 1000;
  for (let index = 0; programs.length < r.count && index < lastIndex; index++) {
    const program = sampler.sample(new Random(deriveSeed(r.seed, index, 'program')));
    if (!program) continue;
    counts.sampled++;
    const outputs = probes.map((p) => runProgram(program, p.grid, r.library).output);
    const succeeded = probes.flatMap((p, i) => (isFailure(outputs[i]) ? [] : [{ probe: p, output: outputs[i] as Grid }]));
    if (succeeded.length === 0) {
      counts.failsEveryProbe++;
      continue;
    }
    if (succeeded.every((s) => s.output.equals(s.probe.grid))) {
      counts.changesNothing++;
      continue;
    }
    if (succeeded.length > 1 && succeeded.every((s) => s.output.equals(succeeded[0]!.output))) {
      counts.sameOutput++;
      continue;
    }
    const key = outputs.map((o) => (isFailure(o) ? '-' : `${o.height}x${o.width}:${o.hash}`)).join(' ');
    if (seen.has(key)) {
      counts.sameBehaviour++;
      continue;
    }
    seen.add(key);
    const kinds = INPUT_KINDS.filter((k) => succeeded.some((s) => s.probe.kind === k && !s.output.equals(s.probe.grid)));
    programs.push({ number: programs.length, index, program, kinds: kinds.length > 0 ? kinds : INPUT_KINDS.filter((k) => succeeded.some((s) => s.probe.kind === k)) });
  }
  counts.kept = programs.length;
  return { programs, counts };
}

/** Whether the task number belongs to the shard. */
export function inShard(number: number, shard: Shard): boolean {
  return shard.count === 1 || shardOf(number, shard.count) === shard.index;
}

/** Stage 2 for one numbered program: its task, or undefined when no draw of inputs passed. */
export function buildTask(numbered: NumberedProgram, options: GenerateOptions): GeneratedTask | undefined {
  const r = resolve(options);
  const random = new Random(deriveSeed(r.seed, numbered.index, 'task'));
  const needed = literalColours(numbered.program);
  const pairs = r.trainPairs + r.testPairs;
  for (let attempt = 0; attempt < r.inputTries; attempt++) {
    const kind = random.pick(numbered.kinds);
    const background = random.chance(0.7) ? 0 : random.below(10);
    const extra = random.sample([0, 1, 2, 3, 4, 5, 6, 7, 8, 9].filter((c) => c !== background && !needed.includes(c)), 9);
    const own = needed.filter((c) => c !== background);
    const wanted = Math.max(own.length, random.between(kind === 'separated' ? 2 : 1, r.colours));
    const colours = random.sample([...own, ...extra.slice(0, Math.max(0, wanted - own.length))], wanted);
    const sameSize = random.chance(0.3);
    let height = random.between(r.minSize, r.maxSize);
    let width = random.between(r.minSize, r.maxSize);
    const inputs: Grid[] = [];
    const outputs: Grid[] = [];
    let ok = true;
    for (let i = 0; i < pairs && ok; i++) {
      if (!sameSize && i > 0) {
        height = random.between(r.minSize, r.maxSize);
        width = random.between(r.minSize, r.maxSize);
      }
      const input = makeInput(kind, random, { height, width, background, colours });
      const output = runProgram(numbered.program, input, r.library).output;
      ok = !isFailure(output) && !output.equals(input) && !inputs.some((g) => g.equals(input));
      inputs.push(input);
      if (!isFailure(output)) outputs.push(output);
    }
    if (!ok || outputs.every((o) => o.equals(outputs[0]!))) continue;
    const name = generatedTaskName(r.seed, numbered.number);
    const task: Task = {
      name,
      path: `${name}.json`,
      train: inputs.slice(0, r.trainPairs).map((input, i) => ({ input, output: outputs[i]! })),
      test: inputs.slice(r.trainPairs).map((input, i) => ({ input, output: outputs[r.trainPairs + i]! })),
    };
    return {
      number: numbered.number,
      index: numbered.index,
      name,
      kind,
      task,
      program: numbered.program,
      size: callCount(numbered.program),
      trace: traceRecord(task, numbered.program, r.library),
    };
  }
  return undefined;
}

/** Checks generate options early (for the command line), throwing a RangeError that says what is wrong. */
export function checkGenerateOptions(options: GenerateOptions): void {
  resolve(options);
}
