/**
 * The solver: shortest programs, budgets, determinism, and that test outputs stay hidden.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Grid } from '../src/grid/grid.ts';
import type { Expression, LiteralValue, Program } from '../src/language/ast.ts';
import { isFailure } from '../src/language/failure.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { printLiteral, printProgram } from '../src/language/printer.ts';
import { splitFunctionType, type Type } from '../src/language/types.ts';
import { defaultLibrary } from '../dsl/index.ts';
import type { Primitive } from '../src/library/primitive.ts';
import { taskConstants } from '../src/search/constants.ts';
import { programBits } from '../src/search/description-length.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import type { Puzzle } from '../src/tasks/task.ts';

const library = defaultLibrary;

/**
 * Random small programs, typed by the library's signatures: the answer is a call returning a
 * Grid whose arguments are calls, the input grid or constants the task's table offers (colours
 * 0-3, numbers 0-3, unit offsets, true/false); functions are filled with sections. A flavour
 * picks the answer's primitive among those that take objects, numbers, points or functions, so
 * each kind is drawn on purpose, not by luck.
 */
const producers = new Map<Type, Primitive[]>();
for (const p of library.primitives) {
  if (p.parameters.includes('Palette')) continue;
  const list = producers.get(p.result) ?? [];
  list.push(p);
  producers.set(p.result, list);
}
const LEAF_TYPES: readonly Type[] = ['Grid', 'Colour', 'Int', 'Bool', 'Point'];

function canBuild(type: Type, depth: number): boolean {
  if (splitFunctionType(type)) return depth > 0;
  if (LEAF_TYPES.includes(type)) return true;
  return depth > 0 && (producers.get(type) ?? []).some((p) => p.parameters.every((t) => canBuild(t, depth - 1)));
}

type Choose = (count: number) => number;

function expressionOf(choose: Choose, type: Type, depth: number): Expression {
  const fn = splitFunctionType(type);
  if (fn) {
    const sections = (producers.get(fn.result) ?? []).filter(
      (p) => p.parameters[0] === fn.parameter && p.parameters.slice(1).every((t) => !splitFunctionType(t) && canBuild(t, depth - 1)),
    );
    const p = sections[choose(sections.length)]!;
    return { kind: 'call', primitive: p.name, arguments: [{ kind: 'hole' }, ...p.parameters.slice(1).map((t) => expressionOf(choose, t, depth - 1))] };
  }
  const calls = depth > 0 ? (producers.get(type) ?? []).filter((p) => p.parameters.every((t) => canBuild(t, depth - 1))) : [];
  let leaf: Expression | undefined;
  if (type === 'Grid') leaf = { kind: 'variable', name: 'grid' };
  else if (type === 'Colour') leaf = { kind: 'literal', literal: { type: 'Colour', value: choose(4) } };
  else if (type === 'Int') leaf = { kind: 'literal', literal: { type: 'Int', value: choose(4) } };
  else if (type === 'Bool') leaf = { kind: 'literal', literal: { type: 'Bool', value: choose(2) === 1 } };
  else if (type === 'Point') leaf = { kind: 'literal', literal: { type: 'Point', row: choose(3) - 1, column: choose(3) - 1 } };
  if (leaf && (calls.length === 0 || choose(3) === 0)) return leaf;
  const p = calls[choose(calls.length)]!;
  return { kind: 'call', primitive: p.name, arguments: p.parameters.map((t) => expressionOf(choose, t, depth - 1)) };
}

const FLAVOURS = {
  grids: (p: Primitive) => p.parameters.every((t) => t === 'Grid' || t === 'Colour'),
  objects: (p: Primitive) => p.parameters.some((t) => t === 'Object' || t === 'Objects'),
  numbers: (p: Primitive) => p.parameters.includes('Int'),
  points: (p: Primitive) => p.parameters.includes('Point'),
  sections: (p: Primitive) => p.parameters.some((t) => splitFunctionType(t) !== undefined),
} as const;
type Flavour = keyof typeof FLAVOURS;

function programOf(choose: Choose, flavour: Flavour): Program {
  const tops = (producers.get('Grid') ?? []).filter((p) => FLAVOURS[flavour](p) && p.parameters.every((t) => canBuild(t, 2)));
  const top = tops[choose(tops.length)]!;
  const answer: Expression = { kind: 'call', primitive: top.name, arguments: top.parameters.map((t) => expressionOf(choose, t, 2)) };
  return { comments: [], input: 'grid', steps: [], answerComments: [], answer };
}

const arbitraryFlavouredProgram = fc
  .tuple(fc.constantFrom(...(Object.keys(FLAVOURS) as Flavour[])), fc.gen())
  .map(([flavour, g]) => ({ flavour, program: programOf((count) => (count <= 1 ? 0 : g(fc.nat, { max: count - 1 })), flavour) }));

/** Inputs in colours 0-3 (0 about half the time), so colour constants 0-3 are in every task's table. */
const inputGrid = fc
  .tuple(fc.integer({ min: 3, max: 6 }), fc.integer({ min: 3, max: 6 }))
  .chain(([h, w]) => fc.array(fc.oneof(fc.constant(0), fc.integer({ min: 0, max: 3 })), { minLength: h * w, maxLength: h * w }).map((v) => new Grid(h, w, Uint8Array.from(v))));

