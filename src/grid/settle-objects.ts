/**
 * Rigid gravity: whole objects move towards a side of the grid, a step at a time, until each
 * touches the border or another object, keeping their shapes.
 */
import { backgroundColour, components } from './components.ts';
import type { GridObject } from './grid-object.ts';
import { EMPTY, Grid, newCells } from './grid.ts';
import { paintObjectInto } from './paint-object.ts';
import { WorkArray } from './work-array.ts';

/** Work arrays: which object holds each cell (index + 1, 0 for none), each object's shift, the order objects move in. */
const ownerWork = new WorkArray(Int32Array);
const shiftWork = new WorkArray(Int32Array);
const orderWork = new WorkArray(Int32Array);
const reachWork = new WorkArray(Int32Array);

/**
 * Moves every object (non-background cells joined through edges and corners, any colours)
 * in the direction (rowStep, columnStep), one of the four unit steps, until none can move.
 * Objects nearest that side move first.
 */
export function settleObjects(grid: Grid, rowStep: number, columnStep: number): Grid {
  const { height, width } = grid;
  const background = backgroundColour(grid);
  const objects = components(grid, { diagonal: true, multicolour: true, background });
  const count = objects.length;
  // How far along the direction each object reaches: larger settles first (insertion sort by
  // reach, then index: stable, and no allocation on a path the search runs millions of times).
  const reach = reachWork.take(count);
  const order = orderWork.take(count);
  for (let i = 0; i < count; i++) {
    const o = objects[i]!;
    const r = rowStep > 0 ? o.top + o.height - 1 : rowStep < 0 ? -o.top : 0;
    const c = columnStep > 0 ? o.left + o.width - 1 : columnStep < 0 ? -o.left : 0;
    reach[i] = r + c;
    let j = i;
    while (j > 0 && reach[order[j - 1]!]! < r + c) {
      order[j] = order[j - 1]!;
      j--;
    }
    order[j] = i;
  }
  // Objects fall one step at a time, nearest the side first in each round, each blocked by the
  // border and by every other object where it is then: an object whose box reaches past another's
  // cannot pass through it, and no cell is ever covered twice.
  const owner = ownerWork.take(height * width).fill(0, 0, height * width);
  const shift = shiftWork.take(count).fill(0, 0, count);
  for (let index = 0; index < count; index++) place(objects[index]!, owner, width, 0, 0, index + 1);
  for (let moved = true; moved; ) {
    moved = false;
    for (let k = 0; k < count; k++) {
      const index = order[k]!;
      const o = objects[index]!;
      const d = shift[index]! + 1;
      if (!fits(o, owner, height, width, rowStep * d, columnStep * d, index + 1)) continue;
      place(o, owner, width, rowStep * (d - 1), columnStep * (d - 1), 0);
      shift[index] = d;
      place(o, owner, width, rowStep * d, columnStep * d, index + 1);
      moved = true;
    }
  }
  const out = newCells(height * width).fill(background);
  for (let index = 0; index < count; index++) paintObjectInto(out, height, width, objects[index]!, undefined, rowStep * shift[index]!, columnStep * shift[index]!);
  return new Grid(height, width, out);
}

/** Marks the object's cells, shifted, with `mark` in the owner map. */
function place(o: GridObject, owner: Int32Array, width: number, rowShift: number, columnShift: number, mark: number): void {
  for (let r = 0; r < o.height; r++) {
    for (let c = 0; c < o.width; c++) {
      if (o.cells[r * o.width + c] !== EMPTY) owner[(o.top + r + rowShift) * width + (o.left + c + columnShift)] = mark;
    }
  }
}

/** True when every cell of the object, shifted, lies in the grid on a cell free or its own (`mark`). */
function fits(o: GridObject, owner: Int32Array, height: number, width: number, rowShift: number, columnShift: number, mark: number): boolean {
  for (let r = 0; r < o.height; r++) {
    const gr = o.top + r + rowShift;
    for (let c = 0; c < o.width; c++) {
      if (o.cells[r * o.width + c] === EMPTY) continue;
      const gc = o.left + c + columnShift;
      if (gr < 0 || gr >= height || gc < 0 || gc >= width) return false;
      const there = owner[gr * width + gc]!;
      if (there !== 0 && there !== mark) return false;
    }
  }
  return true;
}
