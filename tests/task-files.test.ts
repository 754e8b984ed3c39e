// Bad task files are rejected with the file and the JSON path of the problem; a directory with
// one bad file still yields its good tasks; the CLI exits non-zero on bad input. All data here
// is invented for these checks.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { parseTask, readTasks, TaskFileError } from '../src/tasks/read-task.ts';
import { puzzleOf, type Pair, type TestCase } from '../src/tasks/task.ts';

const folder = mkdtempSync(join(tmpdir(), 'pithy-task-files-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

const good = { train: [{ input: [[1, 0], [0, 1]], output: [[0, 1], [1, 0]] }], test: [{ input: [[2, 2], [0, 0]], output: [[0, 0], [2, 2]] }] };

function rejection(text: string, file = 'harbour.json'): TaskFileError {
  try {
    parseTask(text, file);
  } catch (error) {
    expect(error).toBeInstanceOf(TaskFileError);
    return error as TaskFileError;
  }
  throw new Error('expected the task to be rejected');
}

describe('bad task files', () => {
  it('not JSON: the message gives the line and column where the text stops being JSON', () => {
    const e = rejection('{"train": [', 'broken/quay.json');
    expect(e.message).toContain('broken/quay.json');
    // The text ends where a value should start: column 12 of line 1 (worked out by hand).
    expect(e.jsonPath).toBe('line 1, column 12');
    expect(e.message).toMatch(/^broken\/quay\.json:1:12: not valid JSON/);
    // Line 2, column 19: two spaces, then {"input": [[1]], takes columns 3 to 18; the second comma is 19.
    const second = rejection('{"train": [\n  {"input": [[1]],, "output": [[1]]}\n]}', 'quay.json');
    expect(second.position).toEqual({ line: 2, column: 19 });
    expect(second.message).toMatch(/^quay\.json:2:19: not valid JSON/);
  });

  it('not JSON: the line and column of the first character that breaks the grammar', () => {
    const e = rejection('{"train": [\n  [1, 2],,\n]}');
    expect(e.jsonPath).toBe('line 2, column 10');
  });

  it('a byte-order mark before the JSON is not an error', () => {
    expect(parseTask('\uFEFF' + JSON.stringify(good), 'harbour.json').train.length).toBe(1);
  });

  it('rows of different lengths', () => {
    const e = rejection(JSON.stringify({ train: [{ input: [[1, 2, 3], [4, 5]], output: [[1]] }], test: [{ input: [[1]] }] }));
    expect(e.message).toContain('harbour.json');
    expect(e.jsonPath).toBe('$.train[0].input[1]');
    expect(e.message).toContain('$.train[0].input[1]');
  });

  it('a colour outside 0-9', () => {
    const e = rejection(JSON.stringify({ train: [{ input: [[1]], output: [[0, 10]] }], test: [{ input: [[1]] }] }));
    expect(e.jsonPath).toBe('$.train[0].output[0][1]');
    expect(e.message).toContain('harbour.json: at $.train[0].output[0][1]');
    expect(e.message).toMatch(/0 to 9/);
  });

  it('a colour that is not a whole number', () => {
    const e = rejection(JSON.stringify({ train: [{ input: [[1]], output: [[1]] }], test: [{ input: [[0.5]] }] }));
    expect(e.jsonPath).toBe('$.test[0].input[0][0]');
  });

  it('an empty grid', () => {
    const e = rejection(JSON.stringify({ train: [{ input: [], output: [[1]] }], test: [{ input: [[1]] }] }));
    expect(e.jsonPath).toBe('$.train[0].input');
    expect(e.message).toContain('$.train[0].input');
    expect(e.message).toMatch(/empty/);
  });

  it('an empty row', () => {
    const e = rejection(JSON.stringify({ train: [{ input: [[]], output: [[1]] }], test: [{ input: [[1]] }] }));
    expect(e.jsonPath).toBe('$.train[0].input[0]');
  });

  it('a grid over the size cap (31 rows)', () => {
    const tall = Array.from({ length: 31 }, () => [0, 1]);
    const e = rejection(JSON.stringify({ train: [{ input: [[1]], output: [[1]] }, { input: tall, output: [[1]] }], test: [{ input: [[1]] }] }));
    expect(e.jsonPath).toBe('$.train[1].input');
    expect(e.message).toMatch(/size cap of 30/);
  });

  it('a row over the size cap (31 cells)', () => {
    const wide = [Array.from({ length: 31 }, () => 3)];
    const e = rejection(JSON.stringify({ train: [{ input: [[1]], output: wide }], test: [{ input: [[1]] }] }));
    expect(e.jsonPath).toBe('$.train[0].output[0]');
  });

  it('no train pairs', () => {
    const e = rejection(JSON.stringify({ train: [], test: [{ input: [[1]] }] }));
    expect(e.jsonPath).toBe('$.train');
    expect(e.message).toContain('harbour.json: at $.train');
  });

  it('train missing altogether', () => {
    const e = rejection(JSON.stringify({ test: [{ input: [[1]] }] }));
    expect(e.jsonPath).toBe('$.train');
  });

  it('a good file is read, with an optional test output', () => {
    const task = parseTask(JSON.stringify({ ...good, test: [{ input: [[3]] }] }), 'good.json');
    expect(task.name).toBe('good');
    expect(task.train[0]!.output.toRows()).toEqual([[0, 1], [1, 0]]);
    expect(task.test[0]!.output).toBeUndefined();
  });
});

// Test files are ES modules, so strict mode: a write to a frozen object throws a TypeError
// instead of being silently ignored.
describe('a task once read cannot change', () => {
  const task = parseTask(JSON.stringify(good), 'good.json');
  const other = Grid.fromRows([[9]]);

  it('its train list cannot grow or lose a pair', () => {
    const train = task.train as Pair[];
    expect(() => train.push({ input: other, output: other })).toThrow(TypeError);
    expect(() => train.pop()).toThrow(TypeError);
    expect(task.train).toHaveLength(1);
  });

  it("a pair's input and output cannot be replaced", () => {
    const pair = task.train[0] as { input: Grid; output: Grid };
    expect(() => {
      pair.input = other;
    }).toThrow(TypeError);
    expect(() => {
      pair.output = other;
    }).toThrow(TypeError);
    expect(task.train[0]!.input.toRows()).toEqual([[1, 0], [0, 1]]);
  });

  it("the test list, a test output and the task's name cannot be changed", () => {
    expect(() => (task.test as TestCase[]).push({ input: other })).toThrow(TypeError);
    expect(() => {
      (task.test[0] as { output?: Grid }).output = other;
    }).toThrow(TypeError);
    expect(() => {
      (task as { name: string }).name = 'quay';
    }).toThrow(TypeError);
  });

  it('the puzzle made from it is frozen too and shares its demonstrations', () => {
    const puzzle = puzzleOf(task);
    expect(puzzle.train).toBe(task.train);
    expect(() => (puzzle.testInputs as Grid[]).push(other)).toThrow(TypeError);
    expect(() => {
      (puzzle as { name: string }).name = 'quay';
    }).toThrow(TypeError);
  });

  it('the grids are left unfrozen (a Uint8Array cannot be frozen) and still work', () => {
    const input = task.train[0]!.input;
    expect(Object.isFrozen(input.cells)).toBe(false);
    expect(input.equals(Grid.fromRows([[1, 0], [0, 1]]))).toBe(true);
    expect(input.get(0, 1)).toBe(0);
    expect(task.test[0]!.output!.toRows()).toEqual([[0, 0], [2, 2]]);
  });
});

describe('a directory with one bad file', () => {
  const directory = join(folder, 'mixed');
  rmSync(directory, { recursive: true, force: true });
  mkdirSync(directory, { recursive: true });
  writeFileSync(join(directory, 'a-good.json'), JSON.stringify(good));
  writeFileSync(join(directory, 'b-bad.json'), '{"train": [{"input": [[1, 2], [3]], "output": [[1]]}], "test": [{"input": [[1]]}]}');
  writeFileSync(join(directory, 'c-good.json'), JSON.stringify(good));
  writeFileSync(join(directory, 'notes.txt'), 'not a task');

  it('still yields the good tasks and reports the bad one', () => {
    const entries = readTasks([directory]);
    expect(entries.map((e) => e.ok)).toEqual([true, false, true]);
    const bad = entries[1]!;
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.file).toContain('b-bad.json');
      expect(bad.error.message).toContain('b-bad.json');
      expect(bad.error.jsonPath).toBe('$.train[0].input[1]');
    }
  });
});

