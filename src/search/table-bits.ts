/**
 * The bits of a table written in a program: a palette, a cell rule or an object rule. A table
 * read off the demonstrations is the data term of the description length, so each entry is
 * paid for: a table of many entries costs many bits and never beats a short program that says
 * the same thing. The bits depend on the literal alone, so a program read from text costs what
 * the search charged for it (README, "Description length", gives the formula):
 *
 *   palette      1 + Σ entries 2c
 *   cell rule    γ(f + 1) + 1 (colour or background first) + Σ extra features (5 + 4 when it names a colour)
 *                + Σ entries (Σ key values + (1 when the cell keeps its colour, else 1 + c));
 *                a rule with `any` in a key (a list read in order) pays 1 more, and each of its key
 *                values 1 more (1 alone for `any`)
 *   object rule  2 + 4 + Σ entries (key value + outcome)
 *   grid rule    3 + 1 + (γ(h) + γ(w) once, when every grid of the table is h × w)
 *                + Σ entries (key value + (γ(h) + γ(w) of its grid, when sizes differ) + h·w·c)
 *
 * where c = max(1, ⌈log₂ k⌉) for the k distinct colours the table writes in its entries, f is
 * the number of features after the cell's own colour, and γ(n) = 2⌊log₂ n⌋ + 1 is the length of
 * the Elias gamma code of a whole number n ≥ 1. A grid rule's key costs γ(n + 1) for a number n,
 * 1 for yes/no, γ(h) + γ(w) + h·w for a shape of h × w, and γ(m) + m·c' for a set of m colours,
 * c' naming one of the colours its keys hold.
 */
import { featureValues, isOrderedRule, ANY, EDGE, KEEP, type CellFeature, type CellFeatureValues } from '../grid/cell-rule-table.ts';
import { gridPropertyValues, type GridKey, type GridProperty } from '../grid/grid-rule-table.ts';
import { OBJECT_PROPERTIES, propertyValues, type ObjectKey, type ObjectOutcome, type ObjectProperty, type SlideWay } from '../grid/object-rule-table.ts';
import type { Grid } from '../grid/grid.ts';
import type { LiteralValue } from '../language/ast.ts';

/** Length of the Elias gamma code of n ≥ 1. */
export function gammaBits(n: number): number {
  return 2 * Math.floor(Math.log2(Math.max(1, n))) + 1;
}

/** A signed whole number: zigzag (0, -1, 1, -2, ...) then gamma of one more. */
export function signedBits(v: number): number {
  return gammaBits((v >= 0 ? 2 * v : -2 * v - 1) + 1);
}

/** Bits naming one of the k colours a table writes (at least 1). */
export function colourBits(k: number): number {
  return Math.max(1, Math.ceil(Math.log2(Math.max(1, k))));
}

/** Bits for the first feature of a cell rule (the cell's colour or whether it is background). */
export const FIRST_FEATURE_BITS = 1;
/** Bits for choosing a feature after the first (22 kinds), and a colour it names. */
export const FEATURE_CHOICE_BITS = 5;
export const FEATURE_COLOUR_BITS = 4;
/**
 * Bits for an object rule's way of cutting into objects (4), for saying whether it keys on one
 * property or two, and for each property (one of OBJECT_PROPERTIES).
 */
export const GROUPING_BITS = 2;
export const PROPERTY_COUNT_BITS = 1;
export const PROPERTY_BITS = Math.ceil(Math.log2(OBJECT_PROPERTIES.length));
/** Bits for a grid rule's property (8), and for saying whether all its grids share one size. */
export const GRID_PROPERTY_BITS = 3;
export const SHARED_SIZE_BITS = 1;
/**
 * Bits for the kind of an object's outcome, a prefix code over the seven kinds (its lengths meet
 * Kraft's sum exactly: 3 × 1/4 + 4 × 1/16 = 1): keep, remove and recolour 2 bits each, as
 * before the rarer kinds came; a move, a slide, a mirror or a fill 4.
 */
