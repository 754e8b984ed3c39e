/**
 * Tables read off the demonstrations: cell rules and object rules (src/grid/cell-rule-table.ts,
 * src/grid/object-rule-table.ts), each offered to the search as a constant that costs its bits
 * (table-bits.ts). Only the demonstration pairs and the test *inputs* are read: a table is kept
 * when it agrees with every demonstration and has an entry for every key that occurs in every
 * test input, so the program that applies it never meets a key it lacks on the task itself.
 *
 * Cell rules: every demonstration pair must keep its shape. The features tried are the cell's
 * colour plus one or two of: a neighbour's colour (8 directions), how many of the 8 or 4
 * neighbours have a colour, whether the cell's row or column holds a colour (for each colour of
 * the task), the parity of its row or column (from either end), whether it is enclosed, whether it lies on the
 * border, the first colour other than the background met looking up, down, left or right; and the
 * colour plus all 4 or all 8 neighbours. Besides these exact tables, one cell list (a rule with
 * `any` in its keys, read in order) is learned greedily from single conditions (learnCellList).
 *
 * Grid rules (any sizes): a property of the whole input picks the output (learnGridRules below).
 *
 * Object rules: every demonstration pair must keep its shape. For each way of cutting into
 * objects and each property, each object of a demonstration input is matched to what the output
 * shows at its place (kept, removed, recoloured) or elsewhere (moved); objects with equal values
 * must agree on one outcome, and the rule must reproduce every demonstration output when applied.
 */
import { colourCounts } from '../grid/components.ts';
import {
  applyCellRule,
  CellRule,
  featureOfCells,
  featureTakesColour,
  FIRST_FEATURES,
  isFirstFeature,
  KEEP,
  ANY,
  type CellFeature,
  type CellFeatureName,
  type CellRuleEntry,
} from '../grid/cell-rule-table.ts';
import type { Grid } from '../grid/grid.ts';
import {
  applyObjectRule,
  entryKeyCode,
  ObjectRule,
  OBJECT_GROUPINGS,
  OBJECT_PROPERTIES,
  objectKeys,
  objectsOf,
  outcomeCode,
  paintOutcomes,
  possibleOutcomes,
  type ObjectKey,
  type ObjectOutcome,
  type ObjectProperty,
  type ObjectRuleEntry,
  objectRuleEntry,
} from '../grid/object-rule-table.ts';
import { applyGridRule, GRID_PROPERTIES, gridKey, GridRule, type GridKey, type GridRuleEntry } from '../grid/grid-rule-table.ts';
import { objectRuleLiteral, type LiteralValue } from '../language/ast.ts';
import type { Puzzle } from '../tasks/task.ts';
import { distinctAttempts } from './distinct-attempts.ts';
import { cellRuleBitsAtLeast, tableBits, writtenOutBits } from './table-bits.ts';

export interface LearnedTable {
  readonly literal: LiteralValue;
  readonly bits: number;
}

/** Tables with more entries than this are not kept (they would cost far more than any search reaches). */
const MAXIMUM_ENTRIES = 64;
/** Objects per grid beyond which a way of cutting into objects is not tried. */
const MAXIMUM_OBJECTS = 120;

const NEIGHBOURS_4: readonly CellFeatureName[] = ['above', 'below', 'left', 'right'];
const NEIGHBOURS_8: readonly CellFeatureName[] = [...NEIGHBOURS_4, 'above_left', 'above_right', 'below_left', 'below_right'];

function sameShapedPairs(puzzle: Puzzle): boolean {
  return puzzle.train.length > 0 && puzzle.train.every((p) => p.input.height === p.output.height && p.input.width === p.output.width);
}

function taskColours(puzzle: Puzzle): number[] {
  const seen = new Set<number>();
  for (const g of [...puzzle.train.flatMap((p) => [p.input, p.output]), ...puzzle.testInputs]) {
    const counts = colourCounts(g);
    for (let c = 0; c < 10; c++) if (counts[c]! > 0) seen.add(c);
  }
  return [...seen].sort((a, b) => a - b);
}

function compareKeys(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
  return 0;
}

