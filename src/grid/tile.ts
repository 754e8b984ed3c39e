/**
 * Tiling: a grid repeated to a size or a number of times, and the grid made of copies of itself
 * (or of another grid) where its cells are drawn.
 */
import { backgroundColour } from './components.ts';
import { Grid, getSizeCap, shapeAllowed, newCells, copyRun, fillCells } from './grid.ts';
import { isCount, MOST_COPIES } from './whole-numbers.ts';

/** The grid repeated to fill `height` × `width`, starting at the top-left corner; null for a size outside 1 to the size cap. */
export function repeatToSize(g: Grid, height: number, width: number): Grid | null {
  const cap = getSizeCap();
  if (!isCount(height, cap) || !isCount(width, cap)) return null;
  const { cells } = g;
  const out = newCells(height * width);
  for (let r = 0; r < height; r++) {
    const source = (r % g.height) * g.width;
    for (let c = 0; c < width; c++) out[r * width + c] = cells[source + (c % g.width)]!;
  }
  return new Grid(height, width, out);
}

/** The grid repeated `down` times downwards and `across` times across (each 1 to 10); null beyond that or past the size cap. */
export function tile(g: Grid, down: number, across: number): Grid | null {
  if (!isCount(down, MOST_COPIES) || !isCount(across, MOST_COPIES)) return null;
  if (!shapeAllowed(g.height * down, g.width * across)) return null;
  return repeatToSize(g, g.height * down, g.width * across);
}

/** Each non-background cell becomes a copy of the whole grid, each background cell a blank block; null past the size cap. */
export function fractalTile(g: Grid): Grid | null {
  return fractalTileWith(g, g);
}

/**
 * Each non-background cell of `g` becomes a copy of `pattern`, each background cell a block of
 * the pattern's size in g's background colour; null past the size cap.
 */
export function fractalTileWith(g: Grid, pattern: Grid): Grid | null {
  const { height, width, cells } = g;
  const outHeight = height * pattern.height;
  const outWidth = width * pattern.width;
  if (!shapeAllowed(outHeight, outWidth)) return null;
  const background = backgroundColour(g);
  const out = fillCells(newCells(outHeight * outWidth), background);
  for (let br = 0; br < height; br++) {
    for (let bc = 0; bc < width; bc++) {
      if (cells[br * width + bc] === background) continue;
      for (let r = 0; r < pattern.height; r++) copyRun(pattern.data, pattern.offset + r * pattern.width, out, (br * pattern.height + r) * outWidth + bc * pattern.width, pattern.width);
    }
  }
  return new Grid(outHeight, outWidth, out);
}
