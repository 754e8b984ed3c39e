/**
 * Random learned tables (cell rules, object rules and grid rules) as literals, for property tests: the text
 * round trip, type soundness, and anything that needs tables to feed the interpreter. Driven by
 * any source of choices (`choose(n)` returns a whole number from 0 to n - 1), or as fast-check
 * arbitraries.
 */
import fc from 'fast-check';
import {
  CELL_FEATURE_NAMES,
  featureTakesColour,
  featureValues,
  FIRST_FEATURES,
  KEEP,
  ANY,
  largestFeatureValue,
  packKey,
  type CellFeature,
  type CellRuleEntry,
} from '../../src/grid/cell-rule-table.ts';
import {
  OBJECT_GROUPINGS,
  OBJECT_PROPERTIES,
  propertyValues,
  SLIDE_WAYS,
  type ObjectKey,
  type ObjectOutcome,
  type ObjectRuleEntry,
} from '../../src/grid/object-rule-table.ts';
import { tableKeyCode } from '../../src/grid/text-hash.ts';
import { GRID_PROPERTIES, gridPropertyValues, type GridKey, type GridRuleEntry } from '../../src/grid/grid-rule-table.ts';
import type { LiteralValue } from '../../src/language/ast.ts';

export type Chooser = (count: number) => number;

/** A random cell rule; with `withAny`, key values are sometimes `any`, making it a list read in order. */
export function randomCellRule(choose: Chooser, withAny = false): LiteralValue {
  const features: CellFeature[] = [{ name: FIRST_FEATURES[choose(FIRST_FEATURES.length)]! }];
  const extra = choose(4);
  for (let i = 0; i < extra; i++) {
    const name = CELL_FEATURE_NAMES[choose(CELL_FEATURE_NAMES.length)]!;
    features.push(featureTakesColour(name) ? { name, colour: choose(10) } : { name });
  }
  const entries: CellRuleEntry[] = [];
  const seen = new Set<number>();
  const count = choose(7);
  for (let i = 0; i < count; i++) {
    const key = features.map((f) => {
      const largest = largestFeatureValue(featureValues(f.name));
      const v = choose(largest + (withAny ? 3 : 1));
      return v > largest ? ANY : v;
    });
    const packed = packKey(key);
    if (seen.has(packed)) continue;
    seen.add(packed);
    const output = choose(11);
    entries.push({ key, colour: output === 10 ? KEEP : output });
  }
  return { type: 'CellRule', features, entries };
}

function randomShape(choose: Chooser): string {
  const height = 1 + choose(3);
  const width = 1 + choose(3);
  const cells = Array.from({ length: height * width }, () => (choose(2) ? 'x' : '.'));
  cells[choose(cells.length)] = 'x';
  const rows: string[] = [];
  for (let r = 0; r < height; r++) rows.push(cells.slice(r * width, (r + 1) * width).join(''));
  return rows.join('/');
}

function randomObjectKey(choose: Chooser, values: ReturnType<typeof propertyValues>): ObjectKey {
  switch (values) {
    case 'number':
      return choose(13);
    case 'colour':
      return choose(10);
    case 'yes or no':
      return choose(2);
    case 'shape':
      return randomShape(choose);
  }
}

function randomGridKey(choose: Chooser, values: ReturnType<typeof gridPropertyValues>): GridKey {
  switch (values) {
    case 'number':
      return choose(31);
    case 'yes or no':
      return choose(2);
    case 'colours': {
      let set = '';
      for (let c = 0; c < 10; c++) if (choose(3) === 0) set += String(c);
      return set === '' ? String(choose(10)) : set;
    }
    case 'shape':
      return randomShape(choose);
  }
}

/** The rows of a small grid of random colours (at most 4 × 4). */
function randomSmallRows(choose: Chooser): number[][] {
  const height = 1 + choose(4);
  const width = 1 + choose(4);
  return Array.from({ length: height }, () => Array.from({ length: width }, () => choose(10)));
}

