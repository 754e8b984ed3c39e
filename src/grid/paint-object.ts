/**
 * Drawing objects into a cell buffer: painting an object's cells at its position, or
 * clearing the cells it covers; cells that fall outside the buffer are dropped.
 */
import type { GridObject } from './grid-object.ts';
import { EMPTY, Grid } from './grid.ts';

/**
 * Writes the object's cells into `cells` (a height × width buffer), shifted by
 * (`rowShift`, `columnShift`). When `colour` is given, every covered cell gets that colour
 * instead of the object's own.
 */
export function paintObjectInto(
  cells: Uint8Array,
  height: number,
  width: number,
  object: GridObject,
  colour?: number,
  rowShift = 0,
  columnShift = 0,
): void {
  const shape = object.shape;
  const top = object.top + rowShift;
  const left = object.left + columnShift;
  const rowFrom = Math.max(0, -top);
  const rowTo = Math.min(shape.height, height - top);
  const columnFrom = Math.max(0, -left);
  const columnTo = Math.min(shape.width, width - left);
  for (let r = rowFrom; r < rowTo; r++) {
    const source = r * shape.width;
    const target = (top + r) * width + left;
    for (let c = columnFrom; c < columnTo; c++) {
      const v = shape.cells[source + c]!;
      if (v !== EMPTY) cells[target + c] = colour ?? v;
    }
  }
}

/**
 * Moves objects of `grid` at once: every object with a non-zero move (`moves[2i]` rows,
 * `moves[2i + 1]` columns) is first lifted (its cells become `background`), then each is put
 * down at its new place, so objects moving past each other do not erase one another.
 */
export function moveObjects(grid: Grid, objects: readonly GridObject[], moves: ArrayLike<number>, background: number): Grid {
  const { height, width } = grid;
  const out = grid.cells.slice();
  for (let i = 0; i < objects.length; i++) {
    if (moves[2 * i] !== 0 || moves[2 * i + 1] !== 0) paintObjectInto(out, height, width, objects[i]!, background);
  }
  for (let i = 0; i < objects.length; i++) {
    const dr = moves[2 * i]!;
    const dc = moves[2 * i + 1]!;
    if (dr !== 0 || dc !== 0) paintObjectInto(out, height, width, objects[i]!, undefined, dr, dc);
  }
  return new Grid(height, width, out);
}
