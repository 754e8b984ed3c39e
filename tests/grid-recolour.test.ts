/** Recolouring through colour tables: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { applyColourMap, keepColour, mapColours, recolour, recolourAllButBackground, swapColours } from '../src/grid/recolour.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;
const colour = fc.integer({ min: 0, max: 9 });

describe('recolour', () => {
  it('changes exactly the cells of the first colour', () => {
    expect(recolour(G([[1, 2], [2, 1]]), 1, 7).toRows()).toEqual([[7, 2], [2, 7]]);
  });

  it('gives back the same grid when nothing changes', () => {
    const g = G([[1, 2]]);
    expect(recolour(g, 3, 4)).toBe(g);
    expect(recolour(g, 1, 1)).toBe(g);
  });
});

describe('mapColours and applyColourMap', () => {
  it('maps every cell once, all at once', () => {
    // 1 -> 2 and 2 -> 1 at the same time: a swap, not a chain
    const colourMap = [0, 2, 1, 3, 4, 5, 6, 7, 8, 9];
    expect(applyColourMap(G([[1, 2], [3, 1]]), colourMap).toRows()).toEqual([[2, 1], [3, 2]]);
  });

  it('the table that changes nothing gives back the same grid', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const table = new Uint8Array(256);
        for (let c = 0; c < 256; c++) table[c] = c;
        expect(mapColours(g, table)).toBe(g);
      }),
    );
  });
});

describe('swapColours', () => {
  it('swaps two colours', () => {
    expect(swapColours(G([[1, 0, 2]]), 1, 2).toRows()).toEqual([[2, 0, 1]]);
  });

  it('twice is the identity', () => {
    fc.assert(
      fc.property(arbitraryGrid(), colour, colour, (g, a, b) => {
        expect(swapColours(swapColours(g, a, b), a, b).equals(g)).toBe(true);
      }),
    );
  });
});

describe('keepColour', () => {
  it('keeps one colour, the rest becomes the background', () => {
    expect(keepColour(G([[0, 1, 2], [2, 0, 0]]), 2).toRows()).toEqual([[0, 0, 2], [2, 0, 0]]);
    // no colour 0: 5 is the background
    expect(keepColour(G([[5, 5, 3], [5, 4, 5]]), 4).toRows()).toEqual([[5, 5, 5], [5, 4, 5]]);
  });

  it('leaves only the kept colour and the background', () => {
    fc.assert(
      fc.property(arbitraryGrid(), colour, (g, c) => {
        const background = backgroundOf(g);
        for (const v of keepColour(g, c).cells) expect(v === c || v === background).toBe(true);
      }),
    );
  });
});

describe('recolourAllButBackground', () => {
  it('every non-background cell gets the colour', () => {
    expect(recolourAllButBackground(G([[0, 1, 0], [2, 0, 3]]), 4).toRows()).toEqual([[0, 4, 0], [4, 0, 4]]);
  });
});
