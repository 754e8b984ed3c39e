/**
 * Crop goals: every primitive that says which rectangle it cuts does cut that rectangle
 * (fast-check), a goal's cell test agrees with running the cut, values naming the same
 * rectangles everywhere make one goal, and in the search a cut is met through a crop goal below
 * its own cost level on an invented task (fenced gardens).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { backgroundColour, components } from '../src/grid/components.ts';
import { Grid } from '../src/grid/grid.ts';
import type { GridObject } from '../src/grid/grid-object.ts';
import { applyOperation } from '../src/language/operation.ts';
import type { Primitive, Rectangle } from '../src/library/primitive.ts';
import { Library } from '../src/library/library.ts';
import { CropGoals } from '../src/search/crop-goals.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import type { Production } from '../src/search/productions.ts';
import type { Candidate } from '../src/search/value-store.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const cutters = defaultLibrary.primitives.filter((p) => p.cropsAt !== undefined);

function rectangleOf(p: Primitive, rest: readonly unknown[]): Rectangle | null {
  return (p.cropsAt as (...r: unknown[]) => Rectangle | null)(...rest);
}

/** The grid's cells under a rectangle, cell by cell (the reference the law compares with). */
function cellsUnder(g: Grid, r: Rectangle): number[][] {
  const rows: number[][] = [];
  for (let row = r.top; row < r.top + r.height; row++) {
    const line: number[] = [];
    for (let c = r.left; c < r.left + r.width; c++) line.push(g.get(row, c));
    rows.push(line);
  }
  return rows;
}

/** A grid and one of the objects cut from another grid of any size (its box may pass the first grid's edge). */
const gridAndObject = fc
  .tuple(arbitraryGrid({ maxHeight: 7, maxWidth: 7 }), arbitraryGrid({ maxHeight: 9, maxWidth: 9 }), fc.nat())
  .map(([g, source, k]) => {
    const objects = components(source, { diagonal: false, multicolour: false, background: backgroundColour(source) });
    return { g, object: objects.length > 0 ? objects[k % objects.length]! : undefined };
  });

function inside(g: Grid, r: Rectangle): boolean {
  return r.top >= 0 && r.left >= 0 && r.top + r.height <= g.height && r.left + r.width <= g.width;
}

function leaf(values: readonly unknown[], cost: number): Candidate {
  return { type: 'Object', typeId: 0, cost, values, production: undefined, arguments: [], leaf: undefined, signature: undefined };
}

function productionOf(p: Primitive): Production {
  return { primitive: p, section: false, argumentTypes: p.parameters, result: p.result, bits: p.bits };
}

describe('primitives that cut the rectangle another argument names', () => {
  it('the library has one: crop_to_object, cut at the object\'s box', () => {
    expect(cutters.map((p) => p.name)).toContain('crop_to_object');
    for (const p of cutters) {
      expect(p.parameters[0]).toBe('Grid');
      expect(p.parameters.length).toBe(2);
      expect(p.result).toBe('Grid');
    }
  });

  for (const p of cutters) {
    it(`${p.name}: where the rectangle lies inside the grid, the call gives the cells under it`, () => {
      fc.assert(
        fc.property(gridAndObject, ({ g, object }) => {
          if (!object) return;
          const r = rectangleOf(p, [object]);
          if (!r || !inside(g, r)) return;
          const result = applyOperation(p, [g, object]) as Grid;
          expect(result.toRows()).toEqual(cellsUnder(g, r));
        }),
      );
    });
  }
});

