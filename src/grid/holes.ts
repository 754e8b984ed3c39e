/**
 * Holes: regions of cells that belong to no object (EMPTY in a shape, or the background in a
 * grid) which cannot reach the outer border through edge steps; counting them, taking them as
 * objects, filling them.
 */
import { backgroundColour, components } from './components.ts';
import type { GridObject } from './grid-object.ts';
import { EMPTY, Grid, newCells, copyCells } from './grid.ts';
import { WorkArray } from './work-array.ts';

/** Marks cells that are in no region; never a colour and never EMPTY. */
const OUTSIDE = 10;

/**
 * A flood through edge steps over a height × width array of marks: from the first `tail` cells
 * in `queue` (already marked), every cell reached through cells marked `from` is marked `to`.
 */
function spread(mark: Uint8Array, height: number, width: number, queue: Int32Array, tail: number, from: number, to: number): void {
  let head = 0;
  while (head < tail) {
    const i = queue[head++]!;
    const r = (i / width) | 0;
    const c = i - r * width;
    if (r > 0 && mark[i - width] === from) (mark[i - width] = to), (queue[tail++] = i - width);
    if (r < height - 1 && mark[i + width] === from) (mark[i + width] = to), (queue[tail++] = i + width);
    if (c > 0 && mark[i - 1] === from) (mark[i - 1] = to), (queue[tail++] = i - 1);
    if (c < width - 1 && mark[i + 1] === from) (mark[i + 1] = to), (queue[tail++] = i + 1);
  }
}

/** Work arrays for the flood fills below. */
const enclosedQueue = new WorkArray(Int32Array);
const regionQueue = new WorkArray(Int32Array);
const markWork = new WorkArray(Uint8Array);

/**
 * Marks, in a new array, the cells of colour `open` that are enclosed: not connected to the
 * border by edge steps through cells of that colour (1 = enclosed).
 */
export function enclosedCells(grid: Grid, open: number): Uint8Array {
  const mark = newCells(grid.height * grid.width);
  markEnclosed(grid.height, grid.width, grid.cells, open, mark);
  return mark;
}

/**
 * Marks in `mark` (at least as long as the cells; the rest is left alone) the cells of colour
 * `open` that are enclosed (1) and every other cell (0); returns how many are enclosed.
 */
function markEnclosed(height: number, width: number, cells: Uint8Array, open: number, mark: Uint8Array): number {
  const n = cells.length;
  // 0 = not open, 1 = open and enclosed (so far), 2 = open and reached from the border
  const queue = enclosedQueue.take(n);
  let tail = 0;
  for (let i = 0; i < n; i++) {
    if (cells[i] !== open) {
      mark[i] = 0;
      continue;
    }
    mark[i] = 1;
    const r = (i / width) | 0;
    const c = i - r * width;
    if (r === 0 || c === 0 || r === height - 1 || c === width - 1) {
      mark[i] = 2;
      queue[tail++] = i;
    }
  }
  spread(mark, height, width, queue, tail, 1, 2);
  let enclosed = 0;
  for (let i = 0; i < n; i++) {
    if (mark[i] === 1) enclosed++;
    else mark[i] = 0;
  }
  return enclosed;
}

/** How many separate enclosed regions (edge-connected) of colour `open` the grid has. */
export function countEnclosedRegions(grid: Grid, open: number): number {
  return regionsEnclosed(grid.height, grid.width, grid.cells, open);
}

/** How many separate enclosed regions (edge-connected) of colour `open` the cells have. */
function regionsEnclosed(height: number, width: number, cells: Uint8Array, open: number): number {
  const mark = markWork.take(cells.length);
  if (markEnclosed(height, width, cells, open, mark) === 0) return 0;
  const queue = regionQueue.take(cells.length);
  let regions = 0;
  for (let start = 0; start < cells.length; start++) {
    if (mark[start] !== 1) continue;
    regions++;
    mark[start] = 0;
    queue[0] = start;
    spread(mark, height, width, queue, 1, 1, 0);
  }
  return regions;
}

/** Regions of background cells (edge neighbours) that cannot reach the border, in reading order. */
export function enclosedRegions(grid: Grid): readonly GridObject[] {
  const background = backgroundColour(grid);
  const n = grid.height * grid.width;
  const enclosed = markWork.take(n);
  if (markEnclosed(grid.height, grid.width, grid.cells, background, enclosed) === 0) return [];
  const cells = newCells(n);
  for (let i = 0; i < n; i++) cells[i] = enclosed[i] ? background : OUTSIDE;
  return components(new Grid(grid.height, grid.width, cells), { diagonal: false, multicolour: false, background: OUTSIDE });
}

/** Background cells that cannot reach the border through background cells (edge steps) take the colour. */
export function fillEnclosed(g: Grid, colour: number): Grid {
  const background = backgroundColour(g);
  if (colour === background) return g;
  const cells = g.cells;
  const enclosed = markWork.take(cells.length);
  // Nothing enclosed: the grid itself, not a copy.
  if (markEnclosed(g.height, g.width, cells, background, enclosed) === 0) return g;
  const out = copyCells(cells);
  for (let i = 0; i < out.length; i++) if (enclosed[i]) out[i] = colour;
  return new Grid(g.height, g.width, out);
}

/**
 * The object's holes as marks over its box (1 = a cell of no object that cannot reach the box's
 * edge by edge steps through such cells) with how many there are. The marks lie in a work array
 * that the next call to this module reuses: read them before.
 */
export function holeMarks(o: GridObject): { readonly marks: Uint8Array; readonly count: number } {
  const marks = markWork.take(o.height * o.width);
  const count = markEnclosed(o.height, o.width, o.cells, EMPTY, marks);
  return { marks, count };
}

/** How many separate gaps the object closes in: regions of its box, not its cells, that cannot reach the box's edge. */
export function holeCount(o: GridObject): number {
  return regionsEnclosed(o.height, o.width, o.cells, EMPTY);
}
