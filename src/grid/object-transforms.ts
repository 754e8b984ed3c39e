/**
 * Transforms of one object that keep it an object: recoloured, shifted, or mirrored within its
 * own bounding box.
 */
import { GridObject } from './grid-object.ts';
import { EMPTY, Grid, getSizeCap, newCells } from './grid.ts';
import { flipLeftRight, flipUpDown } from './rotate-reflect.ts';

/** The same object with every cell in the colour. */
export function recolourObject(o: GridObject, colour: number): GridObject {
  const source = o.cells;
  const cells = newCells(source.length);
  for (let i = 0; i < source.length; i++) cells[i] = source[i] === EMPTY ? EMPTY : colour;
  return new GridObject(o.top, o.left, o.height, o.width, cells);
}

/**
 * The object shifted by `rows` down and `columns` right (negative: up, left); null when it
 * would land further than twice the size cap from the grid's corner.
 */
export function shiftObject(o: GridObject, rows: number, columns: number): GridObject | null {
  const far = 2 * getSizeCap();
  const top = o.top + rows;
  const left = o.left + columns;
  if (Math.abs(top) > far || Math.abs(left) > far) return null;
  return new GridObject(top, left, o.height, o.width, o.cells);
}

/** The object mirrored left to right in place, within its bounding box. */
export function reflectObjectLeftRight(o: GridObject): GridObject {
  return new GridObject(o.top, o.left, flipLeftRight(o.shape));
}

/** The object mirrored top to bottom in place, within its bounding box. */
export function reflectObjectUpDown(o: GridObject): GridObject {
  return new GridObject(o.top, o.left, flipUpDown(o.shape));
}