function literalsOf(e: Expression): LiteralValue[] {
  if (e.kind === 'literal') return [e.literal];
  return e.kind === 'call' ? e.arguments.flatMap(literalsOf) : [];
}

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
  it('finds, for a task made by a random small program, a program no longer than it; the interpreter confirms every attempt', () => {
    const checked: Record<Flavour, number> = { grids: 0, objects: 0, numbers: 0, points: 0, sections: 0 };
    fc.assert(
      fc.property(arbitraryFlavouredProgram, fc.array(inputGrid, { minLength: 4, maxLength: 4 }), ({ flavour, program }, inputs) => {
        const puzzle = puzzleFrom(program, inputs);
        fc.pre(puzzle !== undefined && puzzle.train.some((p) => !p.input.equals(p.output)));
        const constants = taskConstants(puzzle!);
        const table = new Set(constants.map((c) => printLiteral(c.literal)));
        // The generator's constants must be ones the search may use, and the program small enough to search exhaustively.
        fc.pre(literalsOf(program.answer).every((l) => table.has(printLiteral(l))));
        const generatorBits = programBits(program, library, constants);
        fc.pre(generatorBits <= 14);
        checked[flavour]++;
        const result = solvePuzzle(puzzle!, { attempts: 2, maxBits: generatorBits, maxCandidates: 5_000_000, timeLimitSeconds: 1e6 });
        expect(result.solutions.length, `nothing found (${result.reason}) for\n${printProgram(program)}`).toBeGreaterThan(0);
        expect(result.solutions[0]!.bits).toBeLessThanOrEqual(generatorBits);
        for (const solution of result.solutions) {
          // The interpreter, not the search's own values, decides: every demonstration output, and the attempt on every test input.
          expect(programBits(solution.program, library, constants)).toBe(solution.bits);
          for (const pair of puzzle!.train) {
            const out = runProgram(solution.program, pair.input, library).output;
            expect(isFailure(out) ? 'FAILURE' : out.toString()).toBe(pair.output.toString());
          }
          puzzle!.testInputs.forEach((input, i) => {
            const out = runProgram(solution.program, input, library).output;
            expect(isFailure(out) ? 'FAILURE' : out.toString()).toBe(solution.testOutputs[i]!.toString());
          });
        }
      }),
      { numRuns: 100, seed: 20261202 },
    );
    // Each kind of program was drawn and checked several times.
    for (const [flavour, count] of Object.entries(checked)) expect(count, flavour).toBeGreaterThanOrEqual(3);
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
    // A limit of 0 s has passed by the first budget check, however fast or slow the machine.
    const result = solvePuzzle(hard, { timeLimitSeconds: 0 });
    expect(result.reason).toBe('time');
    expect(result.solutions).toEqual([]);
  });

  it('stops at the candidate cap with its reason', () => {
    const result = solvePuzzle(hard, { maxCandidates: 2000 });
    expect(result.reason).toBe('candidates');
    expect(result.statistics.candidates).toBeLessThanOrEqual(2000 + 1024);
  });

  it('stops when the value store is full with its reason', () => {
    const result = solvePuzzle(hard, { maxStoreBytes: 20_000, lastStepsWhenFull: false });
    expect(result.reason).toBe('memory');
  });

  it('holds memory to the cap: it stops once the counted bytes reach it, not long after', () => {
    for (const cap of [50_000, 400_000, 2_000_000]) {
      const result = solvePuzzle(hard, { maxStoreBytes: cap, maxCandidates: 10_000_000, timeLimitSeconds: 3600, lastStepsWhenFull: false });
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
    const options = { maxStoreBytes: 3_000_000, maxCandidates: 10_000_000, timeLimitSeconds: 3600, lastStepsWhenFull: false };
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
    const a = solvePuzzle(mirrorPuzzle, { attempts: 1, maxCandidates: 1_000_000, timeLimitSeconds: 1e6 });
    const b = solvePuzzle(mirrorPuzzle, { attempts: 1, maxCandidates: 1_000_000, timeLimitSeconds: 1e6 });
    expect(a.solutions.map((s) => s.text)).toEqual(b.solutions.map((s) => s.text));
    expect(a.solutions[0]!.testOutputs[0]!.toRows()).toEqual([[9, 8, 7]]);
  });

  // Two rules fit these demonstrations: mirror each row, or let every cell fall to the right
  // (row by row, the two agree on both pairs). On the test row 7 8 0 they differ: mirroring
  // gives 0 8 7, falling gives 0 7 8 (worked out by hand).
  const twoRules: Puzzle = {
    name: 'two rules',
    train: [
      { input: Grid.fromRows([[1, 0, 0], [2, 2, 0]]), output: Grid.fromRows([[0, 0, 1], [0, 2, 2]]) },
      { input: Grid.fromRows([[3, 0], [0, 0], [5, 0]]), output: Grid.fromRows([[0, 3], [0, 0], [0, 5]]) },
    ],
    testInputs: [Grid.fromRows([[7, 8, 0]])],
  };

  it('gives attempts with distinct test outputs, cheapest first', () => {
    const result = solvePuzzle(twoRules, { attempts: 3, maxCandidates: 1_000_000, timeLimitSeconds: 1e6 });
    expect(result.solutions.length).toBeGreaterThanOrEqual(2);
    const outputs = result.solutions.map((s) => s.testOutputs.map((g) => g.toString()).join('|'));
    expect(new Set(outputs).size).toBe(outputs.length);
    const rows = result.solutions.map((s) => s.testOutputs[0]!.toRows());
    expect(rows).toContainEqual([[0, 8, 7]]);
    expect(rows).toContainEqual([[0, 7, 8]]);
    const bits = result.solutions.map((s) => s.bits);
    expect([...bits].sort((x, y) => x - y)).toEqual(bits);
  });
});