/** The single features tried after the cell's colour, in a fixed order. */
function cellAtoms(colours: readonly number[]): CellFeature[] {
  const atoms: CellFeature[] = NEIGHBOURS_8.map((name) => ({ name }));
  for (const name of ['around', 'beside', 'row_holds', 'column_holds'] as const) for (const colour of colours) atoms.push({ name, colour });
  atoms.push({ name: 'row_parity' }, { name: 'column_parity' }, { name: 'row_parity_from_bottom' }, { name: 'column_parity_from_right' }, { name: 'enclosed' }, { name: 'on_border' });
  for (const name of ['sees_above', 'sees_below', 'sees_left', 'sees_right'] as const) atoms.push({ name });
  return atoms;
}

function featureKey(f: CellFeature): string {
  return featureTakesColour(f.name) ? `${f.name}#${f.colour}` : f.name;
}

/** The key of cell i under features whose values are `columns` (the first feature the lowest digit). */
function packedKeyAt(columns: readonly Uint8Array[], i: number): number {
  let key = 0;
  for (let f = columns.length - 1; f >= 0; f--) key = key * 16 + columns[f]![i]!;
  return key;
}

/** Per grid, the values of each feature on its cells, computed once. */
class FeatureCache {
  private readonly values = new Map<Grid, Map<string, Uint8Array>>();

  of(g: Grid, f: CellFeature): Uint8Array {
    let forGrid = this.values.get(g);
    if (!forGrid) this.values.set(g, (forGrid = new Map()));
    const key = featureKey(f);
    let v = forGrid.get(key);
    if (!v) forGrid.set(key, (v = featureOfCells(g, f)));
    return v;
  }

  /** True when the feature takes more than one value over the cells of these grids (else it tells nothing). */
  varies(grids: readonly Grid[], f: CellFeature): boolean {
    const first = this.of(grids[0]!, f)[0];
    return grids.some((g) => this.of(g, f).some((v) => v !== first));
  }
}

/** Unpacks a key of `count` features. */
function unpackKey(packed: number, count: number): number[] {
  const key: number[] = [];
  for (let i = 0; i < count; i++) {
    key.push(packed % 16);
    packed = Math.floor(packed / 16);
  }
  return key;
}

/**
 * The cell rule of the given features that the demonstrations show, or undefined when two
 * cells with one key want different colours, a test input holds a key the demonstrations do not,
 * the table would be too large, or it changes nothing.
 *
 * A rule that starts with the cell's colour maps each key to a colour (a cell that keeps its
 * colour maps to that colour). One that starts with `background` maps a key to `keep` when every
 * cell with that key kept its colour, else to the one colour they all became.
 */
export function learnCellRule(puzzle: Puzzle, features: readonly CellFeature[], cache = new FeatureCache()): LiteralValue | undefined {
  const found = learnCellRuleWithin(puzzle, features, cache, Infinity);
  return found === OVER_BUDGET ? undefined : found?.literal;
}

/** A rule the demonstrations show, but dearer than the budget it was learned under. */
const OVER_BUDGET = Symbol('over budget');

/**
 * As {@link learnCellRule}, but a rule dearer than `maxBits` comes back as OVER_BUDGET without
 * its literal being built or its bits counted when its number of entries already says so
 * (`cellRuleBitsAtLeast`): learning tables from many made grids finds many such rules.
 */
