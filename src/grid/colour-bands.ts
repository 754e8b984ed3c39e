/**
 * The order of colour bands: the colours other than 0, sorted by their mean column (one
 * row) when their mean columns spread wider than their mean rows, else by their mean row (one
 * column).
 */
import { Grid } from './grid.ts';

export function colourBands(g: Grid): Grid | null {
  const { height, width, cells } = g;
  const count = new Float64Array(10);
  const rowSum = new Float64Array(10);
  const columnSum = new Float64Array(10);
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const v = cells[r * width + c]!;
      if (v === 0) continue;
      count[v]!++;
      rowSum[v]! += r;
      columnSum[v]! += c;
    }
  }
  const colours: number[] = [];
  for (let v = 1; v < 10; v++) if (count[v]! > 0) colours.push(v);
  if (colours.length === 0) return null;
  const meanRow = (v: number) => rowSum[v]! / count[v]!;
  const meanColumn = (v: number) => columnSum[v]! / count[v]!;
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
  colours.sort((a, b) => key(a) - key(b) || a - b);
  const out = Uint8Array.from(colours);
  return across ? new Grid(1, colours.length, out) : new Grid(colours.length, 1, out);
}