/** Up to `count` entries: each draws a key, and an entry for it unless the key was drawn before. */
function distinctKeyed<K extends string | number, E>(count: number, key: () => K, entry: (key: K) => E): E[] {
  const entries: E[] = [];
  const seen = new Set<string>();
  for (let i = 0; i < count; i++) {
    const k = key();
    if (seen.has(String(k))) continue;
    seen.add(String(k));
    entries.push(entry(k));
  }
  return entries;
}

export function randomGridRule(choose: Chooser): LiteralValue {
  const property = GRID_PROPERTIES[choose(GRID_PROPERTIES.length)]!;
  const values = gridPropertyValues(property);
  const entries: GridRuleEntry[] = distinctKeyed(choose(5), () => randomGridKey(choose, values), (key) => ({ key, rows: randomSmallRows(choose) }));
  return { type: 'GridRule', property, entries };
}

function randomOutcome(choose: Chooser): ObjectOutcome {
  switch (choose(7)) {
    case 0:
      return { kind: 'keep' };
    case 1:
      return { kind: 'remove' };
    case 2:
      return { kind: 'recolour', colour: choose(10) };
    case 3:
      return { kind: 'fill', colour: choose(10) };
    case 4:
      return { kind: 'mirror', across: choose(2) === 0 ? 'left_right' : 'top_bottom' };
    case 5:
      return { kind: 'slide', way: SLIDE_WAYS[choose(SLIDE_WAYS.length)]! };
    default:
      return { kind: 'move', rows: choose(7) - 3, columns: choose(7) - 3 };
  }
}

export function randomObjectRule(choose: Chooser): LiteralValue {
  const grouping = OBJECT_GROUPINGS[choose(OBJECT_GROUPINGS.length)]!;
  const property = OBJECT_PROPERTIES[choose(OBJECT_PROPERTIES.length)]!;
  const values = propertyValues(property);
  // A third of the rules key on a second property too (never the first again).
  const secondIndex = choose(3) === 0 ? choose(OBJECT_PROPERTIES.length - 1) : -1;
  if (secondIndex < 0) {
    const entries: ObjectRuleEntry[] = distinctKeyed(choose(6), () => randomObjectKey(choose, values), (key) => ({ key, outcome: randomOutcome(choose) }));
    return { type: 'ObjectRule', grouping, property, entries };
  }
  const second = OBJECT_PROPERTIES.filter((p) => p !== property)[secondIndex]!;
  const secondValues = propertyValues(second);
  let pair: [ObjectKey, ObjectKey] = [0, 0];
  const entries: ObjectRuleEntry[] = distinctKeyed(
    choose(6),
    () => {
      pair = [randomObjectKey(choose, values), randomObjectKey(choose, secondValues)];
      return `${tableKeyCode(pair[0])} ${tableKeyCode(pair[1])}`;
    },
    () => ({ key: pair[0], secondKey: pair[1], outcome: randomOutcome(choose) }),
  );
  return { type: 'ObjectRule', grouping, property, second, entries };
}

const chooserArbitrary: fc.Arbitrary<Chooser> = fc.gen().map((g) => (count: number) => (count <= 1 ? 0 : g(fc.nat, { max: count - 1 })));

export const cellRuleArbitrary: fc.Arbitrary<LiteralValue> = chooserArbitrary.map((choose) => randomCellRule(choose));
/** Cell rules, some of them lists read in order (keys holding `any`). */
export const cellListArbitrary: fc.Arbitrary<LiteralValue> = chooserArbitrary.map((choose) => randomCellRule(choose, true));
export const objectRuleArbitrary: fc.Arbitrary<LiteralValue> = chooserArbitrary.map(randomObjectRule);
export const gridRuleArbitrary: fc.Arbitrary<LiteralValue> = chooserArbitrary.map(randomGridRule);
