/**
 * The grid hash and cell comparison read cells four at a time through a word view of a slab, or
 * natively for long arrays: these laws say that the placement of the cells in memory never
 * changes the answer. Cells in a slab, in a buffer of their own and at an odd offset of a larger
 * buffer hash alike; equal cells compare equal and a single changed cell is noticed.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { copyCells, Grid, hashCells, sameCells } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

/** The same cells at `offset` bytes into a fresh buffer (any alignment). */
function placedAt(cells: Uint8Array, offset: number): Uint8Array {
  const view = new Uint8Array(new ArrayBuffer(offset + cells.length + 5), offset, cells.length);
  view.set(cells);
  return view;
}

describe('hashCells', () => {
  it('depends on the cells and the shape only, not on where the cells lie', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 30, maxWidth: 30 }), fc.integer({ min: 0, max: 7 }), (g, offset) => {
        const h = hashCells(g.height, g.width, g.cells);
        expect(hashCells(g.height, g.width, copyCells(g.cells))).toBe(h);
        expect(hashCells(g.height, g.width, Uint8Array.from(g.cells))).toBe(h);
        expect(hashCells(g.height, g.width, placedAt(g.cells, offset))).toBe(h);
        expect(new Grid(g.height, g.width, placedAt(g.cells, offset)).hash).toBe(g.hash);
      }),
    );
  });

  it('tells apart grids that differ in one cell or only in shape, nearly always', () => {
    // Not a law (a 32-bit hash may collide), so counted over a fixed set of cases: distinct values
    // that share a hash cost the search a comparison, never a wrong answer.
    let collisions = 0;
    let cases = 0;
    for (let n = 1; n <= 900; n += 7) {
      const cells = new Uint8Array(n);
      for (let i = 0; i < n; i++) cells[i] = (i * 7 + 3) % 10;
      const h = hashCells(1, n, cells);
      for (let at = 0; at < n; at += Math.max(1, n >> 3)) {
        const changed = Uint8Array.from(cells);
        changed[at] = (changed[at]! + 1) % 10;
        cases++;
        if (hashCells(1, n, changed) === h) collisions++;
      }
      if (n % 2 === 0) {
        cases++;
        if (hashCells(2, n / 2, cells) === h) collisions++;
      }
    }
    expect(cases).toBeGreaterThan(1000);
    expect(collisions).toBe(0);
  });
});

describe('sameCells', () => {
  it('agrees with a comparison cell by cell, short arrays and long', () => {
    fc.assert(
      fc.property(fc.uint8Array({ minLength: 0, maxLength: 300, max: 9 }), fc.nat(), fc.integer({ min: 0, max: 7 }), (cells, at, offset) => {
        expect(sameCells(cells, placedAt(cells, offset))).toBe(true);
        if (cells.length === 0) return;
        const changed = Uint8Array.from(cells);
        const i = at % cells.length;
        changed[i] = (changed[i]! + 1) % 10;
        expect(sameCells(cells, changed)).toBe(false);
        expect(sameCells(placedAt(changed, offset), cells)).toBe(false);
      }),
    );
  });
});

describe('a grid held as a slab and an offset', () => {
  it('reads, hashes and compares the same whether its cells lie in a slab, in an array of their own or at an offset', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 30, maxWidth: 30 }), fc.integer({ min: 0, max: 7 }), fc.nat(), (g, offset, at) => {
        const rows = g.toRows();
        const inSlab = new Grid(g.height, g.width, copyCells(g.cells));
        const own = new Grid(g.height, g.width, Uint8Array.from(g.cells));
        const placed = new Grid(g.height, g.width, placedAt(g.cells, offset));
        for (const x of [inSlab, own, placed]) {
          expect(x.toRows()).toEqual(rows);
          expect(Array.from(x.cells)).toEqual(rows.flat());
          expect(x.hash).toBe(g.hash);
          expect(x.equals(g) && g.equals(x)).toBe(true);
          const i = at % (g.height * g.width);
          expect(x.get(Math.floor(i / g.width), i % g.width)).toBe(rows[Math.floor(i / g.width)]![i % g.width]);
        }
        // one changed cell is noticed, whichever way the cells are held
        const changed = copyCells(g.cells);
        const i = at % changed.length;
        changed[i] = (changed[i]! + 1) % 10;
        const other = new Grid(g.height, g.width, changed);
        expect(other.equals(inSlab) || other.equals(own) || other.equals(placed)).toBe(false);
        // and so does toEqual (tests/support/value-equality.ts), not field by field
        expect(inSlab).toEqual(own);
        expect(placed).toEqual(inSlab);
        expect(other).not.toEqual(inSlab);
      }),
    );
  });
});
