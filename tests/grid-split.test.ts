/** Splitting into equal parts: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { joinBelow, joinRight } from '../src/grid/join.ts';
import { splitAcross, splitDown, splitIntoSquares } from '../src/grid/split.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const G = Grid.fromRows;
const rowsOf = (parts: Grid[] | null) => parts?.map((p) => p.toRows()) ?? null;

describe('splitting', () => {
  it('exact parts, and parts with one-cell separators dropped', () => {
    expect(rowsOf(splitAcross(G([[1, 2, 3, 4]]), 2))).toEqual([[[1, 2]], [[3, 4]]]);
    expect(rowsOf(splitAcross(G([[1, 2, 5, 3, 4]]), 2))).toEqual([[[1, 2]], [[3, 4]]]);
    expect(rowsOf(splitDown(G([[1], [5], [2]]), 2))).toEqual([[[1]], [[2]]]);
  });

  it('null when the side does not divide', () => {
    expect(splitAcross(G([[1, 2, 3, 4]]), 3)).toBeNull();
    expect(splitDown(G([[1]]), 2)).toBeNull();
    expect(splitAcross(G([[1, 2]]), 0)).toBeNull();
  });

  it('splitIntoSquares cuts along the long side', () => {
    expect(rowsOf(splitIntoSquares(G([[1, 0, 2, 2], [1, 1, 2, 0]])))).toEqual([[[1, 0], [1, 1]], [[2, 2], [2, 0]]]);
    // 2 × 5 with a separator column: two 2 × 2 squares
    expect(rowsOf(splitIntoSquares(G([[1, 1, 5, 2, 2], [1, 1, 5, 2, 2]])))).toEqual([[[1, 1], [1, 1]], [[2, 2], [2, 2]]]);
    const square = G([[1, 2], [3, 4]]);
    expect(splitIntoSquares(square)![0]).toBe(square);
    expect(splitIntoSquares(G([[1, 2, 3]]))!.length).toBe(3);
    expect(splitIntoSquares(G([[1, 2, 3], [4, 5, 6]]))).toBeNull();
  });

  it('joining the parts back gives the grid when the side divides exactly', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 1, max: 4 }), (g, n) => {
        const across = splitAcross(g, n);
        if (across && g.width % n === 0) expect(across.reduce((a, b) => joinRight(a, b)!).equals(g)).toBe(true);
        const down = splitDown(g, n);
        if (down && g.height % n === 0) expect(down.reduce((a, b) => joinBelow(a, b)!).equals(g)).toBe(true);
      }),
    );
  });
});
