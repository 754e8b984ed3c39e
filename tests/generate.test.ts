// pithy generate: the same seed gives byte-identical files, shards of one seed give together
// exactly the files of one run, existing files are not overwritten, and every task passes the
// checks it was kept for (its program reproduces it, outputs differ from inputs and from each
// other) with a trace the shipped schema accepts (ajv). Also the parts: the random numbers,
// the shard split, the input makers and the program sampler.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { components } from '../src/grid/components.ts';
import type { Grid } from '../src/grid/grid.ts';
import { findSeparatorLines } from '../src/grid/separator-lines.ts';
import { checkProgram } from '../src/language/checker.ts';
import { parseProgram } from '../src/language/parser.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import { runOnTask } from '../src/tasks/run-on-task.ts';
import { Generation } from '../src/training/generate.ts';
import { INPUT_KINDS, makeInput } from '../src/training/input-makers.ts';
import { callCount, ProgramSampler } from '../src/training/program-sampler.ts';
import { Random } from '../src/training/random.ts';
import { parseShard, shardOf } from '../src/training/shard.ts';

const root = new URL('../', import.meta.url).pathname;
const pithy = (...args: string[]) => spawnSync(process.execPath, [join(root, 'bin', 'pithy.js'), ...args], { encoding: 'utf8', cwd: root });
const filesOf = (dir: string): Map<string, string> => new Map(readdirSync(dir).sort().map((f) => [f, readFileSync(join(dir, f), 'utf8')]));

describe('pithy generate end to end', () => {
  const base = mkdtempSync(join(tmpdir(), 'pithy-generate-'));
  const first = join(base, 'first');
  const second = join(base, 'second');
  const sharded = join(base, 'sharded');
  const runs = [pithy('generate', '--seed', '7', '--count', '20', '--out', first), pithy('generate', '--seed', '7', '--count', '20', '--out', second)];

  it('the same seed twice gives byte-identical files', () => {
    for (const r of runs) expect(r.status, r.stderr).toBe(0);
    const a = filesOf(first);
    const b = filesOf(second);
    expect(a.size).toBeGreaterThanOrEqual(8);
    expect([...b.keys()]).toEqual([...a.keys()]);
    for (const [name, text] of a) expect(b.get(name), name).toBe(text);
  });

  it('shards 1/3, 2/3 and 3/3 of the seed give together exactly the files of one run', () => {
    for (const s of ['1/3', '2/3', '3/3']) expect(pithy('generate', '--seed', '7', '--count', '20', '--out', sharded, '--shard', s).status).toBe(0);
    const whole = filesOf(first);
    const union = filesOf(sharded);
    expect([...union.keys()]).toEqual([...whole.keys()]);
    for (const [name, text] of whole) expect(union.get(name), name).toBe(text);
  });

  it('another seed gives other tasks', () => {
    const other = join(base, 'other');
    expect(pithy('generate', '--seed', '8', '--count', '5', '--out', other).status).toBe(0);
    const programs = new Set([...filesOf(first).values()].map((t) => (JSON.parse(t) as { program: string }).program));
    const otherPrograms = [...filesOf(other).values()].map((t) => (JSON.parse(t) as { program: string }).program);
    expect(otherPrograms.filter((p) => !programs.has(p)).length).toBeGreaterThan(0);
  });

  it('every task is a valid task file that its program reproduces, and worth learning from', () => {
    const schema = JSON.parse(readFileSync(join(root, 'schemas', 'trace-record.schema.json'), 'utf8')) as object;
    const validate = new Ajv2020({ strict: true }).compile(schema);
    const outputs = new Set<string>();
    for (const name of readdirSync(first)) {
      const task = readTaskFile(join(first, name));
      const file = JSON.parse(readFileSync(join(first, name), 'utf8')) as { program: string; trace: { program: string; task: string } };
      const program = parseProgram(file.program);
      expect(runOnTask(program, task, defaultLibrary).every((r) => r.passed), name).toBe(true);
      const pairs = [...task.train, ...task.test.map((t) => ({ input: t.input, output: t.output! }))];
      for (const p of pairs) expect(p.output.equals(p.input), name).toBe(false);
      expect(pairs.every((p) => p.output.equals(pairs[0]!.output)), name).toBe(false);
      expect(validate(file.trace), name).toBe(true);
      expect(file.trace.program).toBe(file.program);
      expect(file.trace.task).toBe(name.replace(/\.json$/, ''));
      outputs.add(pairs.map((p) => p.output.toString()).join('|'));
    }
    // No two tasks share their outputs.
    expect(outputs.size).toBe(readdirSync(first).length);
  });

  it('refuses to overwrite existing files, and --force allows it', () => {
    const victim = join(first, readdirSync(first)[0]!);
    writeFileSync(victim, 'mine');
    const again = pithy('generate', '--seed', '7', '--count', '20', '--out', first);
    expect(again.status).toBe(2);
    expect(again.stderr).toContain('already exist');
    expect(readFileSync(victim, 'utf8')).toBe('mine');
    expect(pithy('generate', '--seed', '7', '--count', '20', '--out', first, '--force').status).toBe(0);
    expect(readFileSync(victim, 'utf8')).toBe(filesOf(second).get(readdirSync(first)[0]!));
  });

  it('refuses a bad shard', () => {
    const bad = pithy('generate', '--out', join(base, 'x'), '--shard', '4/3');
    expect(bad.status).not.toBe(0);
    expect(bad.stderr).toContain('1 <= I <= N');
  });
});

