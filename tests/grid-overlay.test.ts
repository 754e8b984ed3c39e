/** Laying grids over each other: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { overlay, overlayAll } from '../src/grid/overlay.ts';
import { arbitraryGridPair } from './support/arbitrary-grid.ts';

const G = Grid.fromRows;

describe('overlay', () => {
  it('the top grid covers the bottom except where it has the see-through colour', () => {
    expect(overlay(G([[1, 2], [3, 4]]), G([[0, 7], [0, 0]]), 0)!.toRows()).toEqual([[1, 7], [3, 4]]);
    expect(overlay(G([[1, 2]]), G([[5, 6]]), 5)!.toRows()).toEqual([[1, 6]]);
  });

  it('is null for grids of different sizes', () => {
    expect(overlay(G([[1, 2]]), G([[1], [2]]), 0)).toBeNull();
  });

  it('a grid over itself is itself', () => {
    fc.assert(
      fc.property(arbitraryGridPair(), fc.integer({ min: 0, max: 9 }), ([a], colour) => {
        expect(overlay(a, a, colour)!.equals(a)).toBe(true);
      }),
    );
  });
});

describe('overlayAll', () => {
  it('later grids cover earlier ones, except for the shared background', () => {
    expect(overlayAll([G([[1, 0]]), G([[0, 2]]), G([[0, 0]])])!.toRows()).toEqual([[1, 2]]);
    expect(overlayAll([G([[1, 3]]), G([[4, 0]])])!.toRows()).toEqual([[4, 3]]);
  });

  it('without colour 0, the most frequent colour over all the grids is see-through', () => {
    // 5 appears three times over both grids, more than any other colour
    expect(overlayAll([G([[1, 5]]), G([[5, 5]])])!.toRows()).toEqual([[1, 5]]);
  });

  it('is null for no grids or different sizes', () => {
    expect(overlayAll([])).toBeNull();
    expect(overlayAll([G([[1]]), G([[1, 2]])])).toBeNull();
  });
});