function learnCellRuleWithin(puzzle: Puzzle, features: readonly CellFeature[], cache: FeatureCache, maxBits: number): LearnedTable | undefined | typeof OVER_BUDGET {
  const first = features[0]?.name;
  if (!sameShapedPairs(puzzle) || first === undefined || !isFirstFeature(first)) return undefined;
  const byColour = first === 'colour';
  // Keys are packed cell by cell (no array of keys per grid) so that a conflict, the common
  // outcome, ends the work at the first cell that shows it. For a background-first rule an
  // entry's state is the colour every cell with the key became (CONFLICT when they differ) plus
  // KEPT while every one of them kept its colour.
  const table = new Map<number, number>();
  for (const { input, output } of puzzle.train) {
    const columns = features.map((f) => cache.of(input, f));
    const out = output.cells;
    const before = input.cells;
    for (let i = 0; i < out.length; i++) {
      const key = packedKeyAt(columns, i);
      const known = table.get(key);
      const colour = out[i]!;
      if (byColour) {
        if (known === undefined) {
          if (table.size >= MAXIMUM_ENTRIES) return undefined;
          table.set(key, colour);
        } else if (known !== colour) return undefined;
        continue;
      }
      const kept = colour === before[i] ? KEPT : 0;
      if (known === undefined) {
        if (table.size >= MAXIMUM_ENTRIES) return undefined;
        table.set(key, colour | kept);
        continue;
      }
      const became = (known & CONFLICT) === colour ? colour : CONFLICT;
      const stillKept = known & kept;
      if (became === CONFLICT && stillKept === 0) return undefined;
      if ((became | stillKept) !== known) table.set(key, became | stillKept);
    }
  }
  for (const g of puzzle.testInputs) {
    const columns = features.map((f) => cache.of(g, f));
    const length = g.height * g.width;
    for (let i = 0; i < length; i++) if (!table.has(packedKeyAt(columns, i))) return undefined;
  }
  let changes = false;
  for (const [packed, state] of table) {
    if (byColour ? packed % 16 !== state : (state & KEPT) === 0) {
      changes = true;
      break;
    }
  }
  if (!changes) return undefined;
  if (cellRuleBitsAtLeast(features, table.size) > maxBits) return OVER_BUDGET;
  const entries: CellRuleEntry[] = [];
  for (const [packed, state] of table) {
    const key = unpackKey(packed, features.length);
    const colour = byColour ? state : state & KEPT ? KEEP : state & CONFLICT;
    entries.push({ key, colour });
  }
  entries.sort((a, b) => compareKeys(a.key, b.key));
  const literal: LiteralValue = { type: 'CellRule', features: [...features], entries };
  const bits = tableBits(literal)!;
  return bits <= maxBits ? { literal, bits } : OVER_BUDGET;
}

/** In a background-first rule's learning state: the low bits hold a colour, or CONFLICT. */
const CONFLICT = 15;
/** In a background-first rule's learning state: every cell with the key kept its colour. */
const KEPT = 16;

/**
 * The cheapest cell rules the demonstrations show (at most `limit`, with distinct outputs on the
 * test inputs), cheapest first. The features tried after the first (the cell's colour, and
 * `background`, each in turn): none, each single feature, each pair of them, all 4 and all 8
 * neighbours. A feature that takes one value on every cell of every grid tells nothing and is
 * left out. When a first feature alone works nothing longer is tried, and a pair is not tried
 * when one of its features works alone: with the same first feature the longer table holds at
 * least as many entries, each dearer. (Across the two first features this is a shortcut for
 * speed, not a proof: a longer background-first rule could undercut a colour-first one.)
 *
 * With `maxBits`, only tables of at most that many bits are returned: a rule whose number of
 * entries already puts it over is neither built nor priced (learning tables from made grids finds
 * many). The rules tried are the same as without the budget, so the tables returned are too, less
 * those over it.
 */
export function learnCellRules(puzzle: Puzzle, limit = 2, maxBits = Infinity): LearnedTable[] {
  if (!sameShapedPairs(puzzle)) return [];
  const cache = new FeatureCache();
  const grids = [...puzzle.train.map((p) => p.input), ...puzzle.testInputs];
  const atoms = cellAtoms(taskColours(puzzle)).filter((f) => cache.varies(grids, f));
  const found: LearnedTable[] = [];
  const worksAlone = new Set<number>();
  // Each feature set is tried after the cell's colour and after `background`.
  const tryFeatures = (extra: readonly CellFeature[]): boolean => {
    let works = false;
    for (const name of FIRST_FEATURES) {
      const table = learnCellRuleWithin(puzzle, [{ name }, ...extra], cache, maxBits);
      if (table !== undefined && table !== OVER_BUDGET) found.push(table);
      // A rule over the budget still works: the longer sets it rules out would cost more again.
      works ||= table !== undefined;
    }
    return works;
  };
  // A first feature alone: with the same first feature every longer set only adds entries, so
  // nothing longer is tried when one works (see above for the shortcut this is across the two).
  if (tryFeatures([])) return cheapestDistinct(found, limit, puzzle);
  atoms.forEach((a, i) => {
    if (tryFeatures([a])) worksAlone.add(i);
  });
  for (let i = 0; i < atoms.length; i++) {
    if (worksAlone.has(i)) continue;
    for (let j = i + 1; j < atoms.length; j++) if (!worksAlone.has(j)) tryFeatures([atoms[i]!, atoms[j]!]);
  }
  tryFeatures(NEIGHBOURS_4.map((name) => ({ name })));
  tryFeatures(NEIGHBOURS_8.map((name) => ({ name })));
  return cheapestDistinct(found, limit, puzzle);
}

