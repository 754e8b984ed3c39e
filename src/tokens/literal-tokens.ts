/**
 * How each kind of literal is written as tokens. One entry per literal type of the language,
 * in a table keyed by the type, so adding a literal type to `LiteralValue` (src/language/ast.ts)
 * fails to compile here until its entry is written: the tokens it adds to the vocabulary, the
 * tokens that can start it, and how it is encoded and decoded.
 *
 * - Colour: `#0` … `#9` (the same tokens spell grid cells, see grid-tokens.ts).
 * - Int: the numerals `-30` … `30`.
 * - Bool: `true`, `false`.
 * - Point: `<point>` then the row and the column as Int tokens.
 * - Palette: `<palette>`, each pair as two colour tokens (from, to), then `</palette>`.
 * - CellRule: `<cell_rule>`, the features (`feature:NAME`, then a colour token for those that
 *   name one), `<entries>`, each entry as its key (one value per feature: a colour, `edge`, a
 *   count as a number token, `yes`/`no`, `even`/`odd`) and its colour or `keep` (the token the
 *   object rule's outcome uses too), then `</cell_rule>`.
 * - ObjectRule: `<object_rule>`, `grouping:NAME`, `property:NAME`, each entry as its key (a
 *   number, a colour, `yes`/`no`, or `<shape>` rows of `filled`/`empty` ended by `<row>`, then
 *   `</shape>`) and its outcome (`keep`, `remove`, a colour, or `move` and two numbers), then
 *   `</object_rule>`.
 * - GridRule: `<grid_rule>`, `grid_property:NAME`, each entry as its key (a number, `yes`/`no`,
 *   a shape as above, or `<colours>` colour tokens `</colours>`) and its grid (grid-tokens.ts),
 *   then `</grid_rule>`.
 */
import {
  CELL_FEATURE_NAMES,
  EDGE,
  featureTakesColour,
  featureValues,
  isCellFeatureName,
  KEEP,
  ANY,
  type CellFeature,
  type CellFeatureValues,
  type CellRuleEntry,
} from '../grid/cell-rule-table.ts';
import { MIRROR_AXES, SLIDE_WAYS, OBJECT_GROUPINGS, OBJECT_PROPERTIES, objectRuleEntry, propertyValues, type ObjectKey, type ObjectOutcome, type ObjectProperty, type ObjectRuleEntry } from '../grid/object-rule-table.ts';
import { GRID_PROPERTIES, gridPropertyValues, type GridKey, type GridProperty, type GridRuleEntry } from '../grid/grid-rule-table.ts';
import { objectRuleLiteral, type LiteralValue } from '../language/ast.ts';
import { Grid } from '../grid/grid.ts';
import { readGrid, tokenizeGrid } from './grid-tokens.ts';
import { TokenError, type TokenReader } from './token-reader.ts';

export interface VocabularyEntry {
  readonly token: string;
  /** One line saying what the token stands for. */
  readonly meaning: string;
}

type LiteralOf<T extends LiteralValue['type']> = Extract<LiteralValue, { type: T }>;

export interface LiteralTokenKind<T extends LiteralValue['type']> {
  /** The tokens this kind adds to the vocabulary (tokens shared with another kind are listed once, by the first). */
  readonly entries: readonly VocabularyEntry[];
  /** Whether a literal of this kind can start with the token. */
  starts(token: string): boolean;
  /** Throws TokenError (position -1) when the value has no tokens, such as a number outside the range. */
  encode(literal: LiteralOf<T>): string[];
  decode(reader: TokenReader): LiteralOf<T>;
}

/** The whole numbers that have a token of their own. */
export const LARGEST_INT_TOKEN = 30;

export function colourToken(colour: number): string {
  return `#${colour}`;
}

const COLOUR_TOKENS = Array.from({ length: 10 }, (_, c) => colourToken(c));
const COLOUR_PATTERN = /^#[0-9]$/;

export function readColour(reader: TokenReader): number {
  const t = reader.peek();
  if (t === undefined || !COLOUR_PATTERN.test(t)) reader.fail('a colour token #0 … #9');
  reader.position++;
  return Number(t.slice(1));
}

