/** Cropping primitives: hand-worked cases and fast-check laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { FAILURE } from '../src/language/failure.ts';
import type { GridObject } from '../src/grid/grid-object.ts';
import { Point } from '../src/language/point.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { callPrimitive } from './support/run-primitive.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;
const rows = (value: unknown): unknown => (value instanceof Grid ? value.toRows() : value);

const countNot = (g: Grid, colour: number) => g.cells.reduce((n, v) => n + (v === colour ? 0 : 1), 0);
const sub = (g: Grid, top: number, left: number, h: number, w: number) =>
  g.toRows().slice(top, top + h).map((row) => row.slice(left, left + w));

describe('cropping laws', () => {
  it('crop_to_content fits in the input, keeps every non-background cell and is tight', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const background = backgroundOf(g);
        const result = callPrimitive('crop_to_content', g);
        if (countNot(g, background) === 0) {
          expect(result).toBe(FAILURE);
          return;
        }
        const c = result as Grid;
        expect(c.height).toBeLessThanOrEqual(g.height);
        expect(c.width).toBeLessThanOrEqual(g.width);
        expect(countNot(c, background)).toBe(countNot(g, background));
        const r = c.toRows();
        expect(r[0]!.some((v) => v !== background)).toBe(true);
        expect(r[r.length - 1]!.some((v) => v !== background)).toBe(true);
        expect(r.some((row) => row[0] !== background)).toBe(true);
        expect(r.some((row) => row[row.length - 1] !== background)).toBe(true);
      }),
    );
  });

  it('crop_to_object gives the grid under the object box; object_picture the object on 0', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        for (const o of callPrimitive('objects_multicolour', g) as GridObject[]) {
          const crop = callPrimitive('crop_to_object', g, o) as Grid;
          expect(crop.toRows()).toEqual(sub(g, o.top, o.left, o.height, o.width));
          const picture = callPrimitive('object_picture', o) as Grid;
          expect([picture.height, picture.width]).toEqual([o.height, o.width]);
          for (let i = 0; i < picture.cells.length; i++) {
            const v = o.shape.cells[i]!;
            expect(picture.cells[i]).toBe(v === EMPTY ? 0 : v);
            if (v !== EMPTY) expect(crop.cells[i]).toBe(v);
          }
        }
      }),
    );
  });

  it('crop_region inside the grid copies those cells; any part outside fails', () => {
    fc.assert(
      fc.property(
        arbitraryGrid(),
        fc.integer({ min: -2, max: 9 }),
        fc.integer({ min: -2, max: 9 }),
        fc.integer({ min: -1, max: 9 }),
        fc.integer({ min: -1, max: 9 }),
        (g, top, left, h, w) => {
          const result = callPrimitive('crop_region', g, new Point(top, left), new Point(h, w));
          const inside = top >= 0 && left >= 0 && h >= 1 && w >= 1 && top + h <= g.height && left + w <= g.width;
          if (!inside) expect(result).toBe(FAILURE);
          else expect(rows(result)).toEqual(sub(g, top, left, h, w));
        },
      ),
    );
  });

  it('the halves have half the size, rounded down, and come from the right edge', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const h = Math.floor(g.height / 2);
        const w = Math.floor(g.width / 2);
        const top = callPrimitive('top_half', g);
        const bottom = callPrimitive('bottom_half', g);
        const left = callPrimitive('left_half', g);
        const right = callPrimitive('right_half', g);
        if (h === 0) {
          expect(top).toBe(FAILURE);
          expect(bottom).toBe(FAILURE);
        } else {
          expect(rows(top)).toEqual(sub(g, 0, 0, h, g.width));
          expect(rows(bottom)).toEqual(sub(g, g.height - h, 0, h, g.width));
        }
        if (w === 0) {
          expect(left).toBe(FAILURE);
          expect(right).toBe(FAILURE);
        } else {
          expect(rows(left)).toEqual(sub(g, 0, 0, g.height, w));
          expect(rows(right)).toEqual(sub(g, 0, g.width - w, g.height, w));
        }
      }),
    );
  });

  it('crop_to_colour holds every cell of the colour, with one on each edge', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 0, max: 9 }), (g, colour) => {
        const count = g.cells.reduce((n, v) => n + (v === colour ? 1 : 0), 0);
        const result = callPrimitive('crop_to_colour', g, colour);
        if (count === 0) {
          expect(result).toBe(FAILURE);
          return;
        }
        const r = (result as Grid).toRows();
        expect(r.flat().filter((v) => v === colour).length).toBe(count);
        expect(r[0]!.includes(colour) && r[r.length - 1]!.includes(colour)).toBe(true);
        expect(r.some((row) => row[0] === colour) && r.some((row) => row[row.length - 1] === colour)).toBe(true);
      }),
    );
  });
});

describe('cropping, hand-worked cases', () => {
  const g = G([
    [0, 0, 0, 0, 0],
    [0, 3, 0, 0, 0],
    [0, 0, 0, 4, 0],
    [0, 0, 0, 0, 0],
  ]);

  it('crop_to_content keeps the gap between two far cells', () => {
    expect(rows(callPrimitive('crop_to_content', g))).toEqual([
      [3, 0, 0],
      [0, 0, 4],
    ]);
    expect(callPrimitive('crop_to_content', Grid.filled(2, 2, 5))).toBe(FAILURE);
  });

  it('crop_to_content on a background other than 0 crops to the other colours', () => {
    // No 0: 7 (eight cells) is the background, so only the 2 is content.
    expect(rows(callPrimitive('crop_to_content', G([[7, 7, 7], [7, 2, 7], [7, 7, 7]])))).toEqual([[2]]);
    // One cell of 0 makes 0 the background although 7 has more cells: the sevens are the
    // content and their bounding box is the whole grid.
    expect(rows(callPrimitive('crop_to_content', G([[7, 7, 7], [7, 0, 7], [7, 7, 7]])))).toEqual([
      [7, 7, 7],
      [7, 0, 7],
      [7, 7, 7],
    ]);
  });

  it('crop_to_object takes the neighbours inside the box too; object_picture does not', () => {
    const mixed = G([
      [0, 0, 0, 0],
      [0, 6, 2, 0],
      [0, 6, 6, 0],
      [0, 0, 0, 0],
    ]);
    const sixes = (callPrimitive('objects_by_colour', mixed) as GridObject[]).find((o) => o.mainColour === 6)!;
    expect(rows(callPrimitive('crop_to_object', mixed, sixes))).toEqual([
      [6, 2],
      [6, 6],
    ]);
    expect(rows(callPrimitive('object_picture', sixes))).toEqual([
      [6, 0],
      [6, 6],
    ]);
  });

  it('crop_region and remove_border', () => {
    const numbers = G([
      [1, 2, 3, 4],
      [5, 6, 7, 8],
      [9, 1, 2, 3],
    ]);
    expect(rows(callPrimitive('crop_region', numbers, new Point(0, 2), new Point(2, 2)))).toEqual([
      [3, 4],
      [7, 8],
    ]);
    expect(callPrimitive('crop_region', numbers, new Point(2, 2), new Point(2, 2))).toBe(FAILURE);
    expect(rows(callPrimitive('remove_border', numbers))).toEqual([[6, 7]]);
    expect(callPrimitive('remove_border', G([[1, 2, 3], [4, 5, 6]]))).toBe(FAILURE);
  });

  it('the halves of an odd size leave out the middle line', () => {
    const odd = G([
      [1, 2, 3],
      [4, 5, 6],
      [7, 8, 9],
    ]);
    expect(rows(callPrimitive('top_half', odd))).toEqual([[1, 2, 3]]);
    expect(rows(callPrimitive('bottom_half', odd))).toEqual([[7, 8, 9]]);
    expect(rows(callPrimitive('left_half', odd))).toEqual([[1], [4], [7]]);
    expect(rows(callPrimitive('right_half', odd))).toEqual([[3], [6], [9]]);
    expect(callPrimitive('left_half', G([[1], [2]]))).toBe(FAILURE);
  });
});

describe('keep_middle_column and keep_middle_row', () => {
  const transpose = (g: Grid) => G(g.toRows()[0]!.map((_, c) => g.toRows().map((row) => row[c]!)));

  it('keep the middle line in place, background elsewhere; the row one is the column one through the transpose', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const kept = callPrimitive('keep_middle_column', g);
        if (g.width % 2 === 0) {
          expect(kept).toBe(FAILURE);
          return;
        }
        const background = backgroundOf(g);
        const middle = (g.width - 1) / 2;
        const out = kept as Grid;
        for (let r = 0; r < g.height; r++) for (let c = 0; c < g.width; c++) expect(out.get(r, c)).toBe(c === middle ? g.get(r, c) : background);
        expect((callPrimitive('keep_middle_row', transpose(g)) as Grid).equals(transpose(out))).toBe(true);
      }),
    );
  });

  it('hand-worked: a 3×5 grid keeps column 2 or row 1; even sizes fail', () => {
    const g = G([
      [3, 0, 4, 0, 0],
      [0, 8, 5, 6, 0],
      [3, 0, 0, 0, 9],
    ]);
    expect(rows(callPrimitive('keep_middle_column', g))).toEqual([
      [0, 0, 4, 0, 0],
      [0, 0, 5, 0, 0],
      [0, 0, 0, 0, 0],
    ]);
    expect(rows(callPrimitive('keep_middle_row', g))).toEqual([
      [0, 0, 0, 0, 0],
      [0, 8, 5, 6, 0],
      [0, 0, 0, 0, 0],
    ]);
    expect(callPrimitive('keep_middle_column', G([[1, 2]]))).toBe(FAILURE);
    expect(callPrimitive('keep_middle_row', G([[1], [2]]))).toBe(FAILURE);
  });
});

describe('crop_to_colour_in', () => {
  it('cropping a grid at its own colour is crop_to_colour', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 0, max: 9 }), (g, colour) => {
        expect(rows(callPrimitive('crop_to_colour_in', g, g, colour))).toEqual(rows(callPrimitive('crop_to_colour', g, colour)));
      }),
    );
  });

  it('cuts the first grid where the second has the colour, and fails on different sizes', () => {
    const picture = G([
      [1, 2, 3],
      [4, 5, 6],
    ]);
    const marks = G([
      [0, 0, 9],
      [0, 0, 9],
    ]);
    expect(rows(callPrimitive('crop_to_colour_in', picture, marks, 9))).toEqual([[3], [6]]);
    expect(callPrimitive('crop_to_colour_in', picture, G([[9]]), 9)).toBe(FAILURE);
    expect(callPrimitive('crop_to_colour_in', picture, marks, 4)).toBe(FAILURE);
  });
});
