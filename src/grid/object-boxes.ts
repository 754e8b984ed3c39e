/** The bounding boxes of the objects of a grid, filled or framed. */
import { backgroundColour, components } from './components.ts';
import { Grid, copyCells } from './grid.ts';

/**
 * For every object (non-background cells joined through edges and corners, any colours),
 * paints the background cells inside its bounding box (`ring` false) or on the ring one cell
 * outside it (`ring` true) with the colour.
 */
export function paintObjectBoxes(g: Grid, colour: number, ring: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = copyCells(cells);
  for (const o of components(g, { diagonal: true, multicolour: true, background })) {
    const top = ring ? o.top - 1 : o.top;
    const left = ring ? o.left - 1 : o.left;
    const bottom = ring ? o.top + o.height : o.top + o.height - 1;
    const right = ring ? o.left + o.width : o.left + o.width - 1;
    for (let r = Math.max(0, top); r <= Math.min(height - 1, bottom); r++) {
      for (let c = Math.max(0, left); c <= Math.min(width - 1, right); c++) {
        if (ring && r !== top && r !== bottom && c !== left && c !== right) continue;
        const i = r * width + c;
        if (cells[i] === background) out[i] = colour;
      }
    }
  }
  return new Grid(height, width, out);
}
