/**
 * The background rule written out independently of src/grid/components.ts, for tests that
 * must not use the code they check: 0 whenever a cell is 0, otherwise the most
 * frequent colour (the lowest on ties).
 */
import type { Grid } from '../../src/grid/grid.ts';

export function backgroundOf(g: Grid): number {
  if (g.cells.includes(0)) return 0;
  const counts = new Array<number>(10).fill(0);
  for (const v of g.cells) counts[v]!++;
  return counts.indexOf(Math.max(...counts));
}
