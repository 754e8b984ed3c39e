/** Laying same-sized grids over each other, with one colour see-through. */
import { Grid, copyCells } from './grid.ts';
import { backgroundOfCounts } from './most-frequent-colour.ts';

/** The top grid laid over the bottom one: its cells of `transparent` let the bottom show; null unless the sizes match. */
export function overlay(bottom: Grid, top: Grid, transparent: number): Grid | null {
  if (bottom.height !== top.height || bottom.width !== top.width) return null;
  const out = copyCells(bottom.cells);
  const cells = top.cells;
  for (let i = 0; i < out.length; i++) if (cells[i] !== transparent) out[i] = cells[i]!;
  return new Grid(bottom.height, bottom.width, out);
}

/**
 * Stacks the grids in order; later cells that are not the shared background win. The shared
 * background follows the background rule over the cells of all the grids together. Null for
 * no grids or grids of different sizes.
 */
export function overlayAll(grids: readonly Grid[]): Grid | null {
  if (grids.length === 0) return null;
  const { height, width } = grids[0]!;
  const counts = new Uint32Array(10);
  for (const g of grids) {
    if (g.height !== height || g.width !== width) return null;
    const cells = g.cells;
    for (let i = 0; i < cells.length; i++) counts[cells[i]!]!++;
  }
  const background = backgroundOfCounts(counts);
  const out = copyCells(grids[0]!.cells);
  for (let k = 1; k < grids.length; k++) {
    const cells = grids[k]!.cells;
    for (let i = 0; i < out.length; i++) if (cells[i] !== background) out[i] = cells[i]!;
  }
  return new Grid(height, width, out);
}
