/** Scaling a grid by a whole factor: each cell a block, or each block a cell. */
import { Grid, shapeAllowed, newCells, fillCells } from './grid.ts';
import { mostFrequentColour } from './most-frequent-colour.ts';
import { isCount, MOST_COPIES } from './whole-numbers.ts';

/** Every cell becomes a k×k block (k from 1 to 10); null beyond that or past the size cap. */
export function scaleUp(g: Grid, k: number): Grid | null {
  if (!isCount(k, MOST_COPIES) || !shapeAllowed(g.height * k, g.width * k)) return null;
  const { height, width, cells } = g;
  const outWidth = width * k;
  const out = newCells(height * k * outWidth);
  for (let r = 0; r < height; r++) {
    const rowStart = r * k * outWidth;
    for (let c = 0; c < width; c++) fillCells(out, cells[r * width + c]!, rowStart + c * k, rowStart + c * k + k);
    for (let i = 1; i < k; i++) out.copyWithin(rowStart + i * outWidth, rowStart, rowStart + outWidth);
  }
  return new Grid(height * k, outWidth, out);
}

/**
 * The grid of k×k blocks, each block one cell whose colour `blockColour` gives from the index of
 * the block's top-left cell (-1: the block has none, and the whole shrink fails); null when k is
 * not a count up to 10 or the sides do not divide by it.
 */
function shrinkBlocks(g: Grid, k: number, blockColour: (corner: number) => number): Grid | null {
  if (!isCount(k, MOST_COPIES)) return null;
  const { height, width } = g;
  if (height % k !== 0 || width % k !== 0) return null;
  const h = height / k;
  const w = width / k;
  const out = newCells(h * w);
  for (let r = 0; r < h; r++) {
    for (let c = 0; c < w; c++) {
      const v = blockColour(r * k * width + c * k);
      if (v < 0) return null;
      out[r * w + c] = v;
    }
  }
  return new Grid(h, w, out);
}

/** Every k×k block, which must be of one colour, becomes one cell; null when the grid does not divide into such blocks. */
export function scaleDown(g: Grid, k: number): Grid | null {
  const { width, cells } = g;
  return shrinkBlocks(g, k, (corner) => {
    const v = cells[corner]!;
    for (let i = 0; i < k; i++) {
      const base = corner + i * width;
      for (let j = 0; j < k; j++) if (cells[base + j] !== v) return -1;
    }
    return v;
  });
}

/** Every k×k block becomes one cell of its most frequent colour (the lowest on ties); null when the sides do not divide by k. */
export function majorityScaleDown(g: Grid, k: number): Grid | null {
  const { width, cells } = g;
  const counts = new Uint32Array(10);
  return shrinkBlocks(g, k, (corner) => {
    counts.fill(0);
    for (let i = 0; i < k; i++) {
      const base = corner + i * width;
      for (let j = 0; j < k; j++) counts[cells[base + j]!]!++;
    }
    return mostFrequentColour(counts);
  });
}
