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
 */
import type { LiteralValue } from '../language/ast.ts';
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
