/**
 * Parses pithy's program text (see printer.ts for the syntax). Every statement sits on one
 * line; errors name line:column and what was expected there.
 */
import { freeze } from 'immer';
import {
  CELL_FEATURE_NAMES,
  EDGE,
  featureTakesColour,
  featureValues,
  isCellFeatureName,
  isFirstFeature,
  KEEP,
  ANY,
  largestFeatureValue,
  packKey,
  type CellFeature,
  type CellFeatureValues,
  type CellRuleEntry,
} from '../grid/cell-rule-table.ts';
import {
  OBJECT_GROUPINGS,
  OBJECT_PROPERTIES,
  propertyValues,
  type ObjectKey,
  MIRROR_AXES,
  SLIDE_WAYS,
  type ObjectOutcome,
  type ObjectProperty,
  type ObjectRuleEntry,
  entryKeyCode,
  objectRuleEntry,
} from '../grid/object-rule-table.ts';
import { shapeAllowed } from '../grid/grid.ts';
import { GRID_PROPERTIES, gridPropertyValues, type GridKey, type GridProperty, type GridRuleEntry } from '../grid/grid-rule-table.ts';
import { objectRuleLiteral, type Expression, type LiteralValue, type Program, type Step } from './ast.ts';

export class ProgramSyntaxError extends Error {
  constructor(
    readonly line: number,
    readonly column: number,
    readonly expected: string,
    readonly found: string,
    readonly source?: string,
  ) {
    super(`${source ? `${source}:` : ''}${line}:${column}: expected ${expected}, found ${found}`);
    this.name = 'ProgramSyntaxError';
  }
}

const IDENTIFIER = /^[a-z_][a-z0-9_]*/;
const KEYWORDS = new Set(['with', 'answer', 'true', 'false', '_']);

/** True when `word` can name the input or a step: lower-case letters, digits and `_`, not a keyword. */
export function isName(word: string): boolean {
  const match = IDENTIFIER.exec(word);
  return match !== null && match[0] === word && !KEYWORDS.has(word);
}

class LineReader {
  position = 0;
  constructor(
    readonly text: string,
    readonly lineNumber: number,
    readonly offset: number,
    readonly source: string | undefined,
  ) {}

  skipSpaces(): void {
    while (this.position < this.text.length && (this.text[this.position] === ' ' || this.text[this.position] === '\t')) this.position++;
  }

  peek(): string {
    this.skipSpaces();
    return this.text[this.position] ?? '';
  }

  describeHere(): string {
    this.skipSpaces();
    if (this.position >= this.text.length) return 'end of line';
    const rest = this.text.slice(this.position);
    const word = /^[A-Za-z0-9_]+/.exec(rest);
    return `'${word ? word[0] : rest[0]}'`;
  }

  fail(expected: string): never {
    this.skipSpaces();
    throw new ProgramSyntaxError(this.lineNumber, this.offset + this.position + 1, expected, this.describeHere(), this.source);
  }

  expect(symbol: string, what = `'${symbol}'`): void {
    this.skipSpaces();
    if (!this.text.startsWith(symbol, this.position)) this.fail(what);
    this.position += symbol.length;
  }

  identifier(what: string): string {
    this.skipSpaces();
    const match = IDENTIFIER.exec(this.text.slice(this.position));
    if (!match) this.fail(what);
    this.position += match[0].length;
    return match[0];
  }

  integer(what: string): number {
    this.skipSpaces();
    const match = /^-?[0-9]+/.exec(this.text.slice(this.position));
    if (!match) this.fail(what);
    const value = Number(match[0]);
    if (!Number.isSafeInteger(value)) this.fail(`${what} of a safe size`);
    this.position += match[0].length;
    return value;
  }

  colour(): number {
    this.expect('#', "a colour such as '#3'");
    const start = this.position;
    const match = /^[0-9](?![0-9])/.exec(this.text.slice(this.position));
    if (!match) {
      this.position = start;
      this.fail('a colour digit 0-9 after #');
    }
    this.position += 1;
    return Number(match[0]);
  }

  atEnd(): boolean {
    this.skipSpaces();
    return this.position >= this.text.length;
  }
}

