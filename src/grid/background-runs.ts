/**
 * The runs of background cells along the rows or the columns of a grid, each with the colours
 * that bound it: the one walk behind rays (a run takes the colour behind it) and connections
 * (a run between two cells of one colour takes a colour).
 */
import type { Grid } from './grid.ts';

/**
 * Called for one run of background cells: its cells are `first + k * step` (indices into the
 * grid's cells) for k from 0 to `length - 1`; `before` and `after` are the colours of the cells
 * just before and just after it along the line, -1 at the grid's edge.
 */
export type BackgroundRunVisitor = (first: number, step: number, length: number, before: number, after: number) => void;

/** Walks every row (`alongRows`) or every column, left to right or top to bottom, and visits each run of background cells. */
export function forEachBackgroundRun(g: Grid, background: number, alongRows: boolean, visit: BackgroundRunVisitor): void {
  const { height, width, cells } = g;
  const lines = alongRows ? height : width;
  const length = alongRows ? width : height;
  const step = alongRows ? 1 : width;
  for (let line = 0; line < lines; line++) {
    const start = alongRows ? line * width : line;
    let before = -1;
    let runStart = 0;
    for (let k = 0; k <= length; k++) {
      const v = k < length ? cells[start + k * step]! : -1;
      if (v === background) continue;
      if (k > runStart) visit(start + runStart * step, step, k - runStart, before, v);
      before = v;
      runStart = k + 1;
    }
  }
}
