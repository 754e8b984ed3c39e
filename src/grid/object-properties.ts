/**
 * Properties of one object, the tests and keys that choose objects: its colours, its shape,
 * whether it touches the grid's edge, a colour or another object.
 */
import type { GridObject } from './grid-object.ts';
import { EMPTY, type Grid } from './grid.ts';

/** Whether (r, c) of the object's box is one of its cells; false outside the box. */
export function holdsCell(o: GridObject, r: number, c: number): boolean {
  return r >= 0 && r < o.height && c >= 0 && c < o.width && o.data[o.offset + r * o.width + c] !== EMPTY;
}

/** Whether any cell of the object has the colour. */
export function hasColour(o: GridObject, colour: number): boolean {
  return o.cells.indexOf(colour) >= 0;
}

/** How many cells of the object have the colour. */
export function countColourInObject(o: GridObject, colour: number): number {
  const cells = o.cells;
  let n = 0;
  for (let i = 0; i < cells.length; i++) if (cells[i] === colour) n++;
  return n;
}

/** How many different colours the object has. */
export function colourCount(o: GridObject): number {
  let seen = 0;
  const cells = o.cells;
  for (let i = 0; i < cells.length; i++) if (cells[i] !== EMPTY) seen |= 1 << cells[i]!;
  let count = 0;
  for (; seen; seen &= seen - 1) count++;
  return count;
}

/** Whether the object fills its whole bounding box. */
export function isSolidRectangle(o: GridObject): boolean {
  return o.size === o.height * o.width;
}

/** Whether the object is a straight line one cell thick: a single full row or column. */
export function isLine(o: GridObject): boolean {
  return (o.height === 1 || o.width === 1) && o.size === o.height * o.width;
}

/** Whether two objects occupy the same cells of their boxes, colours and places aside. */
export function sameShape(a: GridObject, b: GridObject): boolean {
  if (a.height !== b.height || a.width !== b.width || a.size !== b.size) return false;
  const x = a.cells;
  const y = b.cells;
  for (let i = 0; i < x.length; i++) if ((x[i] === EMPTY) !== (y[i] === EMPTY)) return false;
  return true;
}

/** Whether a cell of the object lies on the outer border of the grid. */
export function touchesEdge(o: GridObject, g: Grid): boolean {
  const { height, width, cells } = o;
  for (let r = 0; r < height; r++) {
    const row = o.top + r;
    for (let c = 0; c < width; c++) {
      if (cells[r * width + c] === EMPTY) continue;
      const column = o.left + c;
      if (row === 0 || column === 0 || row === g.height - 1 || column === g.width - 1) return true;
    }
  }
  return false;
}

/** Whether the object has a neighbour (edge or corner) of a colour on a grid, outside itself. */
export function touchesColour(o: GridObject, g: Grid, colour: number): boolean {
  const { height, width } = g;
  for (let r = 0; r < o.height; r++) {
    for (let c = 0; c < o.width; c++) {
      if (o.data[o.offset + r * o.width + c] === EMPTY) continue;
      const row = o.top + r;
      const column = o.left + c;
      for (let nr = row - 1; nr <= row + 1; nr++) {
        if (nr < 0 || nr >= height) continue;
        for (let nc = column - 1; nc <= column + 1; nc++) {
          if (nc < 0 || nc >= width || g.data[g.offset + nr * width + nc] !== colour) continue;
          const sr = nr - o.top;
          const sc = nc - o.left;
          if (!holdsCell(o, sr, sc)) return true;
        }
      }
    }
  }
  return false;
}

/** Whether a cell of the object has an edge neighbour on the grid that is neither the background nor a cell of the object. */
export function touchesOther(o: GridObject, g: Grid, background: number): boolean {
  const { height, width, cells } = g;
  for (let r = 0; r < o.height; r++) {
    for (let c = 0; c < o.width; c++) {
      if (o.data[o.offset + r * o.width + c] === EMPTY) continue;
      const row = o.top + r;
      const column = o.left + c;
      if (row > 0 && !holdsCell(o, r - 1, c) && cells[(row - 1) * width + column] !== background) return true;
      if (row < height - 1 && !holdsCell(o, r + 1, c) && cells[(row + 1) * width + column] !== background) return true;
      if (column > 0 && !holdsCell(o, r, c - 1) && cells[row * width + column - 1] !== background) return true;
      if (column < width - 1 && !holdsCell(o, r, c + 1) && cells[row * width + column + 1] !== background) return true;
    }
  }
  return false;
}
