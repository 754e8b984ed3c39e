/**
 * Separator lines: full rows and columns of one colour that divide a grid into cells (the
 * panes of a window), the panes they leave between them, and the colour of each pane.
 */
import { backgroundColour } from './components.ts';
import { Grid, newCells, copyRun } from './grid.ts';
import { mostFrequentColour } from './most-frequent-colour.ts';
import { WorkArray } from './work-array.ts';

export interface SeparatorLines {
  readonly colour: number;
  /** 1 where the row is a separator line. */
  readonly rows: Uint8Array;
  /** 1 where the column is a separator line. */
  readonly columns: Uint8Array;
}

/** Runs of consecutive indices whose flag is 0, as [start, end) pairs. */
export function gaps(flags: Uint8Array): [number, number][] {
  const runs: [number, number][] = [];
  let start = -1;
  for (let i = 0; i <= flags.length; i++) {
    const open = i < flags.length && flags[i] === 0;
    if (open && start < 0) start = i;
    if (!open && start >= 0) {
      runs.push([start, i]);
      start = -1;
    }
  }
  return runs;
}

/** Work arrays for the line colours (this runs on most grids the search makes). */
const rowColours = new WorkArray(Int8Array);
const columnColours = new WorkArray(Int8Array);

/**
 * The separator lines of the grid: for each colour, its full rows and columns; a colour
 * qualifies when its lines leave at least two panes. Non-background colours are preferred,
 * then the colour with the most lines (lowest colour on ties). Undefined when none qualifies.
 */
export function findSeparatorLines(grid: Grid): SeparatorLines | undefined {
  const { height, width, cells } = grid;
  const rowColour = rowColours.take(height).fill(-1, 0, height);
  const columnColour = columnColours.take(width).fill(-1, 0, width);
  for (let r = 0; r < height; r++) {
    const first = cells[r * width]!;
    let full = true;
    for (let c = 1; c < width && full; c++) if (cells[r * width + c] !== first) full = false;
    if (full) rowColour[r] = first;
  }
  for (let c = 0; c < width; c++) {
    const first = cells[c]!;
    let full = true;
    for (let r = 1; r < height && full; r++) if (cells[r * width + c] !== first) full = false;
    if (full) columnColour[c] = first;
  }
  const background = backgroundColour(grid);
  // Scored from the line colours alone; only the winner's flags are built (this runs on most
  // grids the search makes, and nearly every colour has no lines).
  let bestColour = -1;
  let bestScore = -1;
  for (let colour = 0; colour < 10; colour++) {
    const rowLines = linesOf(rowColour, height, colour);
    const columnLines = linesOf(columnColour, width, colour);
    if (rowLines + columnLines === 0) continue;
    if (gapCount(rowColour, height, colour) * gapCount(columnColour, width, colour) < 2) continue;
    const score = (colour === background ? 0 : 1000) + rowLines + columnLines;
    if (score > bestScore) {
      bestScore = score;
      bestColour = colour;
    }
  }
  if (bestColour < 0) return undefined;
  const rows = newCells(height);
  const columns = newCells(width);
  for (let r = 0; r < height; r++) if (rowColour[r] === bestColour) rows[r] = 1;
  for (let c = 0; c < width; c++) if (columnColour[c] === bestColour) columns[c] = 1;
  return { colour: bestColour, rows, columns };
}

/** How many of the first `length` lines have the colour. */
function linesOf(lineColours: Int8Array, length: number, colour: number): number {
  let n = 0;
  for (let i = 0; i < length; i++) if (lineColours[i] === colour) n++;
  return n;
}

/** How many runs of lines not of the colour the first `length` lines hold (the gaps of its flags, as {@link gaps} finds them). */
function gapCount(lineColours: Int8Array, length: number, colour: number): number {
  let runs = 0;
  let open = false;
  for (let i = 0; i < length; i++) {
    const gap = lineColours[i] !== colour;
    if (gap && !open) runs++;
    open = gap;
  }
  return runs;
}

/** The panes between the separator lines in reading order, or null when there are no lines. */
export function splitAtSeparatorLines(grid: Grid): Grid[] | null {
  const lines = findSeparatorLines(grid);
  if (!lines) return null;
  const { width, cells } = grid;
  const parts: Grid[] = [];
  const columnRuns = gaps(lines.columns);
  for (const [top, bottom] of gaps(lines.rows)) {
    for (const [left, right] of columnRuns) {
      const h = bottom - top;
      const w = right - left;
      const out = newCells(h * w);
      for (let r = 0; r < h; r++) copyRun(cells, (top + r) * width + left, out, r * w, right - left);
      parts.push(new Grid(h, w, out));
    }
  }
  return parts;
}

/** The most frequent colour of each pane between the separator lines, laid out as the panes are; null when there are no lines. */
export function paneColours(g: Grid): Grid | null {
  const lines = findSeparatorLines(g);
  if (!lines) return null;
  const rowRuns = gaps(lines.rows);
  const columnRuns = gaps(lines.columns);
  const out = newCells(rowRuns.length * columnRuns.length);
  const counts = new Uint32Array(10);
  const { width, cells } = g;
  let k = 0;
  for (const [top, bottom] of rowRuns) {
    for (const [left, right] of columnRuns) {
      counts.fill(0);
      for (let r = top; r < bottom; r++) for (let c = left; c < right; c++) counts[cells[r * width + c]!]!++;
      out[k++] = mostFrequentColour(counts);
    }
  }
  return new Grid(rowRuns.length, columnRuns.length, out);
}
