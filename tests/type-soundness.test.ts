// Type soundness: a random well-typed program run on a random grid returns a Grid or FAILURE,
// never throws, and every step's value has the step's declared type (or is FAILURE).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { FAILURE } from '../src/language/failure.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { isBaseType } from '../src/language/types.ts';
import { valueHasType } from '../src/language/value-identity.ts';
import { defaultLibrary } from '../dsl/index.ts';
import { Library } from '../src/library/library.ts';
import type { Primitive } from '../src/library/primitive.ts';
import { printProgram } from '../src/language/printer.ts';
import { programArbitrary } from './support/random-program.ts';

/** Small grids with few colours, so objects, backgrounds and symmetries actually occur. */
const gridArbitrary = fc
  .record({ height: fc.integer({ min: 1, max: 7 }), width: fc.integer({ min: 1, max: 7 }), colours: fc.array(fc.integer({ min: 0, max: 9 }), { minLength: 1, maxLength: 4 }) })
  .chain(({ height, width, colours }) =>
    fc.array(fc.constantFrom(...colours, 0), { minLength: height * width, maxLength: height * width }).map((cells) => new Grid(height, width, Uint8Array.from(cells))),
  );

/**
 * The default library with every implementation watched: the interpreter turns an exception
 * into FAILURE, so to see whether a primitive throws we record it before it is caught.
 */
function watchedLibrary(thrown: string[]): Library {
  return new Library(
    defaultLibrary.primitives.map((p): Primitive => ({
      ...p,
      run: (...args: never[]) => {
        try {
          return (p.run as (...a: never[]) => unknown)(...args);
        } catch (error) {
          thrown.push(`${p.name}: ${(error as Error).message}`);
          throw error;
        }
      },
    })),
  );
}

describe('type soundness', () => {
  it('random well-typed programs return a Grid or FAILURE, with every step of its declared type, and no primitive throws', () => {
    const thrown: string[] = [];
    const library = watchedLibrary(thrown);
    let runs = 0;
    let answered = 0;
    fc.assert(
      fc.property(programArbitrary(library, { comments: false }), fc.array(gridArbitrary, { minLength: 1, maxLength: 3 }), (program, grids) => {
        for (const grid of grids) {
          thrown.length = 0;
          const { output, trace } = runProgram(program, grid, library, { trace: true });
          expect(thrown, `a primitive threw in\n${printProgram(program)}on\n${grid.toString()}`).toEqual([]);
          expect(output === FAILURE || output instanceof Grid).toBe(true);
          runs++;
          if (output instanceof Grid) answered++;
          expect(trace).toHaveLength(program.steps.length + 1);
          for (const entry of trace) {
            expect(isBaseType(entry.type)).toBe(true);
            if (entry.value === FAILURE) continue;
            expect(valueHasType(entry.type as never, entry.value), `step ${entry.name} should hold ${entry.type}`).toBe(true);
            if (entry.value instanceof Grid) {
              expect(entry.value.cells.length).toBe(entry.value.height * entry.value.width);
              expect(entry.value.cells.every((c) => c <= 9)).toBe(true);
            }
          }
        }
      }),
      { numRuns: 400 },
    );
    // The property says little if almost every program fails: most should produce a grid.
    expect(answered).toBeGreaterThan(runs / 3);
  });
});
