/** Merging repeated neighbouring lines: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { mergeRepeatedLines } from '../src/grid/merge-repeated-lines.ts';
import { scaleUp } from '../src/grid/scale.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const G = Grid.fromRows;

describe('mergeRepeatedLines', () => {
  it('each run of equal rows, then of equal columns, becomes one', () => {
    expect(mergeRepeatedLines(G([[1, 1, 2], [1, 1, 2], [3, 3, 3]])).toRows()).toEqual([[1, 2], [3, 3]]);
    // equal rows apart from each other are not a run
    expect(mergeRepeatedLines(G([[1], [2], [1]])).toRows()).toEqual([[1], [2], [1]]);
  });

  it('gives back the same grid when nothing repeats', () => {
    const g = G([[1, 2], [3, 4]]);
    expect(mergeRepeatedLines(g)).toBe(g);
  });

  it('is idempotent and undoes a scale-up', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 1, max: 3 }), (g, k) => {
        const once = mergeRepeatedLines(g);
        expect(mergeRepeatedLines(once).equals(once)).toBe(true);
        expect(mergeRepeatedLines(scaleUp(g, k)!).equals(once)).toBe(true);
      }),
    );
  });
});