/** Outcomes of each object, as codes in order of preference, with the outcomes themselves. */
interface ObjectsOfPair {
  readonly input: Grid;
  readonly output: Grid;
  readonly objects: ReturnType<typeof objectsOf>;
  readonly choices: readonly (readonly string[])[];
}

/** Each demonstration's objects' values of a property, worked out once per property and grouping. */
type KeysOfPairs = (property: ObjectProperty) => readonly ObjectKey[][];

/**
 * The object rule for one way of cutting and one property (or two: `second`), or undefined (see
 * learnCellRule). With two, an object's key is the pair of its values.
 */
function learnObjectRuleFrom(
  puzzle: Puzzle,
  pairs: readonly ObjectsOfPair[],
  outcomes: ReadonlyMap<string, ObjectOutcome>,
  grouping: (typeof OBJECT_GROUPINGS)[number],
  property: ObjectProperty,
  second: ObjectProperty | undefined,
  keysOf: KeysOfPairs,
): LiteralValue | undefined {
  const allowed = new Map<string, { key: ObjectKey; secondKey: ObjectKey | undefined; codes: string[] }>();
  const namesOfPairs: string[][] = [];
  const firstKeys = keysOf(property);
  const secondKeys = second === undefined ? undefined : keysOf(second);
  for (let p = 0; p < pairs.length; p++) {
    const pair = pairs[p]!;
    const keys = firstKeys[p]!;
    const names: string[] = [];
    namesOfPairs.push(names);
    for (let i = 0; i < keys.length; i++) {
      const secondKey = secondKeys?.[p]![i];
      const name = entryKeyCode(keys[i]!, secondKey);
      names.push(name);
      const known = allowed.get(name);
      const mine = pair.choices[i]!;
      if (!known) {
        if (allowed.size >= MAXIMUM_ENTRIES) return undefined;
        allowed.set(name, { key: keys[i]!, secondKey, codes: [...mine] });
        continue;
      }
      const kept = known.codes.filter((c) => mine.includes(c));
      if (kept.length === 0) return undefined;
      known.codes = kept;
    }
  }
  if (allowed.size === 0) return undefined;
  const chosen = new Map<string, ObjectOutcome>();
  let changes = false;
  for (const [name, { codes }] of allowed) {
    chosen.set(name, outcomes.get(codes[0]!)!);
    if (codes[0] !== 'k') changes = true;
  }
  if (!changes) return undefined;
  for (let p = 0; p < pairs.length; p++) {
    const pair = pairs[p]!;
    const painted = paintOutcomes(pair.input, pair.objects, namesOfPairs[p]!.map((name) => chosen.get(name)!));
    if (!painted || !painted.equals(pair.output)) return undefined;
  }
  for (const g of puzzle.testInputs) {
    const objects = objectsOf(g, grouping);
    const keys = objectKeys(g, objects, property);
    const more = second === undefined ? undefined : objectKeys(g, objects, second);
    for (let i = 0; i < keys.length; i++) if (!allowed.has(entryKeyCode(keys[i]!, more?.[i]))) return undefined;
  }
  const entries: ObjectRuleEntry[] = [...allowed.entries()].map(([name, { key, secondKey }]) => objectRuleEntry(key, secondKey, chosen.get(name)!));
  entries.sort((a, b) => compareTableKeys(a.key, b.key) || (a.secondKey === undefined ? 0 : compareTableKeys(a.secondKey, b.secondKey!)));
  return objectRuleLiteral(grouping, property, second, entries);
}

