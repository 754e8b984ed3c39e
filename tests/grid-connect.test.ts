/** Connecting cells of one colour: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { connectSameColour } from '../src/grid/connect.ts';
import { Grid } from '../src/grid/grid.ts';
import { transposeGrid } from '../src/grid/rotate-reflect.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;

describe('connectSameColour', () => {
  const g = G([[2, 0, 0, 2], [0, 0, 0, 0], [3, 0, 0, 1]]);

  it('rows and columns, in the cells own colour or a given one', () => {
    expect(connectSameColour(g, null, true, true).toRows()).toEqual([[2, 2, 2, 2], [0, 0, 0, 0], [3, 0, 0, 1]]);
    expect(connectSameColour(g, 8, true, true).toRows()).toEqual([[2, 8, 8, 2], [0, 0, 0, 0], [3, 0, 0, 1]]);
  });

  it('rows only or columns only', () => {
    const h = G([[1, 0, 1, 0], [0, 0, 0, 0], [1, 0, 0, 3]]);
    expect(connectSameColour(h, 2, true, false).toRows()).toEqual([[1, 2, 1, 0], [0, 0, 0, 0], [1, 0, 0, 3]]);
    expect(connectSameColour(h, 2, false, true).toRows()).toEqual([[1, 0, 1, 0], [2, 0, 0, 0], [1, 0, 0, 3]]);
  });

  it('cells the rows filled stay as the rows filled them', () => {
    // row 1 joins the 4s; column 1 would join the 5s through (1, 1), which the row already took
    const h = G([[0, 5, 0], [4, 0, 4], [0, 5, 0]]);
    expect(connectSameColour(h, null, true, true).toRows()).toEqual([[0, 5, 0], [4, 4, 4], [0, 5, 0]]);
  });

  it('gives back the same grid when there is nothing to connect', () => {
    const h = G([[1, 0, 2]]);
    expect(connectSameColour(h, null, true, true)).toBe(h);
  });

  it('columns are rows of the transposed grid, and only background cells change', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 0, max: 9 }), (x, paint) => {
        const columns = connectSameColour(x, paint, false, true);
        expect(transposeGrid(columns).equals(connectSameColour(transposeGrid(x), paint, true, false))).toBe(true);
        const background = backgroundOf(x);
        for (let i = 0; i < x.cells.length; i++) if (x.cells[i] !== background) expect(columns.cells[i]).toBe(x.cells[i]);
      }),
    );
  });
});
