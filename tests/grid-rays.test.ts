/** Rays: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { extendTowardColour, shootDiagonalRays, shootDiagonalRaysDown, shootRays } from '../src/grid/rays.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;

describe('straight rays', () => {
  it('down, up, right and left, each stopping at the next drawn cell', () => {
    expect(shootRays(G([[1, 0], [0, 2], [0, 0]]), true, true).toRows()).toEqual([[1, 0], [1, 2], [1, 2]]);
    expect(shootRays(G([[0, 0], [0, 2], [1, 0]]), true, false).toRows()).toEqual([[1, 2], [1, 2], [1, 0]]);
    expect(shootRays(G([[3, 0, 4, 0]]), false, true).toRows()).toEqual([[3, 3, 4, 4]]);
    expect(shootRays(G([[0, 3, 0, 4]]), false, false).toRows()).toEqual([[3, 3, 4, 4]]);
  });

  it('only background cells change, and shooting twice is shooting once', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.boolean(), fc.boolean(), (g, columns, forwards) => {
        const once = shootRays(g, columns, forwards);
        const background = backgroundOf(g);
        for (let i = 0; i < g.cells.length; i++) if (g.cells[i] !== background) expect(once.cells[i]).toBe(g.cells[i]);
        if (g.cells.includes(0) && once.cells.includes(0)) expect(shootRays(once, columns, forwards).equals(once)).toBe(true);
      }),
    );
  });
});

describe('diagonal rays', () => {
  it('down to the right and down to the left', () => {
    expect(shootDiagonalRaysDown(G([[3, 0, 0], [0, 0, 0], [0, 4, 0]]), true).toRows()).toEqual([[3, 0, 0], [0, 3, 0], [0, 4, 3]]);
    expect(shootDiagonalRaysDown(G([[0, 0, 3], [0, 0, 0], [0, 0, 0]]), false).toRows()).toEqual([[0, 0, 3], [0, 3, 0], [3, 0, 0]]);
  });

  it('all four diagonals; the first ray in reading order wins a cell', () => {
    expect(shootDiagonalRays(G([[0, 0, 0, 0], [0, 3, 0, 0], [0, 0, 0, 0], [0, 0, 0, 0]])).toRows()).toEqual([
      [3, 0, 3, 0],
      [0, 3, 0, 0],
      [3, 0, 3, 0],
      [0, 0, 0, 3],
    ]);
    // (0, 1) is reached by the 1 (up-right from (1, 0)) and the 2 (up-left from (1, 2)); the 1 comes first
    expect(shootDiagonalRays(G([[0, 0, 0], [1, 0, 2]])).toRows()).toEqual([[0, 1, 0], [1, 0, 2]]);
  });
});

describe('extendTowardColour', () => {
  it('a cell that sees the target along its row or column draws a line up to it', () => {
    const g = G([[0, 0, 0, 0], [3, 0, 0, 2], [0, 0, 0, 0], [0, 2, 0, 0]]);
    expect(extendTowardColour(g, 3)!.toRows()).toEqual([[0, 0, 0, 0], [3, 2, 2, 2], [0, 0, 0, 0], [0, 2, 0, 0]]);
  });

  it('a drawn cell in between blocks the view; the background as target is null', () => {
    const g = G([[2, 0, 5, 0, 3]]);
    expect(extendTowardColour(g, 3)!.toRows()).toEqual([[2, 0, 5, 5, 3]]);
    expect(extendTowardColour(g, 0)).toBeNull();
  });
});