/** One of a few words; fails naming them. */
function oneOf<W extends string>(r: LineReader, words: readonly W[], what: string): W {
  r.skipSpaces();
  const start = r.position;
  const word = r.identifier(what);
  if (!(words as readonly string[]).includes(word)) {
    r.position = start;
    r.fail(what);
  }
  return word as W;
}

/** A whole number from `low` to `high`. */
function boundedInteger(r: LineReader, low: number, high: number, what: string): number {
  r.skipSpaces();
  const start = r.position;
  const value = r.integer(what);
  if (value < low || value > high) {
    r.position = start;
    r.fail(what);
  }
  return value;
}

/** A key value of a cell rule: `any`, or a value of the feature's kind. */
function parseFeatureValue(r: LineReader, values: CellFeatureValues): number {
  r.skipSpaces();
  if (/^any(?![A-Za-z0-9_])/.test(r.text.slice(r.position, r.position + 4))) {
    r.position += 3;
    return ANY;
  }
  switch (values) {
    case 'colour':
      if (r.peek() !== '#') r.fail("a colour such as '#3', or 'any'");
      return r.colour();
    case 'neighbour':
      if (r.peek() === '#') return r.colour();
      oneOf(r, ['edge'], "a colour such as '#3', 'edge' or 'any'");
      return EDGE;
    case 'count of 8':
    case 'count of 4': {
      const high = largestFeatureValue(values);
      return boundedInteger(r, 0, high, `a count from 0 to ${high}, or 'any'`);
    }
    case 'yes or no':
      return oneOf(r, ['no', 'yes'], "'yes', 'no' or 'any'") === 'yes' ? 1 : 0;
    case 'parity':
      return oneOf(r, ['even', 'odd'], "'even', 'odd' or 'any'") === 'odd' ? 1 : 0;
  }
}

/** `cell_rule[colour or background, ...]{key -> #c or keep, ...}`, after the word `cell_rule`. */
function parseCellRule(r: LineReader): LiteralValue {
  r.expect('[');
  const features: CellFeature[] = [];
  for (;;) {
    r.skipSpaces();
    const start = r.position;
    const name = r.identifier('a cell feature');
    if (features.length === 0 && !isFirstFeature(name)) {
      r.position = start;
      r.fail("'colour' or 'background', the first feature of every cell rule");
    }
    if (!isCellFeatureName(name)) {
      r.position = start;
      r.fail(`a cell feature (${CELL_FEATURE_NAMES.join(', ')})`);
    }
    features.push(featureTakesColour(name) ? { name, colour: r.colour() } : { name });
    if (r.peek() !== ',') break;
    r.expect(',');
  }
  r.expect(']', "',' or ']' in the feature list");
  r.expect('{', "'{' opening the table");
  const kinds = features.map((f) => featureValues(f.name));
  const entries: CellRuleEntry[] = [];
  const seen = new Set<number>();
  if (r.peek() !== '}') {
    for (;;) {
      r.skipSpaces();
      const start = r.position;
      const key = kinds.map((k) => parseFeatureValue(r, k));
      const packed = packKey(key);
      if (seen.has(packed)) {
        r.position = start;
        r.fail('a key not already in the table');
      }
      seen.add(packed);
      r.expect('->', "'->' after the key");
      r.skipSpaces();
      if (r.peek() === '#') entries.push({ key, colour: r.colour() });
      else {
        oneOf(r, ['keep'], "a colour such as '#3' or 'keep'");
        entries.push({ key, colour: KEEP });
      }
      if (r.peek() !== ',') break;
      r.expect(',');
    }
  }
  r.expect('}', "',' or '}' in the table");
  return { type: 'CellRule', features, entries };
}

function parseObjectKey(r: LineReader, property: ObjectProperty): ObjectKey {
  switch (propertyValues(property)) {
    case 'number':
      return boundedInteger(r, 0, Number.MAX_SAFE_INTEGER, 'a whole number from 0');
    case 'colour':
      return r.colour();
    case 'yes or no':
      return oneOf(r, ['no', 'yes'], "'yes' or 'no'") === 'yes' ? 1 : 0;
    case 'shape':
      return parseShape(r);
  }
}

