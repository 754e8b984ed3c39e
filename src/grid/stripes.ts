/**
 * Stripes: every row (or every column) painted in its most frequent colour, and the choice of
 * the direction that agrees best with the grid.
 */
import { Grid, newCells } from './grid.ts';
import { mostFrequentColour } from './most-frequent-colour.ts';

/** Each row (alongRows) or column becomes its most frequent colour, the lowest on ties. */
export function majorityLines(g: Grid, alongRows: boolean): Grid {
  const { height, width, cells } = g;
  const out = newCells(cells.length);
  const counts = new Uint16Array(10);
  const lines = alongRows ? height : width;
  const length = alongRows ? width : height;
  const step = alongRows ? 1 : width;
  for (let line = 0; line < lines; line++) {
    const start = alongRows ? line * width : line;
    counts.fill(0);
    for (let k = 0; k < length; k++) counts[cells[start + k * step]!]!++;
    const best = mostFrequentColour(counts);
    for (let k = 0; k < length; k++) out[start + k * step] = best;
  }
  return new Grid(height, width, out);
}

function agreement(a: Grid, b: Grid): number {
  let same = 0;
  for (let i = 0; i < a.cells.length; i++) if (a.cells[i] === b.cells[i]) same++;
  return same;
}

/** Row stripes or column stripes (see majorityLines), whichever keeps more cells as they were; rows on ties. */
export function restoreStripes(g: Grid): Grid {
  const rows = majorityLines(g, true);
  const columns = majorityLines(g, false);
  return agreement(columns, g) > agreement(rows, g) ? columns : rows;
}
