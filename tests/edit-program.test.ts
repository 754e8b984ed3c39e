// Editing program trees: renaming and inlining steps. The expected texts and grids below are
// worked out by hand from the syntax (README) and the primitives' documented behaviour
// (dsl/REFERENCE.md); the programs and grids are invented for these checks.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { Grid } from '../src/grid/grid.ts';
import { inlineStep, ProgramEditError, renameStep } from '../src/language/edit-program.ts';
import { FAILURE } from '../src/language/failure.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { parseProgram } from '../src/language/parser.ts';
import { printProgram } from '../src/language/printer.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { programArbitrary } from './support/random-program.ts';

const towing = `-- Tow the largest boat to the chart.
with harbour
boats = objects_by_colour(harbour)
-- the biggest one
big   = largest_object(boats)
answer crop_to_object(harbour, big)
`;

/** A 2x2 boat of #2 and a one-cell boat of #3 on #0 water. */
const harbour = Grid.fromRows([
  [0, 0, 0, 0],
  [0, 2, 2, 0],
  [0, 2, 2, 0],
  [0, 0, 0, 3],
]);

function outputRows(text: string, grid: Grid): number[][] | 'failure' {
  const { output } = runProgram(parseProgram(text), grid, defaultLibrary);
  return output === FAILURE ? 'failure' : (output as Grid).toRows();
}

describe('program trees are frozen', () => {
  it('a parsed program cannot be changed in place', () => {
    const program = parseProgram(towing);
    expect(() => (program.steps as unknown[]).push(program.steps[0])).toThrow(TypeError);
    expect(() => {
      (program.steps[0] as { name: string }).name = 'vessels';
    }).toThrow(TypeError);
    expect(() => (program.comments as string[]).push('a new line')).toThrow(TypeError);
  });
});

