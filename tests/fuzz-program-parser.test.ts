// Fuzzing the program reader (parse, then type-check, as `pithy run` and `pithy check` read a
// file): arbitrary text, text made of the language's own tokens, mutated valid programs and
// deep nesting. Every case ends in a checked program or a ProgramFileError whose every problem
// names the file, a line and a column inside the text; nothing else escapes, and nothing hangs.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { MAXIMUM_NESTING } from '../src/language/parser.ts';
import { printProgram } from '../src/language/printer.ts';
import { loadProgramText, ProgramFileError } from '../src/cli/program-file.ts';
import { programArbitrary } from './support/random-program.ts';
import { mutate, textMutation } from './support/text-mutations.ts';

const FILE = 'fuzz/dock.pithy';
const demo = new URL('../tasks-demo/', import.meta.url).pathname;
const demoPrograms = readdirSync(demo)
  .filter((f) => f.endsWith('.pithy'))
  .sort()
  .map((f) => readFileSync(join(demo, f), 'utf8'));

/** Reads the text; returns 'program' or 'error', and fails the test on anything else. */
function outcome(text: string): 'program' | 'error' {
  try {
    const loaded = loadProgramText(text, FILE, defaultLibrary);
    expect(loaded.types.answer).toBeDefined();
    return 'program';
  } catch (error) {
    if (!(error instanceof ProgramFileError)) throw new Error(`an exception other than ProgramFileError escaped: ${String(error)}`);
    const lineCount = text.split(/\r?\n/).length;
    expect(error.problems.length).toBeGreaterThan(0);
    for (const p of error.problems) {
      expect(p.file).toBe(FILE);
      expect(p.line).toBeGreaterThanOrEqual(1);
      expect(p.line).toBeLessThanOrEqual(lineCount);
      expect(p.column).toBeGreaterThanOrEqual(1);
    }
    for (const line of error.message.split('\n')) expect(line).toMatch(/^fuzz\/dock\.pithy:\d+:\d+: /);
    return 'error';
  }
}

function tally(): { program: number; error: number } {
  return { program: 0, error: 0 };
}

const TOKENS = ['with', 'answer', 'harbour', 'grid', 'step', '=', '(', ')', ',', '_', '#3', '#', '12', '-1', 'true', '{', '}', '->', '#1 -> #2', '(0, 1)', '--', ' ', ' ', '\n', '\n', 'crop_to_content', 'mirror_right', 'objects_by_colour', 'largest_object', 'object_height', 'recolour', '\t', '\r\n'];

describe('fuzzing the program reader', () => {
  it('arbitrary text', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary', maxLength: 200 }), (text) => void outcome(text)), { numRuns: 500 });
  });

  it("text made of the language's own tokens", () => {
    const counts = tally();
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...TOKENS), { maxLength: 40 }), (tokens) => {
        counts[outcome(tokens.join(''))]++;
      }),
      { numRuns: 1000 },
    );
    expect(counts.error).toBeGreaterThan(0);
  });

  it('valid programs (the demo references and random ones) with characters replaced, inserted or deleted', () => {
    const source = fc.oneof(fc.constantFrom(...demoPrograms), programArbitrary(defaultLibrary).map(printProgram));
    const mutation = textMutation('()_,=#0123456789-> \n\tabcxyz{}');
    const counts = tally();
    fc.assert(
      fc.property(source, fc.array(mutation, { minLength: 1, maxLength: 3 }), (text, mutations) => {
        counts[outcome(mutate(text, mutations))]++;
      }),
      // A fixed seed: how many mutated texts stay programs varies by chance (10 on one unlucky
      // run), and the bounds below are about the mix, not about a seed that happens to pass.
      { numRuns: 300, seed: 1202 },
    );
    // Both sides are reached: some mutations leave a program (a comment, a space), most break it.
    expect(counts.program).toBeGreaterThan(10);
    expect(counts.error).toBeGreaterThan(50);
  });

  it('the unmutated programs are read without error', () => {
    for (const text of demoPrograms) expect(outcome(text)).toBe('program');
  });

  it(`calls nested deeper than ${MAXIMUM_NESTING} are refused with line and column, at any depth, never a stack overflow`, () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 200_000 }), (depth) => {
        const text = `with harbour\nanswer ${'mirror_right('.repeat(depth)}harbour${')'.repeat(depth)}\n`;
        expect(outcome(text)).toBe(depth <= MAXIMUM_NESTING ? 'program' : 'error');
      }),
      { numRuns: 30, examples: [[MAXIMUM_NESTING], [MAXIMUM_NESTING + 1]] },
    );
  });
});
