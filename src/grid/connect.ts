/**
 * Connecting cells of one colour: along rows, columns or both, the run of background cells
 * between two neighbouring drawn cells of the same colour takes a colour.
 */
import { paintBackgroundRuns } from './background-runs.ts';
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
  let changed = 0;
  if (rows) changed += paintBackgroundRuns(g, background, true, 'between', paint ?? -1, out);
  if (columns) changed += paintBackgroundRuns(g, background, false, 'between', paint ?? -1, out);
  return changed > 0 ? new Grid(g.height, g.width, out) : g;
}