/** A shape key: rows of `x` and `.` of one length joined by `/`, at least one `x`. */
function parseShape(r: LineReader): string {
  r.skipSpaces();
  const match = /^[x.]+(?:\/[x.]+)*/.exec(r.text.slice(r.position));
  const rows = match ? match[0].split('/') : [];
  if (!match || rows.some((row) => row.length !== rows[0]!.length) || !match[0].includes('x')) {
    r.fail("a shape: rows of 'x' and '.' of one length joined by '/', such as 'xx/x.'");
  }
  r.position += match[0].length;
  return match[0];
}

function parseOutcome(r: LineReader): ObjectOutcome {
  if (r.peek() === '#') return { kind: 'recolour', colour: r.colour() };
  const word = oneOf(r, ['keep', 'remove', 'move', 'mirror', 'fill', 'slide'], "'keep', 'remove', a colour such as '#3', 'move (rows, columns)', 'slide up' (down, left, right, toward), 'mirror left_right', 'mirror top_bottom' or 'fill #c'");
  if (word === 'keep' || word === 'remove') return { kind: word };
  if (word === 'fill') {
    r.skipSpaces();
    return { kind: 'fill', colour: r.colour() };
  }
  if (word === 'mirror') return { kind: 'mirror', across: oneOf(r, MIRROR_AXES, "'left_right' or 'top_bottom' after mirror") };
  if (word === 'slide') return { kind: 'slide', way: oneOf(r, SLIDE_WAYS, "'up', 'down', 'left', 'right' or 'toward' after slide") };
  r.expect('(', "'(' after move");
  const rows = r.integer('a row offset');
  r.expect(',', "',' between rows and columns");
  const columns = r.integer('a column offset');
  r.expect(')', "')' closing the move");
  return { kind: 'move', rows, columns };
}

/**
 * `object_rule[grouping, property]{value -> outcome, ...}`, or with a second property
 * `object_rule[grouping, property, property]{value value -> outcome, ...}`, after the word `object_rule`.
 */
function parseObjectRule(r: LineReader): LiteralValue {
  r.expect('[');
  const grouping = oneOf(r, OBJECT_GROUPINGS, `a way of cutting into objects (${OBJECT_GROUPINGS.join(', ')})`);
  r.expect(',', "',' after the way of cutting into objects");
  const property = oneOf(r, OBJECT_PROPERTIES, `an object property (${OBJECT_PROPERTIES.join(', ')})`);
  let second: ObjectProperty | undefined;
  if (r.peek() === ',') {
    r.expect(',');
    r.skipSpaces();
    const start = r.position;
    second = oneOf(r, OBJECT_PROPERTIES, `a second object property (${OBJECT_PROPERTIES.join(', ')})`);
    if (second === property) {
      r.position = start;
      r.fail('a second property other than the first');
    }
  }
  r.expect(']', second === undefined ? "',' or ']' after the property" : "']' after the second property");
  // The key read last (with the second property's value, when there is one), for the entry; the
  // key handed to parseKeyedEntries is its text, to find repeats.
  let key: ObjectKey = 0;
  let secondKey: ObjectKey | undefined;
  const entries: ObjectRuleEntry[] = parseKeyedEntries(
    r,
    () => {
      key = parseObjectKey(r, property);
      secondKey = second === undefined ? undefined : parseObjectKey(r, second);
      return entryKeyCode(key, secondKey);
    },
    () => objectRuleEntry(key, secondKey, parseOutcome(r)),
  );
  return objectRuleLiteral(grouping, property, second, entries);
}

/**
 * `{key -> value, ...}`, the entries of an object or grid rule: each key read by `parseKey`,
 * then `->`, then the entry built by `parseEntry`; a key already in the table is refused at its place.
 */
function parseKeyedEntries<K extends string | number, E>(r: LineReader, parseKey: () => K, parseEntry: (key: K) => E): E[] {
  r.expect('{', "'{' opening the table");
  const entries: E[] = [];
  const seen = new Set<string>();
  if (r.peek() !== '}') {
    for (;;) {
      r.skipSpaces();
      const start = r.position;
      const key = parseKey();
      if (seen.has(String(key))) {
        r.position = start;
        r.fail('a key not already in the table');
      }
      seen.add(String(key));
      r.expect('->', "'->' after the key");
      entries.push(parseEntry(key));
      if (r.peek() !== ',') break;
      r.expect(',');
    }
  }
  r.expect('}', "',' or '}' in the table");
  return entries;
}

