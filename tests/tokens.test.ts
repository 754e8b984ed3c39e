// The tokenizer: hand-worked token sequences of a program and a grid, the round trip on random
// well-typed programs (the same program up to step names and comments, which are not tokens),
// the vocabulary's layout and fingerprint, and errors that name the position.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { Grid } from '../src/grid/grid.ts';
import type { Expression, Program } from '../src/language/ast.ts';
import { parseProgram } from '../src/language/parser.ts';
import { ProgramTypeError } from '../src/language/checker.ts';
import { detokenizeGrid, tokenizeGrid } from '../src/tokens/grid-tokens.ts';
import { detokenize, tokenize } from '../src/tokens/program-tokens.ts';
import { TokenError } from '../src/tokens/token-reader.ts';
import { VOCABULARY_VERSION, vocabularyOf } from '../src/tokens/vocabulary.ts';
import { programArbitrary } from './support/random-program.ts';

const tallestMast = parseProgram(
  [
    '-- the vessel with the tallest mast leaves',
    'with harbour',
    'boats = objects_by_colour(harbour)',
    'answer erase_object(harbour, object_with_most(boats, object_height(_)))',
    '',
  ].join('\n'),
);

/**
 * Whether two programs are the same but for names and comments: as many steps, and every
 * expression equal once the input and the k-th step of one are matched with those of the other.
 * Written here, apart from the canonical renaming the tokenizer uses.
 */
function sameUpToNames(a: Program, b: Program): boolean {
  if (a.steps.length !== b.steps.length) return false;
  const index = (p: Program, name: string) => (name === p.input ? 0 : p.steps.findIndex((s) => s.name === name) + 1);
  const same = (x: Expression, y: Expression): boolean => {
    if (x.kind !== y.kind) return false;
    if (x.kind === 'variable' && y.kind === 'variable') return index(a, x.name) === index(b, y.name);
    if (x.kind === 'literal' && y.kind === 'literal') return JSON.stringify(x.literal) === JSON.stringify(y.literal);
    if (x.kind === 'call' && y.kind === 'call') return x.primitive === y.primitive && x.arguments.length === y.arguments.length && x.arguments.every((arg, i) => same(arg, y.arguments[i]!));
    return x.kind === 'hole';
  };
  return a.steps.every((s, i) => same(s.expression, b.steps[i]!.expression)) && same(a.answer, b.answer);
}

describe('program tokens', () => {
  it('writes a program in prefix order with references by step number (worked by hand)', () => {
    expect(tokenize(tallestMast, defaultLibrary)).toEqual([
      '<program>',
      '<step>', 'objects_by_colour', '<input>',
      '<answer>', 'erase_object', '<input>', 'object_with_most', '<ref:1>', 'object_height', '<hole>',
      '</program>',
    ]);
  });

  it('writes every kind of literal (worked by hand)', () => {
    const program = parseProgram('with g\nanswer apply_palette(translate(g, (-2, 3)), {#1 -> #2, #0 -> #9})\n');
    const tokens = tokenize(program, defaultLibrary);
    expect(tokens.slice(1, -1)).toEqual(['<answer>', 'apply_palette', 'translate', '<input>', '<point>', '-2', '3', '<palette>', '#1', '#2', '#0', '#9', '</palette>']);
  });

  it('detokenizes to the canonical form: input `input`, steps named after their types, no comments', () => {
    const program = detokenize(tokenize(tallestMast, defaultLibrary), defaultLibrary);
    expect(program.input).toBe('input');
    expect(program.steps.map((s) => s.name)).toEqual(['objects']);
    expect(program.comments).toEqual([]);
    expect(sameUpToNames(program, tallestMast)).toBe(true);
  });

  it('random well-typed programs come back the same up to names and comments', () => {
    fc.assert(
      fc.property(programArbitrary(defaultLibrary), (program) => {
        const back = detokenize(tokenize(program, defaultLibrary), defaultLibrary);
        expect(sameUpToNames(back, program)).toBe(true);
      }),
      { numRuns: 150 },
    );
  });

  it('a program in canonical form comes back exactly, and its tokens too', () => {
    fc.assert(
      fc.property(programArbitrary(defaultLibrary), (program) => {
        const tokens = tokenize(program, defaultLibrary);
        const canonical = detokenize(tokens, defaultLibrary);
        expect(detokenize(tokenize(canonical, defaultLibrary), defaultLibrary)).toEqual(canonical);
        expect(tokenize(canonical, defaultLibrary)).toEqual(tokens);
      }),
      { numRuns: 80 },
    );
  });

  it('every token of a program is in the vocabulary, and ids map back to the tokens', () => {
    const vocabulary = vocabularyOf(defaultLibrary);
    fc.assert(
      fc.property(programArbitrary(defaultLibrary), (program) => {
        const tokens = tokenize(program, defaultLibrary);
        expect(vocabulary.toTokens(vocabulary.toIds(tokens))).toEqual(tokens);
      }),
      { numRuns: 50 },
    );
  });

  it('padding after the end is allowed', () => {
    const tokens = [...tokenize(tallestMast, defaultLibrary), '<pad>', '<pad>'];
    expect(sameUpToNames(detokenize(tokens, defaultLibrary), tallestMast)).toBe(true);
  });

  it('refuses what has no tokens, naming it', () => {
    expect(() => tokenize(parseProgram('with g\nanswer scale_up(g, 31)\n'), defaultLibrary)).toThrow(/from -30 to 30, found 31/);
    expect(() => tokenize(parseProgram('with g\nanswer no_such_thing(g)\n'), defaultLibrary)).toThrow(TokenError);
  });

  it('bad sequences fail naming the position and what was expected', () => {
    const bad = (tokens: string[]): TokenError => {
      try {
        detokenize(tokens, defaultLibrary);
      } catch (error) {
        expect(error).toBeInstanceOf(TokenError);
        return error as TokenError;
      }
      throw new Error('expected a TokenError');
    };
    // A reference to a step that does not come before.
    expect(bad(['<program>', '<step>', 'objects_by_colour', '<ref:1>', '<answer>', '<input>', '</program>']).position).toBe(3);
    // The end comes too early: erase_object takes two arguments.
    const early = bad(['<program>', '<answer>', 'erase_object', '<input>', '</program>']);
    expect(early.position).toBe(4);
    expect(early.message).toContain("found '</program>'");
    // Something after the end.
    expect(bad(['<program>', '<answer>', '<input>', '</program>', '#3']).message).toBe("token 4: expected nothing but '<pad>' after '</program>', found '#3'");
    // A number token not in canonical form.
    expect(bad(['<program>', '<answer>', 'scale_up', '<input>', '03', '</program>']).position).toBe(4);
  });

  it('a well-formed sequence that spells an ill-typed program is a type error', () => {
    expect(() => detokenize(['<program>', '<answer>', 'count_objects', '<input>', '</program>'], defaultLibrary)).toThrow(ProgramTypeError);
  });
});

