/** Cell-wise masks of two grids: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { MASK_RULES, mask } from '../src/grid/mask.ts';
import { arbitraryGridPair } from './support/arbitrary-grid.ts';

const a = Grid.fromRows([[1, 1, 0, 0]]);
const b = Grid.fromRows([[9, 0, 2, 0]]);

describe('mask', () => {
  it('each rule, worked by hand (pairs: both, first only, second only, neither)', () => {
    expect(mask(a, b, 3, MASK_RULES.both)!.toRows()).toEqual([[3, 0, 0, 0]]);
    expect(mask(a, b, 3, MASK_RULES.either)!.toRows()).toEqual([[3, 3, 3, 0]]);
    expect(mask(a, b, 3, MASK_RULES.exactlyOne)!.toRows()).toEqual([[0, 3, 3, 0]]);
    expect(mask(a, b, 3, MASK_RULES.neither)!.toRows()).toEqual([[0, 0, 0, 3]]);
  });

  it('is null for different sizes', () => {
    expect(mask(a, Grid.fromRows([[1]]), 3, MASK_RULES.both)).toBeNull();
  });

  it('either is both plus exactly one, and neither is the rest', () => {
    fc.assert(
      fc.property(arbitraryGridPair(), ([x, y]) => {
        const either = mask(x, y, 1, MASK_RULES.either)!;
        const both = mask(x, y, 1, MASK_RULES.both)!;
        const one = mask(x, y, 1, MASK_RULES.exactlyOne)!;
        const neither = mask(x, y, 1, MASK_RULES.neither)!;
        for (let i = 0; i < x.cells.length; i++) {
          expect(either.cells[i]).toBe(both.cells[i]! | one.cells[i]!);
          expect(both.cells[i]! & one.cells[i]!).toBe(0);
          expect(neither.cells[i]).toBe(1 - either.cells[i]!);
        }
      }),
    );
  });
});
