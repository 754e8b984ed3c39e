/**
 * Handing cells back (cellsCheckpoint / cellsRewind in src/grid/grid.ts): the search drops most
 * values it builds and reuses their slab space. These laws say what may never happen: cells made
 * before the checkpoint change, new cells come back dirty, or cells something pinned are reused.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellsCheckpoint, cellsRewind, Grid, newCells, pinCells } from '../src/grid/grid.ts';
import { components } from '../src/grid/components.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

/** A grid of these cells, in the slab (arbitraryGrid's cells may lie in a buffer of their own). */
function inSlab(g: Grid): Grid {
  const cells = newCells(g.cells.length);
  cells.set(g.cells);
  return new Grid(g.height, g.width, cells);
}

describe('cellsRewind', () => {
  it('leaves cells made before the checkpoint alone, and hands out zeroed cells in the space it took back', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 12, maxWidth: 12 }), fc.array(fc.integer({ min: 1, max: 200 }), { minLength: 1, maxLength: 8 }), (g, lengths) => {
        const before = inSlab(g);
        const copy = Uint8Array.from(before.cells);
        cellsCheckpoint();
        const dropped = lengths.map((n) => newCells(n).fill(7));
        cellsRewind();
        const again = lengths.map((n) => newCells(n));
        expect(before.cells).toEqual(copy);
        expect(new Grid(before.height, before.width, Uint8Array.from(before.cells)).hash).toBe(before.hash);
        for (const cells of again) expect(cells.every((v) => v === 0)).toBe(true);
        // The space was reused (unless a slab filled in between: then the rewind does nothing).
        if (dropped[dropped.length - 1]!.buffer === before.cells.buffer && again[0]!.buffer === before.cells.buffer) expect(again[0]!.byteOffset).toBe(dropped[0]!.byteOffset);
      }),
    );
  });

  it('does nothing after a pin: cells kept beyond the call keep their colours', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1, max: 200 }), { minLength: 1, maxLength: 8 }), (lengths) => {
        cellsCheckpoint();
        const kept = lengths.map((n) => newCells(n).fill(3));
        pinCells();
        cellsRewind();
        newCells(64).fill(9);
        for (const cells of kept) expect(cells.every((v) => v === 3)).toBe(true);
      }),
    );
  });

  it('keeps the objects a grid memoises: computing components pins their cells', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 10, maxWidth: 10 }), (g) => {
        const grid = inSlab(g);
        cellsCheckpoint();
        const objects = components(grid, { diagonal: false, multicolour: false, background: 0 });
        const copies = objects.map((o) => Uint8Array.from(o.cells));
        cellsRewind();
        newCells(900).fill(5);
        objects.forEach((o, i) => expect(o.cells).toEqual(copies[i]));
        expect(components(grid, { diagonal: false, multicolour: false, background: 0 })).toBe(objects);
      }),
    );
  });
});
