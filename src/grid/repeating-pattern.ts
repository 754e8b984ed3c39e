/**
 * Repeating patterns: the smallest tile that, laid over a grid again and again (each band of
 * rows possibly shifted sideways against the one above, which covers diagonal stripes), agrees
 * with every known cell and tells the colour of every unknown one.
 */
import { Grid } from './grid.ts';

/**
 * The grid with every cell of `hole` replaced from the smallest repeating tile that agrees with
 * all other cells and covers every hole; undefined when there is no hole, no known cell, or no
 * such tile smaller than the grid.
 *
 * A tile has `ph` rows and `pw` columns; the cell (r, c) belongs to the tile cell
 * (r mod ph, (c - shift * floor(r / ph)) mod pw). Tiles are tried by area, then height, then
 * shift, so the answer is deterministic.
 */
export function completeRepeatingPattern(grid: Grid, hole: number): Grid | undefined {
  const { height, width, cells } = grid;
  const size = cells.length;
  let holes = 0;
  for (let i = 0; i < size; i++) if (cells[i] === hole) holes++;
  if (holes === 0 || holes === size) return undefined;
  const known = new Int32Array(size - holes);
  const unknown = new Int32Array(holes);
  for (let i = 0, k = 0, u = 0; i < size; i++) {
    if (cells[i] === hole) unknown[u++] = i;
    else known[k++] = i;
  }
  const tile = new Int8Array(size);
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
      const shifts = ph < height ? pw : 1;
      for (let shift = 0; shift < shifts; shift++) {
        tile.fill(-1, 0, area);
        let agrees = true;
        for (let k = 0; k < known.length && agrees; k++) {
          const i = known[k]!;
          const t = classOf(i, ph, pw, shift);
          const v = cells[i]!;
          if (tile[t] === -1) tile[t] = v;
          else if (tile[t] !== v) agrees = false;
        }
        if (!agrees) continue;
        let covered = true;
        for (let u = 0; u < unknown.length && covered; u++) if (tile[classOf(unknown[u]!, ph, pw, shift)] === -1) covered = false;
        if (!covered) continue;
        const out = cells.slice();
        for (let u = 0; u < unknown.length; u++) out[unknown[u]!] = tile[classOf(unknown[u]!, ph, pw, shift)]!;
        return new Grid(height, width, out);
      }
    }
  }
  return undefined;
}
