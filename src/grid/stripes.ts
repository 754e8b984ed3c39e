/**
 * Stripes: every row (or every column) painted in its most frequent colour, and the choice of
 * the direction that agrees best with the grid.
 */
import { Grid, newCells, fillCells } from './grid.ts';
import { mostFrequentColour } from './most-frequent-colour.ts';
import { WorkArray } from './work-array.ts';

/** Work arrays: colour counts of one line, and each line's most frequent colour. */
const lineCounts = new Uint16Array(10);
const rowBest = new WorkArray(Uint8Array);
const columnBest = new WorkArray(Uint8Array);

/** Each line's (row's when alongRows, else column's) most frequent colour, the lowest on ties, into `best`. */
function lineMajorities(g: Grid, alongRows: boolean, best: Uint8Array): void {
  const { height, width, cells } = g;
  const lines = alongRows ? height : width;
  const length = alongRows ? width : height;
  const step = alongRows ? 1 : width;
  for (let line = 0; line < lines; line++) {
    const start = alongRows ? line * width : line;
    lineCounts.fill(0);
    for (let k = 0; k < length; k++) lineCounts[cells[start + k * step]!]!++;
    best[line] = mostFrequentColour(lineCounts);
  }
}

/** The grid with each line painted in its colour from `best`. */
function paintLines(g: Grid, alongRows: boolean, best: Uint8Array): Grid {
  const { height, width } = g;
  const out = newCells(height * width);
  if (alongRows) for (let r = 0; r < height; r++) fillCells(out, best[r]!, r * width, (r + 1) * width);
  else for (let r = 0; r < height; r++) for (let c = 0; c < width; c++) out[r * width + c] = best[c]!;
  return new Grid(height, width, out);
}

/** Each row (alongRows) or column becomes its most frequent colour, the lowest on ties. */
export function majorityLines(g: Grid, alongRows: boolean): Grid {
  const best = (alongRows ? rowBest : columnBest).take(alongRows ? g.height : g.width);
  lineMajorities(g, alongRows, best);
  return paintLines(g, alongRows, best);
}

/** Row stripes or column stripes (see majorityLines), whichever keeps more cells as they were; rows on ties. */
export function restoreStripes(g: Grid): Grid {
  const { height, width, cells } = g;
  const rows = rowBest.take(height);
  const columns = columnBest.take(width);
  lineMajorities(g, true, rows);
  lineMajorities(g, false, columns);
  // Cells each direction keeps as they were, counted without painting either.
  let keptByRows = 0;
  let keptByColumns = 0;
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const v = cells[r * width + c]!;
      if (v === rows[r]) keptByRows++;
      if (v === columns[c]) keptByColumns++;
    }
  }
  return keptByColumns > keptByRows ? paintLines(g, false, columns) : paintLines(g, true, rows);
}
