/**
 * Rigid gravity: whole objects move one after another towards a side of the grid until they
 * touch the border or a cell already taken, keeping their shapes.
 */
import { backgroundColour, components } from './components.ts';
import { EMPTY, Grid, newCells } from './grid.ts';

/**
 * Moves every object (non-background cells joined through edges and corners, any colours)
 * in the direction (rowStep, columnStep), one of the four unit steps. Objects nearest that
 * side settle first.
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
  const out = newCells(height * width).fill(background);
  const taken = newCells(height * width);
  for (const index of order) {
    const o = objects[index]!;
    const limit = rowStep !== 0 ? height : width;
    let distance = 0;
    for (let d = 1; d <= limit; d++) {
      let fits = true;
      for (let r = 0; r < o.height && fits; r++) {
        for (let c = 0; c < o.width; c++) {
          if (o.cells[r * o.width + c] === EMPTY) continue;
          const gr = o.top + r + rowStep * d;
          const gc = o.left + c + columnStep * d;
          if (gr < 0 || gr >= height || gc < 0 || gc >= width || taken[gr * width + gc]) {
            fits = false;
            break;
          }
        }
      }
      if (!fits) break;
      distance = d;
    }
    for (let r = 0; r < o.height; r++) {
      for (let c = 0; c < o.width; c++) {
        const v = o.cells[r * o.width + c]!;
        if (v === EMPTY) continue;
        const i = (o.top + r + rowStep * distance) * width + (o.left + c + columnStep * distance);
        out[i] = v;
        taken[i] = 1;
      }
    }
  }
  return new Grid(height, width, out);
}
