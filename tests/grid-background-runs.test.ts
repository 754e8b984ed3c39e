/** Painting runs of background cells: hand-worked cases, and a law against a cell-by-cell reference. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { paintBackgroundRuns, type RunPaint } from '../src/grid/background-runs.ts';
import { Grid } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

/** The painted copy of the grid's cells as rows, and how many cells were painted. */
function painted(g: Grid, background: number, alongRows: boolean, way: RunPaint, colour = -1): [number[][], number] {
  const out = Uint8Array.from(g.cells);
  const count = paintBackgroundRuns(g, background, alongRows, way, colour, out);
  return [new Grid(g.height, g.width, out).toRows(), count];
}

/**
 * Reference, cell by cell: a background cell looks along its line for the nearest drawn cell
 * behind it and ahead of it (-1 past the edge) and takes the colour the way asks for.
 */
function reference(g: Grid, background: number, alongRows: boolean, way: RunPaint, colour: number): number[][] {
  const rows = g.toRows();
  const out = g.toRows();
  const at = (line: number, k: number) => (alongRows ? rows[line]![k]! : rows[k]![line]!);
  const lines = alongRows ? g.height : g.width;
  const length = alongRows ? g.width : g.height;
  for (let line = 0; line < lines; line++) {
    for (let k = 0; k < length; k++) {
      if (at(line, k) !== background) continue;
      let before = -1;
      for (let j = k - 1; j >= 0; j--) if (at(line, j) !== background) (before = at(line, j)), (j = -1);
      let after = -1;
      for (let j = k + 1; j < length; j++) if (at(line, j) !== background) (after = at(line, j)), (j = length);
      const bound = way === 'behind' ? before : way === 'ahead' ? after : before === after ? before : -1;
      if (bound < 0) continue;
      const paint = colour >= 0 ? colour : bound;
      if (alongRows) out[line]![k] = paint;
      else out[k]![line] = paint;
    }
  }
  return out;
}

describe('paintBackgroundRuns', () => {
  const g = Grid.fromRows([
    [0, 2, 0, 0, 2],
    [3, 3, 0, 0, 0],
  ]);

  it('along rows: behind, ahead and between', () => {
    expect(painted(g, 0, true, 'behind')).toEqual([[[0, 2, 2, 2, 2], [3, 3, 3, 3, 3]], 5]);
    expect(painted(g, 0, true, 'ahead')).toEqual([[[2, 2, 2, 2, 2], [3, 3, 0, 0, 0]], 3]);
    expect(painted(g, 0, true, 'between')).toEqual([[[0, 2, 2, 2, 2], [3, 3, 0, 0, 0]], 2]);
    expect(painted(g, 0, true, 'between', 7)).toEqual([[[0, 2, 7, 7, 2], [3, 3, 0, 0, 0]], 2]);
  });

  it('along columns; an edge bounds nothing', () => {
    expect(painted(g, 0, false, 'behind')).toEqual([[[0, 2, 0, 0, 2], [3, 3, 0, 0, 2]], 1]);
    expect(painted(g, 0, false, 'between', 5)).toEqual([g.toRows(), 0]);
  });

  it('with another background colour', () => {
    // with 3 as background, the two 3s are one run ahead of a 0
    expect(painted(g, 3, true, 'ahead')).toEqual([[[0, 2, 0, 0, 2], [0, 0, 0, 0, 0]], 2]);
  });

  it('leaves a cell already changed in the copy as it is', () => {
    const out = Uint8Array.from(g.cells);
    out[2] = 9;
    expect(paintBackgroundRuns(g, 0, true, 'between', -1, out)).toBe(1);
    expect(Array.from(out.subarray(0, 5))).toEqual([0, 2, 9, 2, 2]);
  });

  it('paints as the cell-by-cell reference does, and counts the cells it painted', () => {
    const ways: RunPaint[] = ['behind', 'ahead', 'between'];
    fc.assert(
      fc.property(arbitraryGrid(), fc.boolean(), fc.constantFrom(...ways), fc.integer({ min: -1, max: 9 }), (x, alongRows, way, colour) => {
        const [rows, count] = painted(x, 0, alongRows, way, colour);
        expect(rows).toEqual(reference(x, 0, alongRows, way, colour));
        let background = 0;
        for (let i = 0; i < x.cells.length; i++) if (x.cells[i] === 0) background++;
        let left = 0;
        for (let i = 0; i < x.cells.length; i++) if (x.cells[i] === 0 && rows[Math.floor(i / x.width)]![i % x.width] === 0) left++;
        // every background cell painted with something other than the background is counted
        if (colour !== 0) expect(count).toBe(background - left);
      }),
    );
  });
});
