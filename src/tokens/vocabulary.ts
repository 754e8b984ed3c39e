/**
 * The token vocabulary: every token a program or a grid is written with, each with a fixed id,
 * derived from a primitive library. Sections, in id order:
 *
 * 1. padding: `<pad>` (id 0), for batching sequences of unequal length;
 * 2. program structure: `<program>`, `<step>` (a step follows), `<answer>` (the answer follows),
 *    `</program>`, `<input>` (the input grid), `<hole>` (the open argument of a section), and
 *    `<ref:1>` … `<ref:32>` (the value of step 1 … 32);
 * 3. literals, kind by kind (literal-tokens.ts): colours `#0` … `#9`, numbers `-30` … `30`,
 *    `true`, `false`, `<point>`, `<palette>`, `</palette>`;
 * 4. grids (grid-tokens.ts): `<grid>`, `<row>` (ends a row), `</grid>`; cells are colour tokens;
 * 5. primitives: one token per primitive, its name, in the library's order.
 *
 * The primitives come last so that the ids of every other token stay the same when the library
 * grows. `VOCABULARY_VERSION` changes whenever the scheme above changes; the fingerprint, a hash
 * of every token in order, changes whenever any id would (a primitive added, removed or moved).
 * A token id means the same thing only under the same version and fingerprint.
 */
import type { Library } from '../library/library.ts';
import { LITERAL_KINDS, LITERAL_TYPES, type VocabularyEntry } from './literal-tokens.ts';

export const VOCABULARY_VERSION = 1;

/** Most steps a program may have to be tokenized. */
export const MOST_STEPS = 32;

export const SECTIONS = ['padding', 'program', 'literals', 'grids', 'primitives'] as const;
export type VocabularySection = (typeof SECTIONS)[number];

export interface Token extends VocabularyEntry {
  readonly id: number;
  readonly section: VocabularySection;
}

export function referenceToken(step: number): string {
  return `<ref:${step}>`;
}

const PADDING: readonly VocabularyEntry[] = [{ token: '<pad>', meaning: 'padding after the end of a sequence' }];

const PROGRAM: readonly VocabularyEntry[] = [
  { token: '<program>', meaning: 'starts a program' },
  { token: '<step>', meaning: 'a step follows: an expression whose value the later tokens can refer to' },
  { token: '<answer>', meaning: "the answer follows: the expression giving the program's output grid" },
  { token: '</program>', meaning: 'ends a program' },
  { token: '<input>', meaning: 'the input grid' },
  { token: '<hole>', meaning: 'the open first argument of a section (a call passed as a function)' },
  ...Array.from({ length: MOST_STEPS }, (_, i) => ({ token: referenceToken(i + 1), meaning: `the value of step ${i + 1}` })),
];

const GRIDS: readonly VocabularyEntry[] = [
  { token: '<grid>', meaning: 'starts a grid: its cells follow row by row as colour tokens' },
  { token: '<row>', meaning: 'ends a row of a grid' },
  { token: '</grid>', meaning: 'ends a grid' },
];

export class Vocabulary {
  readonly version = VOCABULARY_VERSION;
  readonly tokens: readonly Token[];
  /** FNV-1a hash of every token in id order, as 8 hexadecimal digits. */
  readonly fingerprint: string;
  private readonly ids = new Map<string, number>();

  constructor(library: Library) {
    const groups: [VocabularySection, readonly VocabularyEntry[]][] = [
      ['padding', PADDING],
      ['program', PROGRAM],
      ['literals', LITERAL_TYPES.flatMap((t) => LITERAL_KINDS[t].entries)],
      ['grids', GRIDS],
      ['primitives', library.primitives.map((p) => ({ token: p.name, meaning: `${p.name}(${p.parameters.join(', ')}) -> ${p.result}: ${p.doc}` }))],
    ];
    const tokens: Token[] = [];
    for (const [section, entries] of groups) {
      for (const entry of entries) {
        if (this.ids.has(entry.token)) throw new Error(`vocabulary: the token '${entry.token}' (${section}) is already taken; a primitive may not be named like a literal or structure token`);
        this.ids.set(entry.token, tokens.length);
        tokens.push({ id: tokens.length, section, token: entry.token, meaning: entry.meaning });
      }
    }
    this.tokens = tokens;
    let h = 0x811c9dc5;
    for (const t of tokens) {
      for (let i = 0; i < t.token.length; i++) h = Math.imul(h ^ t.token.charCodeAt(i), 0x01000193);
      h = Math.imul(h ^ 10, 0x01000193);
    }
    this.fingerprint = (h >>> 0).toString(16).padStart(8, '0');
  }

  get size(): number {
    return this.tokens.length;
  }

  has(token: string): boolean {
    return this.ids.has(token);
  }

  /** The id of a token; throws for a token outside the vocabulary. */
  id(token: string): number {
    const id = this.ids.get(token);
    if (id === undefined) throw new RangeError(`'${token}' is not in the vocabulary (version ${this.version}, fingerprint ${this.fingerprint})`);
    return id;
  }

  /** The token of an id; throws for an id outside the vocabulary. */
  token(id: number): string {
    const t = this.tokens[id];
    if (t === undefined) throw new RangeError(`token id ${id} is outside the vocabulary (0 to ${this.tokens.length - 1})`);
    return t.token;
  }

  /** The ids of a token sequence. */
  toIds(tokens: readonly string[]): number[] {
    return tokens.map((t) => this.id(t));
  }

  /** The token sequence of ids. */
  toTokens(ids: readonly number[]): string[] {
    return ids.map((id) => this.token(id));
  }
}

const cache = new WeakMap<Library, Vocabulary>();

/** The vocabulary of a library (built once per library). */
export function vocabularyOf(library: Library): Vocabulary {
  let v = cache.get(library);
  if (!v) cache.set(library, (v = new Vocabulary(library)));
  return v;
}
