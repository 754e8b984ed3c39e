/** Tiling: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { fractalTile, fractalTileWith, repeatToSize, tile } from '../src/grid/tile.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;

describe('tiling', () => {
  it('repeatToSize continues the pattern from the top-left corner', () => {
    expect(repeatToSize(G([[1, 2], [3, 4]]), 3, 3)!.toRows()).toEqual([[1, 2, 1], [3, 4, 3], [1, 2, 1]]);
    expect(repeatToSize(G([[1]]), 0, 3)).toBeNull();
    expect(repeatToSize(G([[1]]), 31, 3)).toBeNull();
  });

  it('tile repeats down and across', () => {
    expect(tile(G([[1, 2]]), 2, 2)!.toRows()).toEqual([[1, 2, 1, 2], [1, 2, 1, 2]]);
    expect(tile(G([[1]]), 11, 1)).toBeNull();
    expect(tile(Grid.filled(8, 1, 1), 4, 1)).toBeNull();
  });

  it('fractalTile puts a copy of the grid where its cells are drawn', () => {
    expect(fractalTile(G([[1, 0], [0, 1]]))!.toRows()).toEqual([[1, 0, 0, 0], [0, 1, 0, 0], [0, 0, 1, 0], [0, 0, 0, 1]]);
    expect(fractalTile(Grid.filled(6, 6, 1))).toBeNull();
  });

  it('fractalTileWith puts a copy of the second grid where the first has a drawn cell, else its background', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 5, maxWidth: 5 }), arbitraryGrid({ maxHeight: 5, maxWidth: 5 }), (mask, pattern) => {
        const t = fractalTileWith(mask, pattern)!;
        const background = backgroundOf(mask);
        expect([t.height, t.width]).toEqual([mask.height * pattern.height, mask.width * pattern.width]);
        for (let r = 0; r < t.height; r++) {
          for (let c = 0; c < t.width; c++) {
            const drawn = mask.get(Math.floor(r / pattern.height), Math.floor(c / pattern.width)) !== background;
            expect(t.get(r, c)).toBe(drawn ? pattern.get(r % pattern.height, c % pattern.width) : background);
          }
        }
      }),
    );
    expect(fractalTileWith(Grid.filled(6, 6, 1), Grid.filled(6, 1, 2))).toBeNull();
  });

  it('every cell of a tiling is the cell of the grid at the same place modulo its size', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 5, maxWidth: 5 }), fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }), (g, down, across) => {
        const t = tile(g, down, across)!;
        expect([t.height, t.width]).toEqual([g.height * down, g.width * across]);
        for (let r = 0; r < t.height; r++) for (let c = 0; c < t.width; c++) expect(t.get(r, c)).toBe(g.get(r % g.height, c % g.width));
      }),
    );
  });
});
