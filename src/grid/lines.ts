/**
 * Straight lines painted on a grid: between two cells, around the border, along every empty
 * row and column, and through every cell of a colour.
 */
import { backgroundColour } from './components.ts';
import { Grid, copyCells, fillCells } from './grid.ts';
import { WorkArray } from './work-array.ts';
import { isInside, type Position } from './position.ts';

/**
 * A straight (along a row or a column) or diagonal line between two cells of the grid, both
 * ends included; null when an end lies outside the grid or the cells are not in line.
 */
export function drawLine(g: Grid, from: Position, to: Position, colour: number): Grid | null {
  const { height, width } = g;
  if (!isInside(g, from) || !isInside(g, to)) return null;
  const dr = to.row - from.row;
  const dc = to.column - from.column;
  if (dr !== 0 && dc !== 0 && Math.abs(dr) !== Math.abs(dc)) return null;
  const steps = Math.max(Math.abs(dr), Math.abs(dc));
  const sr = Math.sign(dr);
  const sc = Math.sign(dc);
  const out = copyCells(g.cells);
  for (let k = 0; k <= steps; k++) out[(from.row + k * sr) * width + from.column + k * sc] = colour;
  return new Grid(height, width, out);
}

/** The outermost ring of cells takes the colour. */
export function drawBorder(g: Grid, colour: number): Grid {
  const { height, width } = g;
  const out = copyCells(g.cells);
  for (let c = 0; c < width; c++) {
    out[c] = colour;
    out[(height - 1) * width + c] = colour;
  }
  for (let r = 0; r < height; r++) {
    out[r * width] = colour;
    out[r * width + width - 1] = colour;
  }
  return new Grid(height, width, out);
}

/** Rows and columns made only of background cells take the colour. */
export function fillEmptyLines(g: Grid, colour: number): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = copyCells(cells);
  for (let r = 0; r < height; r++) {
    let empty = true;
    for (let c = 0; c < width && empty; c++) if (cells[r * width + c] !== background) empty = false;
    if (empty) fillCells(out, colour, r * width, (r + 1) * width);
  }
  for (let c = 0; c < width; c++) {
    let empty = true;
    for (let r = 0; r < height && empty; r++) if (cells[r * width + c] !== background) empty = false;
    if (empty) for (let r = 0; r < height; r++) out[r * width + c] = colour;
  }
  return new Grid(height, width, out);
}

/** Work arrays for {@link linesThroughColour}: which rows and columns hold the colour. */
const rowHits = new WorkArray(Uint8Array);
const columnHits = new WorkArray(Uint8Array);

/** Each cell of the colour paints its whole row (when `rows`), its whole column (when `columns`), or both, in the colour, over whatever was there. */
export function linesThroughColour(g: Grid, colour: number, rows: boolean, columns: boolean): Grid {
  const { height, width, cells } = g;
  const rowHit = fillCells(rowHits.take(height), 0, 0, height);
  const columnHit = fillCells(columnHits.take(width), 0, 0, width);
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
  const out = copyCells(cells);
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      if ((rows && rowHit[r]) || (columns && columnHit[c])) out[r * width + c] = colour;
    }
  }
  return new Grid(height, width, out);
}
