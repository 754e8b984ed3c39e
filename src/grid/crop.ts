/**
 * Cutting rectangles out of grids: the bounds of the cells that match a colour test, and the
 * copy of a rectangle that lies inside a grid.
 */
import { Grid } from './grid.ts';

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
  let top = height, left = width, bottom = -1, right = -1;
  for (let r = 0; r < height; r++) {
    const base = r * width;
    for (let c = 0; c < width; c++) {
      if ((cells[base + c] === colour) !== match) continue;
      if (r < top) top = r;
      if (r > bottom) bottom = r;
      if (c < left) left = c;
      if (c > right) right = c;
    }
  }
  return bottom < 0 ? undefined : { top, left, bottom, right };
}

/** Copies the rectangle at (top, left) of the given size; the caller keeps it inside the grid. */
export function cropGrid(grid: Grid, top: number, left: number, height: number, width: number): Grid {
  if (top === 0 && left === 0 && height === grid.height && width === grid.width) return grid;
  const cells = new Uint8Array(height * width);
  const source = grid.cells;
  for (let r = 0; r < height; r++) {
    const from = (top + r) * grid.width + left;
    cells.set(source.subarray(from, from + width), r * width);
  }
  return new Grid(height, width, cells);
}
