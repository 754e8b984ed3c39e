// Fuzzing the task reader: arbitrary bytes, arbitrary JSON, truncated and mutated valid task
// files and deep nesting. Every case ends in a task or a TaskFileError that names the file and
// a place (a JSON path or a line and column); nothing else escapes, and nothing hangs (each
// case is bounded by the text's length; the test's own time-out would catch a hang).
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { jsonErrorIndex } from '../src/tasks/json-error-place.ts';
import { parseTask, readTaskFile, TaskFileError } from '../src/tasks/read-task.ts';
import type { Task } from '../src/tasks/task.ts';
import { mutate, textMutation } from './support/text-mutations.ts';

const FILE = 'fuzz/quay.json';
const demo = new URL('../tasks-demo/', import.meta.url).pathname;
const demoTexts = readdirSync(demo)
  .filter((f) => f.endsWith('.json'))
  .sort()
  .map((f) => readFileSync(join(demo, f), 'utf8'));
const folder = mkdtempSync(join(tmpdir(), 'pithy-fuzz-tasks-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

/** What the reader promises for a task it accepts. */
function checkTask(task: Task): void {
  expect(task.train.length).toBeGreaterThan(0);
  expect(task.test.length).toBeGreaterThan(0);
  const grids = [...task.train.flatMap((p) => [p.input, p.output]), ...task.test.flatMap((t) => (t.output ? [t.input, t.output] : [t.input]))];
  for (const g of grids) {
    expect(g.cells.length).toBe(g.height * g.width);
    expect(g.height).toBeGreaterThan(0);
    expect(g.cells.every((c) => c <= 9)).toBe(true);
  }
}

/** Reads the text; returns 'task' or 'error', and fails the test on anything else. */
function outcome(text: string, file = FILE): 'task' | 'error' {
  let task: Task;
  try {
    task = parseTask(text, file);
  } catch (error) {
    if (!(error instanceof TaskFileError)) throw new Error(`an exception other than TaskFileError escaped: ${String(error)}`);
    expect(error.file).toBe(file);
    // "file: at $.train[0]: ..." for a wrong value, "file:3:14: ..." for broken JSON.
    const place = error.position ? `${file}:${error.position.line}:${error.position.column}: ` : `${file}: at `;
    expect(error.message.startsWith(place)).toBe(true);
    expect(error.jsonPath).toMatch(/^(\$.*|line \d+, column \d+)$/);
    expect(error.problem.length).toBeGreaterThan(0);
    return 'error';
  }
  checkTask(task);
  return 'task';
}

/** Tally of outcomes, to check that the generators reach both sides. */
function tally(): { task: number; error: number } {
  return { task: 0, error: 0 };
}

describe('fuzzing the task reader', () => {
  it('arbitrary bytes, read from a file, give a task or an error naming file and place', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 300 }), (bytes) => {
        const file = join(folder, 'bytes.json');
        writeFileSync(file, bytes);
        try {
          readTaskFile(file);
        } catch (error) {
          expect(error).toBeInstanceOf(TaskFileError);
          const e = error as TaskFileError;
          const place = e.position ? `${file}:${e.position.line}:${e.position.column}: ` : `${file}: at `;
          expect(e.message.startsWith(place)).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('arbitrary text and arbitrary JSON values', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary', maxLength: 200 }), (text) => void outcome(text)), { numRuns: 500 });
    fc.assert(fc.property(fc.jsonValue({ maxDepth: 6 }), (value) => void outcome(JSON.stringify(value))), { numRuns: 500 });
  });

  it('JSON shaped like a task, with any values where grids go', () => {
    const cell = fc.oneof(fc.integer({ min: -2, max: 12 }), fc.constant(1.5), fc.constant('3'), fc.constant(null), fc.constant([1]));
    const goodGrid = fc.integer({ min: 1, max: 3 }).chain((w) => fc.array(fc.array(fc.integer({ min: 0, max: 9 }), { minLength: w, maxLength: w }), { minLength: 1, maxLength: 3 }));
    const grid = fc.oneof(
      { arbitrary: goodGrid, weight: 12 },
      { arbitrary: fc.array(fc.array(cell, { maxLength: 4 }), { maxLength: 4 }), weight: 1 },
      { arbitrary: fc.jsonValue({ maxDepth: 3 }), weight: 1 },
    );
    const pair = fc.oneof({ arbitrary: fc.record({ input: grid, output: grid }), weight: 8 }, { arbitrary: fc.record({ input: grid, output: grid }, { requiredKeys: [] }), weight: 1 });
    const counts = tally();
    fc.assert(
      fc.property(fc.record({ train: fc.array(pair, { maxLength: 3 }), test: fc.array(pair, { maxLength: 2 }) }), (task) => {
        counts[outcome(JSON.stringify(task))]++;
      }),
      { numRuns: 1000 },
    );
    // Both outcomes are reached, so the generator tests the reader on either side.
    expect(counts.task).toBeGreaterThan(20);
    expect(counts.error).toBeGreaterThan(20);
  });

  it('valid task files cut short anywhere are errors naming the line and column', () => {
    fc.assert(
      fc.property(fc.constantFrom(...demoTexts), fc.double({ min: 0, max: 1, noNaN: true }), (text, share) => {
        const trimmed = text.trimEnd();
        const cut = Math.floor(share * (trimmed.length - 1));
        const error = (() => {
          try {
            parseTask(trimmed.slice(0, cut), FILE);
          } catch (e) {
            return e;
          }
          return undefined;
        })();
        expect(error).toBeInstanceOf(TaskFileError);
        // Cut text is broken JSON, or (cut at 0) empty: the place is a line and column.
        expect((error as TaskFileError).jsonPath).toMatch(/^line \d+, column \d+$/);
      }),
      { numRuns: 300 },
    );
  });

  it('valid task files with characters replaced, inserted or deleted', () => {
    const mutation = textMutation('{}[],:"0123456789 -.eatn\\x\n');
    const counts = tally();
    fc.assert(
      fc.property(fc.constantFrom(...demoTexts), fc.array(mutation, { minLength: 1, maxLength: 4 }), (text, mutations) => {
        counts[outcome(mutate(text, mutations))]++;
      }),
      { numRuns: 1000 },
    );
    expect(counts.task).toBeGreaterThan(20);
    expect(counts.error).toBeGreaterThan(20);
  });

  it('deep nesting anywhere a value goes gives an error, not a stack overflow', () => {
    const places = [
      (deep: string) => deep,
      (deep: string) => `{"train": ${deep}, "test": []}`,
      (deep: string) => `{"train": [{"input": ${deep}, "output": [[1]]}], "test": [{"input": [[1]]}]}`,
      (deep: string) => `{"train": [{"input": [[1]], "output": [[1]]}], "test": [{"input": [[1]], "output": [[${deep}]]}]}`,
    ];
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 200_000 }), fc.constantFrom(...places), fc.boolean(), (depth, place, closed) => {
        const deep = '['.repeat(depth) + (closed ? ']'.repeat(depth) : '');
        expect(outcome(place(deep))).toBe('error');
      }),
      { numRuns: 40 },
    );
  });

  it('the line and column of a syntax error agree with the built-in parser on what is valid JSON', () => {
    const near = fc.array(fc.constantFrom(...'{}[],:"01-.e tfnrul\\a'), { maxLength: 24 }).map((cs) => cs.join(''));
    fc.assert(
      fc.property(fc.oneof(near, fc.json({ maxDepth: 4 })), (text) => {
        let valid = true;
        try {
          JSON.parse(text);
        } catch {
          valid = false;
        }
        expect(jsonErrorIndex(text) < 0).toBe(valid);
      }),
      { numRuns: 3000 },
    );
  });
});
