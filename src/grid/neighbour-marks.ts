/**
 * Marks beside cells: background cells that have a cell of a colour (or any drawn cell) among
 * their neighbours take a colour.
 */
import { backgroundColour, colourCounts } from './components.ts';
import { Grid, copyCells } from './grid.ts';

/** `source` value meaning any cell that is not the background. */
export const ANY_DRAWN_CELL = -1;

/**
 * Which cells count as a cell's neighbours: the four sharing an edge, the four sharing only a
 * corner, or the 3×3 block around it (the cell itself included, which matters only when the
 * source colour is the background).
 */
export type Neighbourhood = 'edges' | 'corners' | 'block';

/** Row and column steps of each neighbourhood, as pairs. */
const STEPS: Readonly<Record<Neighbourhood, readonly number[]>> = {
  edges: [-1, 0, 1, 0, 0, -1, 0, 1],
  corners: [-1, -1, -1, 1, 1, -1, 1, 1],
  block: [-1, -1, -1, 0, -1, 1, 0, -1, 0, 0, 0, 1, 1, -1, 1, 0, 1, 1],
};

/**
 * Background cells with a neighbour of colour `source` (any drawn cell for
 * {@link ANY_DRAWN_CELL}) take `colour`.
 */
export function markBeside(g: Grid, source: number, colour: number, neighbourhood: Neighbourhood): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  // Nothing to mark: no neighbour of the colour anywhere, or the mark is the background itself.
  if (colour === background || (source !== ANY_DRAWN_CELL && colourCounts(g)[source] === 0)) return g;
  const steps = STEPS[neighbourhood];
  const out = copyCells(cells);
  // From each source cell to the background cells around it (every neighbourhood is symmetric,
  // so this marks exactly the background cells with a source among their neighbours): sources
  // are usually far fewer than background cells.
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const v = cells[r * width + c]!;
      if (source === ANY_DRAWN_CELL ? v === background : v !== source) continue;
      for (let k = 0; k < steps.length; k += 2) {
        const nr = r + steps[k]!;
        const nc = c + steps[k + 1]!;
        if (nr < 0 || nr >= height || nc < 0 || nc >= width) continue;
        if (cells[nr * width + nc] === background) out[nr * width + nc] = colour;
      }
    }
  }
  return new Grid(height, width, out);
}