/** Table keys in order: numbers by value, texts by their characters. */
function compareTableKeys(a: number | string, b: number | string): number {
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  const x = String(a);
  const y = String(b);
  return x < y ? -1 : x > y ? 1 : 0;
}

/**
 * The cheapest object rules the demonstrations show (at most `limit`, of at most `maxBits` each),
 * cheapest first; rules keyed on two properties only where no one property explains a cut, and
 * only when `twoProperties` is true.
 */
export function learnObjectRules(puzzle: Puzzle, limit = 2, maxBits = Infinity, twoProperties = true): LearnedTable[] {
  if (!sameShapedPairs(puzzle)) return [];
  const found: LearnedTable[] = [];
  for (const grouping of OBJECT_GROUPINGS) {
    const outcomes = new Map<string, ObjectOutcome>();
    const pairs: ObjectsOfPair[] = [];
    let usable = true;
    for (const { input, output } of puzzle.train) {
      const objects = objectsOf(input, grouping);
      if (objects.length === 0 || objects.length > MAXIMUM_OBJECTS) {
        usable = false;
        break;
      }
      const choices = objects.map((o) =>
        possibleOutcomes(o, input, output).map((outcome) => {
          const code = outcomeCode(outcome);
          outcomes.set(code, outcome);
          return code;
        }),
      );
      if (choices.some((c) => c.length === 0)) {
        usable = false;
        break;
      }
      pairs.push({ input, output, objects, choices });
    }
    if (!usable) continue;
    const cache = new Map<ObjectProperty, ObjectKey[][]>();
    const keysOf: KeysOfPairs = (property) => {
      let keys = cache.get(property);
      if (!keys) cache.set(property, (keys = pairs.map((pair) => objectKeys(pair.input, pair.objects, property))));
      return keys;
    };
    const before = found.length;
    for (const property of OBJECT_PROPERTIES) {
      const literal = learnObjectRuleFrom(puzzle, pairs, outcomes, grouping, property, undefined, keysOf);
      if (!literal) continue;
      const bits = tableBits(literal)!;
      if (bits <= maxBits) found.push({ literal, bits });
    }
    // Two properties at once, only where no single one explains the objects under this cut: a
    // pair costs another property's bits and more entries, so it is rarely the cheaper anyway.
    if (!twoProperties || found.length > before) continue;
    for (let a = 0; a < OBJECT_PROPERTIES.length; a++) {
      for (let b = a + 1; b < OBJECT_PROPERTIES.length; b++) {
        const literal = learnObjectRuleFrom(puzzle, pairs, outcomes, grouping, OBJECT_PROPERTIES[a]!, OBJECT_PROPERTIES[b]!, keysOf);
        if (!literal) continue;
        const bits = tableBits(literal)!;
        if (bits <= maxBits) found.push({ literal, bits });
      }
    }
  }
  return cheapestDistinct(found, limit, puzzle);
}

/**
 * The grid rules the demonstrations show (at most `limit`, of at most `maxBits` each), cheapest
 * first. For each property of the whole input, demonstrations whose inputs share a value must
 * share their output, and every test input's value must have an entry. Two further conditions
 * keep a rule from merely listing the demonstrations: at least two demonstrations share a value
 * (so the table has fewer entries than there are demonstrations), and the table costs fewer bits
 * than the demonstration outputs written out cell by cell (table-bits.ts, `writtenOutBits`): a
 * table that does not compress the outputs explains nothing.
 */