function intToken(value: number): string {
  if (!Number.isInteger(value) || Math.abs(value) > LARGEST_INT_TOKEN) {
    throw new TokenError(-1, `a whole number from -${LARGEST_INT_TOKEN} to ${LARGEST_INT_TOKEN}`, String(value));
  }
  return String(value);
}

const INT_PATTERN = /^-?[0-9]+$/;

function readInt(reader: TokenReader): number {
  const t = reader.peek();
  if (t === undefined || !INT_PATTERN.test(t) || String(Number(t)) !== t || Math.abs(Number(t)) > LARGEST_INT_TOKEN) reader.fail(`a number token -${LARGEST_INT_TOKEN} … ${LARGEST_INT_TOKEN}`);
  reader.position++;
  return Number(t);
}

function word<W extends string>(reader: TokenReader, words: readonly W[], what: string): W {
  const t = reader.peek();
  if (t === undefined || !(words as readonly string[]).includes(t)) reader.fail(what);
  reader.position++;
  return t as W;
}

function prefixed<W extends string>(reader: TokenReader, prefix: string, names: readonly W[], what: string): W {
  const t = reader.peek();
  const name = t?.startsWith(prefix) ? t.slice(prefix.length) : undefined;
  if (name === undefined || !(names as readonly string[]).includes(name)) reader.fail(what);
  reader.position++;
  return name as W;
}

function featureValueTokens(kind: CellFeatureValues, value: number): string[] {
  if (value === ANY) return ['any'];
  switch (kind) {
    case 'colour':
      return [colourToken(value)];
    case 'neighbour':
      return [value === EDGE ? 'edge' : colourToken(value)];
    case 'count of 8':
    case 'count of 4':
      return [intToken(value)];
    case 'yes or no':
      return [value ? 'yes' : 'no'];
    case 'parity':
      return [value ? 'odd' : 'even'];
  }
}

function readFeatureValue(reader: TokenReader, kind: CellFeatureValues): number {
  if (reader.peek() === 'any') {
    reader.position++;
    return ANY;
  }
  switch (kind) {
    case 'colour':
      return readColour(reader);
    case 'neighbour':
      if (reader.peek() === 'edge') {
        reader.position++;
        return EDGE;
      }
      return readColour(reader);
    case 'count of 8':
    case 'count of 4':
      return readInt(reader);
    case 'yes or no':
      return word(reader, ['yes', 'no'], "'yes' or 'no'") === 'yes' ? 1 : 0;
    case 'parity':
      return word(reader, ['even', 'odd'], "'even' or 'odd'") === 'odd' ? 1 : 0;
  }
}

function objectKeyTokens(property: ObjectProperty, key: ObjectKey): string[] {
  switch (propertyValues(property)) {
    case 'number':
      return [intToken(key as number)];
    case 'colour':
      return [colourToken(key as number)];
    case 'yes or no':
      return [key ? 'yes' : 'no'];
    case 'shape':
      return shapeTokens(key as string);
  }
}

function shapeTokens(shape: string): string[] {
  return ['<shape>', ...shape.split('/').flatMap((row) => [...[...row].map((c) => (c === 'x' ? 'filled' : 'empty')), '<row>']), '</shape>'];
}

function readShape(reader: TokenReader): string {
  reader.expect('<shape>');
  const rows: string[] = [];
  let row = '';
  while (reader.peek() !== '</shape>') {
    const t = word(reader, ['filled', 'empty', '<row>'], "'filled', 'empty', '<row>' or '</shape>'");
    if (t === '<row>') {
      rows.push(row);
      row = '';
    } else row += t === 'filled' ? 'x' : '.';
  }
  reader.expect('</shape>');
  return rows.join('/');
}

function readObjectKey(reader: TokenReader, property: ObjectProperty): ObjectKey {
  switch (propertyValues(property)) {
    case 'number':
      return readInt(reader);
    case 'colour':
      return readColour(reader);
    case 'yes or no':
      return word(reader, ['yes', 'no'], "'yes' or 'no'") === 'yes' ? 1 : 0;
    case 'shape':
      return readShape(reader);
  }
}

