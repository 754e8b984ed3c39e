/** Scaling a grid by a whole factor: each cell a block, or each block a cell. */
import { Grid, shapeAllowed } from './grid.ts';
import { mostFrequentColour } from './most-frequent-colour.ts';
import { isCount, MOST_COPIES } from './whole-numbers.ts';

/** Every cell becomes a k×k block (k from 1 to 10); null beyond that or past the size cap. */
export function scaleUp(g: Grid, k: number): Grid | null {
  if (!isCount(k, MOST_COPIES) || !shapeAllowed(g.height * k, g.width * k)) return null;
  const { height, width, cells } = g;
  const outWidth = width * k;
  const out = new Uint8Array(height * k * outWidth);
  for (let r = 0; r < height; r++) {
    const rowStart = r * k * outWidth;
    for (let c = 0; c < width; c++) out.fill(cells[r * width + c]!, rowStart + c * k, rowStart + c * k + k);
    for (let i = 1; i < k; i++) out.copyWithin(rowStart + i * outWidth, rowStart, rowStart + outWidth);
  }
  return new Grid(height * k, outWidth, out);
}

/** Every k×k block, which must be of one colour, becomes one cell; null when the grid does not divide into such blocks. */
export function scaleDown(g: Grid, k: number): Grid | null {
  if (!isCount(k, MOST_COPIES)) return null;
  const { height, width, cells } = g;
  if (height % k !== 0 || width % k !== 0) return null;
  const h = height / k;
  const w = width / k;
  const out = new Uint8Array(h * w);
  for (let r = 0; r < h; r++) {
    for (let c = 0; c < w; c++) {
      const v = cells[r * k * width + c * k]!;
      for (let i = 0; i < k; i++) {
        const base = (r * k + i) * width + c * k;
        for (let j = 0; j < k; j++) if (cells[base + j] !== v) return null;
      }
      out[r * w + c] = v;
    }
  }
  return new Grid(h, w, out);
}

/** Every k×k block becomes one cell of its most frequent colour (the lowest on ties); null when the sides do not divide by k. */
export function majorityScaleDown(g: Grid, k: number): Grid | null {
  if (!isCount(k, MOST_COPIES)) return null;
  const { height, width, cells } = g;
  if (height % k !== 0 || width % k !== 0) return null;
  const h = height / k;
  const w = width / k;
  const out = new Uint8Array(h * w);
  const counts = new Uint32Array(256);
  for (let r = 0; r < h; r++) {
    for (let c = 0; c < w; c++) {
      counts.fill(0);
      for (let i = 0; i < k; i++) {
        const base = (r * k + i) * width + c * k;
        for (let j = 0; j < k; j++) counts[cells[base + j]!]!++;
      }
      out[r * w + c] = mostFrequentColour(counts);
    }
  }
  return new Grid(h, w, out);
}
