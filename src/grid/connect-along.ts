/**
 * Joining same-coloured cells along one direction only: in every row (or every column) the
 * background gap between two neighbouring non-background cells of the same colour takes a
 * colour.
 */
import { backgroundColour } from './components.ts';
import { Grid } from './grid.ts';

export function connectAlong(g: Grid, colour: number, alongRows: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  const lines = alongRows ? height : width;
  const length = alongRows ? width : height;
  const step = alongRows ? 1 : width;
  let changed = false;
  for (let line = 0; line < lines; line++) {
    const start = alongRows ? line * width : line;
    let last = -1;
    for (let k = 0; k < length; k++) {
      const v = cells[start + k * step]!;
      if (v === background) continue;
      if (last >= 0 && k > last + 1 && cells[start + last * step] === v) {
        for (let m = last + 1; m < k; m++) out[start + m * step] = colour;
        changed = true;
      }
      last = k;
    }
  }
  return changed ? new Grid(height, width, out) : g;
}
