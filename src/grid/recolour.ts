/**
 * Recolouring cell by cell through a colour table: one colour to another, a whole colour map,
 * two colours swapped, everything but one colour (or but the background) made one colour.
 */
import { backgroundColour, colourCounts } from './components.ts';
import { Grid, newCells, copyCells } from './grid.ts';

/**
 * The grid with every colour c replaced by `target[c]` (`target` holds an entry for every
 * value a cell can have); the same grid when nothing changes (read off the grid's colour counts,
 * which most grids have memoised already).
 */
export function mapColours(g: Grid, target: Uint8Array): Grid {
  const counts = colourCounts(g);
  let changed = false;
  for (let c = 0; c < 10; c++) {
    if (target[c] !== c && counts[c]! > 0) {
      changed = true;
      break;
    }
  }
  if (!changed) return g;
  const source = g.cells;
  const cells = newCells(source.length);
  for (let i = 0; i < source.length; i++) cells[i] = target[source[i]!]!;
  return new Grid(g.height, g.width, cells);
}

/**
 * One colour table for every call (filled afresh by each; mapColours reads it before returning):
 * a table per call would cost the search an allocation each time.
 */
const table = new Uint8Array(256);
/** Every value mapped to itself, copied into the shared table in one native call. */
const IDENTITY = Uint8Array.from({ length: 256 }, (_, c) => c);

/** The shared table, filled with `colour` (or, by default, each value mapped to itself). */
function freshTable(colour = -1): Uint8Array {
  if (colour >= 0) table.fill(colour);
  else table.set(IDENTITY);
  return table;
}

/** Cells of `from` get `to`; the same grid when there are none or the colours are equal. */
export function recolour(g: Grid, from: number, to: number): Grid {
  if (from === to || (from < 10 && colourCounts(g)[from] === 0)) return g;
  const source = g.cells;
  const first = source.indexOf(from);
  if (first < 0) return g;
  const cells = copyCells(source);
  for (let i = first; i < cells.length; i++) if (cells[i] === from) cells[i] = to;
  return new Grid(g.height, g.width, cells);
}

/** Every colour c becomes `colourMap[c]` (ten entries, colours 0–9), all at once. */
export function applyColourMap(g: Grid, colourMap: ArrayLike<number>): Grid {
  const target = freshTable();
  for (let c = 0; c < 10; c++) target[c] = colourMap[c]!;
  return mapColours(g, target);
}

/** Cells of `a` get `b` and cells of `b` get `a`. */
export function swapColours(g: Grid, a: number, b: number): Grid {
  const target = freshTable();
  target[a] = b;
  target[b] = a;
  return mapColours(g, target);
}

/** Cells of the colour keep it; every other cell becomes the background. */
export function keepColour(g: Grid, colour: number): Grid {
  const background = backgroundColour(g);
  const target = freshTable(background);
  target[colour] = colour;
  return mapColours(g, target);
}

/** Every cell that is not the background gets the colour. */
export function recolourAllButBackground(g: Grid, colour: number): Grid {
  const background = backgroundColour(g);
  const target = freshTable(colour);
  target[background] = background;
  return mapColours(g, target);
}
