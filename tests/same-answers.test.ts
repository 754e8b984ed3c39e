/**
 * Same answers after the speed work: the first program the search finds at a candidate cap,
 * for every demo task and a fixed sample of the public training set, equals what the search
 * found before it (tests/fixtures/first-programs-before-speed.jsonl, written by the search at
 * commit bba3324, before the enumerator became a class with type ids, section signatures,
 * per-grid memos and slab-allocated cells). Goals, tables learned from intermediate grids and
 * case splits are switched off here: they add programs the earlier search could not find at the
 * cap, which is their point, not a change of answers.
 * Programs with a demonstrated colour map (`{#a -> #b, ...}`) are left out: the learned-tables
 * work made that constant cost bits entry by entry instead of a flat 3 bits (README,
 * "Description length"), a deliberate change of the score, not of the search's speed.
 *
 * Training tasks: ARC-AGI-1 public training set (F. Chollet 2019, Apache-2.0), read from
 * ../shared/datasets/arc-agi-1-training/; that part skips where the folder is absent.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { solvePuzzle } from '../src/search/solve.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import { puzzleOf } from '../src/tasks/task.ts';

const root = resolve(import.meta.dirname, '..');
const dataset = resolve(root, '..', 'shared', 'datasets', 'arc-agi-1-training');
const CAP = 100_000;

interface Expected {
  readonly task: string;
  readonly program: string | null;
  readonly bits: number | null;
}

const expected: Expected[] = readFileSync(join(root, 'tests', 'fixtures', 'first-programs-before-speed.jsonl'), 'utf8')
  .trim()
  .split('\n')
  .map((line) => JSON.parse(line) as Expected)
  .filter((e) => !(e.program ?? '').includes('{#'));

function firstProgram(file: string): { program: string | null; bits: number | null } {
  const result = solvePuzzle(puzzleOf(readTaskFile(file)), { maxCandidates: CAP, timeLimitSeconds: 3600, attempts: 1, goalBits: 0, intermediateGrids: 0, caseSplits: false });
  const first = result.solutions[0];
  return { program: first?.text ?? null, bits: first?.bits ?? null };
}

describe('the same first programs as before the speed work, at a candidate cap', () => {
  const demo = expected.filter((e) => existsSync(join(root, 'tasks-demo', `${e.task}.json`)));
  const training = expected.filter((e) => !existsSync(join(root, 'tasks-demo', `${e.task}.json`)));

  it('the fixture covers every demo task and a training sample, found and not found', () => {
    expect(demo.length).toBe(17);
    expect(training.length).toBe(14);
    expect(expected.some((e) => e.program === null)).toBe(true);
    expect(expected.filter((e) => e.program !== null).length).toBeGreaterThan(15);
  });

  it.each(demo.map((e) => [e.task, e] as const))('demo task %s', (_, e) => {
    expect(firstProgram(join(root, 'tasks-demo', `${e.task}.json`))).toEqual({ program: e.program, bits: e.bits });
  });

  describe.skipIf(!existsSync(dataset))('training sample', () => {
    it.each(training.map((e) => [e.task, e] as const))('training task %s', (_, e) => {
      expect(firstProgram(join(dataset, `${e.task}.json`))).toEqual({ program: e.program, bits: e.bits });
    });
  });
  if (!existsSync(dataset)) console.log(`tests/same-answers.test.ts: ${dataset} is absent; the training sample is skipped`);
});
