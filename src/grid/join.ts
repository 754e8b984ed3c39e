/** Joining two grids side by side or one above the other. */
import { Grid, shapeAllowed, newCells, copyRun } from './grid.ts';

/** The second grid placed right of the first; null unless their heights match and the result fits the size cap. */
export function joinRight(a: Grid, b: Grid): Grid | null {
  if (a.height !== b.height || !shapeAllowed(a.height, a.width + b.width)) return null;
  const width = a.width + b.width;
  const out = newCells(a.height * width);
  for (let r = 0; r < a.height; r++) {
    copyRun(a.data, a.offset + r * a.width, out, r * width, a.width);
    copyRun(b.data, b.offset + r * b.width, out, r * width + a.width, b.width);
  }
  return new Grid(a.height, width, out);
}

/** The second grid placed below the first; null unless their widths match and the result fits the size cap. */
export function joinBelow(a: Grid, b: Grid): Grid | null {
  if (a.width !== b.width || !shapeAllowed(a.height + b.height, a.width)) return null;
  const top = a.cells;
  const out = newCells(top.length + b.height * b.width);
  out.set(top, 0);
  out.set(b.cells, top.length);
  return new Grid(a.height + b.height, a.width, out);
}
