/**
 * Working back from the outputs: every inverse in the library agrees with its primitive
 * (fast-check), hand-worked inverses, the output-size rule, and goals in the search (a
 * program is met through a goal where the plain search at the same candidate cap finds none).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { Grid } from '../src/grid/grid.ts';
import { undoColourMap, undoMirrorCopies, undoTile } from '../src/grid/undo.ts';
import { FAILURE } from '../src/language/failure.ts';
import { applyOperation } from '../src/language/operation.ts';
import { Palette } from '../src/language/palette.ts';
import type { Type } from '../src/language/types.ts';
import type { Primitive } from '../src/library/primitive.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import { predictOutputSizes } from '../src/search/output-size.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const invertible = defaultLibrary.primitives.filter((p) => p.inverse !== undefined);

/** Arguments after the first, drawn to suit the primitives that have inverses. */
function arbitraryRest(types: readonly Type[]): fc.Arbitrary<unknown[]> {
  const parts = types.map((t): fc.Arbitrary<unknown> => {
    switch (t) {
      case 'Int':
        return fc.integer({ min: 1, max: 3 });
      case 'Colour':
        return fc.integer({ min: 0, max: 9 });
      case 'Palette':
        // A swap of two colours, a permutation, so every image has exactly one preimage.
        return fc.tuple(fc.integer({ min: 0, max: 9 }), fc.integer({ min: 0, max: 9 })).map(([a, b]) => Palette.fromPairs([[a, b], [b, a]]));
      default:
        throw new Error(`tests/goals.test.ts: no arbitrary for an argument of type ${t}`);
    }
  });
  return fc.tuple(...parts);
}

function invert(p: Primitive, wanted: Grid, rest: readonly unknown[]): unknown {
  return (p.inverse as (w: unknown, ...r: unknown[]) => unknown)(wanted, ...rest);
}

describe('inverses agree with their primitives', () => {
  it('the library has inverses for turns, reflections, mirrored copies, scaling, tiling and colour maps', () => {
    const names = invertible.map((p) => p.name);
    for (const name of ['rotate_clockwise', 'transpose', 'mirror_right', 'scale_up', 'tile', 'apply_palette']) expect(names).toContain(name);
    for (const p of invertible) {
      expect(p.parameters[0]).toBe('Grid');
      expect(p.result).toBe('Grid');
    }
  });

  for (const p of invertible) {
    it(`${p.name}: whatever grid the inverse gives, the primitive turns back into the wanted grid`, () => {
      fc.assert(
        fc.property(arbitraryGrid({ maxHeight: 6, maxWidth: 6 }), arbitraryRest(p.parameters.slice(1)), (wanted, rest) => {
          const x = invert(p, wanted, rest);
          if (x === null) return;
          expect(x).toBeInstanceOf(Grid);
          const again = applyOperation(p, [x, ...rest]);
          expect(again !== FAILURE && (again as Grid).equals(wanted)).toBe(true);
        }),
        { numRuns: 150 },
      );
    });

    it(`${p.name}: the inverse finds a grid for every result of the primitive`, () => {
      fc.assert(
        fc.property(arbitraryGrid({ maxHeight: 5, maxWidth: 5 }), arbitraryRest(p.parameters.slice(1)), (x, rest) => {
          const wanted = applyOperation(p, [x, ...rest]);
          fc.pre(wanted !== FAILURE);
          const found = invert(p, wanted as Grid, rest);
          expect(found).toBeInstanceOf(Grid);
          expect((applyOperation(p, [found, ...rest]) as Grid).equals(wanted as Grid)).toBe(true);
        }),
        { numRuns: 150 },
      );
    });
  }
});

describe('hand-worked inverses', () => {
  it('mirrored copies: the left half when the right half is its mirror image, none otherwise', () => {
    const wanted = Grid.fromRows([[1, 2, 2, 1], [3, 0, 0, 3]]);
    expect(undoMirrorCopies(wanted, false, true)?.toRows()).toEqual([[1, 2], [3, 0]]);
    expect(undoMirrorCopies(Grid.fromRows([[1, 2, 1, 2]]), false, true)).toBeNull();
    expect(undoMirrorCopies(Grid.fromRows([[1, 2, 1]]), false, true)).toBeNull();
  });

  it('tiling: the first tile when every tile equals it', () => {
    expect(undoTile(Grid.fromRows([[5, 6, 5, 6], [5, 6, 5, 6]]), 2, 2)?.toRows()).toEqual([[5, 6]]);
    expect(undoTile(Grid.fromRows([[5, 6, 5, 7]]), 1, 2)).toBeNull();
  });

  it('a colour map runs backwards only where each colour has one source', () => {
    const swap = Palette.fromPairs([[1, 2], [2, 1]]).target;
    expect(undoColourMap(Grid.fromRows([[2, 1, 0]]), swap)?.toRows()).toEqual([[1, 2, 0]]);
    // {1 -> 2}: a 2 in the output came from 1 or from 2, so there is no single answer.
    expect(undoColourMap(Grid.fromRows([[2]]), Palette.fromPairs([[1, 2]]).target)).toBeNull();
    // Nothing becomes 1, so an output holding 1 has no source.
    expect(undoColourMap(Grid.fromRows([[1]]), Palette.fromPairs([[1, 2]]).target)).toBeNull();
  });
});

