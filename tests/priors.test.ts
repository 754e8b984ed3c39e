/**
 * Priors from solutions: counting primitive uses in programs, the smoothed formula (worked by
 * hand), the priors file (deterministic text, rejected with file and place when bad), a library
 * with other bits, and that the search charges the new bits.
 */
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { parseProgram } from '../src/language/parser.ts';
import { primitiveUses } from '../src/language/program-walk.ts';
import { bitsFromCount, DEFAULT_PRIORS_PARAMETERS, fitBits } from '../src/library/fit-priors.ts';
import { Library } from '../src/library/library.ts';
import { libraryHash, parsePriors, PriorsFileError, priorsFile, priorsText } from '../src/library/priors-file.ts';
import { taskConstants } from '../src/search/constants.ts';
import { programBits } from '../src/search/description-length.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import { puzzleOf } from '../src/tasks/task.ts';

const root = new URL('../', import.meta.url).pathname;

/** A library of four primitives, so the formula's L is 4 in the hand-worked cases. */
const four = new Library(['crop_to_content', 'mirror_right', 'join_right', 'rotate_half'].map((n) => defaultLibrary.get(n)!));

describe('counting primitive uses', () => {
  it('counts every call with steps written out where used (a step used twice counts twice)', () => {
    const program = parseProgram('with chart\npart = crop_to_content(chart)\nanswer join_right(part, mirror_right(part))\n');
    expect([...primitiveUses(program)].sort()).toEqual([
      ['crop_to_content', 2],
      ['join_right', 1],
      ['mirror_right', 1],
    ]);
  });

  it('counts a section (a call with its first argument open) as a use', () => {
    const program = parseProgram('with harbour\nanswer keep_objects_where(harbour, objects_by_colour(harbour), has_colour(_, #3))\n');
    expect(primitiveUses(program).get('has_colour')).toBe(1);
    expect(primitiveUses(program).get('objects_by_colour')).toBe(1);
  });
});

describe('the smoothed formula', () => {
  // L = 4, smoothing 1/2: uses 13, 1, 0, 0 give N = 14 and N + L/2 = 16. By hand:
  // 13 uses: log2(16 / 13.5) = 0.25, rounds to 0, raised to the minimum 1;
  //  1 use:  log2(16 / 1.5) = log2(10.67) = 3.42, rounds to 3;
  //  unused: log2(16 / 0.5) = log2(32) = 5 exactly.
  const uses = new Map([['crop_to_content', 13], ['mirror_right', 1]]);

  it('gives the bits worked out by hand', () => {
    const bits = fitBits(uses, four);
    expect([...bits]).toEqual([
      ['crop_to_content', 1],
      ['mirror_right', 3],
      ['join_right', 5],
      ['rotate_half', 5],
    ]);
  });

  it('a primitive used often gets fewer bits than one used once, and that fewer than an unused one', () => {
    const bits = fitBits(uses, four);
    expect(bits.get('crop_to_content')!).toBeLessThan(bits.get('mirror_right')!);
    expect(bits.get('mirror_right')!).toBeLessThan(bits.get('join_right')!);
  });

  it('caps an unused primitive at the stated cap (here 4 instead of 5)', () => {
    expect(fitBits(uses, four, { ...DEFAULT_PRIORS_PARAMETERS, capBits: 4 }).get('join_right')).toBe(4);
  });

  it('an unused primitive keeps finite whole bits between the minimum and the cap, whatever the counts (law)', () => {
    fc.assert(
      fc.property(fc.nat(10_000_000), fc.integer({ min: 1, max: 1000 }), fc.double({ min: 0.01, max: 10, noNaN: true }), fc.integer({ min: 1, max: 60 }), (total, primitives, smoothing, cap) => {
        const bits = bitsFromCount(0, total, primitives, { smoothing, minimumBits: 1, capBits: cap });
        return Number.isInteger(bits) && bits >= 1 && bits <= cap;
      }),
    );
  });

  it('more uses never cost more bits (law)', () => {
    fc.assert(
      fc.property(fc.nat(1000), fc.nat(1000), fc.nat(5000), fc.integer({ min: 1, max: 500 }), (a, b, extra, primitives) => {
        const total = a + b + extra;
        const f = (n: number) => bitsFromCount(n, total, primitives, DEFAULT_PRIORS_PARAMETERS);
        return a <= b ? f(a) >= f(b) : f(a) <= f(b);
      }),
    );
  });

  it('rejects a name the library does not hold and smoothing that would leave unused primitives unreachable', () => {
    expect(() => fitBits(new Map([['mirror_rite', 1]]), four)).toThrow(/mirror_rite/);
    expect(() => fitBits(uses, four, { ...DEFAULT_PRIORS_PARAMETERS, smoothing: 0 })).toThrow(/smoothing/);
    expect(() => fitBits(uses, four, { smoothing: 0.5, minimumBits: 3, capBits: 2 })).toThrow(/cap/);
  });
});

