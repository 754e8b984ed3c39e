/** Composition primitives: hand-worked cases and fast-check laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compositionPrimitives } from '../dsl/composition.ts';
import { components } from '../src/grid/components.ts';
import { backgroundOf } from './support/background-oracle.ts';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { FAILURE } from '../src/language/failure.ts';
import { GridObject } from '../src/grid/grid-object.ts';
import { evaluateExpression } from '../src/language/interpreter.ts';
import { parseExpression } from '../src/language/parser.ts';
import { Point } from '../src/language/point.ts';
import { defaultLibrary } from '../dsl/index.ts';
import { Library } from '../src/library/library.ts';
import { applyOperation } from '../src/language/operation.ts';
import { arbitraryGrid, arbitraryGridPair } from './support/arbitrary-grid.ts';
import { callPrimitive } from './support/run-primitive.ts';

const library = new Library(compositionPrimitives);
function apply(name: string, ...args: unknown[]): unknown {
  const p = library.get(name);
  if (!p) throw new Error(`tests/primitives-composition.test.ts: no primitive named '${name}'`);
  return applyOperation(p, args);
}
function grid(name: string, ...args: unknown[]): Grid {
  const result = apply(name, ...args);
  if (!(result instanceof Grid)) throw new Error(`tests/primitives-composition.test.ts: ${name} gave no grid`);
  return result;
}
function object(name: string, ...args: unknown[]): GridObject {
  const result = apply(name, ...args);
  if (!(result instanceof GridObject)) throw new Error(`tests/primitives-composition.test.ts: ${name} gave no object`);
  return result;
}
const rows = (value: unknown): unknown => (value instanceof Grid ? value.toRows() : value);
const G = Grid.fromRows;

/** Objects of the grid under one of the four extraction rules. */
const arbitraryGridAndObjects = fc
  .tuple(arbitraryGrid(), fc.boolean(), fc.boolean())
  .map(([g, diagonal, multicolour]) => [g, components(g, { diagonal, multicolour, background: backgroundOf(g) })] as const);

describe('composition laws', () => {
  it('painting an object taken from the grid leaves the grid unchanged', () => {
    fc.assert(
      fc.property(arbitraryGridAndObjects, ([g, objects]) => {
        for (const o of objects) expect(grid('paint_object', g, o).equals(g)).toBe(true);
        expect(grid('paint_objects', g, objects).equals(g)).toBe(true);
      }),
    );
  });

  it('erasing then painting an object restores the grid; erasing leaves only background under it', () => {
    fc.assert(
      fc.property(arbitraryGridAndObjects, ([g, objects]) => {
        const background = backgroundOf(g);
        for (const o of objects) {
          const erased = grid('erase_object', g, o);
          expect(grid('paint_object', erased, o).equals(g)).toBe(true);
          for (let r = 0; r < o.height; r++) {
            for (let c = 0; c < o.width; c++) {
              if (o.shape.get(r, c) !== EMPTY) expect(erased.get(o.top + r, o.left + c)).toBe(background);
            }
          }
        }
        expect(grid('paint_objects', grid('erase_objects', g, objects), objects).equals(g)).toBe(true);
      }),
    );
  });

  it('erasing every object leaves a blank grid of the background colour', () => {
    fc.assert(
      fc.property(arbitraryGridAndObjects, ([g, objects]) => {
        const erased = grid('erase_objects', g, objects);
        expect(erased.equals(Grid.filled(g.height, g.width, backgroundOf(g)))).toBe(true);
      }),
    );
  });

  it('map_objects with a zero move, or a reflection done twice, leaves the grid unchanged', () => {
    fc.assert(
      fc.property(arbitraryGridAndObjects, ([g, objects]) => {
        const still = (o: GridObject) => object('move_object', o, new Point(0, 0));
        expect(grid('map_objects', g, objects, still).equals(g)).toBe(true);
        const twice = (o: GridObject) => object('reflect_object_vertically', object('reflect_object_vertically', o));
        expect(grid('map_objects', g, objects, twice).equals(g)).toBe(true);
      }),
    );
  });

  it('keep_only_object then painting the other objects restores the grid', () => {
    fc.assert(
      fc.property(arbitraryGridAndObjects, ([g, objects]) => {
        if (objects.length === 0) return;
        const kept = grid('keep_only_object', g, objects[0]!);
        expect(grid('paint_objects', kept, objects.slice(1)).equals(g)).toBe(true);
      }),
    );
  });

  it('overlay with a fully transparent top is the identity; with an opaque top it is the top', () => {
    fc.assert(
      fc.property(arbitraryGridPair(), fc.integer({ min: 0, max: 9 }), ([a, b], colour) => {
        expect(grid('overlay', a, Grid.filled(a.height, a.width, colour), colour).equals(a)).toBe(true);
        // Transparent colour 0 over a top without 0 gives the top.
        const opaque = G(b.toRows().map((row) => row.map((v) => (v === 0 ? 1 : v))));
        expect(grid('overlay', a, opaque, 0).equals(opaque)).toBe(true);
      }),
    );
  });

  it('masks: either = both + exactly one, neither = not either, and both is symmetric', () => {
    fc.assert(
      fc.property(arbitraryGridPair(), fc.integer({ min: 1, max: 9 }), ([a, b], colour) => {
        const both = grid('mask_both', a, b, colour);
        const either = grid('mask_either', a, b, colour);
        const one = grid('mask_exactly_one', a, b, colour);
        const neither = grid('mask_neither', a, b, colour);
        expect(grid('mask_both', b, a, colour).equals(both)).toBe(true);
        for (let i = 0; i < a.cells.length; i++) {
          const isBoth = both.cells[i] === colour;
          const isOne = one.cells[i] === colour;
          expect(isBoth && isOne).toBe(false);
          expect(either.cells[i] === colour).toBe(isBoth || isOne);
          expect(neither.cells[i] === colour).toBe(either.cells[i] !== colour);
          expect(isBoth).toBe(a.cells[i] !== 0 && b.cells[i] !== 0);
        }
      }),
    );
  });

  it('overlay_all of one grid is that grid, and of a grid and a blank grid too', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        expect(grid('overlay_all', [g]).equals(g)).toBe(true);
        expect(grid('overlay_all', [g, Grid.filled(g.height, g.width, 0)]).equals(g)).toBe(true);
      }),
    );
  });

  it('reflecting an object twice gives the same object back', () => {
    fc.assert(
      fc.property(arbitraryGridAndObjects, ([, objects]) => {
        for (const o of objects) {
          expect(object('reflect_object_horizontally', object('reflect_object_horizontally', o)).equals(o)).toBe(true);
        }
      }),
    );
  });
});