describe('shards and the behaviour check', () => {
  it('with many programs alike, the shards still give together exactly the tasks of one run', () => {
    const run = (shard?: { index: number; count: number }) => {
      const generation = new Generation({ seed: 11, count: 300, library: defaultLibrary, ...(shard ? { shard } : {}) });
      const tasks = generation.own().flatMap((o) => generation.build(o) ?? []);
      return { counts: generation.counts, tasks: new Map(tasks.map((t) => [t.name, JSON.stringify(t.trace)])) };
    };
    const whole = run();
    // The check has work to do: some programs behave like earlier ones.
    expect(whole.counts.sameBehaviour).toBeGreaterThan(10);
    const parts = [1, 2, 3].map((index) => run({ index, count: 3 }));
    const union = new Map(parts.flatMap((p) => [...p.tasks]));
    expect(parts.reduce((n, p) => n + p.tasks.size, 0)).toBe(union.size);
    expect([...union.keys()].sort()).toEqual([...whole.tasks.keys()].sort());
    for (const [name, trace] of whole.tasks) expect(union.get(name)).toBe(trace);
    expect(parts.reduce((n, p) => n + p.counts.sameBehaviour, 0)).toBe(whole.counts.sameBehaviour);
  });
});

describe('the random numbers', () => {
  it('the same seed gives the same sequence, another seed another one', () => {
    const draw = (seed: number) => {
      const r = new Random(seed);
      return Array.from({ length: 20 }, () => r.next());
    };
    expect(draw(7)).toEqual(draw(7));
    expect(draw(7)).not.toEqual(draw(8));
  });

  it('below(n) stays in range and spreads evenly (each of 10 values within 15% of 1000 in 10000 draws)', () => {
    const r = new Random(12345);
    const counts = new Array<number>(10).fill(0);
    for (let i = 0; i < 10000; i++) counts[r.below(10)]!++;
    for (const c of counts) expect(Math.abs(c - 1000)).toBeLessThan(150);
  });

  it('weighted draws follow the weights (1:3 within 10%)', () => {
    const r = new Random(99);
    let heavy = 0;
    for (let i = 0; i < 8000; i++) heavy += r.weighted([1, 3]);
    expect(Math.abs(heavy / 8000 - 0.75)).toBeLessThan(0.075);
  });
});

describe('shards', () => {
  it('every index falls in exactly one shard, and the shards are about equal', () => {
    fc.assert(fc.property(fc.nat(), fc.integer({ min: 1, max: 16 }), (index, count) => {
      const s = shardOf(index, count);
      return Number.isInteger(s) && s >= 1 && s <= count;
    }));
    const sizes = [0, 0, 0, 0];
    for (let i = 0; i < 4000; i++) sizes[shardOf(i, 4) - 1]!++;
    for (const s of sizes) expect(Math.abs(s - 1000)).toBeLessThan(150);
  });

  it('reads I/N and refuses anything else', () => {
    expect(parseShard('2/4')).toEqual({ index: 2, count: 4 });
    for (const bad of ['0/3', '4/3', '2', 'a/b', '1/0']) expect(() => parseShard(bad)).toThrow(/I\/N/);
  });
});