function parseGridKey(r: LineReader, property: GridProperty): GridKey {
  switch (gridPropertyValues(property)) {
    case 'number':
      return boundedInteger(r, 0, Number.MAX_SAFE_INTEGER, 'a whole number from 0');
    case 'yes or no':
      return oneOf(r, ['no', 'yes'], "'yes' or 'no'") === 'yes' ? 1 : 0;
    case 'colours': {
      let set = '';
      while (r.peek() === '#') {
        const start = r.position;
        const colour = r.colour();
        if (set !== '' && colour <= Number(set[set.length - 1])) {
          r.position = start;
          r.fail('a colour above the one before it (the colours of a set in rising order)');
        }
        set += String(colour);
      }
      if (set === '') r.fail("the colours present, such as '#0 #2'");
      return set;
    }
    case 'shape':
      return parseShape(r);
  }
}

/** A grid written as rows of colour digits of one length joined by `/`, such as `505/050`. */
function parseDigitRows(r: LineReader): number[][] {
  r.skipSpaces();
  const match = /^[0-9]+(?:\/[0-9]+)*/.exec(r.text.slice(r.position));
  const rows = match ? match[0].split('/') : [];
  if (!match || rows.some((row) => row.length !== rows[0]!.length) || !shapeAllowed(rows.length, rows[0]!.length)) {
    r.fail("a grid: rows of colour digits of one length joined by '/', such as '505/050', within the size cap");
  }
  r.position += match[0].length;
  return rows.map((row) => [...row].map(Number));
}

/** `grid_rule[property]{value -> grid, ...}`, after the word `grid_rule`. */
function parseGridRule(r: LineReader): LiteralValue {
  r.expect('[');
  const property = oneOf(r, GRID_PROPERTIES, `a grid property (${GRID_PROPERTIES.join(', ')})`);
  r.expect(']', "']' after the property");
  const entries: GridRuleEntry[] = parseKeyedEntries(
    r,
    () => parseGridKey(r, property),
    (key) => ({ key, rows: parseDigitRows(r) }),
  );
  return { type: 'GridRule', property, entries };
}

/** Calls nest at most this deep (deeper text is refused, never a stack overflow). */
export const MAXIMUM_NESTING = 100;

/** Where each parsed expression starts in the text (1-based); kept beside the tree, not in it. */
const positions = new WeakMap<Expression, { readonly line: number; readonly column: number }>();

/** Line and column where a parsed expression starts, when it came from the parser. */
export function positionOf(e: Expression): { readonly line: number; readonly column: number } | undefined {
  return positions.get(e);
}

function parseLiteralOrExpression(r: LineReader, depth = 0): Expression {
  r.skipSpaces();
  const at = { line: r.lineNumber, column: r.offset + r.position + 1 };
  const e = parseExpressionAt(r, depth);
  positions.set(e, at);
  return e;
}

