/**
 * A cell's place on a grid, or an offset, in rows and columns. The language's point value has
 * this shape, so algorithms here can take points without knowing the language.
 */
import type { Grid } from './grid.ts';

export interface Position {
  readonly row: number;
  readonly column: number;
}

/** Whether the position is a cell of the grid. */
export function isInside(g: Grid, p: Position): boolean {
  return p.row >= 0 && p.column >= 0 && p.row < g.height && p.column < g.width;
}

/** The colour of the cell at the position; null outside the grid. */
export function colourAt(g: Grid, p: Position): number | null {
  return isInside(g, p) ? g.data[g.offset + p.row * g.width + p.column]! : null;
}
