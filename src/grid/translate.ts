/** Shifting the whole picture of a grid inside its frame. */
import { backgroundColour } from './components.ts';
import { Grid, newCells, copyRun, fillCells } from './grid.ts';
import type { Position } from './position.ts';

/** The picture shifted by the offset in rows and columns; cells shifted out are lost, vacated cells become the background. */
export function translate(g: Grid, offset: Position): Grid {
  const { height, width, cells } = g;
  const dr = offset.row;
  const dc = offset.column;
  const out = fillCells(newCells(height * width), backgroundColour(g));
  if (Math.abs(dr) >= height || Math.abs(dc) >= width) return new Grid(height, width, out);
  const columnFrom = Math.max(0, -dc);
  const columnTo = Math.min(width, width - dc);
  for (let r = Math.max(0, -dr); r < Math.min(height, height - dr); r++) {
    const source = r * width;
    copyRun(cells, source + columnFrom, out, (r + dr) * width + columnFrom + dc, columnTo - columnFrom);
  }
  return new Grid(height, width, out);
}
