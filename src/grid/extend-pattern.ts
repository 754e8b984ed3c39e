/**
 * Continuing a repeating pattern: the smallest period of the rows and of the columns, used to
 * grow the grid to a new size or to fill the empty columns on its right.
 */
import { backgroundColour } from './components.ts';
import { Grid, shapeAllowed, newCells, copyCells } from './grid.ts';

/** Whether column c equals column c + p for every c with c + p < known (rows when `rows`). */
function linesRepeat(g: Grid, p: number, known: number, rows: boolean): boolean {
  const { width, cells } = g;
  const across = rows ? width : g.height;
  for (let k = 0; k + p < known; k++) {
    for (let j = 0; j < across; j++) {
      const a = rows ? cells[k * width + j] : cells[j * width + k];
      const b = rows ? cells[(k + p) * width + j] : cells[j * width + k + p];
      if (a !== b) return false;
    }
  }
  return true;
}

function smallestPeriod(g: Grid, known: number, rows: boolean): number {
  for (let p = 1; p < known; p++) if (linesRepeat(g, p, known, rows)) return p;
  return known;
}

/** The grid grown (or cut) to height × width by continuing its smallest row and column periods. */
export function extendPatternToSize(g: Grid, height: number, width: number): Grid | null {
  if (!Number.isInteger(height) || !Number.isInteger(width) || !shapeAllowed(height, width)) return null;
  const rowPeriod = smallestPeriod(g, g.height, true);
  const columnPeriod = smallestPeriod(g, g.width, false);
  const out = newCells(height * width);
  for (let r = 0; r < height; r++) {
    const sr = r < g.height ? r : (r - g.height) % rowPeriod + g.height - rowPeriod;
    for (let c = 0; c < width; c++) {
      const sc = c < g.width ? c : (c - g.width) % columnPeriod + g.width - columnPeriod;
      out[r * width + c] = g.data[g.offset + sr * g.width + sc]!;
    }
  }
  return new Grid(height, width, out);
}

/**
 * The columns right of the last non-background cell are filled by continuing the smallest
 * column period of the columns up to it.
 */
export function continuePatternRight(g: Grid): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  let last = -1;
  for (let i = 0; i < cells.length; i++) if (cells[i] !== background && i % width > last) last = i % width;
  if (last < 0 || last === width - 1) return g;
  const period = smallestPeriod(g, last + 1, false);
  if (period > last) return g;
  const out = copyCells(cells);
  for (let c = last + 1; c < width; c++) {
    for (let r = 0; r < height; r++) out[r * width + c] = out[r * width + c - period]!;
  }
  return new Grid(height, width, out);
}
