/**
 * Rigid gravity: whole objects move towards a side of the grid, a step at a time, until each
 * touches the border or another object, keeping their shapes.
 */
import { backgroundColour, components } from './components.ts';
import { EMPTY, Grid, newCells, fillCells } from './grid.ts';
import { paintObjectInto } from './paint-object.ts';
import { WorkArray } from './work-array.ts';

/** Work arrays: which object holds each cell (index + 1, 0 for none), each object's shift, the order objects move in, each object's cells. */
const ownerWork = new WorkArray(Int32Array);
const shiftWork = new WorkArray(Int32Array);
const orderWork = new WorkArray(Int32Array);
const reachWork = new WorkArray(Int32Array);
const startWork = new WorkArray(Int32Array);
const offsetWork = new WorkArray(Int32Array);

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
  // Each object's cells as offsets into the grid, listed once (starts[index] .. starts[index + 1]):
  // a step then checks and marks only the object's cells, and the border by its box alone.
  const starts = startWork.take(count + 1);
  let total = 0;
  for (let index = 0; index < count; index++) total += objects[index]!.size;
  const offsets = offsetWork.take(total);
  let at = 0;
  for (let index = 0; index < count; index++) {
    starts[index] = at;
    const o = objects[index]!;
    for (let r = 0; r < o.height; r++) {
      for (let c = 0; c < o.width; c++) if (o.data[o.offset + r * o.width + c] !== EMPTY) offsets[at++] = (o.top + r) * width + o.left + c;
    }
  }
  starts[count] = at;
  // Objects fall one step at a time, nearest the side first in each round, each blocked by the
  // border and by every other object where it is then: an object whose box reaches past another's
  // cannot pass through it, and no cell is ever covered twice.
  const owner = ownerWork.take(height * width).fill(0, 0, height * width);
  const shift = shiftWork.take(count).fill(0, 0, count);
  for (let index = 0; index < count; index++) for (let k = starts[index]!; k < starts[index + 1]!; k++) owner[offsets[k]!] = index + 1;
  const step = rowStep * width + columnStep;
  for (let moved = true; moved; ) {
    moved = false;
    for (let k = 0; k < count; k++) {
      const index = order[k]!;
      const o = objects[index]!;
      const d = shift[index]! + 1;
      // The box stays in the grid (it is tight: each of its sides holds a cell of the object).
      const top = o.top + rowStep * d;
      const left = o.left + columnStep * d;
      if (top < 0 || left < 0 || top + o.height > height || left + o.width > width) continue;
      const mark = index + 1;
      const from = starts[index]!;
      const to = starts[index + 1]!;
      const ahead = step * d;
      let free = true;
      for (let j = from; j < to && free; j++) {
        const there = owner[offsets[j]! + ahead]!;
        if (there !== 0 && there !== mark) free = false;
      }
      if (!free) continue;
      const behind = ahead - step;
      for (let j = from; j < to; j++) owner[offsets[j]! + behind] = 0;
      for (let j = from; j < to; j++) owner[offsets[j]! + ahead] = mark;
      shift[index] = d;
      moved = true;
    }
  }
  const out = fillCells(newCells(height * width), background);
  for (let index = 0; index < count; index++) paintObjectInto(out, height, width, objects[index]!, undefined, rowStep * shift[index]!, columnStep * shift[index]!);
  return new Grid(height, width, out);
}
