/** Cutting rectangles out of grids: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellBounds, cropGrid, cropRegion, cropToCells, cropToColourIn, cropToObject, half, keepMiddleLine, objectPicture, removeBorder } from '../src/grid/crop.ts';
import { GridObject } from '../src/grid/grid-object.ts';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const G = Grid.fromRows;
const nine = G([[1, 2, 3], [4, 5, 6], [7, 8, 9]]);

describe('bounds and crops of cells', () => {
  const g = G([[0, 0, 0, 0], [0, 2, 0, 0], [0, 0, 3, 0]]);

  it('cellBounds of matching and of non-matching cells', () => {
    expect(cellBounds(g, 0, false)).toEqual({ top: 1, left: 1, bottom: 2, right: 2 });
    expect(cellBounds(g, 3, true)).toEqual({ top: 2, left: 2, bottom: 2, right: 2 });
    expect(cellBounds(g, 7, true)).toBeUndefined();
  });

  it('cellBounds agrees with the extremes of the qualifying cells, found one by one', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 10, maxWidth: 10 }), fc.integer({ min: 0, max: 9 }), fc.boolean(), (x, colour, match) => {
        const rows: number[] = [];
        const columns: number[] = [];
        for (let r = 0; r < x.height; r++) {
          for (let c = 0; c < x.width; c++) {
            if ((x.get(r, c) === colour) === match) rows.push(r), columns.push(c);
          }
        }
        const expected = rows.length === 0 ? undefined : { top: Math.min(...rows), left: Math.min(...columns), bottom: Math.max(...rows), right: Math.max(...columns) };
        expect(cellBounds(x, colour, match)).toEqual(expected);
      }),
      { numRuns: 300 },
    );
  });

  it('cropToCells cuts to the content or to a colour; null when there is none', () => {
    expect(cropToCells(g, 0, false)!.toRows()).toEqual([[2, 0], [0, 3]]);
    expect(cropToCells(G([[0, 8, 1, 8]]), 8, true)!.toRows()).toEqual([[8, 1, 8]]);
    expect(cropToCells(g, 5, true)).toBeNull();
  });

  it('cropToColourIn cuts one grid where another has the colour', () => {
    const marks = G([[1, 0, 3], [4, 0, 6]]);
    expect(cropToColourIn(G([[5, 6, 7], [8, 9, 1]]), marks, 0)!.toRows()).toEqual([[6], [9]]);
    expect(cropToColourIn(nine, marks, 0)).toBeNull();
  });
});

describe('rectangles', () => {
  it('cropGrid and cropRegion copy a rectangle; cropRegion refuses one that leaves the grid', () => {
    expect(cropGrid(nine, 1, 0, 2, 2).toRows()).toEqual([[4, 5], [7, 8]]);
    expect(cropRegion(nine, 1, 1, 2, 2)!.toRows()).toEqual([[5, 6], [8, 9]]);
    expect(cropRegion(nine, 2, 2, 2, 1)).toBeNull();
    expect(cropRegion(nine, -1, 0, 1, 1)).toBeNull();
    expect(cropRegion(nine, 0, 0, 0, 1)).toBeNull();
  });

  it('removeBorder and the halves', () => {
    expect(removeBorder(nine)!.toRows()).toEqual([[5]]);
    expect(removeBorder(G([[1, 2], [3, 4]]))).toBeNull();
    expect(half(nine, 'top')!.toRows()).toEqual([[1, 2, 3]]);
    expect(half(nine, 'bottom')!.toRows()).toEqual([[7, 8, 9]]);
    expect(half(nine, 'left')!.toRows()).toEqual([[1], [4], [7]]);
    expect(half(nine, 'right')!.toRows()).toEqual([[3], [6], [9]]);
    expect(half(G([[1, 2]]), 'top')).toBeNull();
  });

  it('an even grid is its two halves joined', () => {
    fc.assert(
      fc.property(arbitraryGrid({ minHeight: 2, minWidth: 2 }), (x) => {
        const top = half(x, 'top')!;
        const bottom = half(x, 'bottom')!;
        if (x.height % 2 === 0) expect([...top.cells, ...bottom.cells]).toEqual([...x.cells]);
        expect(top.height).toBe(bottom.height);
        expect(top.height * 2 + (x.height % 2)).toBe(x.height);
      }),
    );
  });
});

describe('objects', () => {
  const o = new GridObject(1, 1, G([[5, 5], [EMPTY, 5]]));

  it('objectPicture puts the object on colour 0', () => {
    expect(objectPicture(o).toRows()).toEqual([[5, 5], [0, 5]]);
  });

  it('cropToObject takes the grid under the box, clipped; null when the box misses', () => {
    expect(cropToObject(nine, o)!.toRows()).toEqual([[5, 6], [8, 9]]);
    expect(cropToObject(nine, new GridObject(2, 2, o.shape))!.toRows()).toEqual([[9]]);
    expect(cropToObject(nine, new GridObject(3, 0, o.shape))).toBeNull();
  });
});

describe('keepMiddleLine', () => {
  const g = G([[6, 4, 0], [0, 3, 9], [1, 0, 0]]);

  it('keeps the middle column or row in place, the rest background', () => {
    expect(keepMiddleLine(g, true)!.toRows()).toEqual([[0, 4, 0], [0, 3, 0], [0, 0, 0]]);
    expect(keepMiddleLine(g, false)!.toRows()).toEqual([[0, 0, 0], [0, 3, 9], [0, 0, 0]]);
  });

  it('is null without a middle line', () => {
    expect(keepMiddleLine(G([[1, 2]]), true)).toBeNull();
    expect(keepMiddleLine(G([[1], [2]]), false)).toBeNull();
  });
});
