/**
 * Where the object-moving rules start (sliding toward a colour, lining up with it): the
 * rectangle around the cells of a target colour, and the one-colour objects (cells joined
 * through edges or corners), each marked as of that colour (so it stays) or not (so it moves).
 */
import { backgroundColour, components } from './components.ts';
import { cellBounds, type Bounds } from './crop.ts';
import type { GridObject } from './grid-object.ts';
import { EMPTY, type Grid, newCells } from './grid.ts';

export interface ObjectsAroundColour {
  readonly background: number;
  /** The smallest rectangle holding every cell of the target colour. */
  readonly target: Bounds;
  /** One-colour objects joined through edges or corners, in reading order. */
  readonly objects: readonly GridObject[];
  /** 1 where `objects[i]` is of the target colour itself. */
  readonly ofTarget: Uint8Array;
}

/** The colour of a one-colour object: the colour of its first cell in reading order. */
export function firstCellColour(o: GridObject): number {
  const cells = o.cells;
  return cells[cells.findIndex((v) => v !== EMPTY)]!;
}

/** The objects of the grid around the cells of `colour`; null when that colour is the background or absent. */
export function objectsAroundColour(g: Grid, colour: number): ObjectsAroundColour | null {
  const background = backgroundColour(g);
  if (colour === background) return null;
  const target = cellBounds(g, colour, true);
  if (!target) return null;
  const objects = components(g, { diagonal: true, multicolour: false, background });
  const ofTarget = newCells(objects.length);
  for (let i = 0; i < objects.length; i++) if (firstCellColour(objects[i]!) === colour) ofTarget[i] = 1;
  return { background, target, objects, ofTarget };
}