describe('composition hand-worked cases', () => {
  const piece = new GridObject(1, 1, G([[7, EMPTY], [7, 7]]));

  it('paint_object drops the cells that fall outside', () => {
    const g = Grid.filled(2, 2, 0);
    expect(rows(apply('paint_object', g, piece))).toEqual([[0, 0], [0, 7]]);
    const left = new GridObject(-1, -1, G([[7, EMPTY], [7, 7]]));
    expect(rows(apply('paint_object', g, left))).toEqual([[7, 0], [0, 0]]);
    const away = new GridObject(5, 5, G([[7]]));
    expect(rows(apply('paint_object', g, away))).toEqual([[0, 0], [0, 0]]);
  });

  it('erase_object uses the grid background, not 0', () => {
    const g = G([[4, 4, 4], [4, 7, 4], [4, 7, 7]]);
    expect(rows(apply('erase_object', g, piece))).toEqual([[4, 4, 4], [4, 4, 4], [4, 4, 4]]);
  });

  it('overlay needs equal sizes and keeps the first where the top is see-through', () => {
    expect(apply('overlay', G([[1]]), G([[1, 2]]), 0)).toBe(FAILURE);
    expect(rows(apply('overlay', G([[1, 2, 3]]), G([[9, 0, 8]]), 0))).toEqual([[9, 2, 8]]);
    expect(rows(apply('overlay', G([[1, 2, 3]]), G([[9, 0, 8]]), 8))).toEqual([[9, 0, 3]]);
  });

  it('masks of two small grids', () => {
    const a = G([[1, 1], [0, 0]]);
    const b = G([[2, 0], [2, 0]]);
    expect(rows(apply('mask_both', a, b, 4))).toEqual([[4, 0], [0, 0]]);
    expect(rows(apply('mask_either', a, b, 4))).toEqual([[4, 4], [4, 0]]);
    expect(rows(apply('mask_exactly_one', a, b, 4))).toEqual([[0, 4], [4, 0]]);
    expect(rows(apply('mask_neither', a, b, 4))).toEqual([[0, 0], [0, 4]]);
    expect(apply('mask_both', a, G([[1]]), 4)).toBe(FAILURE);
  });

  it('overlay_all: later parts win, background from all parts together; fails on mixed sizes or none', () => {
    const parts = [G([[1, 1], [0, 0]]), G([[0, 2], [0, 0]]), G([[0, 0], [3, 0]])];
    expect(rows(apply('overlay_all', parts))).toEqual([[1, 2], [3, 0]]);
    expect(apply('overlay_all', [G([[1]]), G([[1, 2]])])).toBe(FAILURE);
    expect(apply('overlay_all', [])).toBe(FAILURE);
  });

  it('map_objects fails when the transform fails', () => {
    const g = G([[1, 0]]);
    const objects = components(g, { diagonal: false, multicolour: false, background: 0 });
    expect(apply('map_objects', g, objects, () => FAILURE)).toBe(FAILURE);
  });

  it('move_object keeps the shape and shifts the position; a huge move fails', () => {
    const moved = object('move_object', piece, new Point(-2, 3));
    expect([moved.top, moved.left]).toEqual([-1, 4]);
    expect(moved.shape.equals(piece.shape)).toBe(true);
    expect(apply('move_object', piece, new Point(1000, 0))).toBe(FAILURE);
  });

  it('reflect_object_horizontally and vertically mirror the shape in place', () => {
    const h = object('reflect_object_horizontally', piece);
    expect([h.top, h.left]).toEqual([1, 1]);
    expect(h.shape.toRows()).toEqual([[EMPTY, 7], [7, 7]]);
    expect(object('reflect_object_vertically', piece).shape.toRows()).toEqual([[7, 7], [7, EMPTY]]);
  });
});