export function learnGridRules(puzzle: Puzzle, limit = 2, maxBits = Infinity): LearnedTable[] {
  const outputs = puzzle.train.map((p) => p.output);
  if (outputs.length < 2) return [];
  const writtenOut = writtenOutBits(outputs);
  const found: LearnedTable[] = [];
  for (const property of GRID_PROPERTIES) {
    const table = new Map<string, { key: GridKey; grid: Grid }>();
    let agrees = true;
    for (const { input, output } of puzzle.train) {
      const key = gridKey(input, property);
      if (key === undefined) {
        agrees = false;
        break;
      }
      const code = String(key);
      const entry = table.get(code);
      if (entry && !entry.grid.equals(output)) {
        agrees = false;
        break;
      }
      if (!entry) table.set(code, { key, grid: output });
    }
    if (!agrees || table.size >= outputs.length) continue;
    if (!puzzle.testInputs.every((g) => table.has(String(gridKey(g, property))))) continue;
    const entries: GridRuleEntry[] = [...table.values()]
      .sort((a, b) => compareTableKeys(a.key, b.key))
      .map(({ key, grid }) => ({ key, rows: grid.toRows() }));
    const literal: LiteralValue = { type: 'GridRule', property, entries };
    const bits = tableBits(literal)!;
    if (bits <= maxBits && bits < writtenOut) found.push({ literal, bits });
  }
  return cheapestDistinct(found, limit, puzzle);
}

/** What a table does to a grid (null where it lacks a key). */
export function applyTable(literal: LiteralValue, g: Grid): Grid | null {
  if (literal.type === 'CellRule') return applyCellRule(g, new CellRule(literal.features, literal.entries));
  if (literal.type === 'ObjectRule') return applyObjectRule(g, new ObjectRule(literal.grouping, literal.property, literal.entries, literal.second));
  if (literal.type === 'GridRule') return applyGridRule(g, new GridRule(literal.property, literal.entries));
  return null;
}

/**
 * The `limit` cheapest tables (ties in the order found, the fixed order of the lists above),
 * leaving out one whose outputs on the test inputs equal a cheaper one's: on the demonstrations
 * they all agree, so it would add nothing.
 */
function cheapestDistinct(found: LearnedTable[], limit: number, puzzle: Puzzle): LearnedTable[] {
  const ordered = found
    .map((t, i) => ({ t, i }))
    .sort((a, b) => a.t.bits - b.t.bits || a.i - b.i)
    .map(({ t }) => t);
  return distinctAttempts(ordered, (t) => puzzle.testInputs.map((g) => applyTable(t.literal, g)), limit);
}

/** Conditions a cell list may take at most (its last entry, `keep` for every other cell, not counted). */
const MAXIMUM_CONDITIONS = 8;

/**
 * A cell rule read in order (a list of conditions, src/grid/cell-rule-table.ts), learned greedily:
 * each condition is one feature taking one value (the cell's colour, whether it is background, or
 * one of the single features the exact rules try), and gives one colour. At each step, among the
 * conditions whose cells not yet claimed by an earlier condition all become one colour, the one
 * that changes the most such cells comes next (then the one covering the most; ties in the fixed
 * feature order). It stops when every cell left keeps its colour, and ends the list with `any ...
 * -> keep`; it gives up (undefined) when no condition can change a cell left, after
 * MAXIMUM_CONDITIONS conditions, or when the list would cost more than `maxBits`.
 *
 * Where an exact table needs an entry for every combination of its features, and so fails on a
 * test input that brings a combination no demonstration shows, a list states each condition once:
 * "below a #1 cell becomes #2" holds whatever the other neighbours are.
 */
