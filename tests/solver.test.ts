/**
 * The solver: shortest programs, budgets, determinism, and that test outputs stay hidden.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Grid } from '../src/grid/grid.ts';
import type { Expression, Program } from '../src/language/ast.ts';
import { isFailure } from '../src/language/failure.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { defaultLibrary } from '../dsl/index.ts';
import type { Primitive } from '../src/library/primitive.ts';
import { taskConstants } from '../src/search/constants.ts';
import { programBits } from '../src/search/description-length.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import type { Puzzle } from '../src/tasks/task.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const library = defaultLibrary;

/** Grid transforms the generator composes: Grid -> Grid, and (Grid, Colour) -> Grid. */
const unary = library.primitives.filter((p) => p.parameters.length === 1 && p.parameters[0] === 'Grid' && p.result === 'Grid');
const withColour = library.primitives.filter(
  (p) => p.parameters.length === 2 && p.parameters[0] === 'Grid' && p.parameters[1] === 'Colour' && p.result === 'Grid',
);

function callOf(p: Primitive, inner: Expression, colour: number): Expression {
  const args: Expression[] = [inner];
  if (p.parameters.length === 2) args.push({ kind: 'literal', literal: { type: 'Colour', value: colour } });
  return { kind: 'call', primitive: p.name, arguments: args };
}

const programArbitrary: fc.Arbitrary<Program> = fc
  .array(fc.tuple(fc.constantFrom(...unary, ...withColour), fc.integer({ min: 0, max: 9 })), { minLength: 1, maxLength: 2 })
  .map((chain) => {
    let e: Expression = { kind: 'variable', name: 'grid' };
    for (const [p, colour] of chain) e = callOf(p, e, colour);
    return { comments: [], input: 'grid', steps: [], answerComments: [], answer: e };
  });

function puzzleFrom(program: Program, inputs: readonly Grid[]): Puzzle | undefined {
  const outputs = inputs.map((g) => runProgram(program, g, library).output);
  if (outputs.some(isFailure)) return undefined;
  return {
    name: 'generated',
    train: inputs.slice(0, 3).map((input, i) => ({ input, output: outputs[i] as Grid })),
    testInputs: inputs.slice(3),
  };
}

