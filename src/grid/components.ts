/**
 * Connected regions of a grid: the cells reachable from each other through neighbours
 * (4 = edges only, 8 = edges and corners), either of one colour or of any non-background
 * colour.
 */
import { EMPTY, Grid, newCells, pinCells } from './grid.ts';
import { GridObject } from './grid-object.ts';
import { backgroundOfCounts } from './most-frequent-colour.ts';

export interface ComponentOptions {
  readonly diagonal: boolean;
  /** true: one object may hold several colours; false: each object is one colour. */
  readonly multicolour: boolean;
  /** Cells of this colour belong to no object; -1 keeps every cell. */
  readonly background: number;
}

/**
 * Bytes of analyses memoised on grids since the process started (components and colour
 * counts), so that a memory budget can count what the caches hold.
 */
let analysisBytes = 0;

export function analysisBytesSoFar(): number {
  return analysisBytes;
}

/** Objects in reading order of their first cell (top row first, then left). Callers must not change the list. */
export function components(grid: Grid, options: ComponentOptions): readonly GridObject[] {
  const key = (options.diagonal ? 1 : 0) | (options.multicolour ? 2 : 0) | ((options.background + 2) << 2);
  // Kept with the grid: the search asks for the same grid's objects many times (each
  // extractor, and primitives that work object by object).
  let forGrid = grid.componentsMemo;
  if (forGrid) for (let i = 0; i < forGrid.length; i += 2) if (forGrid[i] === key) return forGrid[i + 1] as readonly GridObject[];
  const found = computeComponents(grid, options);
  // The objects' cells stay with the grid (see cellsRewind).
  pinCells();
  analysisBytes += 96 + 8 * found.length;
  for (const o of found) analysisBytes += 200 + o.cells.length;
  // A literal of two holds exactly two (an empty list's first push would make room for 17).
  if (!forGrid) grid.componentsMemo = [key, found];
  else forGrid.push(key, found);
  return found;
}

/**
 * Work buffers shared by every call (the search calls this very often; allocation shows): seen
 * marks, and the queue's cells with their rows and columns (kept beside each cell, not worked
 * out again by a division per cell).
 */
let seenBuffer = new Uint8Array(0);
let queueBuffer = new Int32Array(0);
let rowBuffer = new Int32Array(0);
let columnBuffer = new Int32Array(0);
const objectBuffer: (GridObject | undefined)[] = [];

function computeComponents(grid: Grid, options: ComponentOptions): GridObject[] {
  const { height, width, cells } = grid;
  if (seenBuffer.length < cells.length) {
    seenBuffer = new Uint8Array(cells.length);
    queueBuffer = new Int32Array(cells.length);
    rowBuffer = new Int32Array(cells.length);
    columnBuffer = new Int32Array(cells.length);
  }
  const seen = seenBuffer;
  const queue = queueBuffer;
  const rows = rowBuffer;
  const columns = columnBuffer;
  seen.fill(0, 0, cells.length);
  // Objects are gathered in a list kept for every call and copied out at their exact count: the
  // list is kept with the grid, and one grown by pushing holds room for 17 however few there are.
  const objects = objectBuffer;
  let count = 0;
  const { background, multicolour, diagonal } = options;
  const lastRow = height - 1;
  const lastColumn = width - 1;
  for (let start = 0; start < cells.length; start++) {
    if (seen[start] || cells[start] === background) continue;
    const colour = cells[start]!;
    let head = 0;
    let tail = 1;
    const startRow = (start / width) | 0;
    queue[0] = start;
    rows[0] = startRow;
    columns[0] = start - startRow * width;
    seen[start] = 1;
    let top = height, left = width, bottom = -1, right = -1;
    while (head < tail) {
      const index = queue[head]!;
      const r = rows[head]!;
      const c = columns[head]!;
      head++;
      if (r < top) top = r;
      if (r > bottom) bottom = r;
      if (c < left) left = c;
      if (c > right) right = c;
      const up = r > 0;
      const down = r < lastRow;
      const leftOpen = c > 0;
      const rightOpen = c < lastColumn;
      // A closure per object would cost an allocation (and a name helper under tsx) each time.
      if (up) tail = join(index - width, r - 1, c, cells, seen, queue, rows, columns, tail, background, multicolour, colour);
      if (down) tail = join(index + width, r + 1, c, cells, seen, queue, rows, columns, tail, background, multicolour, colour);
      if (leftOpen) tail = join(index - 1, r, c - 1, cells, seen, queue, rows, columns, tail, background, multicolour, colour);
      if (rightOpen) tail = join(index + 1, r, c + 1, cells, seen, queue, rows, columns, tail, background, multicolour, colour);
      if (diagonal) {
        if (up && leftOpen) tail = join(index - width - 1, r - 1, c - 1, cells, seen, queue, rows, columns, tail, background, multicolour, colour);
        if (up && rightOpen) tail = join(index - width + 1, r - 1, c + 1, cells, seen, queue, rows, columns, tail, background, multicolour, colour);
        if (down && leftOpen) tail = join(index + width - 1, r + 1, c - 1, cells, seen, queue, rows, columns, tail, background, multicolour, colour);
        if (down && rightOpen) tail = join(index + width + 1, r + 1, c + 1, cells, seen, queue, rows, columns, tail, background, multicolour, colour);
      }
    }
    const h = bottom - top + 1;
    const w = right - left + 1;
    const shape = newCells(h * w).fill(EMPTY);
    for (let i = 0; i < tail; i++) shape[(rows[i]! - top) * w + (columns[i]! - left)] = cells[queue[i]!]!;
    objects[count++] = new GridObject(top, left, h, w, shape, tail);
  }
  const found = objects.slice(0, count);
  objects.fill(undefined, 0, count);
  return found as GridObject[];
}

/**
 * Visits neighbour n (at row nr, column nc) of a growing object: it joins (queued with its row
 * and column, marked seen) when unseen, not background and, for one-colour objects, of the
 * object's colour. Returns the queue's new end.
 */
function join(n: number, nr: number, nc: number, cells: Uint8Array, seen: Uint8Array, queue: Int32Array, rows: Int32Array, columns: Int32Array, tail: number, background: number, multicolour: boolean, colour: number): number {
  if (seen[n]) return tail;
  const v = cells[n]!;
  if (v === background || (!multicolour && v !== colour)) return tail;
  seen[n] = 1;
  queue[tail] = n;
  rows[tail] = nr;
  columns[tail] = nc;
  return tail + 1;
}

/** Counts of each colour 0–9, computed once per grid; callers must not change the array. */
export function colourCounts(grid: Grid): Uint32Array {
  if (grid.colourCountsMemo) return grid.colourCountsMemo;
  const counts = (grid.colourCountsMemo = new Uint32Array(10));
  analysisBytes += 112;
  const cells = grid.cells;
  for (let i = 0; i < cells.length; i++) {
    const v = cells[i]!;
    if (v < 10) counts[v]!++;
  }
  return counts;
}

/**
 * The background colour: 0 whenever the grid holds any cell of colour 0 (puzzles draw on 0
 * far more often than not, and a dense small picture can have more drawn cells than empty
 * ones); otherwise the most frequent colour, the lowest on ties.
 */
export function backgroundColour(grid: Grid): number {
  if (grid.backgroundMemo >= 0) return grid.backgroundMemo;
  return (grid.backgroundMemo = backgroundOfCounts(colourCounts(grid)));
}
