/** Transforms of one object: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GridObject } from '../src/grid/grid-object.ts';
import { EMPTY, Grid, getSizeCap } from '../src/grid/grid.ts';
import { recolourObject, reflectObjectLeftRight, reflectObjectUpDown, shiftObject } from '../src/grid/object-transforms.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const E = EMPTY;
const L = new GridObject(2, 3, Grid.fromRows([[1, E], [1, 2]]));

describe('object transforms', () => {
  it('recolourObject paints every cell and keeps the holes and the place', () => {
    const r = recolourObject(L, 6);
    expect([r.top, r.left]).toEqual([2, 3]);
    expect(r.shape.toRows()).toEqual([[6, E], [6, 6]]);
  });

  it('shiftObject moves the place and keeps the shape', () => {
    const s = shiftObject(L, -1, 4)!;
    expect([s.top, s.left]).toEqual([1, 7]);
    expect(s.shape.equals(L.shape)).toBe(true);
    expect(s.cells).toBe(L.cells);
  });

  it('shiftObject refuses to go further than twice the size cap', () => {
    expect(shiftObject(L, 2 * getSizeCap(), 0)).toBeNull();
    expect(shiftObject(L, 0, -2 * getSizeCap() - 4)).toBeNull();
  });

  it('reflections mirror the shape in place', () => {
    expect(reflectObjectLeftRight(L).shape.toRows()).toEqual([[E, 1], [2, 1]]);
    expect(reflectObjectUpDown(L).shape.toRows()).toEqual([[1, 2], [1, E]]);
    expect([reflectObjectUpDown(L).top, reflectObjectUpDown(L).left]).toEqual([2, 3]);
  });

  it('each reflection twice is the identity, and shifting back undoes a shift', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: -5, max: 5 }), fc.integer({ min: -5, max: 5 }), (shape, dr, dc) => {
        const o = new GridObject(1, 1, shape);
        expect(reflectObjectLeftRight(reflectObjectLeftRight(o)).equals(o)).toBe(true);
        expect(reflectObjectUpDown(reflectObjectUpDown(o)).equals(o)).toBe(true);
        expect(shiftObject(shiftObject(o, dr, dc)!, -dr, -dc)!.equals(o)).toBe(true);
      }),
    );
  });
});
