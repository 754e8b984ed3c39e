/** Marks beside cells: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { ANY_DRAWN_CELL, markBeside } from '../src/grid/neighbour-marks.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;

describe('markBeside', () => {
  const g = G([[0, 0, 0], [0, 2, 0], [0, 0, 3]]);

  it('edges, corners and the whole block around cells of a colour', () => {
    expect(markBeside(g, 2, 7, 'edges').toRows()).toEqual([[0, 7, 0], [7, 2, 7], [0, 7, 3]]);
    expect(markBeside(g, 2, 4, 'corners').toRows()).toEqual([[4, 0, 4], [0, 2, 0], [4, 0, 3]]);
    expect(markBeside(g, 2, 4, 'block').toRows()).toEqual([[4, 4, 4], [4, 2, 4], [4, 4, 3]]);
  });

  it('beside any drawn cell', () => {
    const h = G([[0, 0, 0, 0], [0, 5, 0, 0], [0, 0, 0, 0], [0, 0, 0, 0]]);
    expect(markBeside(h, ANY_DRAWN_CELL, 2, 'block').toRows()).toEqual([[2, 2, 2, 0], [2, 5, 2, 0], [2, 2, 2, 0], [0, 0, 0, 0]]);
    expect(markBeside(h, ANY_DRAWN_CELL, 8, 'corners').toRows()).toEqual([[8, 0, 8, 0], [0, 5, 0, 0], [8, 0, 8, 0], [0, 0, 0, 0]]);
  });

  it('with the background as source, the block counts the cell itself: every background cell is marked', () => {
    expect(markBeside(G([[1, 0, 1]]), 0, 6, 'block').toRows()).toEqual([[1, 6, 1]]);
    expect(markBeside(G([[1, 0, 1]]), 0, 6, 'edges').toRows()).toEqual([[1, 0, 1]]);
  });

  it('marks exactly the background cells that have a neighbour of the source colour (the definition, cell by cell)', () => {
    const steps = {
      edges: [[-1, 0], [1, 0], [0, -1], [0, 1]],
      corners: [[-1, -1], [-1, 1], [1, -1], [1, 1]],
      block: [[-1, -1], [-1, 0], [-1, 1], [0, -1], [0, 0], [0, 1], [1, -1], [1, 0], [1, 1]],
    } as const;
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 8, maxWidth: 8 }), fc.integer({ min: -1, max: 9 }), fc.constantFrom('edges', 'corners', 'block'), (x, source, neighbourhood: 'edges' | 'corners' | 'block') => {
        const background = backgroundOf(x);
        const marked = markBeside(x, source, 10, neighbourhood);
        for (let r = 0; r < x.height; r++) {
          for (let c = 0; c < x.width; c++) {
            const beside = steps[neighbourhood].some(([dr, dc]) => {
              const nr = r + dr;
              const nc = c + dc;
              if (nr < 0 || nc < 0 || nr >= x.height || nc >= x.width) return false;
              const v = x.get(nr, nc);
              return source === ANY_DRAWN_CELL ? v !== background : v === source;
            });
            expect(marked.get(r, c)).toBe(x.get(r, c) === background && beside ? 10 : x.get(r, c));
          }
        }
      }),
    );
  });

  it('only background cells change; edges and corners together mark what the block marks', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 1, max: 9 }), (x, source) => {
        const background = backgroundOf(x);
        // 10 is no colour of the input, so a 10 in the output is a mark
        const block = markBeside(x, source, 10, 'block');
        const edges = markBeside(x, source, 10, 'edges');
        const corners = markBeside(x, source, 10, 'corners');
        for (let i = 0; i < x.cells.length; i++) {
          if (x.cells[i] !== background) expect(block.cells[i]).toBe(x.cells[i]);
          if (source !== background) expect(block.cells[i] === 10).toBe(edges.cells[i] === 10 || corners.cells[i] === 10);
        }
      }),
    );
  });
});
