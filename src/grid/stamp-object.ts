/**
 * Stamping a template object onto markers: every region of a marker colour (cells joined
 * through edges or corners) is cleared and the template is drawn centred on it.
 */
import type { GridObject } from './grid-object.ts';
import { backgroundColour, components } from './components.ts';
import { EMPTY, Grid, copyCells } from './grid.ts';
import { firstCellColour } from './objects-around-colour.ts';

export function stampObjectOnColour(g: Grid, template: GridObject, colour: number): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  if (colour === background) return g;
  const markers = components(g, { diagonal: true, multicolour: false, background }).filter((o) => firstCellColour(o) === colour);
  if (markers.length === 0) return g;
  const out = copyCells(cells);
  for (const m of markers) {
    for (let r = 0; r < m.height; r++) {
      for (let c = 0; c < m.width; c++) {
        if (m.data[m.offset + r * m.width + c] !== EMPTY) out[(m.top + r) * width + m.left + c] = background;
      }
    }
  }
  for (const m of markers) {
    // Centres of the two bounding boxes meet; odd differences round toward the top left.
    const top = m.top + Math.floor((m.height - template.height) / 2);
    const left = m.left + Math.floor((m.width - template.width) / 2);
    for (let r = 0; r < template.height; r++) {
      const row = top + r;
      if (row < 0 || row >= height) continue;
      for (let c = 0; c < template.width; c++) {
        const column = left + c;
        if (column < 0 || column >= width) continue;
        const v = template.data[template.offset + r * template.width + c]!;
        if (v !== EMPTY) out[row * width + column] = v;
      }
    }
  }
  return new Grid(height, width, out);
}
