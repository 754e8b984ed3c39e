/** The most frequent colour of a count table, and the background rule on one. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { backgroundColour, colourCounts } from '../src/grid/components.ts';
import { Grid } from '../src/grid/grid.ts';
import { backgroundOfCounts, mostFrequentColour } from '../src/grid/most-frequent-colour.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const counts = fc.array(fc.nat({ max: 20 }), { minLength: 10, maxLength: 10 });

describe('mostFrequentColour', () => {
  it('picks the largest count, the lowest colour on ties', () => {
    expect(mostFrequentColour([0, 3, 0, 5, 0, 0, 0, 0, 0, 1])).toBe(3);
    expect(mostFrequentColour([2, 0, 0, 0, 0, 0, 0, 7, 0, 7])).toBe(7);
    expect(mostFrequentColour([4, 4, 4, 4, 4, 4, 4, 4, 4, 4])).toBe(0);
  });

  it('gives 0 when every count is 0 and ignores entries past colour 9', () => {
    expect(mostFrequentColour(new Uint32Array(10))).toBe(0);
    const wide = new Uint32Array(256);
    wide[2] = 1;
    wide[200] = 50;
    expect(mostFrequentColour(wide)).toBe(2);
  });

  it('no colour has more, and every lower colour has strictly less', () => {
    fc.assert(
      fc.property(counts, (table) => {
        const best = mostFrequentColour(table);
        for (let c = 0; c < 10; c++) expect(table[c]!).toBeLessThanOrEqual(table[best]!);
        for (let c = 0; c < best; c++) expect(table[c]!).toBeLessThan(table[best]!);
      }),
    );
  });
});

describe('backgroundOfCounts', () => {
  it('is 0 whenever there is a cell of colour 0, however few', () => {
    expect(backgroundOfCounts([1, 9, 9, 0, 0, 0, 0, 0, 0, 0])).toBe(0);
  });

  it('without colour 0, is the most frequent colour (the lowest on ties)', () => {
    expect(backgroundOfCounts([0, 2, 5, 5, 0, 0, 0, 0, 0, 0])).toBe(2);
    expect(backgroundOfCounts([0, 0, 0, 0, 0, 0, 3, 0, 3, 0])).toBe(6);
  });
});

describe('backgroundColour of a grid', () => {
  it('is the background rule on the grid counted cell by cell, whether its colour counts were asked for first or not', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 12, maxWidth: 12 }), fc.boolean(), (g, countsFirst) => {
        const fresh = new Grid(g.height, g.width, Uint8Array.from(g.cells));
        if (countsFirst) colourCounts(fresh);
        const table = new Array<number>(10).fill(0);
        for (const v of g.cells) table[v]!++;
        expect(backgroundColour(fresh)).toBe(backgroundOfCounts(table));
        // asked again, from the memo
        expect(backgroundColour(fresh)).toBe(backgroundOfCounts(table));
      }),
    );
  });
});
