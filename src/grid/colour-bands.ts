/**
 * The order of colour bands: the colours other than 0, sorted by their mean column (one
 * row) when their mean columns spread wider than their mean rows, else by their mean row (one
 * column).
 */
import { Grid, newCells } from './grid.ts';

/** Work array: per colour, cell count, sum of rows, sum of columns. */
const sums = new Float64Array(30);
/** Work array: the colours present, then in band order. */
const bandColours = new Uint8Array(9);

export function colourBands(g: Grid): Grid | null {
  const { height, width, cells } = g;
  sums.fill(0);
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const v = cells[r * width + c]!;
      if (v === 0) continue;
      sums[v]!++;
      sums[10 + v]! += r;
      sums[20 + v]! += c;
    }
  }
  // No closures, lists or typed arrays of their own: under tsx each closure made costs a name
  // helper, and a typed array made here (not in a slab) gets a buffer of its own once hashed.
  let count = 0;
  let lowRow = Infinity, highRow = -Infinity, lowColumn = Infinity, highColumn = -Infinity;
  for (let v = 1; v < 10; v++) {
    if (sums[v]! === 0) continue;
    bandColours[count++] = v;
    const row = sums[10 + v]! / sums[v]!;
    const column = sums[20 + v]! / sums[v]!;
    if (row < lowRow) lowRow = row;
    if (row > highRow) highRow = row;
    if (column < lowColumn) lowColumn = column;
    if (column > highColumn) highColumn = column;
  }
  if (count === 0) return null;
  const across = highColumn - lowColumn > highRow - lowRow;
  const sumAt = across ? 20 : 10;
  // Insertion by mean (row or column), the lower colour first on ties: stable, a handful of colours.
  for (let i = 1; i < count; i++) {
    const colour = bandColours[i]!;
    const mean = sums[sumAt + colour]! / sums[colour]!;
    let j = i;
    while (j > 0) {
      const other = bandColours[j - 1]!;
      const otherMean = sums[sumAt + other]! / sums[other]!;
      if (otherMean < mean || (otherMean === mean && other < colour)) break;
      bandColours[j] = other;
      j--;
    }
    bandColours[j] = colour;
  }
  const out = newCells(count);
  for (let i = 0; i < count; i++) out[i] = bandColours[i]!;
  return across ? new Grid(1, count, out) : new Grid(count, 1, out);
}
