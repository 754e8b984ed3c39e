/**
 * Object rules: the one-colour objects of a grid (cells joined through edges) that pass, or
 * fail, a test are painted in one colour or erased, in place.
 */
import { backgroundColour, components } from './components.ts';
import type { GridObject } from './grid-object.ts';
import { Grid, copyCells } from './grid.ts';
import { paintObjectInto } from './paint-object.ts';

/**
 * Paints every object whose verdict is `wanted` in `colour`, or in the background colour when
 * `colour` is null; the same grid when no object qualifies. The test may give something other
 * than a boolean (the language's failure value) when it cannot apply; then so does this, with
 * null.
 */
export function paintObjectsWhere<Other>(
  g: Grid,
  test: (o: GridObject) => boolean | Other,
  wanted: boolean,
  colour: number | null,
): Grid | null {
  const background = backgroundColour(g);
  const objects = components(g, { diagonal: false, multicolour: false, background });
  const out = copyCells(g.cells);
  let changed = false;
  for (const o of objects) {
    const verdict = test(o);
    if (typeof verdict !== 'boolean') return null;
    if (verdict !== wanted) continue;
    paintObjectInto(out, g.height, g.width, o, colour ?? background);
    changed = true;
  }
  return changed ? new Grid(g.height, g.width, out) : g;
}