export function learnCellList(puzzle: Puzzle, maxBits = Infinity): LearnedTable | undefined {
  if (!sameShapedPairs(puzzle)) return undefined;
  const cache = new FeatureCache();
  const inputs = puzzle.train.map((p) => p.input);
  const grids = [...inputs, ...puzzle.testInputs];
  const candidates: CellFeature[] = [...FIRST_FEATURES.map((name) => ({ name })), ...cellAtoms(taskColours(puzzle))].filter((f) => cache.varies(grids, f));
  // Cells of all demonstrations in one row: what each becomes, and whether it changes.
  let total = 0;
  for (const g of inputs) total += g.height * g.width;
  const target = new Uint8Array(total);
  const changes = new Uint8Array(total);
  /** Changed cells no condition has claimed yet. */
  let changesLeft = 0;
  let offset = 0;
  for (const { input, output } of puzzle.train) {
    const inputCells = input.cells;
    const outputCells = output.cells;
    for (let i = 0; i < inputCells.length; i++) {
      target[offset + i] = outputCells[i]!;
      changes[offset + i] = outputCells[i] !== inputCells[i] ? 1 : 0;
      changesLeft += changes[offset + i]!;
    }
    offset += inputCells.length;
  }
  const columns = candidates.map((f) => {
    const all = new Uint8Array(total);
    let at = 0;
    for (const g of inputs) {
      all.set(cache.of(g, f), at);
      at += g.height * g.width;
    }
    return all;
  });
  const claimed = new Uint8Array(total);
  const chosen: { feature: number; value: number; colour: number }[] = [];
  // Per value of a feature: cells covered, cells changed, and the one colour they become (NONE when they differ).
  const covered = new Int32Array(16);
  const changed = new Int32Array(16);
  const becomes = new Int16Array(16);
  const NONE = -1;
  const UNSET = -2;
  while (changesLeft > 0) {
    if (chosen.length >= MAXIMUM_CONDITIONS) return undefined;
    let best: { feature: number; value: number; colour: number; changed: number; covered: number } | undefined;
    for (let f = 0; f < columns.length; f++) {
      const column = columns[f]!;
      covered.fill(0);
      changed.fill(0);
      becomes.fill(UNSET);
      for (let i = 0; i < total; i++) {
        if (claimed[i]) continue;
        const v = column[i]!;
        covered[v]!++;
        changed[v]! += changes[i]!;
        const b = becomes[v]!;
        if (b === UNSET) becomes[v] = target[i]!;
        else if (b !== target[i]) becomes[v] = NONE;
      }
      for (let v = 0; v < 16; v++) {
        if (changed[v] === 0 || becomes[v]! < 0) continue;
        if (!best || changed[v]! > best.changed || (changed[v] === best.changed && covered[v]! > best.covered)) {
          best = { feature: f, value: v, colour: becomes[v]!, changed: changed[v]!, covered: covered[v]! };
        }
      }
    }
    if (!best) return undefined;
    chosen.push(best);
    const column = columns[best.feature]!;
    for (let i = 0; i < total; i++) {
      if (claimed[i] || column[i] !== best.value) continue;
      claimed[i] = 1;
      changesLeft -= changes[i]!;
    }
  }
  if (chosen.length === 0) return undefined;
  // The rule's features: the cell's colour first when a condition names it, else `background`;
  // then the others in the order the conditions first name them.
  const used: number[] = [];
  const colourIndex = candidates.findIndex((f) => f.name === 'colour');
  const backgroundIndex = candidates.findIndex((f) => f.name === 'background');
  const first = chosen.some((c) => c.feature === colourIndex) ? colourIndex : backgroundIndex;
  const features: CellFeature[] = [first >= 0 ? candidates[first]! : { name: 'background' }];
  for (const c of chosen) if (c.feature !== first && !used.includes(c.feature)) used.push(c.feature);
  for (const f of used) features.push(candidates[f]!);
  const position = (feature: number): number => (feature === first ? 0 : 1 + used.indexOf(feature));
  const entries: CellRuleEntry[] = chosen.map((c) => {
    const key = new Array<number>(features.length).fill(ANY);
    key[position(c.feature)] = c.value;
    return { key, colour: c.colour };
  });
  entries.push({ key: new Array<number>(features.length).fill(ANY), colour: KEEP });
  const literal: LiteralValue = { type: 'CellRule', features, entries };
  const bits = tableBits(literal)!;
  return bits <= maxBits ? { literal, bits } : undefined;
}

/** Every learned table the search is offered: cell rules, then object rules, then grid rules. */
export function learnedTables(puzzle: Puzzle): LearnedTable[] {
  const cells = learnCellRules(puzzle);
  const list = learnCellList(puzzle);
  if (list) cells.push(list);
  return [...cheapestDistinct(cells, 2, puzzle), ...learnObjectRules(puzzle), ...learnGridRules(puzzle)];
}
