/**
 * Removing drawn cells judged by their four edge neighbours: the inside of solid shapes
 * (leaving outlines), and cells with too few neighbours of their own colour (specks and loose
 * ends).
 */
import { backgroundColour } from './components.ts';
import { Grid, copyCells } from './grid.ts';

/** Non-background cells whose four edge neighbours are all inside the grid and non-background become background. */
export function hollow(g: Grid): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = copyCells(cells);
  for (let r = 1; r < height - 1; r++) {
    for (let c = 1; c < width - 1; c++) {
      const i = r * width + c;
      if (cells[i] === background) continue;
      if (cells[i - 1] !== background && cells[i + 1] !== background && cells[i - width] !== background && cells[i + width] !== background) {
        out[i] = background;
      }
    }
  }
  return new Grid(height, width, out);
}

/** Non-background cells with fewer than two edge neighbours of their own colour become background. */
export function removeLonelyCells(g: Grid): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = copyCells(cells);
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const i = r * width + c;
      const v = cells[i]!;
      if (v === background) continue;
      let same = 0;
      if (r > 0 && cells[i - width] === v) same++;
      if (r < height - 1 && cells[i + width] === v) same++;
      if (c > 0 && cells[i - 1] === v) same++;
      if (c < width - 1 && cells[i + 1] === v) same++;
      if (same < 2) out[i] = background;
    }
  }
  return new Grid(height, width, out);
}
