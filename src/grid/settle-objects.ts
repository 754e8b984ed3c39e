/**
 * Rigid gravity: whole objects move towards a side of the grid, a step at a time, until each
 * touches the border or another object, keeping their shapes.
 */
import { backgroundColour, components } from './components.ts';
import { EMPTY, Grid, newCells } from './grid.ts';
import { paintObjectInto } from './paint-object.ts';

/**
 * Moves every object (non-background cells joined through edges and corners, any colours)
 * in the direction (rowStep, columnStep), one of the four unit steps, until none can move.
 * Objects nearest that side move first.
 */
export function settleObjects(grid: Grid, rowStep: number, columnStep: number): Grid {
  const { height, width } = grid;
  const background = backgroundColour(grid);
  const objects = components(grid, { diagonal: true, multicolour: true, background });
  // How far along the direction each object reaches: larger settles first.
  const reach = objects.map((o) => {
    const r = rowStep > 0 ? o.top + o.height - 1 : rowStep < 0 ? -o.top : 0;
    const c = columnStep > 0 ? o.left + o.width - 1 : columnStep < 0 ? -o.left : 0;
    return r + c;
  });
  const order = objects.map((_, i) => i).sort((a, b) => reach[b]! - reach[a]! || a - b);
  // Objects fall one step at a time, nearest the side first in each round, each blocked by the
  // border and by every other object where it is then: an object whose box reaches past another's
  // cannot pass through it, and no cell is ever covered twice.
  const owner = new Int32Array(height * width);
  const shift = new Int32Array(objects.length);
  const place = (index: number, mark: number): void => {
    const o = objects[index]!;
    const d = shift[index]!;
    for (let r = 0; r < o.height; r++) {
      for (let c = 0; c < o.width; c++) {
        if (o.cells[r * o.width + c] !== EMPTY) owner[(o.top + r + rowStep * d) * width + (o.left + c + columnStep * d)] = mark;
      }
    }
  };
  for (let index = 0; index < objects.length; index++) place(index, index + 1);
  for (let moved = true; moved; ) {
    moved = false;
    for (const index of order) {
      const o = objects[index]!;
      const d = shift[index]! + 1;
      let fits = true;
      for (let r = 0; r < o.height && fits; r++) {
        for (let c = 0; c < o.width; c++) {
          if (o.cells[r * o.width + c] === EMPTY) continue;
          const gr = o.top + r + rowStep * d;
          const gc = o.left + c + columnStep * d;
          const there = gr < 0 || gr >= height || gc < 0 || gc >= width ? -1 : owner[gr * width + gc]!;
          if (there !== 0 && there !== index + 1) {
            fits = false;
            break;
          }
        }
      }
      if (!fits) continue;
      place(index, 0);
      shift[index] = d;
      place(index, index + 1);
      moved = true;
    }
  }
  const out = newCells(height * width).fill(background);
  for (let index = 0; index < objects.length; index++) paintObjectInto(out, height, width, objects[index]!, undefined, rowStep * shift[index]!, columnStep * shift[index]!);
  return new Grid(height, width, out);
}
