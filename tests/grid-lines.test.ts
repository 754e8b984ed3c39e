/** Straight lines painted on a grid: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { drawBorder, drawLine, fillEmptyLines, linesThroughColour } from '../src/grid/lines.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const G = Grid.fromRows;
const blank = Grid.filled(3, 3, 0);

describe('drawLine', () => {
  it('straight and diagonal lines, both ends included', () => {
    expect(drawLine(blank, { row: 0, column: 2 }, { row: 2, column: 0 }, 6)!.toRows()).toEqual([[0, 0, 6], [0, 6, 0], [6, 0, 0]]);
    expect(drawLine(blank, { row: 1, column: 2 }, { row: 1, column: 0 }, 4)!.toRows()).toEqual([[0, 0, 0], [4, 4, 4], [0, 0, 0]]);
    expect(drawLine(blank, { row: 1, column: 1 }, { row: 1, column: 1 }, 4)!.toRows()).toEqual([[0, 0, 0], [0, 4, 0], [0, 0, 0]]);
  });

  it('null for ends outside the grid or cells not in line', () => {
    expect(drawLine(blank, { row: 0, column: 0 }, { row: 3, column: 0 }, 1)).toBeNull();
    expect(drawLine(blank, { row: 0, column: 0 }, { row: 1, column: 2 }, 1)).toBeNull();
  });

  it('the line from a to b is the line from b to a', () => {
    const cell = fc.record({ row: fc.integer({ min: 0, max: 2 }), column: fc.integer({ min: 0, max: 2 }) });
    fc.assert(
      fc.property(cell, cell, (a, b) => {
        const forth = drawLine(blank, a, b, 1);
        const back = drawLine(blank, b, a, 1);
        if (forth === null) expect(back).toBeNull();
        else expect(forth.equals(back!)).toBe(true);
      }),
    );
  });
});

describe('borders, empty lines and lines through a colour', () => {
  it('drawBorder paints the outer ring', () => {
    expect(drawBorder(G([[0, 0, 0], [0, 1, 0], [0, 0, 0], [0, 0, 0]]), 8).toRows()).toEqual([[8, 8, 8], [8, 1, 8], [8, 0, 8], [8, 8, 8]]);
  });

  it('fillEmptyLines paints every row and column of background only', () => {
    expect(fillEmptyLines(G([[1, 0, 1], [0, 0, 0], [1, 0, 0]]), 2).toRows()).toEqual([[1, 2, 1], [2, 2, 2], [1, 2, 0]]);
  });

  it('linesThroughColour: rows, columns or both', () => {
    const g = G([[0, 0, 0], [0, 3, 0], [2, 0, 0]]);
    expect(linesThroughColour(g, 3, true, false).toRows()).toEqual([[0, 0, 0], [3, 3, 3], [2, 0, 0]]);
    expect(linesThroughColour(g, 3, false, true).toRows()).toEqual([[0, 3, 0], [0, 3, 0], [2, 3, 0]]);
    expect(linesThroughColour(g, 3, true, true).toRows()).toEqual([[0, 3, 0], [3, 3, 3], [2, 3, 0]]);
    expect(linesThroughColour(g, 7, true, true)).toBe(g);
  });

  it('a border drawn twice is drawn once; lines through a colour change exactly the cells in a row or column holding it', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 1, max: 9 }), (g, colour) => {
        const border = drawBorder(g, colour);
        expect(drawBorder(border, colour).equals(border)).toBe(true);
        const through = linesThroughColour(g, colour, true, true);
        const rows = g.toRows();
        for (let r = 0; r < g.height; r++) {
          for (let c = 0; c < g.width; c++) {
            const hit = rows[r]!.includes(colour) || rows.some((row) => row[c] === colour);
            expect(through.get(r, c)).toBe(hit ? colour : g.get(r, c));
          }
        }
      }),
    );
  });
});
