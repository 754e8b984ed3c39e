/** Object rules: objects that pass a test painted or erased in place. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { GridObject } from '../src/grid/grid-object.ts';
import { Grid } from '../src/grid/grid.ts';
import { paintObjectsWhere } from '../src/grid/object-rules.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;
const g = G([[1, 0, 1, 1], [0, 0, 0, 0], [2, 0, 0, 0]]);
const single = (o: GridObject) => o.size === 1;

describe('paintObjectsWhere', () => {
  it('paints the objects that pass, or erases them, or erases those that fail', () => {
    expect(paintObjectsWhere(g, single, true, 5)!.toRows()).toEqual([[5, 0, 1, 1], [0, 0, 0, 0], [5, 0, 0, 0]]);
    expect(paintObjectsWhere(g, single, true, null)!.toRows()).toEqual([[0, 0, 1, 1], [0, 0, 0, 0], [0, 0, 0, 0]]);
    expect(paintObjectsWhere(g, single, false, null)!.toRows()).toEqual([[1, 0, 0, 0], [0, 0, 0, 0], [2, 0, 0, 0]]);
  });

  it('gives back the same grid when no object qualifies, and null when the test cannot apply', () => {
    expect(paintObjectsWhere(g, () => false, true, 5)).toBe(g);
    expect(paintObjectsWhere(g, () => Symbol('cannot'), true, 5)).toBeNull();
  });

  it('erasing what passes and erasing what fails: each drawn cell survives exactly one of the two', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 1, max: 4 }), (x, size) => {
        const test = (o: GridObject) => o.size <= size;
        const erasedPassing = paintObjectsWhere(x, test, true, null)!;
        const erasedFailing = paintObjectsWhere(x, test, false, null)!;
        const background = backgroundOf(x);
        for (let i = 0; i < x.cells.length; i++) {
          const survivals = (erasedPassing.cells[i] === x.cells[i] ? 1 : 0) + (erasedFailing.cells[i] === x.cells[i] ? 1 : 0);
          expect(survivals).toBe(x.cells[i] === background ? 2 : 1);
        }
      }),
    );
  });
});
