/** The learned-table primitives through the library: laws of apply_cell_rule and apply_object_rule. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CellRule, cellKeys, type CellFeature } from '../src/grid/cell-rule-table.ts';
import { Grid } from '../src/grid/grid.ts';
import { objectKeys, objectsOf, ObjectRule, OBJECT_GROUPINGS, OBJECT_PROPERTIES } from '../src/grid/object-rule-table.ts';
import { FAILURE } from '../src/language/failure.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { callPrimitive, evaluateGrid } from './support/run-primitive.ts';

const features: CellFeature[] = [{ name: 'colour' }, { name: 'above' }, { name: 'around', colour: 0 }];

/** A cell rule whose every entry keeps the cell's colour, with an entry for every key of the grid. */
function keepingRule(g: Grid): CellRule {
  const keys = cellKeys(g, features);
  const seen = new Map<number, number[]>();
  for (let i = 0; i < keys.length; i++) {
    if (seen.has(keys[i]!)) continue;
    let packed = keys[i]!;
    const key: number[] = [];
    for (let f = 0; f < features.length; f++) key.push(packed % 16), (packed = Math.floor(packed / 16));
    seen.set(keys[i]!, key);
  }
  return new CellRule(features, [...seen.values()].map((key) => ({ key, colour: key[0]! })));
}

describe('apply_cell_rule', () => {
  it('gives back the grid when every entry keeps the cell colour', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        expect((callPrimitive('apply_cell_rule', g, keepingRule(g)) as Grid).equals(g)).toBe(true);
      }),
    );
  });

  it('fails as soon as one key is missing', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.nat(), (g, pick) => {
        const full = keepingRule(g);
        const dropped = full.entries.filter((_, i) => i !== pick % full.entries.length);
        expect(callPrimitive('apply_cell_rule', g, new CellRule(features, dropped))).toBe(FAILURE);
      }),
    );
  });

  it('recolours by the left neighbour in a program', () => {
    const out = evaluateGrid('apply_cell_rule(grid, cell_rule[colour, left]{#2 edge -> #2, #0 #2 -> #7, #0 #0 -> #0, #2 #0 -> #2})', Grid.fromRows([[2, 0, 0], [2, 0, 2]]));
    expect(out.toRows()).toEqual([[2, 7, 0], [2, 7, 2]]);
  });
});

describe('apply_object_rule', () => {
  it('gives back the grid when every object is kept', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.constantFrom(...OBJECT_GROUPINGS), fc.constantFrom(...OBJECT_PROPERTIES), (g, grouping, property) => {
        const keys = objectKeys(g, objectsOf(g, grouping), property);
        const entries = [...new Set(keys.map(String))].map((k) => ({ key: keys.find((x) => String(x) === k)!, outcome: { kind: 'keep' as const } }));
        expect((callPrimitive('apply_object_rule', g, new ObjectRule(grouping, property, entries)) as Grid).equals(g)).toBe(true);
      }),
    );
  });

  it('removing every object leaves only the background', () => {
    const g = Grid.fromRows([[0, 3, 0], [4, 4, 0], [0, 0, 5]]);
    const out = evaluateGrid('apply_object_rule(grid, object_rule[multicolour_diagonal, touches_edge]{yes -> remove, no -> keep})', g);
    expect(out.toRows()).toEqual([[0, 0, 0], [0, 0, 0], [0, 0, 0]]);
  });
});
