/** Counting and comparison primitives: hand-worked cases and fast-check laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { FAILURE } from '../src/language/failure.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { callPrimitive, evaluate } from './support/run-primitive.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;
const rows = (value: unknown): unknown => (value instanceof Grid ? value.toRows() : value);
const small = fc.integer({ min: -50, max: 50 });

describe('counting laws', () => {
  it('count_cells_of_colour summed over the colours is the number of cells', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        let total = 0;
        for (let c = 0; c < 10; c++) total += callPrimitive('count_cells_of_colour', g, c) as number;
        expect(total).toBe(g.height * g.width);
      }),
    );
  });

  it('count_non_background_colours is the number of distinct colours other than the background', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const background = backgroundOf(g);
        expect(callPrimitive('count_non_background_colours', g)).toBe(new Set([...g.cells].filter((v) => v !== background)).size);
      }),
    );
  });

  it('count_cells plus the background count is the number of cells', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const background = backgroundOf(g);
        expect((callPrimitive('count_cells', g) as number) + (callPrimitive('count_cells_of_colour', g, background) as number)).toBe(g.cells.length);
      }),
    );
  });

  it('add and subtract undo each other; is_greater and is_equal agree with the numbers', () => {
    fc.assert(
      fc.property(small, small, (a, b) => {
        expect(callPrimitive('subtract', callPrimitive('add', a, b), b)).toBe(a);
        expect(callPrimitive('multiply', a, b)).toBe(a * b);
        expect(callPrimitive('is_greater', a, b)).toBe(a > b);
        expect(callPrimitive('is_equal', a, b)).toBe(a === b);
        // exactly one of a > b, b > a, a = b
        const truths = [callPrimitive('is_greater', a, b), callPrimitive('is_greater', b, a), callPrimitive('is_equal', a, b)].filter((t) => t === true);
        expect(truths.length).toBe(1);
      }),
    );
  });

  it('grid_of_size builds the asked size within 1..30 and fails outside', () => {
    fc.assert(
      fc.property(fc.integer({ min: -2, max: 33 }), fc.integer({ min: -2, max: 33 }), fc.integer({ min: 0, max: 9 }), (h, w, c) => {
        const result = callPrimitive('grid_of_size', h, w, c);
        if (h < 1 || w < 1 || h > 30 || w > 30) expect(result).toBe(FAILURE);
        else {
          const g = result as Grid;
          expect([g.height, g.width]).toEqual([h, w]);
          expect(g.cells.every((v) => v === c)).toBe(true);
        }
      }),
    );
  });
});

describe('counting, hand-worked cases', () => {
  const g = G([
    [0, 4, 0, 4],
    [0, 4, 0, 0],
    [7, 0, 0, 7],
  ]);

  it('counts of objects, one colour, colours and cells', () => {
    expect(evaluate('count_objects(objects_by_colour(grid))', g)).toBe(4);
    expect(callPrimitive('count_cells_of_colour', g, 4)).toBe(3);
    expect(callPrimitive('count_cells_of_colour', g, 9)).toBe(0);
    expect(callPrimitive('count_non_background_colours', g)).toBe(2);
    expect(callPrimitive('count_cells', g)).toBe(5);
  });

  it('choose picks by the condition', () => {
    expect(rows(evaluate('choose(is_greater(count_cells_of_colour(grid, #4), count_cells_of_colour(grid, #7)), top_half(grid), bottom_half(grid))', g))).toEqual([[0, 4, 0, 4]]);
    expect(rows(evaluate('choose(is_equal(count_cells_of_colour(grid, #4), 2), top_half(grid), bottom_half(grid))', g))).toEqual([[7, 0, 0, 7]]);
  });

  it('arithmetic beyond the bound fails rather than growing without limit', () => {
    expect(callPrimitive('multiply', 5000, 5000)).toBe(FAILURE);
    expect(callPrimitive('add', 9000, 9000)).toBe(FAILURE);
    expect(callPrimitive('add', 2, -5)).toBe(-3);
  });
});
