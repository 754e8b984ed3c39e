/**
 * Drawing objects onto grids: painting an object's cells at its position, or clearing the
 * cells it covers (into a cell buffer or as a new grid), moving or changing several objects at
 * once; cells that fall outside the grid are dropped.
 */
import { backgroundColour } from './components.ts';
import { GridObject } from './grid-object.ts';
import { EMPTY, Grid, newCells, copyCells, fillCells } from './grid.ts';

/**
 * Writes the object's cells into `cells` (a height × width buffer), shifted by
 * (`rowShift`, `columnShift`). When `colour` is given, every covered cell gets that colour
 * instead of the object's own.
 */
export function paintObjectInto(
  cells: Uint8Array,
  height: number,
  width: number,
  object: GridObject,
  colour?: number,
  rowShift = 0,
  columnShift = 0,
): void {
  const top = object.top + rowShift;
  const left = object.left + columnShift;
  const rowFrom = Math.max(0, -top);
  const rowTo = Math.min(object.height, height - top);
  const columnFrom = Math.max(0, -left);
  const columnTo = Math.min(object.width, width - left);
  for (let r = rowFrom; r < rowTo; r++) {
    const source = r * object.width;
    const target = (top + r) * width + left;
    for (let c = columnFrom; c < columnTo; c++) {
      const v = object.data[object.offset + source + c]!;
      if (v !== EMPTY) cells[target + c] = colour ?? v;
    }
  }
}

/**
 * Moves objects of `grid` at once: every object with a non-zero move (`moves[2i]` rows,
 * `moves[2i + 1]` columns) is first lifted (its cells become `background`), then each is put
 * down at its new place, so objects moving past each other do not erase one another.
 */
export function moveObjects(grid: Grid, objects: readonly GridObject[], moves: ArrayLike<number>, background: number): Grid {
  const { height, width } = grid;
  const out = copyCells(grid.cells);
  for (let i = 0; i < objects.length; i++) {
    if (moves[2 * i] !== 0 || moves[2 * i + 1] !== 0) paintObjectInto(out, height, width, objects[i]!, background);
  }
  for (let i = 0; i < objects.length; i++) {
    const dr = moves[2 * i]!;
    const dc = moves[2 * i + 1]!;
    if (dr !== 0 || dc !== 0) paintObjectInto(out, height, width, objects[i]!, undefined, dr, dc);
  }
  return new Grid(height, width, out);
}

/** The grid with every object painted on it in order; later objects cover earlier ones. */
export function paintObjects(g: Grid, objects: readonly GridObject[]): Grid {
  const out = copyCells(g.cells);
  for (const o of objects) paintObjectInto(out, g.height, g.width, o);
  return new Grid(g.height, g.width, out);
}

/** The grid with the cells under every object turned to the background colour. */
export function eraseObjects(g: Grid, objects: readonly GridObject[]): Grid {
  const background = backgroundColour(g);
  const out = copyCells(g.cells);
  for (const o of objects) paintObjectInto(out, g.height, g.width, o, background);
  return new Grid(g.height, g.width, out);
}

/** The grid with every cell outside the object turned to the background colour. */
export function keepOnlyObject(g: Grid, object: GridObject): Grid {
  const out = fillCells(newCells(g.height * g.width), backgroundColour(g));
  paintObjectInto(out, g.height, g.width, object);
  return new Grid(g.height, g.width, out);
}

/**
 * Every object erased from the grid, then each painted again as `transform` changes it. The
 * transform may give something other than an object (the language's failure value) when it
 * cannot apply; then so does this, with null.
 */
export function mapObjects<Other>(g: Grid, objects: readonly GridObject[], transform: (o: GridObject) => GridObject | Other): Grid | null {
  const background = backgroundColour(g);
  const out = copyCells(g.cells);
  const moved: GridObject[] = [];
  for (const o of objects) {
    paintObjectInto(out, g.height, g.width, o, background);
    const t = transform(o);
    if (!(t instanceof GridObject)) return null;
    moved.push(t);
  }
  for (const o of moved) paintObjectInto(out, g.height, g.width, o);
  return new Grid(g.height, g.width, out);
}