describe('CropGoals', () => {
  const crop = defaultLibrary.primitives.find((p) => p.name === 'crop_to_object')!;
  const production = productionOf(crop);

  it('a goal meets a grid exactly when cutting the grid at its rectangles gives every output', () => {
    fc.assert(
      fc.property(fc.array(gridAndObject, { minLength: 1, maxLength: 3 }), arbitraryGrid({ maxHeight: 7, maxWidth: 7 }), (pairs, other) => {
        const objects = pairs.map((p) => p.object);
        if (objects.some((o) => o === undefined)) return;
        const found = objects as GridObject[];
        // The outputs are the cuts of the grids; a second grid (another one on the first demonstration) is tested as well.
        const grids = pairs.map((p) => p.g);
        const outputs = grids.map((g, i) => applyOperation(crop, [g, found[i]!]));
        if (outputs.some((o) => !(o instanceof Grid))) return;
        const goals = new CropGoals(outputs as Grid[], grids.length, 4);
        const goal = goals.consider(production, leaf(found, 3));
        const fits = found.every((o, i) => o.height === (outputs[i] as Grid).height && o.width === (outputs[i] as Grid).width);
        if (!fits) {
          // A box that passes the grid's edge is cut smaller than itself: no goal of the outputs' size.
          expect(goal).toBeUndefined();
          return;
        }
        expect(goal).toBeDefined();
        expect(goals.meets(goal!, grids)).toBe(true);
        const tried = [other, ...grids.slice(1)];
        const cut = tried.map((g, i) => applyOperation(crop, [g, found[i]!]));
        const answers = cut.every((c, i) => c instanceof Grid && c.equals(outputs[i] as Grid));
        expect(goals.meets(goal!, tried)).toBe(answers);
      }),
    );
  });

  it('two values naming the same rectangles on every input make one goal; a rectangle of another size none', () => {
    const g = Grid.fromRows([
      [0, 0, 0, 0],
      [0, 3, 3, 0],
      [0, 3, 0, 0],
      [0, 0, 0, 0],
    ]);
    const [shape] = components(g, { diagonal: false, multicolour: false, background: 0 });
    const output = Grid.fromRows([
      [3, 3],
      [3, 0],
    ]);
    const goals = new CropGoals([output], 2, 4);
    expect(goals.consider(production, leaf([shape, shape], 2))).toBeDefined();
    expect(goals.consider(production, leaf([shape, shape], 5))).toBeUndefined();
    expect(goals.goals.length).toBe(1);
    const wide = Grid.fromRows([[3, 3, 3]]);
    const [bar] = components(wide, { diagonal: false, multicolour: false, background: 0 });
    expect(goals.consider(production, leaf([bar, bar], 2))).toBeUndefined();
    expect(goals.meets(goals.goals[0]!, [g, g])).toBe(true);
    expect(goals.meets(goals.goals[0]!, [Grid.filled(4, 4, 3), g])).toBe(false);
  });
});

describe('crop goals in the search', () => {
  const G = (rows: string[]): Grid => Grid.fromRows(rows.map((r) => [...r].map(Number)));
  // Invented: a fenced garden (colour 2) on a field; seedlings (1) and stones (3) lie inside and
  // out. The picture wanted is the garden's plot with only its seedlings left.
  const train = [
    { input: G(['100000', '022220', '021020', '023120', '022220', '000310']), output: G(['0000', '0100', '0010', '0000']) },
    { input: G(['3000001', '0222220', '0210120', '0200020', '0222220', '1000030', '0001000']), output: G(['00000', '01010', '00000', '00000']) },
    { input: G(['01030', '00000', '22200', '21200', '22201']), output: G(['000', '010', '000']) },
  ];
  const test = { input: G(['1000000', '0022222', '0021012', '0023102', '0022222', '3000010']), output: G(['00000', '01010', '00100', '00000']) };
  const puzzle = { name: 'gardens', train, testInputs: [test.input] };
  const library = new Library(['keep_colour', 'objects_by_colour', 'largest_object', 'crop_to_object'].map((n) => defaultLibrary.get(n)!));
  // The cap stops the plain search before the level the whole program costs.
  const CAP = 20;

  it('the cut of the seedlings at the fence\'s box is met through a crop goal below its own cost level, and gives the test output', () => {
    const result = solvePuzzle(puzzle, { library, maxCandidates: CAP, timeLimitSeconds: 60 });
    const first = result.solutions[0]!;
    expect(first.throughGoal).toBe(true);
    expect(first.text).toContain('crop_to_object(');
    expect(first.bits).toBeGreaterThan(result.statistics.costReached);
    expect(first.testOutputs[0]!.equals(test.output)).toBe(true);
  });

  it('with goals off, the same cap finds nothing', () => {
    const result = solvePuzzle(puzzle, { library, maxCandidates: CAP, timeLimitSeconds: 60, goalBits: 0 });
    expect(result.solutions.length).toBe(0);
  });
});
