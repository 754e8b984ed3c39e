/**
 * The common one and the odd one out, among objects (by their shape and colours, or by their
 * main colour) and among the parts of a grid (by their cells, or by which cells are filled).
 */
import { backgroundColour } from './components.ts';
import type { GridObject } from './grid-object.ts';
import { Grid, newCells } from './grid.ts';
import { WorkArray } from './work-array.ts';

/** Work arrays for {@link uniqueColourObject}: counts per colour, each object's main colour. */
const colourTally = new Uint32Array(10);
const mainColours = new WorkArray(Uint8Array);

/** For each item, how many items (itself included) are the same as it. */
function tally<T>(items: readonly T[], same: (a: T, b: T) => boolean): number[] {
  return items.map((item) => items.reduce((n, other) => n + (same(item, other) ? 1 : 0), 0));
}

const sameShape = (a: GridObject, b: GridObject): boolean => a.shape.equals(b.shape);
const sameGrid = (a: Grid, b: Grid): boolean => a.equals(b);

/** The index of the only count of 1, or -1 when no count or more than one count is 1. */
function onlyUnique(counts: readonly number[]): number {
  const first = counts.indexOf(1);
  return first >= 0 && counts.indexOf(1, first + 1) < 0 ? first : -1;
}

/** The object whose shape-and-colours pattern occurs most often (the first on ties); null unless some pattern repeats. */
export function mostCommonObject(objects: readonly GridObject[]): GridObject | null {
  const counts = tally(objects, sameShape);
  const most = Math.max(0, ...counts);
  return most > 1 ? objects[counts.indexOf(most)]! : null;
}

/** Among three objects or more, the only one whose shape-and-colours pattern occurs once, when every other pattern repeats. */
export function oddOneOut(objects: readonly GridObject[]): GridObject | null {
  if (objects.length < 3) return null;
  const index = onlyUnique(tally(objects, sameShape));
  return index < 0 ? null : objects[index]!;
}

/** The only object whose main colour no other object has; null unless there is exactly one (and two objects or more). */
export function uniqueColourObject(objects: readonly GridObject[]): GridObject | null {
  const n = objects.length;
  if (n < 2) return null;
  const counts = colourTally.fill(0);
  const colours = mainColours.take(n);
  for (let i = 0; i < n; i++) {
    colours[i] = objects[i]!.mainColour;
    counts[colours[i]!]!++;
  }
  let unique: GridObject | null = null;
  for (let i = 0; i < n; i++) {
    if (counts[colours[i]!] !== 1) continue;
    if (unique !== null) return null;
    unique = objects[i]!;
  }
  return unique;
}

/** The part's filled pattern: 1 where a cell is not the part's background, 0 elsewhere. */
function filledPattern(g: Grid): Grid {
  const background = backgroundColour(g);
  const out = newCells(g.height * g.width);
  for (let i = 0; i < out.length; i++) out[i] = g.data[g.offset + i] === background ? 0 : 1;
  return new Grid(g.height, g.width, out);
}

/**
 * The one part unlike the others: first by exact cells, then, when every part differs (say
 * each is drawn in its own colour), by the pattern of filled cells. Needs three parts or more,
 * exactly one unique and every other part with a twin; null otherwise.
 */
export function oddOneOutPart(parts: readonly Grid[]): Grid | null {
  if (parts.length < 3) return null;
  for (const key of [(g: Grid) => g, filledPattern]) {
    const counts = tally(parts.map(key), sameGrid);
    const index = onlyUnique(counts);
    if (index >= 0) return parts[index]!;
    if (counts.some((n) => n !== 1)) return null;
  }
  return null;
}

/** The part that occurs most often, cell for cell (the first on ties); null for no parts. */
export function mostCommonPart(parts: readonly Grid[]): Grid | null {
  if (parts.length === 0) return null;
  const counts = tally(parts, sameGrid);
  return parts[counts.indexOf(Math.max(...counts))]!;
}
