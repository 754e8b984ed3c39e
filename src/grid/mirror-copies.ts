/**
 * Mirrored copies: a grid followed by its mirror image to the right, below, or both (a
 * kaleidoscope), and a square grid with its quarter turns around it.
 */
import { Grid, shapeAllowed, newCells, copyRun } from './grid.ts';
import { rotateClockwise, rotateCounterclockwise, rotateHalf } from './rotate-reflect.ts';

/**
 * The grid extended by its mirror images: to the right when `columnsTwice`, below when
 * `rowsTwice` (both: the 2×2 kaleidoscope); null when the result would pass the size cap.
 */
export function mirrorCopies(g: Grid, rowsTwice: boolean, columnsTwice: boolean): Grid | null {
  const { height, width, cells } = g;
  const outHeight = rowsTwice ? height * 2 : height;
  const outWidth = columnsTwice ? width * 2 : width;
  if (!shapeAllowed(outHeight, outWidth)) return null;
  const out = newCells(outHeight * outWidth);
  for (let r = 0; r < outHeight; r++) {
    const sr = r < height ? r : 2 * height - 1 - r;
    for (let c = 0; c < outWidth; c++) {
      const sc = c < width ? c : 2 * width - 1 - c;
      out[r * outWidth + c] = cells[sr * width + sc]!;
    }
  }
  return new Grid(outHeight, outWidth, out);
}

/**
 * A square grid and its quarter turns in a 2×2 layout, turning clockwise around the centre:
 * the grid top-left, its clockwise quarter turn top-right, its half turn bottom-right and its
 * counterclockwise quarter turn bottom-left. The result looks the same after a quarter turn.
 * Null unless the grid is square and twice its size fits the size cap.
 */
export function fourRotationsSquare(g: Grid): Grid | null {
  const n = g.height;
  if (g.width !== n || !shapeAllowed(2 * n, 2 * n)) return null;
  const quadrants = [g, rotateClockwise(g), rotateCounterclockwise(g), rotateHalf(g)];
  const size = 2 * n;
  const out = newCells(size * size);
  for (let q = 0; q < 4; q++) {
    const cells = quadrants[q]!.cells;
    const top = q >= 2 ? n : 0;
    const left = q % 2 === 1 ? n : 0;
    for (let r = 0; r < n; r++) copyRun(cells, r * n, out, (top + r) * size + left, n);
  }
  return new Grid(size, size, out);
}