describe('the priors file', () => {
  const bits = fitBits(new Map([['crop_to_content', 13], ['mirror_right', 1]]), four);
  const fittedOn = { results: ['half-a.jsonl'], solvedTasks: 12, uses: 14 };

  it('writes the same bytes for the same priors, and reads back the bits it wrote', () => {
    const text = priorsText(priorsFile(four, bits, DEFAULT_PRIORS_PARAMETERS, fittedOn));
    expect(priorsText(priorsFile(four, new Map(bits), DEFAULT_PRIORS_PARAMETERS, fittedOn))).toBe(text);
    const loaded = parsePriors(text, 'p.json', four);
    expect([...loaded.bits]).toEqual([...bits]);
    expect(loaded.sameLibrary).toBe(true);
    expect(loaded.unnamed).toEqual([]);
    expect(loaded.hash).toMatch(/^sha256:[0-9a-f]{64}$/);
  });

  it('tells a file fitted on another library apart, and lists the primitives it does not name', () => {
    const text = priorsText(priorsFile(four, bits, DEFAULT_PRIORS_PARAMETERS, fittedOn));
    const loaded = parsePriors(text, 'p.json', defaultLibrary);
    expect(libraryHash(four)).not.toBe(libraryHash(defaultLibrary));
    expect(loaded.sameLibrary).toBe(false);
    expect(loaded.unnamed.length).toBe(defaultLibrary.primitives.length - 4);
  });

  const rejected = (text: string): PriorsFileError => {
    try {
      parsePriors(text, 'fitted/priors.json', four);
    } catch (error) {
      expect(error).toBeInstanceOf(PriorsFileError);
      return error as PriorsFileError;
    }
    throw new Error('the file was accepted');
  };

  it('rejects an unknown primitive name, naming the file and the place', () => {
    const e = rejected('{"version": 1, "bits": {"crop_to_content": 3, "mirror_rite": 4}}');
    expect(e.message).toContain('fitted/priors.json');
    expect(e.message).toContain('$.bits.mirror_rite');
    expect(e.message).toContain("no primitive named 'mirror_rite'");
  });

  it('rejects bits that are not a whole number from 1 to 60, naming the file and the place', () => {
    for (const bad of ['2.5', '0', '-3', '61', '"5"', 'null', 'true']) {
      const e = rejected(`{"version": 1, "bits": {"mirror_right": ${bad}}}`);
      expect(e.message).toContain('fitted/priors.json');
      expect(e.message).toContain('$.bits.mirror_right');
      expect(e.message).toContain('expected a whole number of bits from 1 to 60');
    }
  });

  it('rejects a file that is not JSON, has no version 1 or no bits object', () => {
    expect(rejected('{"version": 1, "bits": {').message).toMatch(/fitted\/priors\.json: at \$: not valid JSON/);
    expect(rejected('{"bits": {}}').message).toContain('$.version');
    expect(rejected('{"version": 2, "bits": {}}').message).toContain('$.version: expected 1, found number 2');
    expect(rejected('{"version": 1, "bits": [3]}').message).toContain('$.bits: expected an object');
    expect(rejected('{"version": 1, "library": {"hash": 7}, "bits": {}}').message).toContain('$.library.hash');
  });
});

describe('a library with other bits', () => {
  it('changes only the named primitives and keeps order and behaviour', () => {
    const changed = defaultLibrary.withBits(new Map([['mirror_right', 2]]));
    expect(changed.get('mirror_right')!.bits).toBe(2);
    expect(changed.get('mirror_right')!.run).toBe(defaultLibrary.get('mirror_right')!.run);
    expect(changed.get('crop_to_content')!.bits).toBe(defaultLibrary.get('crop_to_content')!.bits);
    expect(changed.primitives.map((p) => p.name)).toEqual(defaultLibrary.primitives.map((p) => p.name));
    expect(defaultLibrary.get('mirror_right')!.bits).not.toBe(2);
  });

  it('rejects unknown names and bits that are not whole numbers of at least 1', () => {
    expect(() => defaultLibrary.withBits(new Map([['mirror_rite', 2]]))).toThrow(/mirror_rite/);
    expect(() => defaultLibrary.withBits(new Map([['mirror_right', 1.5]]))).toThrow(/whole number/);
    expect(() => defaultLibrary.withBits(new Map([['mirror_right', 0]]))).toThrow(/whole number/);
  });
});

describe('the search charges the priors', () => {
  // tasks-demo/lighthouse-mirror: cut out the drawing and mirror it to the right; its reference
  // program is mirror_right(crop_to_content(chart)).
  const puzzle = puzzleOf(readTaskFile(join(root, 'tasks-demo', 'lighthouse-mirror.json')));

  it('reports the bits the priors say: 2 (mirror_right) + 3 (crop_to_content) + 1 (the input) = 6', () => {
    const library = defaultLibrary.withBits(new Map([['mirror_right', 2], ['crop_to_content', 3]]));
    const best = solvePuzzle(puzzle, { library, timeLimitSeconds: 60, maxCandidates: 2_000_000 }).solutions[0]!;
    expect(best.text).toContain('mirror_right');
    expect(best.text).toContain('crop_to_content');
    expect(best.bits).toBe(6);
    expect(programBits(best.program, library, taskConstants(puzzle))).toBe(6);
  });

  it('without priors the same program costs the records\' bits', () => {
    const best = solvePuzzle(puzzle, { timeLimitSeconds: 60, maxCandidates: 2_000_000 }).solutions[0]!;
    expect(best.bits).toBe(defaultLibrary.get('mirror_right')!.bits + defaultLibrary.get('crop_to_content')!.bits + 1);
  });
});