export const OUTCOME_KIND_BITS: { readonly [K in ObjectOutcome['kind']]: number } = { keep: 2, remove: 2, recolour: 2, move: 4, slide: 4, mirror: 4, fill: 4 };
/** Bits for the way an object is mirrored (left to right or top to bottom). */
export const MIRROR_AXIS_BITS = 1;
/**
 * Bits for the way of a slide, a prefix code meeting Kraft's sum exactly (1/2 + 4 × 1/8 = 1):
 * `toward` 1 bit (it needs no way of its own), each of the four ways 3.
 */
export const SLIDE_WAY_BITS: { readonly [W in SlideWay]: number } = { toward: 1, up: 3, down: 3, left: 3, right: 3 };

function featureValueBits(values: CellFeatureValues, c: number, k: number): number {
  switch (values) {
    case 'colour':
      return c;
    case 'neighbour':
      return colourBits(k + 1);
    case 'count of 8':
      return 4;
    case 'count of 4':
      return 3;
    case 'yes or no':
    case 'parity':
      return 1;
  }
}

function objectKeyBits(property: ObjectProperty, key: ObjectKey, c: number): number {
  switch (propertyValues(property)) {
    case 'number':
      return gammaBits((key as number) + 1);
    case 'colour':
      return c;
    case 'yes or no':
      return 1;
    case 'shape':
      return shapeBits(String(key));
  }
}

function shapeBits(shape: string): number {
  const rows = shape.split('/');
  return gammaBits(rows.length) + gammaBits(rows[0]!.length) + rows.length * rows[0]!.length;
}

function gridKeyBits(property: GridProperty, key: GridKey, keyColourBits: number): number {
  switch (gridPropertyValues(property)) {
    case 'number':
      return gammaBits((key as number) + 1);
    case 'yes or no':
      return 1;
    case 'colours':
      return gammaBits(String(key).length) + String(key).length * keyColourBits;
    case 'shape':
      return shapeBits(key as string);
  }
}

function outcomeBits(o: ObjectOutcome, c: number): number {
  switch (o.kind) {
    case 'keep':
    case 'remove':
      return OUTCOME_KIND_BITS[o.kind];
    case 'recolour':
    case 'fill':
      return OUTCOME_KIND_BITS[o.kind] + c;
    case 'move':
      return OUTCOME_KIND_BITS.move + signedBits(o.rows) + signedBits(o.columns);
    case 'mirror':
      return OUTCOME_KIND_BITS.mirror + MIRROR_AXIS_BITS;
    case 'slide':
      return OUTCOME_KIND_BITS.slide + SLIDE_WAY_BITS[o.way];
  }
}

/**
 * A lower bound on the bits of a cell rule with these features and at least `entries` entries,
 * whatever its keys and colours: the features' bits plus, per entry, one bit per key value at
 * least (more for counts) and one for what it writes. A learned rule that passes a budget by this
 * bound is not built (learned-tables.ts).
 */
export function cellRuleBitsAtLeast(features: readonly CellFeature[], entries: number): number {
  let perEntry = 1;
  for (const f of features) perEntry += featureValueBits(featureValues(f.name), 1, 0);
  return cellRuleFeatureBits(features) + entries * perEntry;
}

/** The bits a cell rule spends naming its features: their count, the first, and each after it (with a colour it names). */
function cellRuleFeatureBits(features: readonly CellFeature[]): number {
  let bits = gammaBits(features.length) + FIRST_FEATURE_BITS;
  for (let i = 1; i < features.length; i++) bits += FEATURE_CHOICE_BITS + (features[i]!.colour !== undefined ? FEATURE_COLOUR_BITS : 0);
  return bits;
}

/**
 * The bits of grids written out cell by cell: for each, γ(h) + γ(w) + h·w·c, c naming one of
 * the colours the grids hold between them. A table that costs this much or more explains
 * nothing about the demonstration outputs it reproduces: it does not compress them.
 */
