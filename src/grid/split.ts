/** Splitting a grid into equal parts, side by side or stacked, with or without one-cell separators between them. */
import { Grid, newCells, copyRun } from './grid.ts';

/**
 * Splits a length into n equal parts: either exactly, or with one-cell separator lines
 * between the parts. Returns the part length, and the gap (0 or 1), or undefined.
 */
function partLength(length: number, n: number): [number, number] | undefined {
  if (!Number.isInteger(n) || n < 1 || n > length) return undefined;
  if (length % n === 0) return [length / n, 0];
  const rest = length - (n - 1);
  if (rest >= n && rest % n === 0) return [rest / n, 1];
  return undefined;
}

/** n equally wide parts side by side, left to right (one-column separators between them dropped); null when the width does not divide so. */
export function splitAcross(g: Grid, n: number): Grid[] | null {
  const sizes = partLength(g.width, n);
  if (!sizes) return null;
  const [w, gap] = sizes;
  const parts: Grid[] = [];
  for (let p = 0; p < n; p++) {
    const left = p * (w + gap);
    const out = newCells(g.height * w);
    for (let r = 0; r < g.height; r++) copyRun(g.data, g.offset + r * g.width + left, out, r * w, w);
    parts.push(new Grid(g.height, w, out));
  }
  return parts;
}

/** n equally tall parts stacked top to bottom (one-row separators between them dropped); null when the height does not divide so. */
export function splitDown(g: Grid, n: number): Grid[] | null {
  const sizes = partLength(g.height, n);
  if (!sizes) return null;
  const [h, gap] = sizes;
  const parts: Grid[] = [];
  for (let p = 0; p < n; p++) {
    const top = p * (h + gap);
    parts.push(new Grid(h, g.width, g.cells.slice(top * g.width, (top + h) * g.width)));
  }
  return parts;
}

/**
 * Square parts along the longer side, each as big as the shorter side, side by side or
 * stacked, with or without one-cell separator lines between them; a square grid is its own one
 * part. Null when the long side does not divide so.
 */
export function splitIntoSquares(g: Grid): Grid[] | null {
  const { height, width } = g;
  if (height === width) return [g];
  const across = width > height;
  const long = across ? width : height;
  const short = across ? height : width;
  let n: number;
  if (long % short === 0) n = long / short;
  else if ((long + 1) % (short + 1) === 0) n = (long + 1) / (short + 1);
  else return null;
  return across ? splitAcross(g, n) : splitDown(g, n);
}
