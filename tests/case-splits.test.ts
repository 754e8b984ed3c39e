/**
 * Case splits (src/search/case-splits.ts): two kept grids that each answer some demonstrations,
 * joined by a kept condition that holds on exactly one group. The law is checked against a brute
 * force over every pair on random answer sets and conditions; the search is checked on a public
 * task whose rule depends on the input's shape: 7b7f7511 of the ARC-AGI-1 public training set
 * (F. Chollet 2019, Apache-2.0), read from ../shared/datasets/arc-agi-1-training/ and skipped
 * where absent. Its test outputs are read only to score the answer. The README's example is
 * checked on invented signal flags.
 */
import { existsSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { Grid } from '../src/grid/grid.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { applyOperation } from '../src/language/operation.ts';
import { parseProgram } from '../src/language/parser.ts';
import type { Type } from '../src/language/types.ts';
import { Library } from '../src/library/library.ts';
import { CaseSplits } from '../src/search/case-splits.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import type { Candidate } from '../src/search/value-store.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import { puzzleOf, type Puzzle } from '../src/tasks/task.ts';

const CHOICE_BITS = 6;

/** A stand-in kept candidate: only its cost and values matter to the splits. */
function candidate(type: Type, cost: number, values: unknown[]): Candidate {
  return { type, typeId: 0, cost, values, production: undefined, arguments: [], leaf: undefined, signature: undefined };
}

/** Outputs 1×1 of colours 0..n-1; a grid answering a set holds the output there and #9 elsewhere. */
function answering(outputs: readonly Grid[], set: number, cost: number): Candidate {
  return candidate('Grid', cost, outputs.map((o, i) => (set & (1 << i) ? o : Grid.filled(1, 1, 9))));
}

function holding(n: number, set: number, cost: number): Candidate {
  return candidate('Bool', cost, Array.from({ length: n }, (_, i) => (set & (1 << i)) !== 0));
}

const world = fc.integer({ min: 2, max: 5 }).chain((n) =>
  fc.record({
    n: fc.constant(n),
    grids: fc.array(fc.record({ set: fc.integer({ min: 0, max: (1 << n) - 1 }), cost: fc.integer({ min: 1, max: 12 }) }), { maxLength: 12 }),
    conditions: fc.array(fc.record({ set: fc.integer({ min: 0, max: (1 << n) - 1 }), cost: fc.integer({ min: 1, max: 12 }) }), { maxLength: 8 }),
  }),
);

describe('case splits join grids by a condition', () => {
  it('each split is the cheapest pair covering its condition\'s two groups, and nothing is joined twice (fast-check against every pair)', () => {
    fc.assert(
      fc.property(world, ({ n, grids, conditions }) => {
        const full = (1 << n) - 1;
        const outputs = Array.from({ length: n }, (_, i) => Grid.filled(1, 1, i));
        const splits = new CaseSplits(outputs, CHOICE_BITS, Infinity);
        // Kept in order of cost, as the enumerator keeps them.
        const kept = grids.map((g) => answering(outputs, g.set, g.cost)).sort((a, b) => a.cost - b.cost);
        for (const g of kept) splits.noteGrid(g);
        const keptConditions = conditions.map((c) => holding(n, c.set, c.cost)).sort((a, b) => a.cost - b.cost);
        const found = splits.join(keptConditions);
        const answers = (g: Candidate, i: number): boolean => (g.values[i] as Grid).equals(outputs[i]!);
        const answerSet = (g: Candidate): number => outputs.reduce((s, _, i) => (answers(g, i) ? s | (1 << i) : s), 0);
        // Brute force: per pattern a condition holds on, the cheapest condition and the cheapest pair.
        const expected = new Map<number, number>();
        for (const c of keptConditions) {
          const holds = outputs.reduce((s, _, i) => (c.values[i] === true ? s | (1 << i) : s), 0);
          if (holds === 0 || holds === full) continue;
          let best = Infinity;
          for (const a of kept) {
            for (const b of kept) {
              const sa = answerSet(a);
              const sb = answerSet(b);
              if (sa === full || sb === full || sa === 0 || sb === 0) continue;
              if ((sa & holds) === holds && (sb & (full & ~holds)) === (full & ~holds)) best = Math.min(best, CHOICE_BITS + c.cost + a.cost + b.cost);
            }
          }
          if (best < Infinity) expected.set(holds, Math.min(expected.get(holds) ?? Infinity, best));
        }
        expect(found.length).toBe(expected.size);
        for (const split of found) {
          let holds = 0;
          for (let i = 0; i < n; i++) {
            const yes = split.condition.values[i] === true;
            if (yes) holds |= 1 << i;
            // On every demonstration the grid the condition picks is the output.
            expect(answers(yes ? split.whenTrue : split.whenFalse, i)).toBe(true);
          }
          expect(split.cost).toBe(CHOICE_BITS + split.condition.cost + split.whenTrue.cost + split.whenFalse.cost);
          expect(split.cost).toBe(expected.get(holds));
        }
        // Nothing new kept: nothing new joined.
        expect(splits.join(keptConditions)).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });

  it('joins nothing dearer than the cost limit, and nothing with a single demonstration', () => {
    const outputs = [Grid.filled(1, 1, 0), Grid.filled(1, 1, 1)];
    const condition = [holding(2, 1, 4)];
    const costs = [CHOICE_BITS + 4 + 5 + 5 - 1, CHOICE_BITS + 4 + 5 + 5].map((limit) => {
      const splits = new CaseSplits(outputs, CHOICE_BITS, limit);
      splits.noteGrid(answering(outputs, 1, 5));
      splits.noteGrid(answering(outputs, 2, 5));
      return splits.join(condition).map((s) => s.cost);
    });
    expect(costs).toEqual([[], [CHOICE_BITS + 14]]);
    expect(new CaseSplits([Grid.filled(1, 1, 0)], CHOICE_BITS, Infinity).open).toBe(false);
  });
});

const dataset = resolve(import.meta.dirname, '..', '..', 'shared', 'datasets', 'arc-agi-1-training');
const task = resolve(dataset, '7b7f7511.json');

describe.skipIf(!existsSync(task))('the search finds a case split on a public task (ARC-AGI-1 training 7b7f7511)', () => {
  // A small library keeps the test quick; the cap stops the search long before the level the
  // whole choice costs, so only a case split can find it within the cap.
  const library = new Library(['left_half', 'top_half', 'width_of', 'height_of', 'is_greater', 'choose'].map((n) => defaultLibrary.get(n)!));
  const CAP = 80;

  it('found below its own cost level through a split, the test output among the two attempts, and runs as printed', () => {
    const loaded = readTaskFile(task);
    const puzzle = puzzleOf(loaded);
    const result = solvePuzzle(puzzle, { library, maxCandidates: CAP, timeLimitSeconds: 60 });
    const first = result.solutions[0]!;
    expect(first.throughCaseSplit).toBe(true);
    expect(first.text).toContain('choose(');
    expect(first.bits).toBeGreaterThan(result.statistics.costReached);
    expect(result.statistics.caseSplitSolutions).toBeGreaterThan(0);
    // Scoring only: the test outputs were never shown to the search.
    loaded.test.forEach((pair, i) => expect(result.solutions.some((s) => s.testOutputs[i]!.equals(pair.output!))).toBe(true));
    const program = parseProgram(first.text);
    for (const pair of puzzle.train) expect((runProgram(program, pair.input, library).output as Grid).equals(pair.output)).toBe(true);
  });

  it('with case splits off, the same cap finds nothing', () => {
    const result = solvePuzzle(puzzleOf(readTaskFile(task)), { library, maxCandidates: CAP, timeLimitSeconds: 60, caseSplits: false });
    expect(result.solutions).toEqual([]);
  });
});
if (!existsSync(task)) console.log(`tests/case-splits.test.ts: ${task} is absent; the search part is skipped`);

/** Invented for this test and the README: signal flags that read the same mirrored turn a quarter clockwise, the others are hoisted upside down. */
const flags: Puzzle = (() => {
  const symmetric = [
    [[0, 2, 0], [2, 2, 2], [0, 1, 0]],
    [[3, 0, 0, 3], [3, 3, 3, 3], [0, 4, 4, 0]],
  ].map((rows) => Grid.fromRows(rows));
  const other = [
    [[5, 5, 0], [0, 5, 0], [0, 6, 6]],
    [[7, 0, 0, 0], [7, 7, 0, 0], [1, 0, 0, 0]],
  ].map((rows) => Grid.fromRows(rows));
  const turn = (g: Grid): Grid => applyOperation(defaultLibrary.get('rotate_clockwise')!, [g]) as Grid;
  const upsideDown = (g: Grid): Grid => applyOperation(defaultLibrary.get('reflect_vertically')!, [g]) as Grid;
  return {
    name: 'signal-flags',
    train: [...symmetric.map((input) => ({ input, output: turn(input) })), ...other.map((input) => ({ input, output: upsideDown(input) }))],
    testInputs: [Grid.fromRows([[0, 8, 0], [8, 8, 8], [8, 0, 8]])],
  };
})();

describe("the README's case split example", () => {
  const readme = readFileSync(new URL('../README.md', import.meta.url), 'utf8');
  const blocks = [...readme.matchAll(/```pithy\n([\s\S]*?)```/g)].map((m) => m[1]!.replace(/^ {2}/gm, '')).filter((b) => b.includes('choose('));
  const library = new Library(['is_symmetric_left_right', 'rotate_clockwise', 'rotate_half', 'reflect_vertically', 'reflect_horizontally', 'choose'].map((n) => defaultLibrary.get(n)!));

  it('is what the search finds on the invented flags through a case split, within a cap too small to reach its cost', () => {
    expect(blocks.length).toBe(1);
    const result = solvePuzzle(flags, { library, maxCandidates: 30, timeLimitSeconds: 60 });
    const first = result.solutions[0]!;
    expect(first.throughCaseSplit).toBe(true);
    expect(first.bits).toBeGreaterThan(result.statistics.costReached);
    expect(first.text).toBe(blocks[0]);
    // The condition picks the turn for the symmetric test flag.
    expect(first.testOutputs[0]!.equals(Grid.fromRows([[8, 8, 0], [0, 8, 8], [8, 8, 0]]))).toBe(true);
  });
});