describe('output size first', () => {
  const g = (h: number, w: number) => Grid.filled(h, w, 0);

  it('same size as the input', () => {
    const pairs = [{ input: g(3, 4), output: g(3, 4) }, { input: g(5, 2), output: g(5, 2) }];
    expect(predictOutputSizes(pairs, [g(7, 6)])).toEqual([{ height: 7, width: 6 }]);
  });

  it('a fixed size from inputs of different sizes', () => {
    const pairs = [{ input: g(3, 4), output: g(2, 2) }, { input: g(5, 6), output: g(2, 2) }];
    expect(predictOutputSizes(pairs, [g(9, 9)])).toEqual([{ height: 2, width: 2 }]);
  });

  it('three times as tall, and the input height as wide (a turned side)', () => {
    const pairs = [{ input: g(2, 5), output: g(6, 2) }, { input: g(3, 4), output: g(9, 3) }];
    expect(predictOutputSizes(pairs, [g(4, 7)])).toEqual([{ height: 12, width: 4 }]);
  });

  it('leaves a side open when the rules that fit disagree on the test input', () => {
    // Every input is 3×3 and every output 6×6: "fixed 6" and "twice the input" both fit.
    const pairs = [{ input: g(3, 3), output: g(6, 6) }, { input: g(3, 3), output: g(6, 6) }];
    expect(predictOutputSizes(pairs, [g(4, 4)])).toEqual([{ height: undefined, width: undefined }]);
    expect(predictOutputSizes(pairs, [g(3, 3)])).toEqual([{ height: 6, width: 6 }]);
  });
});

describe('goals in the search', () => {
  // An invented task: the input turned a quarter clockwise, then tiled 2 down and 3 across.
  const turn = (rows: number[][]) => rows[0]!.map((_, c) => rows.map((row) => row[c]!).reverse());
  const tiled = (rows: number[][]) => {
    const out: number[][] = [];
    for (let i = 0; i < 2; i++) for (const row of rows) out.push([...row, ...row, ...row]);
    return out;
  };
  const inputs = [
    [[1, 0, 0], [2, 3, 0], [0, 0, 4]],
    [[0, 5, 5], [0, 0, 6], [7, 0, 0]],
    [[8, 0, 1], [0, 0, 0], [0, 2, 2]],
  ];
  const testInput = [[3, 3, 0], [0, 4, 0], [5, 0, 6]];
  const puzzle = {
    name: 'turned-and-tiled',
    train: inputs.map((rows) => ({ input: Grid.fromRows(rows), output: Grid.fromRows(tiled(turn(rows))) })),
    testInputs: [Grid.fromRows(testInput)],
  };
  // Measured: the plain search needs about 26,000 candidates to reach this 17-bit program; the
  // goal tile(_, 2, 3) is met by rotate_clockwise(input), a 6-bit candidate, long before.
  const cap = 5000;

  it('meets the program through a goal within a cap where the plain search finds nothing', () => {
    const withGoals = solvePuzzle(puzzle, { maxCandidates: cap, attempts: 1 });
    expect(withGoals.solutions).toHaveLength(1);
    expect(withGoals.solutions[0]!.throughGoal).toBe(true);
    expect(withGoals.solutions[0]!.testOutputs[0]!.toRows()).toEqual(tiled(turn(testInput)));
    expect(withGoals.statistics.goalSolutions).toBe(1);

    const plain = solvePuzzle(puzzle, { maxCandidates: cap, attempts: 1, goalBits: 0 });
    expect(plain.solutions).toHaveLength(0);
    expect(plain.statistics.goals).toBe(0);
  });

  it('with budget enough, the shortest program still wins and is found by the plain search', () => {
    const result = solvePuzzle(puzzle, { maxCandidates: 200_000, attempts: 1 });
    expect(result.solutions[0]!.bits).toBe(17);
    expect(result.solutions[0]!.testOutputs[0]!.toRows()).toEqual(tiled(turn(testInput)));
  });
});
