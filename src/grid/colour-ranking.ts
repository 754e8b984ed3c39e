/**
 * Colours ranked by how many cells they have: the most or least common colour, how many
 * colours a grid has, the colours in order of frequency and as a bar chart, and the colour most
 * objects share.
 */
import { backgroundColour, colourCounts } from './components.ts';
import type { GridObject } from './grid-object.ts';
import { Grid, shapeAllowed, newCells } from './grid.ts';
import { mostFrequentColour } from './most-frequent-colour.ts';
import { sortSmall } from './small-sort.ts';

/**
 * The colour present in the grid with the most cells (`most` true) or the fewest, the lowest on
 * ties, leaving out the background colour when `skipBackground`; null when no colour is left.
 */
export function colourByCount(g: Grid, most: boolean, skipBackground: boolean): number | null {
  const counts = colourCounts(g);
  const skip = skipBackground ? backgroundColour(g) : -1;
  const sign = most ? 1 : -1;
  let best = -1;
  for (let c = 0; c < 10; c++) {
    if (c === skip || counts[c] === 0) continue;
    if (best < 0 || (counts[c]! - counts[best]!) * sign > 0) best = c;
  }
  return best < 0 ? null : best;
}

/** How many different colours other than the background the grid has. */
export function countColours(g: Grid): number {
  const counts = colourCounts(g);
  const background = backgroundColour(g);
  let n = 0;
  for (let c = 0; c < 10; c++) if (c !== background && counts[c]! > 0) n++;
  return n;
}

/** The colours with a cell, other than `skip`, most cells first (the lower colour first on ties). */
function coloursByCount(counts: Uint32Array, skip: number): number[] {
  const colours: number[] = [];
  for (let c = 0; c < 10; c++) if (c !== skip && counts[c]! > 0) colours.push(c);
  return sortSmall(colours, (a, b) => counts[b]! - counts[a]! || a - b);
}

/** A one-column grid of the colours other than the background, most cells first (lower colour first on ties); null when there is none. */
export function coloursByFrequency(g: Grid): Grid | null {
  const colours = coloursByCount(colourCounts(g), backgroundColour(g));
  if (colours.length === 0) return null;
  // In a slab, like every grid's cells: a typed array of its own gets a buffer of its own once hashed.
  const cells = newCells(colours.length);
  for (let i = 0; i < colours.length; i++) cells[i] = colours[i]!;
  return new Grid(colours.length, 1, cells);
}

/**
 * A bar chart of the colours other than 0: one column per colour, most frequent first
 * (lower colour on ties), each filled from the top with as many cells as the colour has, colour 0
 * below; null when there is no such colour or the chart would pass the size cap.
 */
export function colourHistogram(g: Grid): Grid | null {
  const counts = colourCounts(g);
  const colours = coloursByCount(counts, 0);
  if (colours.length === 0) return null;
  const height = counts[colours[0]!]!;
  const width = colours.length;
  if (!shapeAllowed(height, width)) return null;
  const out = newCells(height * width);
  for (let j = 0; j < width; j++) for (let r = 0; r < counts[colours[j]!]!; r++) out[r * width + j] = colours[j]!;
  return new Grid(height, width, out);
}

/** The main colour shared by the most objects (the lowest on ties); null for no objects. */
export function mostCommonObjectColour(objects: readonly GridObject[]): number | null {
  if (objects.length === 0) return null;
  const counts = new Uint32Array(10);
  for (const o of objects) counts[o.mainColour]!++;
  return mostFrequentColour(counts);
}
