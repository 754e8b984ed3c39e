/**
 * Recolouring the one-colour objects of a grid (cells joined through edges) by their size: the
 * largest and the smallest each in a colour, or every object by the rank of its size.
 */
import { backgroundColour, components } from './components.ts';
import { Grid, copyCells } from './grid.ts';
import { paintObjectInto } from './paint-object.ts';
import { sortSmall } from './small-sort.ts';

/** The first largest object gets `large`, the first smallest `small`; null with fewer than two objects. */
export function recolourLargestAndSmallest(g: Grid, large: number, small: number): Grid | null {
  const objects = components(g, { diagonal: false, multicolour: false, background: backgroundColour(g) });
  if (objects.length < 2) return null;
  let biggest = 0;
  let least = 0;
  for (let i = 1; i < objects.length; i++) {
    if (objects[i]!.size > objects[biggest]!.size) biggest = i;
    if (objects[i]!.size < objects[least]!.size) least = i;
  }
  if (biggest === least) return null;
  const cells = copyCells(g.cells);
  paintObjectInto(cells, g.height, g.width, objects[biggest]!, large);
  paintObjectInto(cells, g.height, g.width, objects[least]!, small);
  return new Grid(g.height, g.width, cells);
}

/**
 * Every object of the largest size gets colour 1, of the next size down colour 2, and so on;
 * null with no objects or more than nine different sizes.
 */
export function recolourBySizeRank(g: Grid): Grid | null {
  const objects = components(g, { diagonal: false, multicolour: false, background: backgroundColour(g) });
  if (objects.length === 0) return null;
  const sizes: number[] = [];
  for (const o of objects) if (!sizes.includes(o.size)) sizes.push(o.size);
  sortSmall(sizes, (a, b) => b - a);
  if (sizes.length > 9) return null;
  const cells = copyCells(g.cells);
  for (const o of objects) paintObjectInto(cells, g.height, g.width, o, sizes.indexOf(o.size) + 1);
  return new Grid(g.height, g.width, cells);
}
