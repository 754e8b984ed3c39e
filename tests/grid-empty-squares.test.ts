/** Filling squares of background cells: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fillEmptySquares } from '../src/grid/empty-squares.ts';
import { Grid } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;

describe('fillEmptySquares', () => {
  it('takes squares in reading order of their corner, skipping overlaps', () => {
    const g = G([[0, 0, 0, 5], [0, 0, 0, 0], [5, 0, 0, 0]]);
    expect(fillEmptySquares(g, 2, 2)!.toRows()).toEqual([[2, 2, 0, 5], [2, 2, 2, 2], [5, 0, 2, 2]]);
  });

  it('gives back the same grid when no square fits, and null for a bad size', () => {
    const g = G([[0, 5], [5, 0]]);
    expect(fillEmptySquares(g, 2, 1)).toBe(g);
    expect(fillEmptySquares(g, 3, 1)).toBeNull();
    expect(fillEmptySquares(g, 0, 1)).toBeNull();
  });

  it('with size 1 every background cell takes the colour', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (x) => {
        const out = fillEmptySquares(x, 1, 10)!;
        const background = backgroundOf(x);
        for (let i = 0; i < x.cells.length; i++) expect(out.cells[i]).toBe(x.cells[i] === background ? 10 : x.cells[i]);
      }),
    );
  });
});
