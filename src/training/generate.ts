/**
 * Synthetic tasks with known programs. A run has a seed and a count of generation indices
 * 0 … count - 1; each index draws a program by the priors (its own random stream, from the seed
 * and the index) and gives at most one task:
 *
 * 1. The program is run on a fixed set of probe inputs (two small ones of each input kind,
 *    drawn once from the seed). It is dropped when it fails on every probe, changes no probe,
 *    gives every probe the same output, or behaves like the program of an earlier index: the
 *    same outputs on every probe (compared by a hash of them).
 * 2. Inputs are drawn (the index's own random stream again) from the input kinds it changed,
 *    until every pair passes: the program succeeds on every input, every output differs from
 *    its input, and the outputs are not all the same. A program whose inputs never pass in
 *    `inputTries` draws gives no task.
 *
 * Shards. The behaviour check compares an index with every earlier one, so shards are not cut
 * by index but by behaviour: every shard draws every program and runs it on the probes, in
 * order, only until the first probe it succeeds on; that probe and its output decide the shard.
 * Two programs that behave alike succeed first on the same probe with the same output, so they
 * fall in the same shard, and the shard that owns a program has seen every earlier program
 * like it: the shards of a seed give together exactly the tasks of one run. Only the drawing
 * and that first probe are repeated by every shard; the other probes and the inputs are the
 * owning shard's alone.
 */
import { Grid } from '../grid/grid.ts';
import type { Program } from '../language/ast.ts';
import { FAILURE, isFailure, type Failure } from '../language/failure.ts';
import { runProgram } from '../language/interpreter.ts';
import type { Library } from '../library/library.ts';
import type { Task } from '../tasks/task.ts';
import { INPUT_KINDS, makeInput, type InputKind, type InputSettings } from './input-makers.ts';
import { callCount, literalColours, ProgramSampler } from './program-sampler.ts';
import { deriveSeed, mix32, Random } from './random.ts';
import { shardOf, WHOLE_RUN, type Shard } from './shard.ts';
import { traceRecord, type TraceRecord } from './trace-record.ts';

export interface GenerateOptions {
  readonly seed: number;
  /** Generation indices (programs drawn); each gives at most one task. */
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

/** What became of a run's generation indices. */
export interface GenerationCounts {
  /** Indices whose program came out too big in every try (every shard counts these). */
  notDrawn: number;
  /** Programs that failed on every probe (every shard counts these). */
  failsEveryProbe: number;
  /** Programs this shard owns, and what became of them: */
  owned: number;
  changesNothing: number;
  sameOutput: number;
  sameBehaviour: number;
  noPassingInputs: number;
  written: number;
}

/** A program this shard owns, after the shared part of stage 1. */
export interface OwnedProgram {
  readonly index: number;
  readonly program: Program;
}

export interface GeneratedTask {
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

/** The name of the task of generation index i of a seed's run: `seed7-00012`. */
export function generatedTaskName(seed: number, index: number): string {
  return `seed${seed}-${String(index).padStart(5, '0')}`;
}

interface Probe {
  readonly kind: InputKind;
  readonly grid: Grid;
}

/** Probe inputs per input kind, and their largest height and width. */
const PROBES_PER_KIND = 2;
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

const outputKey = (o: Grid | Failure): string => (isFailure(o) ? '-' : `${o.height}x${o.width}:${o.hash}`);

/**
 * One run (or one shard of it), stage by stage: `own()` draws every program and keeps this
 * shard's; `build()` takes those in index order through the rest of the checks to a task.
 */
export class Generation {
  readonly counts: GenerationCounts = { notDrawn: 0, failsEveryProbe: 0, owned: 0, changesNothing: 0, sameOutput: 0, sameBehaviour: 0, noPassingInputs: 0, written: 0 };
  private readonly r: Resolved;
  private readonly probes: Probe[];
  private readonly seen = new Set<string>();
  private lastBuilt = -1;

  constructor(options: GenerateOptions) {
    this.r = resolve(options);
    this.probes = probeSet(this.r);
  }

  /** The shared part of stage 1, over every index: the programs this shard owns, in index order. */
  own(): OwnedProgram[] {
    const { r } = this;
    const sampler = new ProgramSampler(r.library, { maxDepth: r.maxDepth, maxCalls: r.maxCalls });
    const owned: OwnedProgram[] = [];
    for (let index = 0; index < r.count; index++) {
      const program = sampler.sample(new Random(deriveSeed(r.seed, index, 'program')));
      if (!program) {
        this.counts.notDrawn++;
        continue;
      }
      let first = -1;
      let output: Grid | Failure = FAILURE;
      for (let i = 0; i < this.probes.length && first < 0; i++) {
        output = runProgram(program, this.probes[i]!.grid, r.library).output;
        if (!isFailure(output)) first = i;
      }
      if (first < 0 || isFailure(output)) {
        this.counts.failsEveryProbe++;
        continue;
      }
      if (r.shard.count === 1 || shardOf(mix32(first + 1) ^ output.hash, r.shard.count) === r.shard.index) owned.push({ index, program });
    }
    this.counts.owned = owned.length;
    return owned;
  }

  /**
   * The rest of stage 1, then stage 2, for an owned program: its task, or undefined when it is
   * dropped (the counts say why). Owned programs must come in index order.
   */
  build(owned: OwnedProgram): GeneratedTask | undefined {
    if (owned.index <= this.lastBuilt) throw new RangeError(`generation index ${owned.index} comes after ${this.lastBuilt}: owned programs are built in index order`);
    this.lastBuilt = owned.index;
    const { r, probes } = this;
    const outputs = probes.map((p) => runProgram(owned.program, p.grid, r.library).output);
    const succeeded = probes.flatMap((p, i) => (isFailure(outputs[i]) ? [] : [{ probe: p, output: outputs[i] as Grid }]));
    if (succeeded.every((s) => s.output.equals(s.probe.grid))) {
      this.counts.changesNothing++;
      return undefined;
    }
    if (succeeded.length > 1 && succeeded.every((s) => s.output.equals(succeeded[0]!.output))) {
      this.counts.sameOutput++;
      return undefined;
    }
    const key = outputs.map(outputKey).join(' ');
    if (this.seen.has(key)) {
      this.counts.sameBehaviour++;
      return undefined;
    }
    this.seen.add(key);
    const changed = INPUT_KINDS.filter((k) => succeeded.some((s) => s.probe.kind === k && !s.output.equals(s.probe.grid)));
    const task = buildTask(owned, changed, r);
    if (task) this.counts.written++;
    else this.counts.noPassingInputs++;
    return task;
  }
}

/** Stage 2: the task of an owned program that passed the probes, or undefined when no draw of inputs passed. */
function buildTask(numbered: OwnedProgram, kinds: readonly InputKind[], r: Resolved): GeneratedTask | undefined {
  const random = new Random(deriveSeed(r.seed, numbered.index, 'task'));
  const needed = literalColours(numbered.program);
  const pairs = r.trainPairs + r.testPairs;
  for (let attempt = 0; attempt < r.inputTries; attempt++) {
    const kind = random.pick(kinds);
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
    const name = generatedTaskName(r.seed, numbered.index);
    const task: Task = {
      name,
      path: `${name}.json`,
      train: inputs.slice(0, r.trainPairs).map((input, i) => ({ input, output: outputs[i]! })),
      test: inputs.slice(r.trainPairs).map((input, i) => ({ input, output: outputs[r.trainPairs + i]! })),
    };
    return {
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