describe('grid tokens', () => {
  it('writes rows of colour tokens, each ended by <row> (worked by hand)', () => {
    expect(tokenizeGrid(Grid.fromRows([[0, 5, 0], [5, 5, 5]]))).toEqual(['<grid>', '#0', '#5', '#0', '<row>', '#5', '#5', '#5', '<row>', '</grid>']);
  });

  it('random grids come back exactly', () => {
    const grids = fc
      .record({ h: fc.integer({ min: 1, max: 8 }), w: fc.integer({ min: 1, max: 8 }) })
      .chain(({ h, w }) => fc.array(fc.integer({ min: 0, max: 9 }), { minLength: h * w, maxLength: h * w }).map((cells) => new Grid(h, w, Uint8Array.from(cells))));
    fc.assert(fc.property(grids, (g) => detokenizeGrid(tokenizeGrid(g)).equals(g)));
  });

  it('rows of unequal length and a missing end are refused with the position', () => {
    expect(() => detokenizeGrid(['<grid>', '#1', '#2', '<row>', '#3', '<row>', '</grid>'])).toThrow('token 5: expected a row of 2 cells, as long as the first');
    expect(() => detokenizeGrid(['<grid>', '#1', '<row>'])).toThrow(/token 3: .*found the end of the tokens/);
  });
});

describe('the vocabulary', () => {
  const vocabulary = vocabularyOf(defaultLibrary);

  it('has padding at id 0, the program structure next, and the primitives last in library order', () => {
    expect(VOCABULARY_VERSION).toBe(1);
    expect(vocabulary.token(0)).toBe('<pad>');
    expect(vocabulary.token(1)).toBe('<program>');
    const primitives = vocabulary.tokens.filter((t) => t.section === 'primitives');
    expect(primitives.map((t) => t.token)).toEqual(defaultLibrary.primitives.map((p) => p.name));
    expect(primitives[0]!.id).toBe(vocabulary.size - defaultLibrary.primitives.length);
  });

  it('has every colour, the numbers -30 to 30, and the grid tokens, each once', () => {
    for (let c = 0; c <= 9; c++) expect(vocabulary.has(`#${c}`)).toBe(true);
    for (let n = -30; n <= 30; n++) expect(vocabulary.has(String(n))).toBe(true);
    expect(vocabulary.has('31')).toBe(false);
    for (const t of ['<grid>', '<row>', '</grid>', '<ref:32>']) expect(vocabulary.has(t)).toBe(true);
    expect(new Set(vocabulary.tokens.map((t) => t.token)).size).toBe(vocabulary.size);
    // 1 padding + 6 structure + 32 references + 10 colours + 61 numbers + 2 truth values
    // + 1 point + 2 palette + 3 grid tokens = 118; the cell rule's 3 markers, 24 feature names
    // and 6 value words (edge, yes, no, even, odd, any) = 33; the object rule's 2 markers, 4 groupings, 30 properties, 2 shape
    // markers, 2 shape cells, 6 outcome words (keep, remove, move, slide, mirror, fill), 5 slide
    // ways and 2 mirror ways = 53; the grid rule's 2 markers, 8 properties and
    // 2 colour-set markers = 12; then the primitives.
    expect(vocabulary.size).toBe(118 + 33 + 53 + 12 + defaultLibrary.primitives.length);
  });

  it('ids of the tokens before the primitives do not depend on the library; the fingerprint does', () => {
    const smaller = vocabularyOf(defaultLibrary.without(['erase_object']));
    expect(smaller.id('<grid>')).toBe(vocabulary.id('<grid>'));
    expect(smaller.id('#7')).toBe(vocabulary.id('#7'));
    expect(smaller.fingerprint).not.toBe(vocabulary.fingerprint);
    expect(vocabularyOf(defaultLibrary).fingerprint).toBe(vocabulary.fingerprint);
    expect(vocabulary.fingerprint).toMatch(/^[0-9a-f]{8}$/);
  });

  it('unknown tokens and ids are refused', () => {
    expect(() => vocabulary.id('<nothing>')).toThrow(/not in the vocabulary/);
    expect(() => vocabulary.token(vocabulary.size)).toThrow(/outside the vocabulary/);
  });
});
