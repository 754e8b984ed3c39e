/** Cell positions: inside the grid or not, and the colour found there. */
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { colourAt, isInside } from '../src/grid/position.ts';

const g = Grid.fromRows([[1, 2], [3, 4], [5, 6]]);

describe('positions', () => {
  it('reads the colour at (row, column)', () => {
    expect(colourAt(g, { row: 1, column: 0 })).toBe(3);
    expect(colourAt(g, { row: 2, column: 1 })).toBe(6);
  });

  it('is null outside the grid, on every side', () => {
    for (const p of [{ row: -1, column: 0 }, { row: 0, column: -1 }, { row: 3, column: 0 }, { row: 0, column: 2 }]) {
      expect(isInside(g, p)).toBe(false);
      expect(colourAt(g, p)).toBeNull();
    }
  });
});
