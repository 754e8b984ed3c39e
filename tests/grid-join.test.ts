/** Joining grids: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { joinBelow, joinRight } from '../src/grid/join.ts';
import { transposeGrid } from '../src/grid/rotate-reflect.ts';
import { arbitraryGridPair } from './support/arbitrary-grid.ts';

const G = Grid.fromRows;

describe('joining', () => {
  it('side by side and one above the other', () => {
    expect(joinRight(G([[1], [2]]), G([[3, 4], [5, 6]]))!.toRows()).toEqual([[1, 3, 4], [2, 5, 6]]);
    expect(joinBelow(G([[1, 2]]), G([[3, 4]]))!.toRows()).toEqual([[1, 2], [3, 4]]);
  });

  it('null when the sides do not match or the result passes the size cap', () => {
    expect(joinRight(G([[1]]), G([[1], [2]]))).toBeNull();
    expect(joinBelow(G([[1]]), G([[1, 2]]))).toBeNull();
    expect(joinRight(Grid.filled(1, 20, 1), Grid.filled(1, 20, 2))).toBeNull();
  });

  it('joining right is joining below seen through the transpose', () => {
    fc.assert(
      fc.property(arbitraryGridPair(), ([a, b]) => {
        expect(transposeGrid(joinRight(a, b)!).equals(joinBelow(transposeGrid(a), transposeGrid(b))!)).toBe(true);
      }),
    );
  });
});
