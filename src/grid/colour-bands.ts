/**
 * The order of colour bands: the colours other than 0, sorted by their mean column (one
 * row) when their mean columns spread wider than their mean rows, else by their mean row (one
 * column).
 */
import { Grid } from './grid.ts';
import { sortSmall } from './small-sort.ts';

/** Work array: per colour, cell count, sum of rows, sum of columns. */
const sums = new Float64Array(30);

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
  const colours: number[] = [];
  for (let v = 1; v < 10; v++) if (sums[v]! > 0) colours.push(v);
  if (colours.length === 0) return null;
  const meanRow = (v: number) => sums[10 + v]! / sums[v]!;
  const meanColumn = (v: number) => sums[20 + v]! / sums[v]!;
  const spread = (mean: (v: number) => number) => {
    let low = Infinity;
    let high = -Infinity;
    for (const v of colours) {
      low = Math.min(low, mean(v));
      high = Math.max(high, mean(v));
    }
    return high - low;
  };
  const across = spread(meanColumn) > spread(meanRow);
  const key = across ? meanColumn : meanRow;
  sortSmall(colours, (a, b) => key(a) - key(b) || a - b);
  const out = Uint8Array.from(colours);
  return across ? new Grid(1, colours.length, out) : new Grid(colours.length, 1, out);
}
