/**
 * Marks beside the cells of one colour: background cells that touch such a cell through an
 * edge, or through a corner only, take a colour.
 */
import { backgroundColour } from './components.ts';
import { Grid } from './grid.ts';

const EDGE_STEPS = [-1, 0, 1, 0, 0, -1, 0, 1];
const CORNER_STEPS = [-1, -1, -1, 1, 1, -1, 1, 1];

/** Background cells beside a cell of `source` (by edges, or by corners when `corners`) take `colour`. */
export function markNeighbours(g: Grid, source: number, colour: number, corners: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const steps = corners ? CORNER_STEPS : EDGE_STEPS;
  const out = cells.slice();
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      if (cells[r * width + c] !== source) continue;
      for (let k = 0; k < 8; k += 2) {
        const nr = r + steps[k]!;
        const nc = c + steps[k + 1]!;
        if (nr < 0 || nr >= height || nc < 0 || nc >= width) continue;
        const i = nr * width + nc;
        if (cells[i] === background) out[i] = colour;
      }
    }
  }
  return new Grid(height, width, out);
}
