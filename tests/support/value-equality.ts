/**
 * Test setup: `toEqual` compares grids and objects as the values they are. A grid holds the
 * bytes of a whole slab and the place its cells start there, so two equal grids made at
 * different places differ field by field; they are equal when their shapes and cells are
 * (`Grid.equals`, and `GridObject.equals` with the position).
 */
import { expect } from 'vitest';
import { Grid } from '../../src/grid/grid.ts';
import { GridObject } from '../../src/grid/grid-object.ts';

expect.addEqualityTesters([
  function sameValue(a: unknown, b: unknown): boolean | undefined {
    if (a instanceof Grid && b instanceof Grid) return a.equals(b);
    if (a instanceof GridObject && b instanceof GridObject) return a.equals(b);
    if (a instanceof Grid || b instanceof Grid || a instanceof GridObject || b instanceof GridObject) return false;
    return undefined;
  },
]);
