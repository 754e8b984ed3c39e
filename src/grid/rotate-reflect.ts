/**
 * Quarter turns, the half turn and the four mirrors of a grid (left-right, top-bottom and the
 * two diagonals): the grid's cells moved, none changed.
 */
import { Grid, newCells, copyCells, copyRun } from './grid.ts';

/** A quarter turn clockwise. */
export function rotateClockwise(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = newCells(height * width);
  // Result is width × height; result (r, c) = source (height - 1 - c, r).
  let i = 0;
  for (let r = 0; r < width; r++) for (let c = 0; c < height; c++) out[i++] = cells[(height - 1 - c) * width + r]!;
  return new Grid(width, height, out);
}

/** A quarter turn counterclockwise. */
export function rotateCounterclockwise(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = newCells(height * width);
  // Result (r, c) = source (c, width - 1 - r).
  let i = 0;
  for (let r = 0; r < width; r++) for (let c = 0; c < height; c++) out[i++] = cells[c * width + (width - 1 - r)]!;
  return new Grid(width, height, out);
}

/** Half a turn: upside down and back to front. */
export function rotateHalf(g: Grid): Grid {
  const out = copyCells(g.cells);
  out.reverse();
  return new Grid(g.height, g.width, out);
}

/** Mirrored top to bottom: the first row becomes the last. */
export function flipUpDown(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = newCells(height * width);
  for (let r = 0; r < height; r++) copyRun(cells, (height - 1 - r) * width, out, r * width, width);
  return new Grid(height, width, out);
}

/** Mirrored left to right: the first column becomes the last. */
export function flipLeftRight(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = newCells(height * width);
  for (let r = 0; r < height; r++) {
    const base = r * width;
    for (let c = 0; c < width; c++) out[base + c] = cells[base + width - 1 - c]!;
  }
  return new Grid(height, width, out);
}

/** Rows and columns swapped: mirrored along the main diagonal. */
export function transposeGrid(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = newCells(height * width);
  let i = 0;
  for (let r = 0; r < width; r++) for (let c = 0; c < height; c++) out[i++] = cells[c * width + r]!;
  return new Grid(width, height, out);
}

/** Mirror along the anti-diagonal (top-right to bottom-left). */
export function transposeAntidiagonal(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = newCells(height * width);
  // Result (r, c) = source (height - 1 - c, width - 1 - r).
  let i = 0;
  for (let r = 0; r < width; r++) for (let c = 0; c < height; c++) out[i++] = cells[(height - 1 - c) * width + (width - 1 - r)]!;
  return new Grid(width, height, out);
}
