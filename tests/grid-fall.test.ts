/** Gravity on single cells: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fall } from '../src/grid/fall.ts';
import { Grid } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const G = Grid.fromRows;

describe('fall', () => {
  it('down, up, left and right, keeping the order of the cells', () => {
    const g = G([[1, 0], [0, 2], [3, 0]]);
    expect(fall(g, true, true).toRows()).toEqual([[0, 0], [1, 0], [3, 2]]);
    expect(fall(g, true, false).toRows()).toEqual([[1, 2], [3, 0], [0, 0]]);
    const h = G([[0, 1, 0, 2], [3, 0, 0, 0]]);
    expect(fall(h, false, false).toRows()).toEqual([[1, 2, 0, 0], [3, 0, 0, 0]]);
    expect(fall(h, false, true).toRows()).toEqual([[0, 0, 1, 2], [0, 0, 0, 3]]);
  });

  it('is idempotent and keeps the colour counts', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.boolean(), fc.boolean(), (g, columns, end) => {
        const once = fall(g, columns, end);
        expect(fall(once, columns, end).equals(once)).toBe(true);
        expect([...once.cells].sort()).toEqual([...g.cells].sort());
      }),
    );
  });
});
