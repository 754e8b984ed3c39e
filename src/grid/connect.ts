/**
 * Connecting cells of one colour: along rows, columns or both, the run of background cells
 * between two neighbouring drawn cells of the same colour takes a colour.
 */
import { forEachBackgroundRun, type BackgroundRunVisitor } from './background-runs.ts';
import { backgroundColour } from './components.ts';
import { Grid, copyCells } from './grid.ts';

/**
 * Along every row (when `rows`), then every column (when `columns`), the background cells
 * between two neighbouring drawn cells of the same colour take `paint`, or that colour when
 * `paint` is null; a cell the rows filled stays as they filled it. The same grid when nothing
 * changes.
 */
export function connectSameColour(g: Grid, paint: number | null, rows: boolean, columns: boolean): Grid {
  const background = backgroundColour(g);
  const out = copyCells(g.cells);
  let changed = false;
  const connect: BackgroundRunVisitor = (first, step, length, before, after) => {
    if (before < 0 || before !== after) return;
    for (let k = 0; k < length; k++) {
      const i = first + k * step;
      if (out[i] !== background) continue;
      out[i] = paint ?? before;
      changed = true;
    }
  };
  if (rows) forEachBackgroundRun(g, background, true, connect);
  if (columns) forEachBackgroundRun(g, background, false, connect);
  return changed ? new Grid(g.height, g.width, out) : g;
}
