/** Every cell of a colour as one object, and one such object per colour. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellsOfColour, colourGroups } from '../src/grid/colour-cells.ts';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;
const E = EMPTY;

describe('cellsOfColour', () => {
  it('gathers scattered cells into one object at their bounding box', () => {
    const o = cellsOfColour(G([[0, 0, 0], [2, 0, 0], [0, 0, 2]]), 2)!;
    expect([o.top, o.left, o.size]).toEqual([1, 0, 2]);
    expect(o.shape.toRows()).toEqual([[2, E, E], [E, E, 2]]);
  });

  it('is null for an absent colour', () => {
    expect(cellsOfColour(G([[1]]), 2)).toBeNull();
  });
});

describe('colourGroups', () => {
  it('one object per colour other than the background, in colour order', () => {
    const groups = colourGroups(G([[3, 0, 3], [0, 1, 0]]));
    expect(groups.map((o) => o.mainColour)).toEqual([1, 3]);
    expect(groups.map((o) => o.size)).toEqual([1, 2]);
  });

  it('the groups hold every cell that is not the background, each once', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const background = backgroundOf(g);
        const total = colourGroups(g).reduce((n, o) => n + o.size, 0);
        expect(total).toBe(g.cells.filter((v) => v !== background).length);
      }),
    );
  });
});
