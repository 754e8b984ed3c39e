/** Symmetry primitives: hand-worked cases and fast-check laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { symmetryPrimitives } from '../dsl/symmetry.ts';
import { Grid } from '../src/grid/grid.ts';
import { FAILURE } from '../src/language/failure.ts';
import { Library } from '../src/library/library.ts';
import { applyOperation } from '../src/language/operation.ts';
import { defaultLibrary } from '../dsl/index.ts';
import { evaluateExpression } from '../src/language/interpreter.ts';
import { parseExpression } from '../src/language/parser.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const library = new Library(symmetryPrimitives);
function apply(name: string, ...args: unknown[]): unknown {
  const p = library.get(name);
  if (!p) throw new Error(`tests/primitives-symmetry.test.ts: no primitive named '${name}'`);
  return applyOperation(p, args);
}
function grid(name: string, g: Grid): Grid {
  const result = apply(name, g);
  if (!(result instanceof Grid)) throw new Error(`tests/primitives-symmetry.test.ts: ${name} gave no grid`);
  return result;
}
const rows = (value: unknown): unknown => (value instanceof Grid ? value.toRows() : value);
const G = Grid.fromRows;

describe('symmetry laws', () => {
  it('four quarter turns are the identity', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        let r = g;
        for (let i = 0; i < 4; i++) r = grid('rotate_clockwise', r);
        expect(r.equals(g)).toBe(true);
      }),
    );
  });

  it('rotate_clockwise then rotate_counterclockwise is the identity (both orders)', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        expect(grid('rotate_counterclockwise', grid('rotate_clockwise', g)).equals(g)).toBe(true);
        expect(grid('rotate_clockwise', grid('rotate_counterclockwise', g)).equals(g)).toBe(true);
      }),
    );
  });

  it('rotate_half is two quarter turns', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        expect(grid('rotate_half', g).equals(grid('rotate_clockwise', grid('rotate_clockwise', g)))).toBe(true);
      }),
    );
  });

  it('reflections and transposes are involutions', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        for (const name of ['reflect_vertically', 'reflect_horizontally', 'transpose', 'reflect_antidiagonal', 'rotate_half']) {
          expect(grid(name, grid(name, g)).equals(g)).toBe(true);
        }
      }),
    );
  });

  it('transpose is a clockwise quarter turn followed by a left-right reflection', () => {
    // (r, c) -> clockwise -> (c, h-1-r) -> left-right mirror over width h -> (c, r).
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        expect(grid('transpose', g).equals(grid('reflect_horizontally', grid('rotate_clockwise', g)))).toBe(true);
      }),
    );
  });

  it('reflect_antidiagonal is transpose followed by a half turn, and a counterclockwise turn then a left-right reflection', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const anti = grid('reflect_antidiagonal', g);
        expect(anti.equals(grid('rotate_half', grid('transpose', g)))).toBe(true);
        expect(anti.equals(grid('reflect_horizontally', grid('rotate_counterclockwise', g)))).toBe(true);
      }),
    );
  });

  it('mirror_right is twice as wide and left-right symmetric, and starts with the grid', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const m = grid('mirror_right', g);
        expect(m.height).toBe(g.height);
        expect(m.width).toBe(2 * g.width);
        expect(apply('is_symmetric_left_right', m)).toBe(true);
        for (let r = 0; r < g.height; r++) for (let c = 0; c < g.width; c++) expect(m.get(r, c)).toBe(g.get(r, c));
      }),
    );
  });

  it('mirror_down is twice as tall and top-bottom symmetric', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const m = grid('mirror_down', g);
        expect([m.height, m.width]).toEqual([2 * g.height, g.width]);
        expect(apply('is_symmetric_top_bottom', m)).toBe(true);
      }),
    );
  });

  it('mirror_four_ways is symmetric both ways and equals mirror_down of mirror_right', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const m = grid('mirror_four_ways', g);
        expect(apply('is_symmetric_top_bottom', m)).toBe(true);
        expect(apply('is_symmetric_left_right', m)).toBe(true);
        expect(m.equals(grid('mirror_down', grid('mirror_right', g)))).toBe(true);
      }),
    );
  });

  it('is_symmetric_left_right holds exactly when the grid equals its reflection', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 3, maxWidth: 3 }), (g) => {
        expect(apply('is_symmetric_left_right', g)).toBe(grid('reflect_horizontally', g).equals(g));
        expect(apply('is_symmetric_top_bottom', g)).toBe(grid('reflect_vertically', g).equals(g));
      }),
    );
  });

  it('symmetrise_left_right only fills cells from their mirror cells and leaves symmetric grids alone', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const s = grid('symmetrise_left_right', g);
        const symmetric = grid('mirror_right', g);
        expect(grid('symmetrise_left_right', symmetric).equals(symmetric)).toBe(true);
        for (let i = 0; i < g.cells.length; i++) {
          // Every cell either kept its colour or was a background cell that took its mirror's colour.
          const r = Math.floor(i / g.width);
          const c = i % g.width;
          expect(s.cells[i] === g.cells[i] || s.cells[i] === g.get(r, g.width - 1 - c)).toBe(true);
        }
      }),
    );
  });

  it('complete_symmetry restores holes punched into a four-way symmetric grid', () => {
    fc.assert(
      fc.property(
        arbitraryGrid({ maxHeight: 4, maxWidth: 4 }).map((g) => Grid.fromRows(g.toRows().map((row) => row.map((v) => (v === 9 ? 8 : v))))),
        fc.integer({ min: 0, max: 1000 }),
        (seed, punch) => {
          const whole = grid('mirror_four_ways', seed);
          const cells = whole.cells.slice();
          // Punch a hole (colour 9, absent from the picture) into one quadrant only.
          const r = punch % seed.height;
          const c = Math.floor(punch / 7) % seed.width;
          cells[r * whole.width + c] = 9;
          const holed = new Grid(whole.height, whole.width, cells);
          const result = apply('complete_symmetry', holed, 9);
          expect(result instanceof Grid && result.equals(whole)).toBe(true);
        },
      ),
    );
  });
});

describe('four_rotations_square', () => {
  const square = fc
    .integer({ min: 1, max: 6 })
    .chain((n) => fc.array(fc.integer({ min: 0, max: 9 }), { minLength: n * n, maxLength: n * n }).map((cells) => new Grid(n, n, Uint8Array.from(cells))));

  it('is twice the size, holds the grid top-left and looks the same after a quarter turn', () => {
    fc.assert(
      fc.property(square, (g) => {
        const out = grid('four_rotations_square', g);
        expect([out.height, out.width]).toEqual([2 * g.height, 2 * g.width]);
        for (let r = 0; r < g.height; r++) for (let c = 0; c < g.width; c++) expect(out.get(r, c)).toBe(g.get(r, c));
        expect(grid('rotate_clockwise', out).equals(out)).toBe(true);
      }),
    );
  });

  it('fails on a grid that is not square', () => {
    expect(apply('four_rotations_square', G([[1, 2, 3], [4, 5, 6]]))).toBe(FAILURE);
  });

  it('lays out a 3×3 grid with its turns (worked by hand)', () => {
    expect(rows(apply('four_rotations_square', G([[1, 2, 3], [4, 5, 6], [7, 8, 9]])))).toEqual([
      [1, 2, 3, 7, 4, 1],
      [4, 5, 6, 8, 5, 2],
      [7, 8, 9, 9, 6, 3],
      [3, 6, 9, 9, 8, 7],
      [2, 5, 8, 6, 5, 4],
      [1, 4, 7, 3, 2, 1],
    ]);
  });
});

describe('symmetry hand-worked cases', () => {
  it('rotations and reflections of a 2×3 grid', () => {
    const g = G([[1, 2, 3], [4, 5, 6]]);
    expect(rows(apply('rotate_clockwise', g))).toEqual([[4, 1], [5, 2], [6, 3]]);
    expect(rows(apply('rotate_counterclockwise', g))).toEqual([[3, 6], [2, 5], [1, 4]]);
    expect(rows(apply('rotate_half', g))).toEqual([[6, 5, 4], [3, 2, 1]]);
    expect(rows(apply('reflect_vertically', g))).toEqual([[4, 5, 6], [1, 2, 3]]);
    expect(rows(apply('reflect_horizontally', g))).toEqual([[3, 2, 1], [6, 5, 4]]);
    expect(rows(apply('transpose', g))).toEqual([[1, 4], [2, 5], [3, 6]]);
    expect(rows(apply('reflect_antidiagonal', g))).toEqual([[6, 3], [5, 2], [4, 1]]);
  });

  it('mirrors of a 1×2 grid', () => {
    const g = G([[7, 0]]);
    expect(rows(apply('mirror_right', g))).toEqual([[7, 0, 0, 7]]);
    expect(rows(apply('mirror_down', g))).toEqual([[7, 0], [7, 0]]);
    expect(rows(apply('mirror_four_ways', g))).toEqual([[7, 0, 0, 7], [7, 0, 0, 7]]);
  });

  it('mirrors over the size cap fail', () => {
    const wide = Grid.filled(2, 16, 1);
    expect(apply('mirror_right', wide)).toBe(FAILURE);
    expect(apply('mirror_four_ways', wide)).toBe(FAILURE);
    expect(apply('mirror_down', wide)).toBeInstanceOf(Grid);
  });

  it('symmetry tests', () => {
    expect(apply('is_symmetric_left_right', G([[1, 2, 1], [0, 5, 0]]))).toBe(true);
    expect(apply('is_symmetric_left_right', G([[1, 2, 2], [0, 5, 0]]))).toBe(false);
    expect(apply('is_symmetric_top_bottom', G([[1, 2], [3, 3], [1, 2]]))).toBe(true);
    expect(apply('is_symmetric_top_bottom', G([[1, 2], [2, 1]]))).toBe(false);
  });

  it('symmetrise_left_right keeps non-background cells where both sides differ', () => {
    expect(rows(apply('symmetrise_left_right', G([[3, 0, 0, 4], [0, 0, 0, 0], [0, 5, 0, 0]])))).toEqual([
      [3, 0, 0, 4],
      [0, 0, 0, 0],
      [0, 5, 5, 0],
    ]);
    expect(rows(apply('symmetrise_top_bottom', G([[0, 6], [0, 0], [2, 0]])))).toEqual([[2, 6], [0, 0], [2, 6]]);
  });

  it('complete_symmetry uses the transpose on a square grid when only that agrees', () => {
    // Transpose-symmetric but not left-right or top-bottom symmetric; hole colour 0.
    const input = G([
      [1, 2, 3],
      [2, 4, 0],
      [3, 5, 6],
    ]);
    expect(rows(apply('complete_symmetry', input, 0))).toEqual([
      [1, 2, 3],
      [2, 4, 5],
      [3, 5, 6],
    ]);
  });

  it('complete_symmetry fails when no symmetry agrees and is the identity without holes', () => {
    expect(apply('complete_symmetry', G([[1, 2, 0], [3, 4, 5]]), 0)).toBe(FAILURE);
    const whole = G([[1, 2], [3, 4]]);
    expect(apply('complete_symmetry', whole, 0)).toBe(whole);
  });
});

describe('symmetry worked examples', () => {
  for (const p of symmetryPrimitives) {
    it(`${p.name}: the worked example gives the hand-worked output`, () => {
      const env = new Map<string, unknown>([['grid', Grid.fromRows(p.example.input)]]);
      const value = evaluateExpression(parseExpression(p.example.expression), env, defaultLibrary);
      expect(rows(value)).toEqual(p.example.output);
    });
  }
});
