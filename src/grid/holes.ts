/**
 * Holes: regions of cells that belong to no object (EMPTY in a shape, or the background in a
 * grid) which cannot reach the outer border through edge steps.
 */
import { Grid } from './grid.ts';

/**
 * Marks, in a new array, the cells of colour `open` that are enclosed: not connected to the
 * border by edge steps through cells of that colour (1 = enclosed).
 */
export function enclosedCells(grid: Grid, open: number): Uint8Array {
  const { height, width, cells } = grid;
  const n = cells.length;
  // 0 = not open, 1 = open and enclosed (so far), 2 = open and reached from the border
  const mark = new Uint8Array(n);
  const queue = new Int32Array(n);
  let tail = 0;
  for (let i = 0; i < n; i++) {
    if (cells[i] !== open) continue;
    mark[i] = 1;
    const r = (i / width) | 0;
    const c = i - r * width;
    if (r === 0 || c === 0 || r === height - 1 || c === width - 1) {
      mark[i] = 2;
      queue[tail++] = i;
    }
  }
  let head = 0;
  while (head < tail) {
    const i = queue[head++]!;
    const r = (i / width) | 0;
    const c = i - r * width;
    if (r > 0 && mark[i - width] === 1) { mark[i - width] = 2; queue[tail++] = i - width; }
    if (r < height - 1 && mark[i + width] === 1) { mark[i + width] = 2; queue[tail++] = i + width; }
    if (c > 0 && mark[i - 1] === 1) { mark[i - 1] = 2; queue[tail++] = i - 1; }
    if (c < width - 1 && mark[i + 1] === 1) { mark[i + 1] = 2; queue[tail++] = i + 1; }
  }
  for (let i = 0; i < n; i++) mark[i] = mark[i] === 1 ? 1 : 0;
  return mark;
}

/** How many separate enclosed regions (edge-connected) of colour `open` the grid has. */
export function countEnclosedRegions(grid: Grid, open: number): number {
  const { height, width } = grid;
  const mark = enclosedCells(grid, open);
  const queue = new Int32Array(mark.length);
  let regions = 0;
  for (let start = 0; start < mark.length; start++) {
    if (mark[start] !== 1) continue;
    regions++;
    mark[start] = 0;
    let head = 0;
    let tail = 0;
    queue[tail++] = start;
    while (head < tail) {
      const i = queue[head++]!;
      const r = (i / width) | 0;
      const c = i - r * width;
      if (r > 0 && mark[i - width] === 1) { mark[i - width] = 0; queue[tail++] = i - width; }
      if (r < height - 1 && mark[i + width] === 1) { mark[i + width] = 0; queue[tail++] = i + width; }
      if (c > 0 && mark[i - 1] === 1) { mark[i - 1] = 0; queue[tail++] = i - 1; }
      if (c < width - 1 && mark[i + 1] === 1) { mark[i + 1] = 0; queue[tail++] = i + 1; }
    }
  }
  return regions;
}
