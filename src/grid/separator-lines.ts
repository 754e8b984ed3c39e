/**
 * Separator lines: full rows and columns of one colour that divide a grid into cells (the
 * panes of a window), the panes they leave between them, and the colour of each pane.
 */
import { backgroundColour } from './components.ts';
import { Grid, newCells } from './grid.ts';
import { mostFrequentColour } from './most-frequent-colour.ts';

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

/**
 * The separator lines of the grid: for each colour, its full rows and columns; a colour
 * qualifies when its lines leave at least two panes. Non-background colours are preferred,
 * then the colour with the most lines (lowest colour on ties). Undefined when none qualifies.
 */
export function findSeparatorLines(grid: Grid): SeparatorLines | undefined {
  const { height, width, cells } = grid;
  const rowColour = new Int8Array(height).fill(-1);
  const columnColour = new Int8Array(width).fill(-1);
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
  let best: SeparatorLines | undefined;
  let bestScore = -1;
  for (let colour = 0; colour < 10; colour++) {
    const rows = newCells(height);
    const columns = newCells(width);
    let lines = 0;
    for (let r = 0; r < height; r++) if (rowColour[r] === colour) (rows[r] = 1), lines++;
    for (let c = 0; c < width; c++) if (columnColour[c] === colour) (columns[c] = 1), lines++;
    if (lines === 0) continue;
    const panes = gaps(rows).length * gaps(columns).length;
    if (panes < 2) continue;
    const score = (colour === background ? 0 : 1000) + lines;
    if (score > bestScore) {
      bestScore = score;
      best = { colour, rows, columns };
    }
  }
  return best;
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
      for (let r = 0; r < h; r++) out.set(cells.subarray((top + r) * width + left, (top + r) * width + right), r * w);
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
