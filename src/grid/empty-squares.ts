/** Squares of background cells of a given size, found and filled. */
import { backgroundColour } from './components.ts';
import { Grid, copyCells, fillCells } from './grid.ts';
import { WorkArray } from './work-array.ts';

/** Work array for the prefix counts below. */
const prefixCounts = new WorkArray(Uint16Array);
/** Work array: the cells squares already took. */
const takenCells = new WorkArray(Uint8Array);

/**
 * Squares of k×k background cells take the colour; they are found by their top-left corner in
 * reading order, and a square overlapping one already taken is skipped. Null unless k is a
 * whole number from 1 to the shorter side.
 */
export function fillEmptySquares(g: Grid, k: number, colour: number): Grid | null {
  const { height, width, cells } = g;
  if (!Number.isInteger(k) || k < 1 || k > height || k > width) return null;
  const background = backgroundColour(g);
  // filled[(r + 1) * (width + 1) + c + 1]: non-background cells above and left of (r, c), inclusive.
  const stride = width + 1;
  const filled = prefixCounts.take((height + 1) * stride).fill(0, 0, (height + 1) * stride);
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const own = cells[r * width + c] !== background ? 1 : 0;
      filled[(r + 1) * stride + c + 1] = own + filled[r * stride + c + 1]! + filled[(r + 1) * stride + c]! - filled[r * stride + c]!;
    }
  }
  const taken = fillCells(takenCells.take(height * width), 0, 0, height * width);
  let out: Uint8Array | undefined;
  for (let r = 0; r + k <= height; r++) {
    for (let c = 0; c + k <= width; c++) {
      const inside = filled[(r + k) * stride + c + k]! - filled[r * stride + c + k]! - filled[(r + k) * stride + c]! + filled[r * stride + c]!;
      if (inside !== 0) continue;
      let free = true;
      for (let dr = 0; dr < k && free; dr++) for (let dc = 0; dc < k; dc++) if (taken[(r + dr) * width + c + dc]) (free = false), (dc = k);
      if (!free) continue;
      out ??= copyCells(cells);
      for (let dr = 0; dr < k; dr++) {
        const base = (r + dr) * width + c;
        fillCells(taken, 1, base, base + k);
        fillCells(out, colour, base, base + k);
      }
    }
  }
  return out ? new Grid(height, width, out) : g;
}
