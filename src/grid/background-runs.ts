/**
 * The runs of background cells along the rows or the columns of a grid, each with the colours
 * that bound it, painted: the one walk behind rays (a run takes the colour behind or ahead of
 * it) and connections (a run between two cells of one colour takes a colour).
 */
import type { Grid } from './grid.ts';

/** Which runs take a colour, and which: the colour behind a run, the colour ahead of it, or (between) a run bounded on both sides by one colour. */
export type RunPaint = 'behind' | 'ahead' | 'between';

/**
 * Walks every row (`alongRows`) or every column, left to right or top to bottom, and paints in
 * `out` (the grid's cells or a copy of them) the runs of background cells that `way` chooses:
 * with `colour`, or with the bounding colour when `colour` is -1. A cell already changed in
 * `out` (no longer background) is left as it is. Returns how many cells were painted.
 *
 * No callback per run: under tsx every closure made in a call costs a name helper, and the
 * search calls these millions of times.
 */
export function paintBackgroundRuns(g: Grid, background: number, alongRows: boolean, way: RunPaint, colour: number, out: Uint8Array): number {
  const { height, width, cells } = g;
  const lines = alongRows ? height : width;
  const length = alongRows ? width : height;
  const step = alongRows ? 1 : width;
  let painted = 0;
  for (let line = 0; line < lines; line++) {
    const start = alongRows ? line * width : line;
    let before = -1;
    let runStart = 0;
    for (let k = 0; k <= length; k++) {
      const v = k < length ? cells[start + k * step]! : -1;
      if (v === background) continue;
      if (k > runStart) {
        const bound = way === 'behind' ? before : way === 'ahead' ? v : before === v ? v : -1;
        if (bound >= 0) {
          const paint = colour >= 0 ? colour : bound;
          for (let i = start + runStart * step, end = start + k * step; i < end; i += step) {
            if (out[i] !== background) continue;
            out[i] = paint;
            painted++;
          }
        }
      }
      before = v;
      runStart = k + 1;
    }
  }
  return painted;
}
