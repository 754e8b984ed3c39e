// Object rules: recolour, erase or keep the one-colour objects that pass a test.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { backgroundOf } from './support/background-oracle.ts';
import { Grid } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { evaluateGrid } from './support/run-primitive.ts';

const tests = ['has_size(_, 1)', 'is_bigger_than(_, 2)', 'has_colour(_, #3)', 'touches_edge(_, grid)'];

describe('object rules, laws', () => {
  it('erase_objects_where and keep_objects_where split the non-background cells between them', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.constantFrom(...tests), (g, test) => {
        const erased = evaluateGrid(`erase_objects_where(grid, ${test})`, g);
        const kept = evaluateGrid(`keep_objects_where(grid, ${test})`, g);
        const background = backgroundOf(g);
        for (let i = 0; i < g.cells.length; i++) {
          const inErased = erased.cells[i] !== background;
          const inKept = kept.cells[i] !== background;
          if (g.cells[i] === background) expect(inErased || inKept).toBe(false);
          else {
            expect(inErased !== inKept).toBe(true);
            expect(inErased ? erased.cells[i] : kept.cells[i]).toBe(g.cells[i]);
          }
        }
      }),
    );
  });

  it('recolour_objects_where changes exactly the cells that keep_objects_where keeps', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.constantFrom(...tests), fc.integer({ min: 0, max: 9 }), (g, test, colour) => {
        const recoloured = evaluateGrid(`recolour_objects_where(grid, ${test}, #${colour})`, g);
        const kept = evaluateGrid(`keep_objects_where(grid, ${test})`, g);
        const background = backgroundOf(g);
        expect([recoloured.height, recoloured.width]).toEqual([g.height, g.width]);
        for (let i = 0; i < g.cells.length; i++) {
          const selected = g.cells[i] !== background && kept.cells[i] !== background;
          expect(recoloured.cells[i]).toBe(selected ? colour : g.cells[i]);
        }
      }),
    );
  });
});

describe('object rules, hand-worked cases', () => {
  // Three objects on 0: a lone 1 at the top left, a pair of 1s, and a lone 2 below.
  const g = Grid.fromRows([[1, 0, 1, 1], [0, 0, 0, 0], [2, 0, 0, 0]]);

  it('recolours only the single cells', () => {
    expect(evaluateGrid('recolour_objects_where(grid, has_size(_, 1), #5)', g).toRows()).toEqual([[5, 0, 1, 1], [0, 0, 0, 0], [5, 0, 0, 0]]);
  });

  it('erases the objects of colour 2 and keeps the others', () => {
    expect(evaluateGrid('erase_objects_where(grid, has_colour(_, #2))', g).toRows()).toEqual([[1, 0, 1, 1], [0, 0, 0, 0], [0, 0, 0, 0]]);
    expect(evaluateGrid('keep_objects_where(grid, has_colour(_, #2))', g).toRows()).toEqual([[0, 0, 0, 0], [0, 0, 0, 0], [2, 0, 0, 0]]);
  });
});
