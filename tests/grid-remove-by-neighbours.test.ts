/** Removing cells by their edge neighbours: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { hollow, removeLonelyCells } from '../src/grid/remove-by-neighbours.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;

describe('hollow', () => {
  it('empties the inside of a solid block', () => {
    const block = G([[0, 0, 0, 0, 0], [0, 3, 3, 3, 0], [0, 3, 3, 3, 0], [0, 3, 3, 3, 0], [0, 0, 0, 0, 0]]);
    expect(hollow(block).toRows()).toEqual([[0, 0, 0, 0, 0], [0, 3, 3, 3, 0], [0, 3, 0, 3, 0], [0, 3, 3, 3, 0], [0, 0, 0, 0, 0]]);
  });

  it('cells on the grid border are never inside', () => {
    expect(hollow(G([[4, 4], [4, 4]])).toRows()).toEqual([[4, 4], [4, 4]]);
  });
});

describe('removeLonelyCells', () => {
  it('specks and loose ends go, blocks stay', () => {
    const g = G([[4, 4, 0, 0], [4, 4, 0, 4], [0, 0, 0, 0], [0, 4, 0, 0]]);
    expect(removeLonelyCells(g).toRows()).toEqual([[4, 4, 0, 0], [4, 4, 0, 0], [0, 0, 0, 0], [0, 0, 0, 0]]);
    // a line: its two ends have one neighbour each
    expect(removeLonelyCells(G([[0, 2, 2, 2]])).toRows()).toEqual([[0, 0, 2, 0]]);
  });

  it('both only ever turn drawn cells into the background', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (x) => {
        const background = backgroundOf(x);
        for (const out of [hollow(x), removeLonelyCells(x)]) {
          for (let i = 0; i < x.cells.length; i++) expect(out.cells[i] === x.cells[i] || out.cells[i] === background).toBe(true);
        }
      }),
    );
  });
});