describe('composition worked examples', () => {
  for (const p of compositionPrimitives) {
    it(`${p.name}: the worked example gives the hand-worked output`, () => {
      const env = new Map<string, unknown>([['grid', Grid.fromRows(p.example.input)]]);
      const value = evaluateExpression(parseExpression(p.example.expression), env, defaultLibrary);
      expect(rows(value)).toEqual(p.example.output);
    });
  }
});

describe('overlay_all_first_on_top', () => {
  it('the first grid wins wherever it is filled; a single grid is itself', () => {
    const a = G([[1, 0, 0]]);
    const b = G([[2, 2, 0]]);
    const c = G([[3, 3, 3]]);
    expect(grid('overlay_all_first_on_top', [a, b, c]).toRows()).toEqual([[1, 2, 3]]);
    expect(grid('overlay_all_first_on_top', [c, b, a]).toRows()).toEqual([[3, 3, 3]]);
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        expect(grid('overlay_all_first_on_top', [g]).equals(g)).toBe(true);
      }),
    );
  });

  it('fails on no grids and on grids of different sizes', () => {
    expect(apply('overlay_all_first_on_top', [])).toBe(FAILURE);
    expect(apply('overlay_all_first_on_top', [G([[1]]), G([[1, 2]])])).toBe(FAILURE);
  });
});

describe('stamp_object_on_colour', () => {
  it('centres the template on single marker cells, clipping at the border (worked by hand)', () => {
    const g = G([
      [0, 2, 0, 0, 0, 0],
      [2, 1, 3, 0, 0, 0],
      [0, 4, 0, 0, 0, 0],
      [0, 0, 0, 0, 0, 0],
      [0, 0, 0, 5, 0, 0],
      [0, 0, 0, 0, 0, 5],
    ]);
    const template = (callPrimitive('objects_multicolour', g) as GridObject[])[0]!;
    // Marker (4, 3): template box rows 3-5, columns 2-4. Marker (5, 5): box rows 4-6, columns
    // 4-6, the part outside the grid dropped; its empty corner leaves the first copy's 3 alone.
    expect(grid('stamp_object_on_colour', g, template, 5).toRows()).toEqual([
      [0, 2, 0, 0, 0, 0],
      [2, 1, 3, 0, 0, 0],
      [0, 4, 0, 0, 0, 0],
      [0, 0, 0, 2, 0, 0],
      [0, 0, 2, 1, 3, 2],
      [0, 0, 0, 4, 2, 1],
    ]);
  });

  it('replaces a same-sized block of the colour with the template', () => {
    const g = G([
      [6, 8, 0, 5, 5],
      [8, 8, 0, 5, 5],
    ]);
    const template = (callPrimitive('objects_multicolour', g) as GridObject[])[0]!;
    expect(grid('stamp_object_on_colour', g, template, 5).toRows()).toEqual([
      [6, 8, 0, 6, 8],
      [8, 8, 0, 8, 8],
    ]);
  });

  it('leaves a grid without the colour as it is', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 1, max: 9 }), (g, colour) => {
        fc.pre(!g.cells.includes(colour));
        const objects = callPrimitive('objects_multicolour', g) as GridObject[];
        fc.pre(objects.length > 0);
        expect(grid('stamp_object_on_colour', g, objects[0], colour).equals(g)).toBe(true);
      }),
    );
  });
});