describe('the command line on bad input', () => {
  const bin = new URL('../bin/pithy.js', import.meta.url).pathname;
  const pithy = (...args: string[]) => spawnSync(process.execPath, [bin, ...args], { encoding: 'utf8', env: { ...process.env, NO_COLOR: '1' } });
  const program = join(folder, 'swap.pithy');
  writeFileSync(program, 'with deck\nanswer reflect_vertically(deck)\n');
  const goodFile = join(folder, 'flip.json');
  writeFileSync(goodFile, JSON.stringify({ train: [{ input: [[1, 1], [0, 2]], output: [[0, 2], [1, 1]] }], test: [{ input: [[3], [4]], output: [[4], [3]] }] }));
  const badFile = join(folder, 'bad-colour.json');
  writeFileSync(badFile, JSON.stringify({ train: [{ input: [[1, 12]], output: [[1]] }], test: [{ input: [[1]] }] }));

  it('run exits 0 when every pair passes', () => {
    const result = pithy('run', program, goodFile);
    expect(result.stdout).toContain('2/2 pairs passed');
    expect(result.status).toBe(0);
  });

  it('run exits non-zero on a bad task file and names the file and JSON path', () => {
    const result = pithy('run', program, badFile);
    expect(result.status).not.toBe(0);
    expect(result.stderr).toContain('bad-colour.json');
    expect(result.stderr).toContain('$.train[0].input[0][1]');
  });

  it('check exits 2 on an ill-typed program, naming file:line:column of the offending argument and the expected type', () => {
    const ill = join(folder, 'ill.pithy');
    writeFileSync(ill, 'with deck\nboats = objects_by_colour(deck)\nanswer reflect_vertically(boats)\n');
    const result = pithy('check', ill);
    expect(result.status).toBe(2);
    // 'boats' starts at column 27 of line 3: 'answer reflect_vertically(' is 26 characters.
    expect(result.stderr).toContain(`${ill}:3:27`);
    expect(result.stderr).toContain('expected Grid, found Objects');
  });
});
