/** Shifting the picture: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { translate } from '../src/grid/translate.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;

describe('translate', () => {
  it('shifts down-right and up-left, filling with the background', () => {
    const g = G([[1, 2, 0], [3, 0, 0], [0, 0, 0]]);
    expect(translate(g, { row: 1, column: 1 }).toRows()).toEqual([[0, 0, 0], [0, 1, 2], [0, 3, 0]]);
    expect(translate(G([[0, 0], [0, 4]]), { row: -1, column: -1 }).toRows()).toEqual([[4, 0], [0, 0]]);
  });

  it('without colour 0 the background is the most frequent colour', () => {
    expect(translate(G([[5, 5, 2]]), { row: 0, column: -1 }).toRows()).toEqual([[5, 2, 5]]);
  });

  it('a shift past the frame leaves only the background', () => {
    expect(translate(G([[1, 0], [0, 1]]), { row: 2, column: 0 }).toRows()).toEqual([[0, 0], [0, 0]]);
  });

  it('every cell moves by the offset: out(r + dr, c + dc) = in(r, c), the rest background', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: -4, max: 4 }), fc.integer({ min: -4, max: 4 }), (g, dr, dc) => {
        const out = translate(g, { row: dr, column: dc });
        const background = backgroundOf(g);
        for (let r = 0; r < g.height; r++) {
          for (let c = 0; c < g.width; c++) {
            const sr = r - dr;
            const sc = c - dc;
            const inside = sr >= 0 && sr < g.height && sc >= 0 && sc < g.width;
            expect(out.get(r, c)).toBe(inside ? g.get(sr, sc) : background);
          }
        }
      }),
    );
  });
});
