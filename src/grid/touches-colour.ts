/** Whether an object has a neighbour (edge or corner) of a colour on a grid, outside itself. */
import type { GridObject } from './grid-object.ts';
import { EMPTY, type Grid } from './grid.ts';

export function touchesColour(o: GridObject, g: Grid, colour: number): boolean {
  const shape = o.shape;
  const { height, width } = g;
  for (let r = 0; r < shape.height; r++) {
    for (let c = 0; c < shape.width; c++) {
      if (shape.cells[r * shape.width + c] === EMPTY) continue;
      const row = o.top + r;
      const column = o.left + c;
      for (let nr = row - 1; nr <= row + 1; nr++) {
        if (nr < 0 || nr >= height) continue;
        for (let nc = column - 1; nc <= column + 1; nc++) {
          if (nc < 0 || nc >= width || g.cells[nr * width + nc] !== colour) continue;
          const sr = nr - o.top;
          const sc = nc - o.left;
          const inside = sr >= 0 && sr < shape.height && sc >= 0 && sc < shape.width && shape.cells[sr * shape.width + sc] !== EMPTY;
          if (!inside) return true;
        }
      }
    }
  }
  return false;
}
