/** Merging repeated lines: each run of identical neighbouring rows, then columns, becomes one. */
import { Grid, newCells } from './grid.ts';

/** Runs of equal neighbouring rows become one row, then the same for columns. */
export function mergeRepeatedLines(g: Grid): Grid {
  const { height, width, cells } = g;
  const keptRows: number[] = [0];
  for (let r = 1; r < height; r++) {
    let same = true;
    for (let c = 0; c < width && same; c++) if (cells[r * width + c] !== cells[(r - 1) * width + c]) same = false;
    if (!same) keptRows.push(r);
  }
  const keptColumns: number[] = [0];
  for (let c = 1; c < width; c++) {
    let same = true;
    for (let r = 0; r < height && same; r++) if (cells[r * width + c] !== cells[r * width + c - 1]) same = false;
    if (!same) keptColumns.push(c);
  }
  if (keptRows.length === height && keptColumns.length === width) return g;
  const out = newCells(keptRows.length * keptColumns.length);
  let i = 0;
  for (const r of keptRows) for (const c of keptColumns) out[i++] = cells[r * width + c]!;
  return new Grid(keptRows.length, keptColumns.length, out);
}