describe('the solver', () => {
  it('finds, for a task made by a random small program, a program no longer than it that reproduces every output', () => {
    fc.assert(
      fc.property(programArbitrary, fc.array(arbitraryGrid({ minHeight: 3, maxHeight: 6, minWidth: 3, maxWidth: 6 }), { minLength: 4, maxLength: 4 }), (program, inputs) => {
        const puzzle = puzzleFrom(program, inputs);
        fc.pre(puzzle !== undefined);
        const generatorBits = programBits(program, library, taskConstants(puzzle!));
        const result = solvePuzzle(puzzle!, { timeLimitSeconds: 20, attempts: 1 });
        expect(result.solutions.length, `nothing found for\n${JSON.stringify(program.answer)}`).toBeGreaterThan(0);
        const best = result.solutions[0]!;
        expect(best.bits).toBeLessThanOrEqual(generatorBits);
        expect(programBits(best.program, library, taskConstants(puzzle!))).toBe(best.bits);
        for (const pair of puzzle!.train) {
          const out = runProgram(best.program, pair.input, library).output;
          expect(isFailure(out) ? 'FAILURE' : out.toString()).toBe(pair.output.toString());
        }
      }),
      { numRuns: 12, seed: 20261201 },
    );
  });

  const hard: Puzzle = {
    name: 'hard',
    train: [
      { input: Grid.fromRows([[1, 2, 3], [4, 5, 6], [7, 8, 9]]), output: Grid.fromRows([[9, 9], [1, 0], [0, 3]]) },
      { input: Grid.fromRows([[3, 2, 1], [6, 5, 4], [9, 8, 7]]), output: Grid.fromRows([[2], [4], [6], [8]]) },
    ],
    testInputs: [Grid.fromRows([[1]])],
  };

  it('stops at the time limit with its reason and no exception', () => {
    const result = solvePuzzle(hard, { timeLimitSeconds: 0.3 });
    expect(result.reason).toBe('time');
    expect(result.solutions).toEqual([]);
    expect(result.seconds).toBeLessThan(5);
  });

  it('stops at the candidate cap with its reason', () => {
    const result = solvePuzzle(hard, { maxCandidates: 2000 });
    expect(result.reason).toBe('candidates');
    expect(result.statistics.candidates).toBeLessThanOrEqual(2000 + 1024);
  });

  it('stops when the value store is full with its reason', () => {
    const result = solvePuzzle(hard, { maxStoreBytes: 20_000 });
    expect(result.reason).toBe('memory');
  });

  it('holds memory to the cap: it stops once the counted bytes reach it, not long after', () => {
    for (const cap of [50_000, 400_000, 2_000_000]) {
      const result = solvePuzzle(hard, { maxStoreBytes: cap, maxCandidates: 10_000_000, timeLimitSeconds: 3600 });
      expect(result.reason).toBe('memory');
      expect(result.statistics.bytesHeld).toBeGreaterThanOrEqual(cap);
      // Budgets are checked every 1,024 candidates: what those can add is the only overshoot.
      expect(result.statistics.bytesHeld).toBeLessThan(cap + 1024 * 4 * 1200);
    }
  });

  it('counts the cells of the grids it keeps: a store of 30×30 grids fills sooner than one of 2×2 grids', () => {
    const wide = (rows: number[][], size: number): Grid => Grid.fromRows(Array.from({ length: size }, (_, r) => Array.from({ length: size }, (_, c) => rows[r % rows.length]![c % rows[0]!.length]!)));
    const task = (size: number): Puzzle => ({
      name: `size-${size}`,
      train: hard.train.map((p) => ({ input: wide(p.input.toRows(), size), output: Grid.fromRows([[1, 2], [3, 4], [5, 6], [7, 8], [9, 0]]) })),
      testInputs: [wide([[1]], size)],
    });
    const options = { maxStoreBytes: 3_000_000, maxCandidates: 10_000_000, timeLimitSeconds: 3600 };
    const big = solvePuzzle(task(30), options);
    const small = solvePuzzle(task(2), options);
    expect(big.reason).toBe('memory');
    // Same cap: the big grids' cells use it up after far fewer kept candidates.
    expect(big.statistics.kept * 3).toBeLessThan(small.statistics.kept);
  });

  it('reports an exhausted search when every program up to the cost cap was tried', () => {
    const result = solvePuzzle(hard, { maxBits: 6 });
    expect(result.reason).toBe('exhausted');
    expect(result.statistics.costReached).toBe(6);
  });

  const mirrorPuzzle: Puzzle = {
    name: 'mirror',
    train: [
      { input: Grid.fromRows([[1, 0, 0], [2, 2, 0]]), output: Grid.fromRows([[0, 0, 1], [0, 2, 2]]) },
      { input: Grid.fromRows([[3, 4], [0, 5], [6, 0]]), output: Grid.fromRows([[4, 3], [5, 0], [0, 6]]) },
    ],
    testInputs: [Grid.fromRows([[7, 8, 9]])],
  };

  it('gives the same program for the same inputs', () => {
    const a = solvePuzzle(mirrorPuzzle, { timeLimitSeconds: 10 });
    const b = solvePuzzle(mirrorPuzzle, { timeLimitSeconds: 10 });
    expect(a.solutions.map((s) => s.text)).toEqual(b.solutions.map((s) => s.text));
    expect(a.solutions[0]!.testOutputs[0]!.toRows()).toEqual([[9, 8, 7]]);
  });

  it('gives attempts with distinct test outputs, cheapest first', () => {
    const result = solvePuzzle(mirrorPuzzle, { timeLimitSeconds: 10, attempts: 3 });
    const outputs = result.solutions.map((s) => s.testOutputs.map((g) => g.toString()).join('|'));
    expect(new Set(outputs).size).toBe(outputs.length);
    const bits = result.solutions.map((s) => s.bits);
    expect([...bits].sort((x, y) => x - y)).toEqual(bits);
  });
});
