/**
 * Lines through the cells of a colour: each such cell paints its whole row, or its whole
 * column, in its colour, over whatever was there.
 */
import { Grid } from './grid.ts';

export function linesThroughColour(g: Grid, colour: number, rows: boolean, columns: boolean): Grid {
  const { height, width, cells } = g;
  const rowHit = new Uint8Array(height);
  const columnHit = new Uint8Array(width);
  let any = false;
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      if (cells[r * width + c] !== colour) continue;
      rowHit[r] = 1;
      columnHit[c] = 1;
      any = true;
    }
  }
  if (!any) return g;
  const out = cells.slice();
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      if ((rows && rowHit[r]) || (columns && columnHit[c])) out[r * width + c] = colour;
    }
  }
  return new Grid(height, width, out);
}
