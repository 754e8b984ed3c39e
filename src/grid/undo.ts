/**
 * Running grid operations backwards: from the grid an operation should give, the grid it
 * must have been given (null when no grid gives it). Each answer is checked by running the
 * operation forwards, so an inverse never claims a grid that does not work.
 */
import { Grid, newCells, copyRun } from './grid.ts';
import { mirrorCopies, fourRotationsSquare } from './mirror-copies.ts';
import { scaleDown } from './scale.ts';
import { tile } from './tile.ts';

function topLeft(g: Grid, height: number, width: number): Grid {
  const out = newCells(height * width);
  for (let r = 0; r < height; r++) copyRun(g.data, g.offset + r * g.width, out, r * width, width);
  return new Grid(height, width, out);
}

/** The grid whose mirrored copies (to the right, below, or both) make `wanted`. */
export function undoMirrorCopies(wanted: Grid, rowsTwice: boolean, columnsTwice: boolean): Grid | null {
  if ((rowsTwice && wanted.height % 2 !== 0) || (columnsTwice && wanted.width % 2 !== 0)) return null;
  const source = topLeft(wanted, rowsTwice ? wanted.height / 2 : wanted.height, columnsTwice ? wanted.width / 2 : wanted.width);
  const again = mirrorCopies(source, rowsTwice, columnsTwice);
  return again !== null && again.equals(wanted) ? source : null;
}

/** The square grid whose four quarter turns make `wanted`. */
export function undoFourRotations(wanted: Grid): Grid | null {
  if (wanted.height !== wanted.width || wanted.height % 2 !== 0) return null;
  const source = topLeft(wanted, wanted.height / 2, wanted.width / 2);
  const again = fourRotationsSquare(source);
  return again !== null && again.equals(wanted) ? source : null;
}

/** The grid that, scaled up k times, gives `wanted`. */
export function undoScaleUp(wanted: Grid, k: number): Grid | null {
  return scaleDown(wanted, k);
}

/** The grid that, repeated `down` × `across` times, gives `wanted`. */
export function undoTile(wanted: Grid, down: number, across: number): Grid | null {
  if (!Number.isInteger(down) || !Number.isInteger(across) || down < 1 || across < 1) return null;
  if (wanted.height % down !== 0 || wanted.width % across !== 0) return null;
  const source = topLeft(wanted, wanted.height / down, wanted.width / across);
  const again = tile(source, down, across);
  return again !== null && again.equals(wanted) ? source : null;
}

/**
 * The grid that a colour map (`target[c]` is what c becomes) turns into `wanted`: each colour
 * of `wanted` must come from exactly one colour; null when a colour has no source or several.
 */
export function undoColourMap(wanted: Grid, target: Uint8Array): Grid | null {
  const source = new Int8Array(10).fill(-1);
  for (let c = 0; c < 10; c++) {
    const t = target[c]!;
    if (t > 9) continue;
    source[t] = source[t] === -1 ? c : -2;
  }
  const cells = wanted.cells;
  const out = newCells(cells.length);
  for (let i = 0; i < cells.length; i++) {
    const s = source[cells[i]!]!;
    if (s < 0) return null;
    out[i] = s;
  }
  return new Grid(wanted.height, wanted.width, out);
}
