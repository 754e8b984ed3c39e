/**
 * Repeating patterns: the smallest tile that, laid over a grid again and again (each band of
 * rows possibly shifted sideways against the one above, which covers diagonal stripes), agrees
 * with every known cell and tells the colour of every unknown one.
 */
import { Grid, copyCells } from './grid.ts';
import { WorkArray } from './work-array.ts';

/** Work arrays for the search below (it runs on many grids the search makes). */
const knownWork = new WorkArray(Int32Array);
const unknownWork = new WorkArray(Int32Array);
const rowWork = new WorkArray(Int32Array);
const columnWork = new WorkArray(Int32Array);
const tileWork = new WorkArray(Int8Array);
const stampWork = new WorkArray(Int32Array);
const acrossWork = new WorkArray(Int8Array);
const downWork = new WorkArray(Int8Array);
const slantWork = new WorkArray(Int8Array);

/** How many known cells the search may compare in all, over every tile it tries. */
const CHECK_BUDGET = 60_000;

/**
 * The grid with every cell of `hole` replaced from the smallest repeating tile that agrees with
 * all other cells and covers every hole; null when there is no hole, no known cell, or no
 * such tile smaller than the grid.
 *
 * A tile has `ph` rows and `pw` columns; the cell (r, c) belongs to the tile cell
 * (r mod ph, (c - shift * floor(r / ph)) mod pw), where the shift is 0 unless the tile is one
 * row high. Tiles are tried by area, then height, then
 * shift, so the answer is deterministic. The search gives up (null) after a fixed number
 * of cell comparisons.
 *
 * Before a tile is tried cell by cell, two checks it needs are looked up (each worked out once
 * per call and shared by every tile that needs it): known cells `pw` apart in a row agree, and
 * known cells `ph` apart in a column agree (for a shifted one-row tile: each known cell agrees
 * with the known cell one row down and `shift` columns right). Most tiles fail one of them,
 * so they are not tried at all.
 */
export function completeRepeatingPattern(grid: Grid, hole: number): Grid | null {
  const { height, width, cells } = grid;
  const size = cells.length;
  let holes = 0;
  for (let i = 0; i < size; i++) if (cells[i] === hole) holes++;
  if (holes === 0 || holes === size) return null;
  const knownCount = size - holes;
  const known = knownWork.take(knownCount);
  const unknown = unknownWork.take(holes);
  for (let i = 0, k = 0, u = 0; i < size; i++) {
    if (cells[i] === hole) unknown[u++] = i;
    else known[k++] = i;
  }
  // Compare known cells in a fixed scattered order: two cells of one tile cell then meet early,
  // so a wrong tile is usually rejected after a few comparisons.
  let seed = 12345;
  for (let k = knownCount - 1; k > 0; k--) {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    const j = seed % (k + 1);
    const swap = known[k]!;
    known[k] = known[j]!;
    known[j] = swap;
  }
  const knownRow = rowWork.take(knownCount);
  const knownColumn = columnWork.take(knownCount);
  for (let k = 0; k < knownCount; k++) {
    knownRow[k] = (known[k]! / width) | 0;
    knownColumn[k] = known[k]! - knownRow[k]! * width;
  }
  const tile = tileWork.take(size);
  // stamp[t] === trial marks tile cell t as set during the current trial (no clearing between trials).
  const stamp = stampWork.take(size).fill(0, 0, size);
  let trial = 0;
  // A fixed budget of cell checks keeps the worst case bounded on large, nearly repeating grids.
  let budget = CHECK_BUDGET;
  // Per distance, whether known cells that far apart agree: -1 not yet worked out, 0 no, 1 yes.
  const across = acrossWork.take(width + 1).fill(-1, 0, width + 1);
  const down = downWork.take(height + 1).fill(-1, 0, height + 1);
  const slant = slantWork.take(width).fill(-1, 0, width);
  // Known cells (r, c) and (r + rows, c + columns) agree wherever both lie in the grid; -1 when
  // the budget runs out. The cells are taken in the scattered order, so a disagreement shows early.
  const agreeApart = (rows: number, columns: number): number => {
    const step = rows * width + columns;
    for (let k = 0; k < knownCount; k++) {
      if (knownRow[k]! + rows >= height || knownColumn[k]! + columns >= width) continue;
      if (--budget < 0) return -1;
      const there = cells[known[k]! + step]!;
      if (there !== hole && there !== cells[known[k]!]) return 0;
    }
    return 1;
  };
  const classOf = (i: number, ph: number, pw: number, shift: number): number => {
    const r = (i / width) | 0;
    const c = i - r * width;
    const band = (r / ph) | 0;
    let column = (c - shift * band) % pw;
    if (column < 0) column += pw;
    return (r % ph) * pw + column;
  };
  // A tile must repeat at least twice to be evidence of a pattern.
  for (let area = 1; area * 2 <= size; area++) {
    for (let ph = 1; ph <= Math.min(height, area); ph++) {
      if (area % ph !== 0) continue;
      const pw = area / ph;
      if (pw > width) continue;
      // Shifted bands are tried only one row high: diagonal stripes, each row the one above moved.
      const shifts = ph === 1 && height > 1 ? pw : 1;
      if (across[pw] === -1 && (across[pw] = agreeApart(0, pw)) === -1) return null;
      if (across[pw] === 0) continue;
      for (let shift = 0; shift < shifts; shift++) {
        if (shift === 0 || ph > 1) {
          if (down[ph] === -1 && (down[ph] = agreeApart(ph, 0)) === -1) return null;
          if (down[ph] === 0) continue;
        } else {
          if (slant[shift] === -1 && (slant[shift] = agreeApart(1, shift)) === -1) return null;
          if (slant[shift] === 0) continue;
        }
        trial++;
        let agrees = true;
        for (let k = 0; k < knownCount && agrees; k++) {
          if (--budget < 0) return null;
          const r = knownRow[k]!;
          const band = (r / ph) | 0;
          let column = (knownColumn[k]! - shift * band) % pw;
          if (column < 0) column += pw;
          const t = (r - band * ph) * pw + column;
          const v = cells[known[k]!]!;
          if (stamp[t] !== trial) (stamp[t] = trial), (tile[t] = v);
          else if (tile[t] !== v) agrees = false;
        }
        if (!agrees) continue;
        let covered = true;
        for (let u = 0; u < holes && covered; u++) if (stamp[classOf(unknown[u]!, ph, pw, shift)] !== trial) covered = false;
        if (!covered) continue;
        const out = copyCells(cells);
        for (let u = 0; u < holes; u++) out[unknown[u]!] = tile[classOf(unknown[u]!, ph, pw, shift)]!;
        return new Grid(height, width, out);
      }
    }
  }
  return null;
}
