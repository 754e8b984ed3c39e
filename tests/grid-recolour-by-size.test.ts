/** Recolouring objects by their size: hand-worked cases. */
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { recolourBySizeRank, recolourLargestAndSmallest } from '../src/grid/recolour-by-size.ts';

const G = Grid.fromRows;

describe('recolourLargestAndSmallest', () => {
  it('the first largest and the first smallest object get the two colours', () => {
    // objects in reading order: (0,0)-(0,1) size 2, (0,3) size 1, (2,0) size 1, (2,2)-(2,3) size 2
    const g = G([[1, 1, 0, 1], [0, 0, 0, 0], [1, 0, 1, 1]]);
    expect(recolourLargestAndSmallest(g, 2, 3)!.toRows()).toEqual([[2, 2, 0, 3], [0, 0, 0, 0], [1, 0, 1, 1]]);
  });

  it('is null with fewer than two objects or all of one size', () => {
    expect(recolourLargestAndSmallest(G([[1, 1, 0]]), 2, 3)).toBeNull();
    expect(recolourLargestAndSmallest(G([[1, 0, 1]]), 2, 3)).toBeNull();
  });
});

describe('recolourBySizeRank', () => {
  it('the largest size gets 1, the next 2, equal sizes share a colour', () => {
    // sizes: left column 3, middle column 2, bottom-right 1
    const g = G([[5, 0, 5, 0], [5, 0, 5, 0], [5, 0, 0, 5]]);
    expect(recolourBySizeRank(g)!.toRows()).toEqual([[1, 0, 2, 0], [1, 0, 2, 0], [1, 0, 0, 3]]);
    expect(recolourBySizeRank(G([[4, 0, 4]]))!.toRows()).toEqual([[1, 0, 1]]);
  });

  it('is null with no objects', () => {
    expect(recolourBySizeRank(G([[0, 0]]))).toBeNull();
  });
});
