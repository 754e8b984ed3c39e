/**
 * Connected regions of a grid: the cells reachable from each other through neighbours
 * (4 = edges only, 8 = edges and corners), either of one colour or of any non-background
 * colour.
 */
import { EMPTY, Grid, newCells, pinCells, fillCells } from './grid.ts';
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
  const key = optionKey(options.diagonal, options.multicolour, options.background);
  // Kept with the grid: the search asks for the same grid's objects many times (each
  // extractor, and primitives that work object by object).
  const forGrid = grid.componentsMemo;
  const kept = memoised(forGrid, key);
  if (kept) return kept;
  let found = forGrid ? sameAsSimplerCut(grid, forGrid, options) : undefined;
  if (found) {
    analysisBytes += 32;
  } else {
    found = computeComponents(grid, options);
    // The objects' cells stay with the grid (see cellsRewind).
    pinCells();
    analysisBytes += 96 + 8 * found.length;
    for (const o of found) analysisBytes += 200 + o.height * o.width;
  }
  // A literal of two holds exactly two (an empty list's first push would make room for 17).
  if (!forGrid) grid.componentsMemo = [key, found];
  else forGrid.push(key, found);
  return found;
}

function optionKey(diagonal: boolean, multicolour: boolean, background: number): number {
  return (diagonal ? 1 : 0) | (multicolour ? 2 : 0) | ((background + 2) << 2);
}

function memoised(forGrid: readonly unknown[] | undefined, key: number): readonly GridObject[] | undefined {
  if (forGrid) for (let i = 0; i < forGrid.length; i += 2) if (forGrid[i] === key) return forGrid[i + 1] as readonly GridObject[];
  return undefined;
}

/**
 * The very list of a simpler cut of the grid already made, when a scan of the cells shows that
 * this cut gives the same objects: joining through corners changes nothing when every two cells
 * that touch only at a corner and would join also share an edge neighbour that joins them
 * ({@link cornersAddNothing}); letting an object hold several colours changes nothing when no two
 * neighbouring drawn cells differ in colour ({@link coloursNeverMeet}). Objects keep their reading
 * order either way. Most grids are cut several ways and are cut alike; the scan costs far less
 * than a flood, and the search then finds the two lists equal at once.
 */
function sameAsSimplerCut(grid: Grid, forGrid: readonly unknown[], options: ComponentOptions): readonly GridObject[] | undefined {
  const { diagonal, multicolour, background } = options;
  if (diagonal) {
    const simpler = memoised(forGrid, optionKey(false, multicolour, background));
    if (simpler && cornersAddNothing(grid, background, multicolour)) return simpler;
  }
  if (multicolour) {
    const simpler = memoised(forGrid, optionKey(diagonal, false, background));
    if (simpler && coloursNeverMeet(grid, background, diagonal)) return simpler;
  }
  return undefined;
}

/**
 * True when, in every 2×2 window, two cells on a diagonal that would join (neither the background;
 * of one colour unless `multicolour`) have a third cell of the window joining both through edges:
 * then any path through corners has one through edges, and the cuts with and without corners agree.
 */
function cornersAddNothing(grid: Grid, background: number, multicolour: boolean): boolean {
  const { height, width, data, offset } = grid;
  for (let r = 0; r + 1 < height; r++) {
    let i = offset + r * width;
    for (let c = 0; c + 1 < width; c++, i++) {
      const a = data[i]!;
      const b = data[i + 1]!;
      const below = data[i + width]!;
      const d = data[i + width + 1]!;
      if (a !== background && d !== background && (multicolour || a === d)) {
        const bridged = multicolour ? b !== background || below !== background : b === a || below === a;
        if (!bridged) return false;
      }
      if (b !== background && below !== background && (multicolour || b === below)) {
        const bridged = multicolour ? a !== background || d !== background : a === b || d === b;
        if (!bridged) return false;
      }
    }
  }
  return true;
}

/** True when no two neighbouring cells (through edges, and corners when `diagonal`) are both drawn and of different colours. */
function coloursNeverMeet(grid: Grid, background: number, diagonal: boolean): boolean {
  const { height, width, data, offset } = grid;
  for (let r = 0; r < height; r++) {
    const last = r + 1 === height;
    let i = offset + r * width;
    for (let c = 0; c < width; c++, i++) {
      const v = data[i]!;
      if (v === background) continue;
      if (c + 1 < width && differs(v, data[i + 1]!, background)) return false;
      if (last) continue;
      if (differs(v, data[i + width]!, background)) return false;
      if (!diagonal) continue;
      if (c > 0 && differs(v, data[i + width - 1]!, background)) return false;
      if (c + 1 < width && differs(v, data[i + width + 1]!, background)) return false;
    }
  }
  return true;
}

/** A drawn cell `v` beside `w`: true when `w` is drawn too, in another colour. */
function differs(v: number, w: number, background: number): boolean {
  return w !== background && w !== v;
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
  fillCells(seen, 0, 0, cells.length);
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
    const shape = fillCells(newCells(h * w), EMPTY);
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
  if (!grid.colourCountsMemo) {
    // A grid with a cell of colour 0 has background 0 whatever its other counts: found by a scan
    // that mostly stops early, with no count table made and kept for the grid.
    const { data, offset } = grid;
    const end = offset + grid.height * grid.width;
    for (let i = offset; i < end; i++) if (data[i] === 0) return (grid.backgroundMemo = 0);
  }
  return (grid.backgroundMemo = backgroundOfCounts(colourCounts(grid)));
}