describe('the input makers', () => {
  const settings = fc.record({
    seed: fc.nat(),
    height: fc.integer({ min: 3, max: 14 }),
    width: fc.integer({ min: 3, max: 14 }),
    background: fc.integer({ min: 0, max: 9 }),
    count: fc.integer({ min: 2, max: 4 }),
  });
  const draw = (kind: (typeof INPUT_KINDS)[number], s: { seed: number; height: number; width: number; background: number; count: number }) => {
    const colours = [1, 2, 3, 4, 5, 6, 7, 8, 9, 0].filter((c) => c !== s.background).slice(0, s.count);
    return { colours, grid: makeInput(kind, new Random(s.seed), { height: s.height, width: s.width, background: s.background, colours }) };
  };
  const usesOnly = (g: Grid, allowed: number[]) => [...g.cells].every((v) => allowed.includes(v));

  it('every kind keeps the size and the colours, and draws something besides the background', () => {
    fc.assert(
      fc.property(settings, fc.constantFrom(...INPUT_KINDS), (s, kind) => {
        const { colours, grid } = draw(kind, s);
        expect([grid.height, grid.width]).toEqual([s.height, s.width]);
        expect(usesOnly(grid, [s.background, ...colours])).toBe(true);
        expect([...grid.cells].some((v) => v !== s.background)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it('symmetric pictures equal their mirror image one way or another', () => {
    fc.assert(
      fc.property(settings, (s) => {
        const { grid: g } = draw('symmetric', s);
        const at = (r: number, c: number) => g.get(r, c);
        const all = (f: (r: number, c: number) => boolean) => Array.from({ length: g.height }, (_, r) => Array.from({ length: g.width }, (_, c) => f(r, c)).every(Boolean)).every(Boolean);
        const leftRight = all((r, c) => at(r, c) === at(r, g.width - 1 - c));
        const topBottom = all((r, c) => at(r, c) === at(g.height - 1 - r, c));
        const halfTurn = all((r, c) => at(r, c) === at(g.height - 1 - r, g.width - 1 - c));
        expect(leftRight || topBottom || halfTurn).toBe(true);
      }),
      { numRuns: 200 },
    );
  });

  it('objects never touch each other, corners included', () => {
    fc.assert(
      fc.property(settings, (s) => {
        const { grid } = draw('objects', s);
        // Touching shapes would merge into one region of any colour joined at corners; so the
        // regions joined at corners must be as many as those joined at edges.
        const options = { multicolour: true, background: s.background };
        expect(components(grid, { ...options, diagonal: true }).length).toBe(components(grid, { ...options, diagonal: false }).length);
      }),
      { numRuns: 200 },
    );
  });

  it('grids of five or more rows and columns cut by lines have separator lines', () => {
    fc.assert(
      fc.property(settings.filter((s) => s.height >= 5 && s.width >= 5), (s) => {
        expect(findSeparatorLines(draw('separated', s).grid)).toBeDefined();
      }),
      { numRuns: 200 },
    );
  });
});

describe('the program sampler', () => {
  const sampler = new ProgramSampler(defaultLibrary, { maxCalls: 5 });
  const random = new Random(2024);
  const programs = Array.from({ length: 400 }, () => sampler.sample(random)!);

  it('draws well-typed programs whose answer is a call, within the size limit', () => {
    for (const p of programs) {
      expect(checkProgram(p, defaultLibrary).answer).toBe('Grid');
      expect(p.answer.kind).toBe('call');
      expect(callCount(p)).toBeGreaterThanOrEqual(1);
      expect(callCount(p)).toBeLessThanOrEqual(5);
    }
  });

  it('draws the answer primitive by the prior: its mean bits match the 2^-bits weighting, below an even draw', () => {
    const grids = defaultLibrary.primitives.filter((p) => p.result === 'Grid');
    const evenMean = grids.reduce((s, p) => s + p.bits, 0) / grids.length;
    const weights = grids.map((p) => 2 ** -p.bits);
    const total = weights.reduce((a, b) => a + b, 0);
    const priorMean = grids.reduce((s, p, i) => s + p.bits * weights[i]!, 0) / total;
    const drawnMean = programs.reduce((s, p) => s + defaultLibrary.get((p.answer as { primitive: string }).primitive)!.bits, 0) / programs.length;
    expect(Math.abs(drawnMean - priorMean)).toBeLessThan(0.2);
    expect(drawnMean).toBeLessThan(evenMean - 0.2);
  });
});
