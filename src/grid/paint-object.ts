/**
 * Drawing objects into a cell buffer: painting an object's cells at its position, or
 * clearing the cells it covers; cells that fall outside the buffer are dropped.
 */
import type { GridObject } from '../language/grid-object.ts';
import { EMPTY } from './grid.ts';

/**
 * Writes the object's cells into `cells` (a height × width buffer). When `colour` is given,
 * every covered cell gets that colour instead of the object's own.
 */
export function paintObjectInto(cells: Uint8Array, height: number, width: number, object: GridObject, colour?: number): void {
  const shape = object.shape;
  const rowFrom = Math.max(0, -object.top);
  const rowTo = Math.min(shape.height, height - object.top);
  const columnFrom = Math.max(0, -object.left);
  const columnTo = Math.min(shape.width, width - object.left);
  for (let r = rowFrom; r < rowTo; r++) {
    const source = r * shape.width;
    const target = (object.top + r) * width + object.left;
    for (let c = columnFrom; c < columnTo; c++) {
      const v = shape.cells[source + c]!;
      if (v !== EMPTY) cells[target + c] = colour ?? v;
    }
  }
}
