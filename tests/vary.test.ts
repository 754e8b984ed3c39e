// Task variation: the kind of content read from hand-drawn grids, a task's profile, and new
// pairs that look like the task's own (sizes, colours), that the program reproduces, that repeat
// no input, and that the same seed draws again; the vary command end to end.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { Grid } from '../src/grid/grid.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { parseProgram } from '../src/language/parser.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import type { Task } from '../src/tasks/task.ts';
import { contentKind, profileOf } from '../src/training/content-kind.ts';
import { varyTask } from '../src/training/vary.ts';

const root = new URL('../', import.meta.url).pathname;
const demo = join(root, 'tasks-demo');
const pithy = (...args: string[]) => spawnSync(process.execPath, [join(root, 'bin', 'pithy.js'), ...args], { encoding: 'utf8', cwd: root });

describe('the kind of content of a grid (hand-drawn grids)', () => {
  it('a grid cut by a full line of colour 5 is separated', () => {
    expect(contentKind(Grid.fromRows([[1, 0, 5, 0, 0], [0, 0, 5, 0, 2], [0, 3, 5, 0, 0]]))).toBe('separated');
  });

  it('a picture equal to its mirror image left to right is symmetric', () => {
    expect(contentKind(Grid.fromRows([[2, 0, 0, 2], [0, 7, 7, 0], [1, 0, 0, 1]]))).toBe('symmetric');
  });

  it('a two-by-three tile repeated, and the same with a patch of colour 0 over it, is a pattern', () => {
    const rows = [
      [1, 2, 3, 1, 2, 3],
      [3, 1, 2, 3, 1, 2],
      [1, 2, 3, 1, 2, 3],
      [3, 1, 2, 3, 1, 2],
    ];
    expect(contentKind(Grid.fromRows(rows))).toBe('pattern');
    const patched = rows.map((r) => r.slice());
    patched[1]![3] = 0;
    patched[2]![3] = 0;
    patched[2]![4] = 0;
    expect(contentKind(Grid.fromRows(patched))).toBe('pattern');
  });

  it('two shapes of several cells are objects; lone cells are scattered', () => {
    expect(contentKind(Grid.fromRows([[4, 4, 0, 0, 0], [4, 4, 0, 0, 6], [0, 0, 0, 0, 6], [0, 0, 0, 0, 6]]))).toBe('objects');
    expect(contentKind(Grid.fromRows([[4, 0, 0, 0, 0], [0, 0, 0, 0, 6], [0, 0, 0, 0, 0], [0, 3, 0, 0, 0]]))).toBe('scattered');
  });
});

describe('a task profile', () => {
  it('reads the background, the colours most used first, and the sizes of the demonstration inputs', () => {
    const g = (rows: number[][]) => Grid.fromRows(rows);
    const task: Task = {
      name: 'hand',
      path: 'hand.json',
      train: [
        { input: g([[0, 0, 0], [0, 3, 3], [0, 3, 3]]), output: g([[1]]) },
        { input: g([[0, 0, 0, 0], [7, 0, 3, 3], [7, 0, 0, 0]]), output: g([[1]]) },
      ],
      // Test inputs are not read: colour 9 must not appear in the profile.
      test: [{ input: g([[9, 9], [9, 0]]) }],
    };
    const profile = profileOf(task);
    expect(profile.background).toBe(0);
    expect(profile.colours).toEqual([3, 7]);
    expect(profile.sizes).toEqual([
      { height: 3, width: 3 },
      { height: 3, width: 4 },
    ]);
    expect(profile.kind).toBe('objects');
  });
});

describe('new pairs for a demo task', () => {
  const task = readTaskFile(join(demo, 'tallest-mast.json'));
  const program = parseProgram(readFileSync(join(demo, 'tallest-mast.pithy'), 'utf8'));
  const variation = varyTask(task, program, defaultLibrary, { seed: 3, count: 30 });

  it('gives the pairs asked for, each reproduced by the program', () => {
    expect(variation.pairs).toHaveLength(30);
    for (const p of variation.pairs) expect(runProgram(program, p.input, defaultLibrary).output).toEqual(p.output);
  });

  it('draws inputs of the demonstrations’ sizes and colours, repeating none', () => {
    const sizes = new Set(task.train.map((p) => `${p.input.height}x${p.input.width}`));
    const colours = new Set(task.train.flatMap((p) => [...p.input.cells]));
    const known = [...task.train.map((p) => p.input), ...task.test.map((t) => t.input)];
    variation.pairs.forEach((p, i) => {
      expect(sizes.has(`${p.input.height}x${p.input.width}`)).toBe(true);
      expect([...p.input.cells].every((c) => colours.has(c))).toBe(true);
      expect(known.some((g) => g.equals(p.input))).toBe(false);
      expect(variation.pairs.slice(0, i).some((q) => q.input.equals(p.input))).toBe(false);
    });
  });

  it('the same seed draws the same pairs; another seed others', () => {
    const again = varyTask(task, program, defaultLibrary, { seed: 3, count: 30 });
    expect(again.pairs.map((p) => p.input.toString())).toEqual(variation.pairs.map((p) => p.input.toString()));
    const other = varyTask(task, program, defaultLibrary, { seed: 4, count: 30 });
    expect(other.pairs.map((p) => p.input.toString())).not.toEqual(variation.pairs.map((p) => p.input.toString()));
  });
});

describe('pithy vary', () => {
  const dir = mkdtempSync(join(tmpdir(), 'pithy-vary-'));
  const out = join(dir, 'varied.json');

  it('writes a task file with the new pairs as demonstrations and the task’s own test', () => {
    const r = pithy('vary', join(demo, 'marker-buoys.pithy'), join(demo, 'marker-buoys.json'), '--count', '12', '--out', out);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).toContain('12 new pairs for marker-buoys');
    const varied = readTaskFile(out);
    const original = readTaskFile(join(demo, 'marker-buoys.json'));
    expect(varied.train).toHaveLength(12);
    expect(varied.test.map((t) => t.input.toString())).toEqual(original.test.map((t) => t.input.toString()));
    // Marker buoys keep colour 2 only: every new output is its input with other colours cleared to 0.
    for (const p of varied.train) expect([...p.output.cells]).toEqual([...p.input.cells].map((c) => (c === 2 ? 2 : 0)));
  });

  it('refuses to overwrite, and refuses a program that does not solve the task', () => {
    writeFileSync(out, 'mine');
    const again = pithy('vary', join(demo, 'marker-buoys.pithy'), join(demo, 'marker-buoys.json'), '--out', out);
    expect(again.status).toBe(2);
    expect(readFileSync(out, 'utf8')).toBe('mine');
    const wrong = pithy('vary', join(demo, 'tallest-mast.pithy'), join(demo, 'marker-buoys.json'));
    expect(wrong.status).toBe(1);
    expect(wrong.stderr).toMatch(/does not reproduce train 0.*vary needs a program that solves the task/);
  });
});
