/** Mirrored copies and the four quarter turns around a square: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { fourRotationsSquare, mirrorCopies } from '../src/grid/mirror-copies.ts';
import { rotateClockwise } from '../src/grid/rotate-reflect.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const g = Grid.fromRows([[1, 2], [3, 0]]);

describe('mirrorCopies', () => {
  it('to the right, below, and both', () => {
    expect(mirrorCopies(g, false, true)!.toRows()).toEqual([[1, 2, 2, 1], [3, 0, 0, 3]]);
    expect(mirrorCopies(g, true, false)!.toRows()).toEqual([[1, 2], [3, 0], [3, 0], [1, 2]]);
    expect(mirrorCopies(g, true, true)!.toRows()).toEqual([[1, 2, 2, 1], [3, 0, 0, 3], [3, 0, 0, 3], [1, 2, 2, 1]]);
  });

  it('is null when twice the size passes the cap', () => {
    expect(mirrorCopies(Grid.filled(16, 2, 1), true, false)).toBeNull();
    expect(mirrorCopies(Grid.filled(16, 2, 1), false, true)).not.toBeNull();
  });

  it('the kaleidoscope is left-right and top-bottom symmetric and starts with the grid', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (x) => {
        const k = mirrorCopies(x, true, true)!;
        const rows = k.toRows();
        for (const row of rows) expect(row).toEqual([...row].reverse());
        expect(rows).toEqual([...rows].reverse());
        expect(rows.slice(0, x.height).map((row) => row.slice(0, x.width))).toEqual(x.toRows());
      }),
    );
  });
});

describe('fourRotationsSquare', () => {
  it('the grid, its clockwise turn, its half turn and its counterclockwise turn around the centre', () => {
    expect(fourRotationsSquare(g)!.toRows()).toEqual([
      [1, 2, 3, 1],
      [3, 0, 0, 2],
      [2, 0, 0, 3],
      [1, 3, 2, 1],
    ]);
  });

  it('is null for a grid that is not square', () => {
    expect(fourRotationsSquare(Grid.fromRows([[1, 2]]))).toBeNull();
  });

  it('looks the same after a quarter turn', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 6, maxWidth: 6 }).filter((x) => x.height === x.width), (x) => {
        const four = fourRotationsSquare(x)!;
        expect(rotateClockwise(four).equals(four)).toBe(true);
      }),
    );
  });
});