describe('renaming a step', () => {
  it('renames the step and every use of it, and realigns the step names', () => {
    const renamed = renameStep(parseProgram(towing), 'boats', 'vessels');
    expect(printProgram(renamed)).toBe(`-- Tow the largest boat to the chart.
with harbour
vessels = objects_by_colour(harbour)
-- the biggest one
big     = largest_object(vessels)
answer crop_to_object(harbour, big)
`);
  });

  it('leaves the original unchanged and shares what the rename did not touch', () => {
    const original = parseProgram(towing);
    const renamed = renameStep(original, 'big', 'flagship');
    expect(printProgram(original)).toBe(towing);
    expect(renamed.steps[0]).toBe(original.steps[0]);
    expect(renamed.answer).not.toBe(original.answer);
    expect(printProgram(renamed)).toContain('answer crop_to_object(harbour, flagship)');
  });

  it('gives a frozen program', () => {
    const renamed = renameStep(parseProgram(towing), 'big', 'flagship');
    expect(Object.isFrozen(renamed)).toBe(true);
    expect(Object.isFrozen(renamed.steps[1])).toBe(true);
    expect(() => (renamed.steps as unknown[]).pop()).toThrow(TypeError);
  });

  it('refuses a name in use, a bad name, an unknown step and the input', () => {
    const program = parseProgram(towing);
    expect(() => renameStep(program, 'boats', 'big')).toThrow(/'big' already names a step/);
    expect(() => renameStep(program, 'boats', 'harbour')).toThrow(/'harbour' already names the program's input/);
    expect(() => renameStep(program, 'boats', 'answer')).toThrow(ProgramEditError);
    expect(() => renameStep(program, 'boats', 'Big boats')).toThrow(/cannot name a step/);
    expect(() => renameStep(program, 'crane', 'hoist')).toThrow(/no step named 'crane' \(the steps are: 'boats', 'big'\)/);
    expect(() => renameStep(program, 'harbour', 'quay')).toThrow(/'harbour' is the program's input, not a step/);
  });

  it('renaming a step to its own name gives the same program', () => {
    const program = parseProgram(towing);
    expect(renameStep(program, 'big', 'big')).toBe(program);
  });
});

describe('inlining a step', () => {
  it('puts the expression where the step was used; the comment moves to the answer', () => {
    const inlined = inlineStep(parseProgram(towing), 'big');
    expect(printProgram(inlined)).toBe(`-- Tow the largest boat to the chart.
with harbour
boats = objects_by_colour(harbour)
-- the biggest one
answer crop_to_object(harbour, largest_object(boats))
`);
  });

  it("a step's comment moves to the step that followed it", () => {
    const program = parseProgram(`with harbour
-- every boat
boats = objects_by_colour(harbour)
-- the biggest one
big = largest_object(boats)
answer crop_to_object(harbour, big)
`);
    expect(printProgram(inlineStep(program, 'boats'))).toBe(`with harbour
-- every boat
-- the biggest one
big = largest_object(objects_by_colour(harbour))
answer crop_to_object(harbour, big)
`);
  });

  it('the program still crops the largest boat', () => {
    // Worked by hand: the largest object is the 2x2 block of #2; its box holds only #2.
    expect(outputRows(towing, harbour)).toEqual([[2, 2], [2, 2]]);
    const both = inlineStep(inlineStep(parseProgram(towing), 'big'), 'boats');
    expect(printProgram(both)).toBe(`-- Tow the largest boat to the chart.
with harbour
-- the biggest one
answer crop_to_object(harbour, largest_object(objects_by_colour(harbour)))
`);
    expect(outputRows(printProgram(both), harbour)).toEqual([[2, 2], [2, 2]]);
  });

  it('a step used twice is written out twice', () => {
    const text = `with deck
sea = background(deck)
answer recolour(recolour(deck, #2, sea), sea, #5)
`;
    const inlined = printProgram(inlineStep(parseProgram(text), 'sea'));
    expect(inlined).toBe(`with deck
answer recolour(recolour(deck, #2, background(deck)), background(deck), #5)
`);
    // Worked by hand: the background is #0 (the grid holds a #0 cell); #2 becomes #0, then
    // every #0 becomes #5.
    const deck = Grid.fromRows([
      [0, 2],
      [3, 0],
    ]);
    expect(outputRows(text, deck)).toEqual([[5, 5], [3, 5]]);
    expect(outputRows(inlined, deck)).toEqual([[5, 5], [3, 5]]);
  });

  it('a step used nowhere simply goes', () => {
    const text = `with deck
spare = background(deck)
answer deck
`;
    expect(printProgram(inlineStep(parseProgram(text), 'spare'))).toBe(`with deck
answer deck
`);
  });

  it('refuses an unknown step', () => {
    expect(() => inlineStep(parseProgram(towing), 'crane')).toThrow(/no step named 'crane'/);
  });
});

describe('laws of editing', () => {
  // Programs without steps are skipped with fc.pre (a .filter on this arbitrary stalls fast-check).
  const programs = programArbitrary(defaultLibrary);

  it('renaming a step and renaming it back gives the same program text', () => {
    fc.assert(
      fc.property(programs, fc.nat(), fc.constantFrom('lantern', 'ferry_line', 'mooring_2'), (program, pick, fresh) => {
        fc.pre(program.steps.length > 0);
        const step = program.steps[pick % program.steps.length]!.name;
        fc.pre(fresh !== program.input && program.steps.every((s) => s.name !== fresh));
        const renamed = renameStep(program, step, fresh);
        expect(printProgram(renamed)).not.toBe(printProgram(program));
        expect(printProgram(renameStep(renamed, fresh, step))).toBe(printProgram(program));
      }),
      { numRuns: 100 },
    );
  });

  it('inlining a step keeps the outputs on random grids', () => {
    fc.assert(
      fc.property(programs, fc.nat(), fc.array(arbitraryGrid({ maxHeight: 6, maxWidth: 6 }), { minLength: 1, maxLength: 3 }), (program, pick, grids) => {
        fc.pre(program.steps.length > 0);
        const step = program.steps[pick % program.steps.length]!.name;
        const inlined = inlineStep(program, step);
        expect(inlined.steps).toHaveLength(program.steps.length - 1);
        expect(inlined.steps.some((s) => s.name === step)).toBe(false);
        for (const grid of grids) {
          const before = runProgram(program, grid, defaultLibrary).output;
          const after = runProgram(inlined, grid, defaultLibrary).output;
          if (before === FAILURE) expect(after).toBe(FAILURE);
          else expect(after !== FAILURE && (after as Grid).equals(before as Grid), `inlining '${step}' in\n${printProgram(program)}`).toBe(true);
        }
      }),
      { numRuns: 100 },
    );
  });
});
