/**
 * Cutting rectangles out of grids: the bounds of the cells that match a colour test, the copy of
 * a rectangle that lies inside a grid, and the cuts built on them (to content, to a colour, to
 * an object's box, a given region, a half, the inside of the border); and keeping one middle
 * line in place.
 */
import { backgroundColour } from './components.ts';
import type { GridObject } from './grid-object.ts';
import { EMPTY, Grid, shapeAllowed, newCells, copyRun, fillCells } from './grid.ts';

/** An inclusive rectangle of cells: rows top..bottom, columns left..right. */
export interface Bounds {
  readonly top: number;
  readonly left: number;
  readonly bottom: number;
  readonly right: number;
}

/**
 * The smallest rectangle holding every cell whose colour is `colour` (when `match` is true)
 * or is not `colour` (when `match` is false); undefined when no cell qualifies.
 */
export function cellBounds(grid: Grid, colour: number, match: boolean): Bounds | undefined {
  const { height, width, cells } = grid;
  // Each side is found by scanning in from it, stopping at the first line that has such a cell:
  // most grids have one near every edge, so few cells are read.
  let top = 0;
  while (top < height && !rowHas(cells, top * width, width, colour, match)) top++;
  if (top === height) return undefined;
  let bottom = height - 1;
  while (bottom > top && !rowHas(cells, bottom * width, width, colour, match)) bottom--;
  let left = 0;
  while (!columnHas(cells, left, width, top, bottom, colour, match)) left++;
  let right = width - 1;
  while (right > left && !columnHas(cells, right, width, top, bottom, colour, match)) right--;
  return { top, left, bottom, right };
}

/** True when the row starting at `base` has a cell that is (`match`) or is not the colour. */
function rowHas(cells: Uint8Array, base: number, width: number, colour: number, match: boolean): boolean {
  for (let c = 0; c < width; c++) if ((cells[base + c] === colour) === match) return true;
  return false;
}

/** True when column `column`, rows top..bottom, has a cell that is (`match`) or is not the colour. */
function columnHas(cells: Uint8Array, column: number, width: number, top: number, bottom: number, colour: number, match: boolean): boolean {
  for (let r = top; r <= bottom; r++) if ((cells[r * width + column] === colour) === match) return true;
  return false;
}

/** Copies the rectangle at (top, left) of the given size; the caller keeps it inside the grid. */
export function cropGrid(grid: Grid, top: number, left: number, height: number, width: number): Grid {
  if (top === 0 && left === 0 && height === grid.height && width === grid.width) return grid;
  const cells = newCells(height * width);
  const source = grid.data;
  for (let r = 0; r < height; r++) {
    const from = grid.offset + (top + r) * grid.width + left;
    copyRun(source, from, cells, r * width, width);
  }
  return new Grid(height, width, cells);
}

/** The bounding box of the cells that are (`match`) or are not (not `match`) of the colour; null when there is none. */
export function cropToCells(g: Grid, colour: number, match: boolean): Grid | null {
  return cropToBounds(g, cellBounds(g, colour, match));
}

function cropToBounds(g: Grid, b: Bounds | undefined): Grid | null {
  return b ? cropGrid(g, b.top, b.left, b.bottom - b.top + 1, b.right - b.left + 1) : null;
}

/**
 * The cells of `g` under the bounding box of every cell of the colour in `marks` (a grid of the
 * same size); null when the sizes differ or `marks` has no such cell.
 */
export function cropToColourIn(g: Grid, marks: Grid, colour: number): Grid | null {
  if (g.height !== marks.height || g.width !== marks.width) return null;
  return cropToBounds(g, cellBounds(marks, colour, true));
}

/** The part of the grid under the object's bounding box (clipped to the grid); null when the box misses the grid. */
export function cropToObject(g: Grid, o: GridObject): Grid | null {
  const top = Math.max(0, o.top);
  const left = Math.max(0, o.left);
  const bottom = Math.min(g.height, o.top + o.height);
  const right = Math.min(g.width, o.left + o.width);
  if (bottom <= top || right <= left) return null;
  return cropGrid(g, top, left, bottom - top, right - left);
}

/** The object's own cells on a background of colour 0, the size of its bounding box. */
export function objectPicture(o: GridObject): Grid {
  const source = o.cells;
  const cells = newCells(source.length);
  for (let i = 0; i < source.length; i++) cells[i] = source[i] === EMPTY ? 0 : source[i]!;
  return new Grid(o.height, o.width, cells);
}

/** The rectangle at (top, left) of the given size; null unless it is a whole rectangle inside the grid. */
export function cropRegion(g: Grid, top: number, left: number, height: number, width: number): Grid | null {
  if (!shapeAllowed(height, width) || top < 0 || left < 0 || top + height > g.height || left + width > g.width) return null;
  return cropGrid(g, top, left, height, width);
}

/** The grid without its outermost ring of cells; null when it has fewer than 3 rows or columns. */
export function removeBorder(g: Grid): Grid | null {
  return g.height < 3 || g.width < 3 ? null : cropGrid(g, 1, 1, g.height - 2, g.width - 2);
}

/**
 * One half of the grid: the top or bottom half of the rows, the left or right half of the
 * columns; an odd middle line belongs to neither. Null when the grid has a single line that way.
 */
export function half(g: Grid, side: 'top' | 'bottom' | 'left' | 'right'): Grid | null {
  const rows = side === 'top' || side === 'bottom';
  const size = (rows ? g.height : g.width) >> 1;
  if (size < 1) return null;
  if (side === 'top') return cropGrid(g, 0, 0, size, g.width);
  if (side === 'bottom') return cropGrid(g, g.height - size, 0, size, g.width);
  if (side === 'left') return cropGrid(g, 0, 0, g.height, size);
  return cropGrid(g, 0, g.width - size, g.height, size);
}

/**
 * Only the middle column (`column`) or row of an odd width (height) keeps its cells; every other
 * cell becomes the background, and the grid keeps its size. Null for an even width (height).
 */
export function keepMiddleLine(g: Grid, column: boolean): Grid | null {
  const { height, width, cells } = g;
  const length = column ? width : height;
  if (length % 2 === 0) return null;
  const middle = (length - 1) / 2;
  const out = fillCells(newCells(cells.length), backgroundColour(g));
  if (column) for (let r = 0; r < height; r++) out[r * width + middle] = cells[r * width + middle]!;
  else copyRun(cells, middle * width, out, middle * width, width);
  return new Grid(height, width, out);
}