function gridKeyTokens(property: GridProperty, key: GridKey): string[] {
  switch (gridPropertyValues(property)) {
    case 'number':
      return [intToken(key as number)];
    case 'yes or no':
      return [key ? 'yes' : 'no'];
    case 'colours':
      return ['<colours>', ...[...String(key)].map((d) => colourToken(Number(d))), '</colours>'];
    case 'shape':
      return shapeTokens(key as string);
  }
}

function readGridKey(reader: TokenReader, property: GridProperty): GridKey {
  switch (gridPropertyValues(property)) {
    case 'number':
      return readInt(reader);
    case 'yes or no':
      return word(reader, ['yes', 'no'], "'yes' or 'no'") === 'yes' ? 1 : 0;
    case 'colours': {
      reader.expect('<colours>');
      let set = '';
      while (reader.peek() !== '</colours>') set += String(readColour(reader));
      reader.expect('</colours>');
      return set;
    }
    case 'shape':
      return readShape(reader);
  }
}

function outcomeTokens(outcome: ObjectOutcome): string[] {
  switch (outcome.kind) {
    case 'keep':
    case 'remove':
      return [outcome.kind];
    case 'recolour':
      return [colourToken(outcome.colour)];
    case 'move':
      return ['move', intToken(outcome.rows), intToken(outcome.columns)];
    case 'fill':
      return ['fill', colourToken(outcome.colour)];
    case 'mirror':
      return ['mirror', `across:${outcome.across}`];
    case 'slide':
      return ['slide', `way:${outcome.way}`];
  }
}

function readOutcome(reader: TokenReader): ObjectOutcome {
  const t = reader.peek();
  if (t !== undefined && COLOUR_PATTERN.test(t)) return { kind: 'recolour', colour: readColour(reader) };
  const kind = word(reader, ['keep', 'remove', 'move', 'mirror', 'fill', 'slide'], "'keep', 'remove', 'move', 'slide', 'mirror', 'fill' or a colour token");
  if (kind === 'keep' || kind === 'remove') return { kind };
  if (kind === 'fill') return { kind: 'fill', colour: readColour(reader) };
  if (kind === 'mirror') return { kind: 'mirror', across: prefixed(reader, 'across:', MIRROR_AXES, "'across:left_right' or 'across:top_bottom'") };
  if (kind === 'slide') return { kind: 'slide', way: prefixed(reader, 'way:', SLIDE_WAYS, "'way:up', 'way:down', 'way:left', 'way:right' or 'way:toward'") };
  const rows = readInt(reader);
  return { kind: 'move', rows, columns: readInt(reader) };
}

const INT_VALUES = Array.from({ length: 2 * LARGEST_INT_TOKEN + 1 }, (_, i) => i - LARGEST_INT_TOKEN);