function parseExpressionAt(r: LineReader, depth: number): Expression {
  const c = r.peek();
  if (c === '#') return { kind: 'literal', literal: { type: 'Colour', value: r.colour() } };
  if (c === '-' || (c >= '0' && c <= '9')) return { kind: 'literal', literal: { type: 'Int', value: r.integer('a whole number') } };
  if (c === '(') {
    r.expect('(');
    const row = r.integer('a row offset');
    r.expect(',', "',' between row and column");
    const column = r.integer('a column offset');
    r.expect(')', "')' closing the point");
    const literal: LiteralValue = { type: 'Point', row, column };
    return { kind: 'literal', literal };
  }
  if (c === '{') {
    r.expect('{');
    const pairs: [number, number][] = [];
    if (r.peek() !== '}') {
      for (;;) {
        const from = r.colour();
        r.expect('->', "'->' in a palette entry");
        const to = r.colour();
        pairs.push([from, to]);
        if (r.peek() === ',') {
          r.expect(',');
          continue;
        }
        break;
      }
    }
    r.expect('}', "',' or '}' in a palette");
    return { kind: 'literal', literal: { type: 'Palette', pairs } };
  }
  if (c === '_' && !/^_[a-z0-9_]/.test(r.text.slice(r.position))) {
    r.expect('_');
    return { kind: 'hole' };
  }
  const name = r.identifier("an expression (a name, a call, or a literal such as #3, 2, true, (0, 1), {#1 -> #2})");
  if (name === 'true' || name === 'false') return { kind: 'literal', literal: { type: 'Bool', value: name === 'true' } };
  if (name === 'cell_rule' && r.peek() === '[') return { kind: 'literal', literal: parseCellRule(r) };
  if (name === 'object_rule' && r.peek() === '[') return { kind: 'literal', literal: parseObjectRule(r) };
  if (name === 'grid_rule' && r.peek() === '[') return { kind: 'literal', literal: parseGridRule(r) };
  if (r.peek() !== '(') return { kind: 'variable', name };
  if (depth >= MAXIMUM_NESTING) r.fail(`at most ${MAXIMUM_NESTING} nested calls (name some of them as steps)`);
  r.expect('(');
  const args: Expression[] = [];
  if (r.peek() !== ')') {
    for (;;) {
      args.push(parseLiteralOrExpression(r, depth + 1));
      if (r.peek() === ',') {
        r.expect(',');
        continue;
      }
      break;
    }
  }
  r.expect(')', "',' or ')' in the argument list");
  return { kind: 'call', primitive: name, arguments: args };
}

/** Parses one expression (for worked examples and the REPL-like commands). */
export function parseExpression(text: string, source?: string): Expression {
  const r = new LineReader(text, 1, 0, source);
  const e = parseLiteralOrExpression(r);
  if (!r.atEnd()) r.fail('end of expression');
  return e;
}

/** Parses a program; the tree comes back deeply frozen (edit it with edit-program.ts). */
export function parseProgram(text: string, source?: string): Program {
  const lines = text.split(/\r?\n/);
  const programComments: string[] = [];
  let pending: string[] = [];
  let input: string | undefined;
  const steps: Step[] = [];
  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i]!;
    const indent = raw.length - raw.trimStart().length;
    const body = raw.trim();
    const r = new LineReader(body, i + 1, indent, source);
    if (body === '') continue;
    if (body.startsWith('--')) {
      // Keep a comment's trailing spaces so printing and parsing give back the same text.
      const rest = raw.trimStart().replace(/\r$/, '').slice(2);
      pending.push(rest.startsWith(' ') ? rest.slice(1) : rest);
      continue;
    }
    const word = r.identifier(input === undefined ? "'with' naming the input grid" : "a step 'name = ...' or 'answer ...'");
    if (input === undefined) {
      if (word !== 'with') {
        r.position = 0;
        r.fail("'with' naming the input grid");
      }
      input = r.identifier('a name for the input grid');
      if (KEYWORDS.has(input)) {
        r.position -= input.length;
        r.fail('a name that is not a keyword');
      }
      if (!r.atEnd()) r.fail('end of line after the input name');
      programComments.push(...pending);
      pending = [];
      continue;
    }
    if (word === 'answer') {
      const answer = parseLiteralOrExpression(r);
      if (!r.atEnd()) r.fail('end of line after the answer');
      for (let j = i + 1; j < lines.length; j++) {
        const after = lines[j]!.trim();
        if (after !== '') {
          const tail = new LineReader(after, j + 1, lines[j]!.length - lines[j]!.trimStart().length, source);
          tail.fail("end of program after 'answer'");
        }
      }
      return freeze({ comments: programComments, input, steps, answerComments: pending, answer }, true);
    }
    if (KEYWORDS.has(word)) {
      r.position = 0;
      r.fail('a step name that is not a keyword');
    }
    r.expect('=', "'=' after the step name");
    const expression = parseLiteralOrExpression(r);
    if (!r.atEnd()) r.fail('end of line after the step');
    steps.push({ comments: pending, name: word, expression });
    pending = [];
  }
  const last = lines.length;
  throw new ProgramSyntaxError(last, 1, input === undefined ? "'with' naming the input grid" : "'answer ...' ending the program", 'end of text', source);
}