export function writtenOutBits(grids: readonly Grid[]): number {
  const colours = new Set<number>();
  for (const g of grids) for (const v of g.cells) colours.add(v);
  const c = colourBits(colours.size);
  let bits = 0;
  for (const g of grids) bits += gammaBits(g.height) + gammaBits(g.width) + g.height * g.width * c;
  return bits;
}

/** The bits of a table literal, or undefined for a literal that is not a table. */
export function tableBits(l: LiteralValue): number | undefined {
  switch (l.type) {
    case 'Palette': {
      const colours = new Set<number>();
      for (const [from, to] of l.pairs) colours.add(from).add(to);
      return 1 + 2 * colourBits(colours.size) * l.pairs.length;
    }
    case 'CellRule': {
      const kinds = l.features.map((f) => featureValues(f.name));
      const colours = new Set<number>();
      for (const e of l.entries) {
        if (e.colour !== KEEP) colours.add(e.colour);
        e.key.forEach((v, i) => {
          if ((kinds[i] === 'colour' || kinds[i] === 'neighbour') && v !== EDGE && v !== ANY) colours.add(v);
        });
      }
      const k = colours.size;
      const c = colourBits(k);
      const byColour = l.features[0]?.name === 'colour';
      // A list read in order (a key holds `any`) pays a bit for being one, and each key value a
      // bit for saying whether it is `any`, which costs nothing more.
      const ordered = isOrderedRule(l.entries);
      let bits = cellRuleFeatureBits(l.features) + (ordered ? 1 : 0);
      for (const e of l.entries) {
        for (let i = 0; i < e.key.length; i++) {
          if (ordered) bits += e.key[i] === ANY ? 1 : 1 + featureValueBits(kinds[i]!, c, k);
          else bits += featureValueBits(kinds[i]!, c, k);
        }
        const keeps = e.colour === KEEP || (byColour && e.colour === e.key[0]);
        bits += keeps ? 1 : 1 + c;
      }
      return bits;
    }
    case 'ObjectRule': {
      const colours = new Set<number>();
      const second = l.second;
      for (const e of l.entries) {
        if (propertyValues(l.property) === 'colour') colours.add(e.key as number);
        if (second !== undefined && propertyValues(second) === 'colour') colours.add(e.secondKey as number);
        if (e.outcome.kind === 'recolour' || e.outcome.kind === 'fill') colours.add(e.outcome.colour);
      }
      const c = colourBits(colours.size);
      let bits = GROUPING_BITS + PROPERTY_COUNT_BITS + PROPERTY_BITS * (second === undefined ? 1 : 2);
      for (const e of l.entries) bits += objectKeyBits(l.property, e.key, c) + (second === undefined ? 0 : objectKeyBits(second, e.secondKey!, c)) + outcomeBits(e.outcome, c);
      return bits;
    }
    case 'GridRule': {
      const colours = new Set<number>();
      const keyColours = new Set<string>();
      for (const e of l.entries) {
        for (const row of e.rows) for (const v of row) colours.add(v);
        if (gridPropertyValues(l.property) === 'colours') for (const d of String(e.key)) keyColours.add(d);
      }
      const c = colourBits(colours.size);
      const keyColourBits = colourBits(keyColours.size);
      const height = (rows: readonly (readonly number[])[]): number => rows.length;
      const width = (rows: readonly (readonly number[])[]): number => rows[0]?.length ?? 0;
      const first = l.entries[0]?.rows;
      const shared = first !== undefined && l.entries.every((e) => height(e.rows) === height(first) && width(e.rows) === width(first));
      const sizeBits = (rows: readonly (readonly number[])[]): number => gammaBits(height(rows)) + gammaBits(width(rows));
      let bits = GRID_PROPERTY_BITS + SHARED_SIZE_BITS + (shared ? sizeBits(first) : 0);
      for (const e of l.entries) {
        bits += gridKeyBits(l.property, e.key, keyColourBits) + (shared ? 0 : sizeBits(e.rows)) + height(e.rows) * width(e.rows) * c;
      }
      return bits;
    }
    default:
      return undefined;
  }
}
