/** Holes: enclosed cells, counted, taken as objects, filled. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GridObject } from '../src/grid/grid-object.ts';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { countEnclosedRegions, enclosedCells, enclosedRegions, fillEnclosed, holeCount } from '../src/grid/holes.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const G = Grid.fromRows;
const E = EMPTY;

// two rings side by side, the right one with a gap in its wall
const rings = G([
  [1, 1, 1, 0, 2, 2, 2],
  [1, 0, 1, 0, 2, 0, 0],
  [1, 1, 1, 0, 2, 2, 2],
]);

describe('enclosed cells and regions', () => {
  it('marks only the cells that cannot reach the border', () => {
    expect([...enclosedCells(rings, 0)]).toEqual([0, 0, 0, 0, 0, 0, 0, 0, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0]);
    expect(countEnclosedRegions(rings, 0)).toBe(1);
  });

  it('enclosedRegions are objects of background cells', () => {
    const regions = enclosedRegions(rings);
    expect(regions).toHaveLength(1);
    expect([regions[0]!.top, regions[0]!.left, regions[0]!.size]).toEqual([1, 1, 1]);
    expect(enclosedRegions(G([[0, 1], [1, 0]]))).toEqual([]);
  });

  it('fillEnclosed colours the holes and nothing else', () => {
    expect(fillEnclosed(rings, 4).toRows()).toEqual([
      [1, 1, 1, 0, 2, 2, 2],
      [1, 4, 1, 0, 2, 0, 0],
      [1, 1, 1, 0, 2, 2, 2],
    ]);
  });

  it('holeCount counts the gaps an object closes in', () => {
    const eight = new GridObject(0, 0, G([[3, 3, 3], [3, E, 3], [3, 3, 3], [3, E, 3], [3, 3, 3]]));
    expect(holeCount(eight)).toBe(2);
    expect(holeCount(new GridObject(0, 0, G([[3, E], [3, 3]])))).toBe(0);
  });

  it('no cell on the border is ever enclosed, and filling twice is filling once', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 1, max: 9 }), (g, colour) => {
        const marks = enclosedCells(g, 0);
        for (let r = 0; r < g.height; r++) {
          for (let c = 0; c < g.width; c++) {
            if (r === 0 || c === 0 || r === g.height - 1 || c === g.width - 1) expect(marks[r * g.width + c]).toBe(0);
          }
        }
        const once = fillEnclosed(g, colour);
        expect(fillEnclosed(once, colour).equals(once)).toBe(true);
      }),
    );
  });
});
