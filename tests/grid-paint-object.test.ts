/** Drawing objects onto grids: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { components } from '../src/grid/components.ts';
import { GridObject } from '../src/grid/grid-object.ts';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { eraseObjects, keepOnlyObject, mapObjects, moveObjects, paintObjectInto, paintObjects } from '../src/grid/paint-object.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;
const E = EMPTY;

describe('paintObjectInto', () => {
  it('paints the object at its place, shifted, clipped at the edges, in its own colours or one', () => {
    const cells = new Uint8Array(6);
    const o = new GridObject(0, 1, G([[4, E], [4, 5]]));
    paintObjectInto(cells, 2, 3, o);
    expect([...cells]).toEqual([0, 4, 0, 0, 4, 5]);
    paintObjectInto(cells, 2, 3, o, 7, 1, 1);
    // shifted one down and one right: only its top row, (1, 2), lands inside
    expect([...cells]).toEqual([0, 4, 0, 0, 4, 7]);
  });
});

describe('painting and erasing objects', () => {
  const g = G([[1, 0, 2, 2], [0, 0, 0, 3]]);
  const objects = components(g, { diagonal: false, multicolour: false, background: 0 });

  it('paintObjects draws in order, later objects on top', () => {
    const a = new GridObject(0, 0, G([[6, 6]]));
    const b = new GridObject(0, 1, G([[7]]));
    expect(paintObjects(Grid.filled(1, 3, 0), [a, b]).toRows()).toEqual([[6, 7, 0]]);
  });

  it('eraseObjects and keepOnlyObject', () => {
    // objects in reading order: 1 at (0,0), 2 2 at (0,2), 3 at (1,3)
    expect(eraseObjects(g, [objects[1]!]).toRows()).toEqual([[1, 0, 0, 0], [0, 0, 0, 3]]);
    expect(keepOnlyObject(g, objects[2]!).toRows()).toEqual([[0, 0, 0, 0], [0, 0, 0, 3]]);
  });

  it('mapObjects erases all, then paints each as changed; null when the change cannot apply', () => {
    const down = (o: GridObject) => new GridObject(o.top + 1, o.left, o.shape);
    expect(mapObjects(g, objects.slice(0, 2), down)!.toRows()).toEqual([[0, 0, 0, 0], [1, 0, 2, 2]]);
    expect(mapObjects(g, objects, () => 'cannot')).toBeNull();
  });

  it('erasing every object leaves only the background; painting them back restores the grid', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (x) => {
        const background = backgroundOf(x);
        const all = components(x, { diagonal: true, multicolour: true, background });
        const erased = eraseObjects(x, all);
        expect(erased.cells.every((v) => v === background)).toBe(true);
        expect(paintObjects(erased, all).equals(x)).toBe(true);
      }),
    );
  });
});

describe('moveObjects', () => {
  it('lifts every moving object first, so objects passing each other survive', () => {
    const g = G([[1, 2, 0]]);
    const objects = components(g, { diagonal: false, multicolour: false, background: 0 });
    // 1 moves two right, 2 one left: they cross
    expect(moveObjects(g, objects, [0, 2, 0, -1], 0).toRows()).toEqual([[2, 0, 1]]);
  });
});
