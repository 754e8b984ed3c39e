/** Scaling by whole factors: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { majorityScaleDown, scaleDown, scaleUp } from '../src/grid/scale.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const G = Grid.fromRows;

describe('scaling', () => {
  it('scaleUp makes each cell a block', () => {
    expect(scaleUp(G([[1, 0], [0, 2]]), 2)!.toRows()).toEqual([[1, 1, 0, 0], [1, 1, 0, 0], [0, 0, 2, 2], [0, 0, 2, 2]]);
    expect(scaleUp(G([[1]]), 11)).toBeNull();
    expect(scaleUp(Grid.filled(8, 8, 1), 4)).toBeNull();
  });

  it('scaleDown needs one-colour blocks', () => {
    expect(scaleDown(G([[3, 3, 0, 0], [3, 3, 0, 0]]), 2)!.toRows()).toEqual([[3, 0]]);
    expect(scaleDown(G([[3, 3, 0, 0], [3, 5, 0, 0]]), 2)).toBeNull();
    expect(scaleDown(G([[3, 3, 3]]), 2)).toBeNull();
  });

  it('majorityScaleDown takes each block\'s most frequent colour, the lowest on ties', () => {
    // left block: 3 ×3 and 5 ×1; right block: 0 ×3 and 4 ×1
    expect(majorityScaleDown(G([[3, 3, 0, 0], [3, 5, 0, 4]]), 2)!.toRows()).toEqual([[3, 0]]);
    // one block of 2 ×2 and 7 ×2: tie, so 2
    expect(majorityScaleDown(G([[7, 2], [2, 7]]), 2)!.toRows()).toEqual([[2]]);
    expect(majorityScaleDown(G([[1, 2, 3]]), 2)).toBeNull();
  });

  it('scaling up then down, either way, gives the grid back', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 6, maxWidth: 6 }), fc.integer({ min: 1, max: 5 }), (g, k) => {
        const big = scaleUp(g, k)!;
        expect([big.height, big.width]).toEqual([g.height * k, g.width * k]);
        expect(scaleDown(big, k)!.equals(g)).toBe(true);
        expect(majorityScaleDown(big, k)!.equals(g)).toBe(true);
      }),
    );
  });
});
