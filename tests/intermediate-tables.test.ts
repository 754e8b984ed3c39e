/**
 * Tables learned from grids the search made (src/search/intermediate-tables.ts): a rule that
 * crops first and then recolours cell by cell is found as a table applied to the crop; a test
 * input whose cells hold a key the demonstrations never showed gets no such program (the table
 * never guesses); with the mechanism off, no solution claims it; the README's example of it
 * reproduces the task.
 *
 * The task is invented for this test (a harbour chart: 1 buoys, 2 the wake a buoy leaves to its
 * right, 5 a mooring), worked out by hand: crop to the drawn cells, then every empty cell
 * whose left neighbour is a buoy becomes wake.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { checkProgram } from '../src/language/checker.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { parseProgram } from '../src/language/parser.ts';
import { Grid } from '../src/grid/grid.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import type { Puzzle } from '../src/tasks/task.ts';

const g = (rows: number[][]): Grid => Grid.fromRows(rows);

const train = [
  {
    input: g([[0, 0, 0, 0, 0, 0], [0, 1, 0, 1, 0, 0], [0, 1, 1, 0, 0, 0], [0, 0, 0, 1, 0, 0], [0, 0, 0, 0, 0, 0], [0, 0, 0, 0, 0, 0]]),
    output: g([[1, 2, 1], [1, 1, 2], [0, 0, 1]]),
  },
  {
    input: g([[0, 0, 0, 0, 0, 0], [0, 0, 1, 1, 0, 0], [0, 0, 0, 1, 1, 0], [0, 0, 1, 0, 0, 0], [0, 0, 0, 0, 0, 0]]),
    output: g([[1, 1, 2], [0, 1, 1], [1, 2, 0]]),
  },
  {
    input: g([[0, 0, 0, 0, 0], [0, 1, 1, 0, 0], [0, 0, 1, 0, 0], [0, 0, 0, 1, 0], [0, 0, 0, 0, 0]]),
    output: g([[1, 1, 2], [0, 1, 2], [0, 0, 1]]),
  },
];

// Every (colour, left neighbour) pair of its crop occurs in the demonstrations' crops.
const testInput = g([[0, 0, 0, 0, 0], [0, 1, 0, 0, 0], [0, 1, 1, 0, 0], [0, 0, 1, 1, 0], [0, 0, 0, 0, 0], [0, 0, 0, 0, 0]]);
const expected = g([[1, 2, 0], [1, 1, 2], [0, 1, 1]]);

// Its crop holds a mooring (5), which no demonstration shows.
const unseenKeyInput = g([[0, 0, 0, 0, 0], [0, 1, 5, 0, 0], [0, 1, 1, 0, 0], [0, 0, 0, 1, 0], [0, 0, 0, 0, 0]]);

const options = { maxCandidates: 20_000, timeLimitSeconds: 600, goalBits: 0 };

describe('tables learned from a grid the search made', () => {
  it('finds crop-then-recolour as a cell rule applied to the crop, and the right test output', () => {
    const puzzle: Puzzle = { name: 'wake', train, testInputs: [testInput] };
    const result = solvePuzzle(puzzle, options);
    // (An object rule on a made grid may come first: the search's own choice, not this test's.)
    const through = result.solutions.filter((s) => s.throughIntermediateTable && s.text.includes('apply_cell_rule('));
    expect(through.length).toBeGreaterThan(0);
    expect(through[0]!.text).toContain('crop_to_content(');
    expect(result.solutions.some((s) => s.testOutputs[0]!.equals(expected))).toBe(true);
    expect(result.statistics.intermediateSolutions).toBeGreaterThan(0);
    expect(result.statistics.intermediateGrids).toBeGreaterThan(0);
  });

  it('gives no such program when a test input holds a key the table lacks', () => {
    const seen = solvePuzzle({ name: 'wake', train, testInputs: [testInput] }, options);
    const program = seen.solutions.find((s) => s.throughIntermediateTable && s.text.includes('apply_cell_rule('))!.text;
    const unseen = solvePuzzle({ name: 'wake-unseen', train, testInputs: [unseenKeyInput] }, options);
    // The same table would meet a mooring on the test input's crop: that program is not offered.
    expect(unseen.solutions.map((s) => s.text)).not.toContain(program);
  });

  it('is off when asked: no solution claims an intermediate table and none is learned', () => {
    const puzzle: Puzzle = { name: 'wake-off', train, testInputs: [testInput] };
    const result = solvePuzzle(puzzle, { ...options, intermediateGrids: 0 });
    expect(result.solutions.every((s) => !s.throughIntermediateTable)).toBe(true);
    expect(result.statistics.intermediateGrids).toBe(0);
  });
});

describe("the README's example of a table learned from a grid the search made", () => {
  const readme = readFileSync(new URL('../README.md', import.meta.url), 'utf8');
  const block = [...readme.matchAll(/```pithy\n([\s\S]*?)```/g)].map((m) => m[1]!).find((b) => b.includes('crop_to_content(input)') && b.includes('cell_rule['));

  it('is there, and reproduces every demonstration of the wake task and its test output', () => {
    expect(block).toBeDefined();
    const program = parseProgram(block!, 'README.md');
    checkProgram(program, defaultLibrary);
    for (const { input, output } of train) expect((runProgram(program, input, defaultLibrary).output as Grid).equals(output)).toBe(true);
    expect((runProgram(program, testInput, defaultLibrary).output as Grid).equals(expected)).toBe(true);
  });
});
