/** Cell rules: feature values worked out by hand, applying a table, failing on a missing key, equality. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { applyCellRule, CellRule, EDGE, featureOfCells, type CellFeature, type CellRuleEntry } from '../src/grid/cell-rule-table.ts';
import { Grid } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';
import { cellRuleArbitrary } from './support/random-table.ts';

const G = Grid.fromRows;
//   1 0 2
//   0 1 0
const small = G([[1, 0, 2], [0, 1, 0]]);
const values = (f: CellFeature): number[] => Array.from(featureOfCells(small, f));

describe('featureOfCells', () => {
  it('reads neighbours, with EDGE outside the grid', () => {
    expect(values({ name: 'above' })).toEqual([EDGE, EDGE, EDGE, 1, 0, 2]);
    expect(values({ name: 'right' })).toEqual([0, 2, EDGE, 1, 0, EDGE]);
    expect(values({ name: 'below_left' })).toEqual([EDGE, 0, 1, EDGE, EDGE, EDGE]);
  });

  it('counts a colour among the 8 surrounding cells and among the 4 edge neighbours', () => {
    expect(values({ name: 'around', colour: 1 })).toEqual([1, 2, 1, 2, 1, 1]);
    expect(values({ name: 'beside', colour: 1 })).toEqual([0, 2, 0, 2, 0, 1]);
  });

  it('tells whether the row or column holds a colour, and the parities', () => {
    expect(values({ name: 'row_holds', colour: 2 })).toEqual([1, 1, 1, 0, 0, 0]);
    expect(values({ name: 'column_holds', colour: 1 })).toEqual([1, 1, 0, 1, 1, 0]);
    expect(values({ name: 'row_parity' })).toEqual([0, 0, 0, 1, 1, 1]);
    expect(values({ name: 'column_parity' })).toEqual([0, 1, 0, 0, 1, 0]);
  });

  it('counts the parities from the bottom and right too: the far end is even', () => {
    // Two rows of four: from the left the columns run even, odd, even, odd; from the right the
    // last column is even, so they run odd, even, odd, even; the bottom row is even from below.
    const g = G([[1, 2, 3, 4], [5, 6, 7, 8]]);
    expect(Array.from(featureOfCells(g, { name: 'column_parity_from_right' }))).toEqual([1, 0, 1, 0, 1, 0, 1, 0]);
    expect(Array.from(featureOfCells(g, { name: 'row_parity_from_bottom' }))).toEqual([1, 1, 1, 1, 0, 0, 0, 0]);
  });
});

describe('featureOfCells: enclosed and on_border', () => {
  it('marks background cells walled in by other colours, and the cells of the border', () => {
    //   2 2 2 0
    //   2 0 2 0
    //   2 2 2 0
    const g = G([[2, 2, 2, 0], [2, 0, 2, 0], [2, 2, 2, 0]]);
    expect(Array.from(featureOfCells(g, { name: 'enclosed' }))).toEqual([0, 0, 0, 0, 0, 1, 0, 0, 0, 0, 0, 0]);
    expect(Array.from(featureOfCells(g, { name: 'on_border' }))).toEqual([1, 1, 1, 1, 1, 0, 0, 1, 1, 1, 1, 1]);
  });
});

describe('featureOfCells: the sees_ features', () => {
  it('gives the first colour other than the background met looking each way, by hand', () => {
    //   0 3 0
    //   0 0 0
    //   4 0 3
    // background 0; the cell itself is not counted
    const g = G([[0, 3, 0], [0, 0, 0], [4, 0, 3]]);
    const look = (name: CellFeature['name']) => Array.from(featureOfCells(g, { name }));
    expect(look('sees_above')).toEqual([EDGE, EDGE, EDGE, EDGE, 3, EDGE, EDGE, 3, EDGE]);
    expect(look('sees_below')).toEqual([4, EDGE, 3, 4, EDGE, 3, EDGE, EDGE, EDGE]);
    expect(look('sees_left')).toEqual([EDGE, EDGE, 3, EDGE, EDGE, EDGE, EDGE, 4, 4]);
    expect(look('sees_right')).toEqual([3, EDGE, EDGE, EDGE, EDGE, EDGE, 3, 3, EDGE]);
  });

  it('agrees with a step-by-step walk on random grids (law)', () => {
    const steps = { sees_above: [-1, 0], sees_below: [1, 0], sees_left: [0, -1], sees_right: [0, 1] } as const;
    fc.assert(
      fc.property(arbitraryGrid(), fc.constantFrom(...(Object.keys(steps) as (keyof typeof steps)[])), (g, name) => {
        const background = backgroundOf(g);
        const [dr, dc] = steps[name];
        const got = featureOfCells(g, { name });
        for (let r = 0; r < g.height; r++) {
          for (let c = 0; c < g.width; c++) {
            let seen = EDGE;
            for (let nr = r + dr, nc = c + dc; nr >= 0 && nr < g.height && nc >= 0 && nc < g.width; nr += dr, nc += dc) {
              const v = g.cells[nr * g.width + nc]!;
              if (v !== background) {
                seen = v;
                break;
              }
            }
            if (got[r * g.width + c] !== seen) return false;
          }
        }
        return true;
      }),
    );
  });
});

describe('applyCellRule', () => {
  // A cell of colour 0 whose left neighbour is 1 becomes 2; everything else keeps its colour.
  const rule = new CellRule(
    [{ name: 'colour' }, { name: 'left' }],
    [
      { key: [0, EDGE], colour: 0 },
      { key: [0, 0], colour: 0 },
      { key: [0, 1], colour: 2 },
      { key: [1, EDGE], colour: 1 },
      { key: [1, 0], colour: 1 },
    ],
  );

  it('looks every cell up', () => {
    expect(applyCellRule(G([[1, 0, 0], [0, 1, 0]]), rule)!.toRows()).toEqual([[1, 2, 0], [0, 1, 2]]);
  });

  it('fails on a key the table lacks instead of guessing', () => {
    // (0, 1): colour 0 with 2 on its left: no entry
    expect(applyCellRule(G([[2, 0]]), rule)).toBeNull();
    // (0, 1): colour 1 with 1 on its left: no entry
    expect(applyCellRule(G([[1, 1]]), rule)).toBeNull();
  });

  it('fails when the first feature is not the cell colour', () => {
    expect(applyCellRule(G([[1]]), new CellRule([{ name: 'above' }], [{ key: [EDGE], colour: 3 }]))).toBeNull();
  });
});

describe('CellRule equality', () => {
  it('does not depend on the order of the entries', () => {
    fc.assert(
      fc.property(cellRuleArbitrary, (literal) => {
        if (literal.type !== 'CellRule') return;
        const a = new CellRule(literal.features, literal.entries);
        const b = new CellRule(literal.features, [...literal.entries].reverse() as CellRuleEntry[]);
        expect(a.equals(b)).toBe(true);
        expect(a.hash).toBe(b.hash);
      }),
    );
  });

  it('tells apart tables that differ in one entry or in a feature', () => {
    const a = new CellRule([{ name: 'colour' }, { name: 'around', colour: 2 }], [{ key: [0, 1], colour: 3 }]);
    expect(a.equals(new CellRule([{ name: 'colour' }, { name: 'around', colour: 2 }], [{ key: [0, 1], colour: 4 }]))).toBe(false);
    expect(a.equals(new CellRule([{ name: 'colour' }, { name: 'around', colour: 5 }], [{ key: [0, 1], colour: 3 }]))).toBe(false);
    expect(a.equals(new CellRule([{ name: 'colour' }, { name: 'beside', colour: 2 }], [{ key: [0, 1], colour: 3 }]))).toBe(false);
  });
});
