/**
 * A full value store: the search keeps nothing more and goes on with last steps only —
 * grid-valued calls on the values it holds, checked against the demonstration outputs — until
 * another budget ends. The demo tasks are invented (tasks-demo/); the caps are chosen so the
 * store fills long before the shortest program's level.
 */
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { defaultLibrary } from '../dsl/index.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import { puzzleOf, type Puzzle } from '../src/tasks/task.ts';

const demo = new URL('../tasks-demo/', import.meta.url).pathname;
const puzzle = (name: string): Puzzle => puzzleOf(readTaskFile(join(demo, `${name}.json`)));

describe('last steps when the store is full', () => {
  it('finds a program whose last step is built on what the store held, where stopping finds none', () => {
    const task = puzzle('compass-rose');
    const options = { maxStoreBytes: 50_000, timeLimitSeconds: 600, maxCandidates: 2_000_000 };
    const unlimited = solvePuzzle(task, { timeLimitSeconds: 600, maxCandidates: 2_000_000 });
    const stopping = solvePuzzle(task, { ...options, lastStepsWhenFull: false });
    const going = solvePuzzle(task, options);
    expect(stopping.reason).toBe('memory');
    expect(stopping.solutions).toEqual([]);
    expect(going.reason).toBe('solved');
    expect(going.statistics.fullAtCost).toBeGreaterThan(0);
    expect(going.statistics.fullAtCost).toBeLessThan(going.solutions[0]!.bits);
    // The program found reproduces every demonstration.
    for (const pair of task.train) expect((runProgram(going.solutions[0]!.program, pair.input, defaultLibrary).output as Grid).toRows()).toEqual(pair.output.toRows());
    // Nothing cheaper exists: the search without a cap finds its first program at the same bits.
    expect(going.solutions[0]!.bits).toBe(unlimited.solutions[0]!.bits);
  });

  it('keeps nothing after the store fills, and says memory when nothing is found', () => {
    const options = { maxStoreBytes: 200_000, timeLimitSeconds: 600, maxCandidates: 300_000 };
    // A fresh copy of the task for each run: grids memoise their analyses, which the count includes.
    const stopping = solvePuzzle(puzzle('lagoon-view'), { ...options, lastStepsWhenFull: false });
    const going = solvePuzzle(puzzle('lagoon-view'), options);
    expect(going.solutions).toEqual([]);
    expect(going.reason).toBe('memory');
    // The same search up to the fill, then only last steps: as many kept, as many bytes held.
    expect(going.statistics.kept).toBe(stopping.statistics.kept);
    expect(going.statistics.bytesHeld).toBe(stopping.statistics.bytesHeld);
    expect(going.statistics.candidates).toBeGreaterThan(stopping.statistics.candidates);
    expect(going.statistics.costReached).toBeGreaterThan(stopping.statistics.costReached);
    expect(stopping.statistics.fullAtCost).toBe(0);
  });

  it('meets a goal in last steps: a grid that the first demonstration\'s goal wants is run on the other inputs too', () => {
    // An invented task: the input reflected left to right, then tiled 2 down and 2 across.
    const reflect = (rows: number[][]) => rows.map((row) => [...row].reverse());
    const tiled = (rows: number[][]) => [...rows, ...rows].map((row) => [...row, ...row]);
    const inputs = [
      [[6, 0], [0, 7], [7, 7]],
      [[0, 0, 9], [4, 0, 0]],
      [[2, 3, 0], [0, 0, 3], [1, 0, 0]],
    ];
    const testInput = [[5, 0, 0], [0, 8, 8]];
    const task: Puzzle = {
      name: 'reflected-and-tiled',
      train: inputs.map((rows) => ({ input: Grid.fromRows(rows), output: Grid.fromRows(tiled(reflect(rows))) })),
      testInputs: [Grid.fromRows(testInput)],
    };
    // 1,000 bytes: the store is full with the leaves, so every call is a last step.
    const options = { maxStoreBytes: 1_000, timeLimitSeconds: 600, maxCandidates: 200_000, attempts: 1 };
    const withGoals = solvePuzzle(task, options);
    expect(withGoals.statistics.lastStepsFromCost).toBeLessThanOrEqual(2);
    expect(withGoals.solutions).toHaveLength(1);
    expect(withGoals.solutions[0]!.throughGoal).toBe(true);
    expect(withGoals.solutions[0]!.testOutputs[0]!.toRows()).toEqual(tiled(reflect(testInput)));
    // Without goals the tiling would need the reflection kept, and nothing is.
    expect(solvePuzzle(task, { ...options, goalBits: 0 }).solutions).toEqual([]);
  });
});
