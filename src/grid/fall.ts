/** Gravity on single cells: the drawn cells of every row or column slide to one end, in their order. */
import { backgroundColour } from './components.ts';
import { Grid, newCells, fillCells } from './grid.ts';

/**
 * Gravity on single cells: along every column (or row) the non-background cells slide to
 * the end (towardsEnd) or the start, in their order.
 */
export function fall(g: Grid, alongColumns: boolean, towardsEnd: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = fillCells(newCells(height * width), background);
  const lines = alongColumns ? width : height;
  const length = alongColumns ? height : width;
  const step = alongColumns ? width : 1;
  for (let line = 0; line < lines; line++) {
    const start = alongColumns ? line : line * width;
    if (towardsEnd) {
      let write = length - 1;
      for (let i = length - 1; i >= 0; i--) {
        const v = cells[start + i * step]!;
        if (v !== background) out[start + write-- * step] = v;
      }
    } else {
      let write = 0;
      for (let i = 0; i < length; i++) {
        const v = cells[start + i * step]!;
        if (v !== background) out[start + write++ * step] = v;
      }
    }
  }
  return new Grid(height, width, out);
}