export const LITERAL_KINDS: { readonly [T in LiteralValue['type']]: LiteralTokenKind<T> } = {
  Colour: {
    entries: COLOUR_TOKENS.map((token, c) => ({ token, meaning: `colour ${c} (a colour literal, or a grid cell)` })),
    starts: (t) => COLOUR_PATTERN.test(t),
    encode: (l) => [colourToken(l.value)],
    decode: (r) => ({ type: 'Colour', value: readColour(r) }),
  },
  Int: {
    entries: INT_VALUES.map((n) => ({ token: String(n), meaning: `the whole number ${n}` })),
    starts: (t) => INT_PATTERN.test(t),
    encode: (l) => [intToken(l.value)],
    decode: (r) => ({ type: 'Int', value: readInt(r) }),
  },
  Bool: {
    entries: [
      { token: 'true', meaning: 'the truth value true' },
      { token: 'false', meaning: 'the truth value false' },
    ],
    starts: (t) => t === 'true' || t === 'false',
    encode: (l) => [l.value ? 'true' : 'false'],
    decode: (r) => ({ type: 'Bool', value: r.next("'true' or 'false'") === 'true' }),
  },
  Point: {
    entries: [{ token: '<point>', meaning: 'a point or offset: the row and the column follow as number tokens' }],
    starts: (t) => t === '<point>',
    encode: (l) => ['<point>', intToken(l.row), intToken(l.column)],
    decode: (r) => {
      r.expect('<point>');
      const row = readInt(r);
      return { type: 'Point', row, column: readInt(r) };
    },
  },
  Palette: {
    entries: [
      { token: '<palette>', meaning: 'a colour map: pairs of colour tokens (from, to) follow' },
      { token: '</palette>', meaning: 'ends a colour map' },
    ],
    starts: (t) => t === '<palette>',
    encode: (l) => ['<palette>', ...l.pairs.flatMap(([from, to]) => [colourToken(from), colourToken(to)]), '</palette>'],
    decode: (r) => {
      r.expect('<palette>');
      const pairs: [number, number][] = [];
      while (r.peek() !== '</palette>') {
        if (r.atEnd()) r.fail("a colour token or '</palette>'");
        const from = readColour(r);
        pairs.push([from, readColour(r)]);
      }
      r.expect('</palette>');
      return { type: 'Palette', pairs };
    },
  },
  CellRule: {
    entries: [
      { token: '<cell_rule>', meaning: 'a cell rule: its features, then <entries> and each key with its colour' },
      { token: '</cell_rule>', meaning: 'ends a cell rule' },
      { token: '<entries>', meaning: "ends a table's header; its entries follow" },
      ...CELL_FEATURE_NAMES.map((name) => ({ token: `feature:${name}`, meaning: `the cell feature ${name}` })),
      { token: 'edge', meaning: 'a neighbour beyond the edge of the grid' },
      { token: 'yes', meaning: 'a yes-or-no value: yes' },
      { token: 'no', meaning: 'a yes-or-no value: no' },
      { token: 'even', meaning: 'an even row or column' },
      { token: 'odd', meaning: 'an odd row or column' },
      { token: 'any', meaning: 'a key value matching every value of its feature (the rule is then read in order)' },
    ],
    starts: (t) => t === '<cell_rule>',
    encode: (l) => [
      '<cell_rule>',
      ...l.features.flatMap((f) => (f.colour !== undefined ? [`feature:${f.name}`, colourToken(f.colour)] : [`feature:${f.name}`])),
      '<entries>',
      ...l.entries.flatMap((e) => [...e.key.flatMap((v, i) => featureValueTokens(featureValues(l.features[i]!.name), v)), e.colour === KEEP ? 'keep' : colourToken(e.colour)]),
      '</cell_rule>',
    ],
    decode: (r) => {
      r.expect('<cell_rule>');
      const features: CellFeature[] = [];
      while (r.peek() !== '<entries>') {
        const name = prefixed(r, 'feature:', CELL_FEATURE_NAMES, "a cell feature token or '<entries>'");
        if (!isCellFeatureName(name)) r.fail('a cell feature token');
        features.push(featureTakesColour(name) ? { name, colour: readColour(r) } : { name });
      }
      r.expect('<entries>');
      const entries: CellRuleEntry[] = [];
      while (r.peek() !== '</cell_rule>') {
        if (r.atEnd()) r.fail("an entry or '</cell_rule>'");
        const key = features.map((f) => readFeatureValue(r, featureValues(f.name)));
        if (r.peek() === 'keep') {
          r.expect('keep');
          entries.push({ key, colour: KEEP });
        } else entries.push({ key, colour: readColour(r) });
      }
      r.expect('</cell_rule>');
      return { type: 'CellRule', features, entries };
    },
  },
  ObjectRule: {
    entries: [
      { token: '<object_rule>', meaning: 'an object rule: how to cut objects, the property (or two), then each key with its outcome' },
      { token: '</object_rule>', meaning: 'ends an object rule' },
      ...OBJECT_GROUPINGS.map((name) => ({ token: `grouping:${name}`, meaning: `objects cut ${name.replace(/_/g, ' ')}` })),
      ...OBJECT_PROPERTIES.map((name) => ({ token: `property:${name}`, meaning: `the object property ${name}` })),
      { token: '<shape>', meaning: 'a shape key: rows of filled and empty cells, each ended by <row>' },
      { token: '</shape>', meaning: 'ends a shape key' },
      { token: 'filled', meaning: 'a cell of the shape' },
      { token: 'empty', meaning: 'a cell of the bounding box outside the shape' },
      { token: 'keep', meaning: 'the object stays as it is' },
      { token: 'remove', meaning: 'the object is erased' },
      { token: 'move', meaning: 'the object moves: rows and columns follow as number tokens' },
      { token: 'slide', meaning: 'the object slides one way as far as it goes: the way follows' },
      ...SLIDE_WAYS.map((w) => ({ token: `way:${w}`, meaning: w === 'toward' ? 'slid toward the nearest object in line' : `slid ${w}` })),
      { token: 'mirror', meaning: 'the object is mirrored in its own box: the way follows' },
      ...MIRROR_AXES.map((a) => ({ token: `across:${a}`, meaning: `mirrored ${a === 'left_right' ? 'left to right' : 'top to bottom'}` })),
      { token: 'fill', meaning: "the object's holes take a colour: the colour token follows" },
    ],
    starts: (t) => t === '<object_rule>',
    encode: (l) => [
      '<object_rule>',
      `grouping:${l.grouping}`,
      `property:${l.property}`,
      ...(l.second === undefined ? [] : [`property:${l.second}`]),
      ...l.entries.flatMap((e) => [...objectKeyTokens(l.property, e.key), ...(l.second === undefined ? [] : objectKeyTokens(l.second, e.secondKey!)), ...outcomeTokens(e.outcome)]),
      '</object_rule>',
    ],
    decode: (r) => {
      r.expect('<object_rule>');
      const grouping = prefixed(r, 'grouping:', OBJECT_GROUPINGS, 'a grouping token');
      const property = prefixed(r, 'property:', OBJECT_PROPERTIES, 'a property token');
      // A second property token, when the rule keys on two.
      const second = r.peek()?.startsWith('property:') ? prefixed(r, 'property:', OBJECT_PROPERTIES, 'a property token') : undefined;
      const entries: ObjectRuleEntry[] = [];
      while (r.peek() !== '</object_rule>') {
        if (r.atEnd()) r.fail("an entry or '</object_rule>'");
        const key = readObjectKey(r, property);
        const secondKey = second === undefined ? undefined : readObjectKey(r, second);
        entries.push(objectRuleEntry(key, secondKey, readOutcome(r)));
      }
      r.expect('</object_rule>');
      return objectRuleLiteral(grouping, property, second, entries);
    },
  },
  GridRule: {
    entries: [
      { token: '<grid_rule>', meaning: 'a grid rule: the property of the whole input, then each key with its output grid' },
      { token: '</grid_rule>', meaning: 'ends a grid rule' },
      ...GRID_PROPERTIES.map((name) => ({ token: `grid_property:${name}`, meaning: `the grid property ${name}` })),
      { token: '<colours>', meaning: 'a key of colours present: colour tokens in rising order follow' },
      { token: '</colours>', meaning: 'ends a key of colours present' },
    ],
    starts: (t) => t === '<grid_rule>',
    encode: (l) => ['<grid_rule>', `grid_property:${l.property}`, ...l.entries.flatMap((e) => [...gridKeyTokens(l.property, e.key), ...tokenizeGrid(Grid.fromRows(e.rows))]), '</grid_rule>'],
    decode: (r) => {
      r.expect('<grid_rule>');
      const property = prefixed(r, 'grid_property:', GRID_PROPERTIES, 'a grid property token');
      const entries: GridRuleEntry[] = [];
      while (r.peek() !== '</grid_rule>') {
        if (r.atEnd()) r.fail("an entry or '</grid_rule>'");
        const key = readGridKey(r, property);
        entries.push({ key, rows: readGrid(r).toRows() });
      }
      r.expect('</grid_rule>');
      return { type: 'GridRule', property, entries };
    },
  },
};

/** The literal types in the order their tokens appear in the vocabulary. */
export const LITERAL_TYPES = Object.keys(LITERAL_KINDS) as LiteralValue['type'][];

export function encodeLiteral(literal: LiteralValue): string[] {
  return (LITERAL_KINDS[literal.type] as LiteralTokenKind<LiteralValue['type']>).encode(literal);
}

/** The literal kind a token starts, if any. */
export function literalKindStartingWith(token: string): LiteralTokenKind<LiteralValue['type']> | undefined {
  for (const type of LITERAL_TYPES) {
    const kind = LITERAL_KINDS[type] as LiteralTokenKind<LiteralValue['type']>;
    if (kind.starts(token)) return kind;
  }
  return undefined;
}
