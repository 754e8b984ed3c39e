/** Turns and mirrors of a grid: hand-worked cases and the laws of the square's symmetries. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import {
  flipLeftRight,
  flipUpDown,
  rotateClockwise,
  rotateCounterclockwise,
  rotateHalf,
  transposeAntidiagonal,
  transposeGrid,
} from '../src/grid/rotate-reflect.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

// 1 2 3
// 4 5 6
const g = Grid.fromRows([[1, 2, 3], [4, 5, 6]]);

describe('turns and mirrors, worked by hand', () => {
  it('quarter turns and the half turn', () => {
    expect(rotateClockwise(g).toRows()).toEqual([[4, 1], [5, 2], [6, 3]]);
    expect(rotateCounterclockwise(g).toRows()).toEqual([[3, 6], [2, 5], [1, 4]]);
    expect(rotateHalf(g).toRows()).toEqual([[6, 5, 4], [3, 2, 1]]);
  });

  it('the four mirrors', () => {
    expect(flipLeftRight(g).toRows()).toEqual([[3, 2, 1], [6, 5, 4]]);
    expect(flipUpDown(g).toRows()).toEqual([[4, 5, 6], [1, 2, 3]]);
    expect(transposeGrid(g).toRows()).toEqual([[1, 4], [2, 5], [3, 6]]);
    expect(transposeAntidiagonal(g).toRows()).toEqual([[6, 3], [5, 2], [4, 1]]);
  });
});

describe('laws', () => {
  const same = (a: Grid, b: Grid) => expect(a.equals(b)).toBe(true);

  it('mirrors are involutions; four quarter turns are the identity', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (x) => {
        for (const mirror of [flipLeftRight, flipUpDown, transposeGrid, transposeAntidiagonal, rotateHalf]) same(mirror(mirror(x)), x);
        same(rotateClockwise(rotateClockwise(rotateClockwise(rotateClockwise(x)))), x);
        same(rotateCounterclockwise(rotateClockwise(x)), x);
      }),
    );
  });

  it('compositions: two mirrors make a turn', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (x) => {
        same(flipUpDown(flipLeftRight(x)), rotateHalf(x));
        same(flipLeftRight(transposeGrid(x)), rotateClockwise(x));
        same(rotateHalf(transposeGrid(x)), transposeAntidiagonal(x));
      }),
    );
  });
});
