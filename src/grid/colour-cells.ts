/** All the cells of one colour gathered into a single object, wherever they lie. */
import { backgroundColour } from './components.ts';
import { EMPTY, Grid, newCells, fillCells } from './grid.ts';
import { GridObject } from './grid-object.ts';
import { cellBounds } from './crop.ts';

/** The object made of every cell of `colour`, or null when the grid has none. */
export function cellsOfColour(grid: Grid, colour: number): GridObject | null {
  const bounds = cellBounds(grid, colour, true);
  if (!bounds) return null;
  const h = bounds.bottom - bounds.top + 1;
  const w = bounds.right - bounds.left + 1;
  const shape = fillCells(newCells(h * w), EMPTY);
  const cells = grid.cells;
  for (let r = 0; r < h; r++) {
    const from = (bounds.top + r) * grid.width + bounds.left;
    for (let c = 0; c < w; c++) if (cells[from + c] === colour) shape[r * w + c] = colour;
  }
  return new GridObject(bounds.top, bounds.left, new Grid(h, w, shape));
}

/** One object per colour present other than the background, holding all its cells, in colour order. */
export function colourGroups(grid: Grid): GridObject[] {
  const background = backgroundColour(grid);
  const groups: GridObject[] = [];
  for (let colour = 0; colour < 10; colour++) {
    if (colour === background) continue;
    const group = cellsOfColour(grid, colour);
    if (group) groups.push(group);
  }
  return groups;
}
