/**
 * The pieces that keep the search's garbage down behave like what they replace: an object made
 * from bare cells is the object made from a Grid of those cells; copyRun copies like a subarray
 * copy; a work array is long enough and reused; components are what a plain flood fill finds.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { components } from '../src/grid/components.ts';
import { GridObject } from '../src/grid/grid-object.ts';
import { copyRun, EMPTY, Grid } from '../src/grid/grid.ts';
import { WorkArray } from '../src/grid/work-array.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

describe('objects from bare cells', () => {
  it('equal the object made from a Grid of the same cells: hash, size, equality, shape, main colour', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: -3, max: 20 }), fc.integer({ min: -3, max: 20 }), (g, top, left) => {
        const fromGrid = new GridObject(top, left, g);
        const fromCells = new GridObject(top, left, g.height, g.width, Uint8Array.from(g.cells));
        expect(fromCells.hash).toBe(fromGrid.hash);
        expect(fromCells.size).toBe(fromGrid.size);
        expect(fromCells.equals(fromGrid) && fromGrid.equals(fromCells)).toBe(true);
        expect(fromCells.shape.equals(g)).toBe(true);
        expect(fromCells.mainColour).toBe(fromGrid.mainColour);
        // The Grid is made once and then kept.
        expect(fromCells.shape).toBe(fromCells.shape);
      }),
    );
  });

  it('differ when a cell, the place or the box differs', () => {
    const cells = Uint8Array.from([1, EMPTY, 1, 2]);
    const o = new GridObject(1, 1, 2, 2, cells);
    expect(o.equals(new GridObject(1, 1, 2, 2, Uint8Array.from([1, EMPTY, 1, 3])))).toBe(false);
    expect(o.equals(new GridObject(1, 2, 2, 2, cells))).toBe(false);
    expect(o.equals(new GridObject(1, 1, 1, 4, cells))).toBe(false);
    expect(o.size).toBe(3);
  });
});

describe('copyRun', () => {
  it('copies like a subarray copy and touches nothing else', () => {
    fc.assert(
      fc.property(fc.uint8Array({ minLength: 1, maxLength: 40 }), fc.uint8Array({ minLength: 1, maxLength: 40 }), fc.nat(), fc.nat(), fc.nat(), (source, target, a, b, n) => {
        const from = a % source.length;
        const to = b % target.length;
        const length = n % (Math.min(source.length - from, target.length - to) + 1);
        const expected = Uint8Array.from(target);
        expected.set(source.subarray(from, from + length), to);
        const actual = Uint8Array.from(target);
        copyRun(source, from, actual, to, length);
        expect(Array.from(actual)).toEqual(Array.from(expected));
      }),
    );
  });
});

describe('WorkArray', () => {
  it('hands out an array at least as long as asked, the same one while it is long enough', () => {
    const work = new WorkArray(Int32Array);
    const first = work.take(10);
    expect(first.length).toBeGreaterThanOrEqual(10);
    expect(work.take(5)).toBe(first);
    const longer = work.take(first.length + 1);
    expect(longer.length).toBeGreaterThan(first.length);
    expect(work.take(3)).toBe(longer);
  });
});

describe('components with reused work arrays', () => {
  it('are one colour each, cover every non-background cell once, and put edge neighbours of one colour together', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 10, maxWidth: 10 }), (g) => {
        const objects = components(g, { diagonal: false, multicolour: false, background: 0 });
        const covered = new Uint8Array(g.cells.length);
        const owner = new Int32Array(g.cells.length).fill(-1);
        objects.forEach((o, id) => {
          const colours = new Set<number>();
          for (let r = 0; r < o.height; r++) {
            for (let c = 0; c < o.width; c++) {
              const v = o.cells[r * o.width + c]!;
              if (v === EMPTY) continue;
              expect(g.get(o.top + r, o.left + c)).toBe(v);
              covered[(o.top + r) * g.width + o.left + c]!++;
              owner[(o.top + r) * g.width + o.left + c] = id;
              colours.add(v);
            }
          }
          expect(colours.size).toBe(1);
        });
        for (let i = 0; i < g.cells.length; i++) expect(covered[i]).toBe(g.cells[i] === 0 ? 0 : 1);
        for (let r = 0; r < g.height; r++) {
          for (let c = 0; c < g.width; c++) {
            const v = g.get(r, c);
            if (v === 0) continue;
            if (c + 1 < g.width && g.get(r, c + 1) === v) expect(owner[r * g.width + c + 1]).toBe(owner[r * g.width + c]);
            if (r + 1 < g.height && g.get(r + 1, c) === v) expect(owner[(r + 1) * g.width + c]).toBe(owner[r * g.width + c]);
          }
        }
        // Asked again (memoised) and on a copy (computed afresh with the same work arrays): the same objects.
        const again = components(new Grid(g.height, g.width, Uint8Array.from(g.cells)), { diagonal: false, multicolour: false, background: 0 });
        expect(again.length).toBe(objects.length);
        again.forEach((o, i) => expect(o.equals(objects[i]!)).toBe(true));
      }),
    );
  });
});
