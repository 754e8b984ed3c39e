/** Colours ranked by their number of cells: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { colourByCount, colourHistogram, coloursByFrequency, countColours, mostCommonObjectColour } from '../src/grid/colour-ranking.ts';
import { GridObject } from '../src/grid/grid-object.ts';
import { Grid } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;

describe('colourByCount', () => {
  // 0 ×3, 3 ×1, 4 ×2
  const g = G([[0, 3, 0], [4, 4, 0]]);

  it('most and least, with and without the background', () => {
    expect(colourByCount(g, true, false)).toBe(0);
    expect(colourByCount(g, true, true)).toBe(4);
    expect(colourByCount(g, false, false)).toBe(3);
    expect(colourByCount(g, false, true)).toBe(3);
  });

  it('lowest colour on ties, and null when only the background is left', () => {
    expect(colourByCount(G([[5, 2, 2, 5]]), true, false)).toBe(2);
    expect(colourByCount(G([[0, 0], [0, 0]]), true, true)).toBeNull();
  });

  it('the answer is present and no present colour beats it', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.boolean(), (grid, most) => {
        const best = colourByCount(grid, most, false)!;
        const count = (c: number) => grid.cells.filter((v) => v === c).length;
        expect(count(best)).toBeGreaterThan(0);
        for (let c = 0; c < 10; c++) {
          if (count(c) === 0) continue;
          if (most) expect(count(c)).toBeLessThanOrEqual(count(best));
          else expect(count(c)).toBeGreaterThanOrEqual(count(best));
        }
      }),
    );
  });
});

describe('countColours', () => {
  it('counts the colours other than the background', () => {
    expect(countColours(G([[0, 2, 0], [5, 2, 0]]))).toBe(2);
    // no colour 0: 7 (four cells) is the background; 1 and 3 remain
    expect(countColours(G([[7, 7, 1], [7, 7, 3]]))).toBe(2);
    expect(countColours(G([[6]]))).toBe(0);
  });
});

describe('coloursByFrequency', () => {
  it('lists non-background colours, most cells first, lower colour first on ties', () => {
    // 4 ×3, 7 ×2, 2 ×1, background 0
    expect(coloursByFrequency(G([[0, 4, 4], [2, 4, 7], [7, 0, 0]]))!.toRows()).toEqual([[4], [7], [2]]);
    expect(coloursByFrequency(G([[3, 0, 1]]))!.toRows()).toEqual([[1], [3]]);
    expect(coloursByFrequency(G([[0, 0]]))).toBeNull();
  });

  it('holds each colour other than the background exactly once', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (grid) => {
        const listed = coloursByFrequency(grid);
        const expected = [...new Set(grid.cells)].filter((c) => c !== backgroundOf(grid)).sort();
        if (expected.length === 0) expect(listed).toBeNull();
        else expect([...listed!.cells].sort()).toEqual(expected);
      }),
    );
  });
});

describe('colourHistogram', () => {
  it('one column per colour other than 0, as tall as its count', () => {
    // 2 ×3, 1 ×2, 3 ×1
    expect(colourHistogram(G([[2, 2, 1], [2, 3, 1]]))!.toRows()).toEqual([
      [2, 1, 3],
      [2, 1, 0],
      [2, 0, 0],
    ]);
    expect(colourHistogram(G([[0, 0]]))).toBeNull();
  });

  it('is null when the tallest bar would pass the size cap', () => {
    expect(colourHistogram(Grid.filled(6, 6, 5))).toBeNull();
  });
});

describe('mostCommonObjectColour', () => {
  const dot = (colour: number, left: number) => new GridObject(0, left, G([[colour]]));

  it('the colour most objects have, the lowest on ties; null for no objects', () => {
    expect(mostCommonObjectColour([dot(1, 0), dot(2, 2), dot(2, 4)])).toBe(2);
    expect(mostCommonObjectColour([dot(8, 0), dot(3, 2)])).toBe(3);
    expect(mostCommonObjectColour([])).toBeNull();
  });
});
