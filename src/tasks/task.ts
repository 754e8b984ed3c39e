/**
 * A task: demonstration pairs and test inputs (with outputs only where the file has them).
 * Tasks and puzzles are frozen once made, so no step of solving or scoring can change a
 * demonstration.
 */
import { freeze } from 'immer';
import type { Grid } from '../grid/grid.ts';

export interface Pair {
  readonly input: Grid;
  readonly output: Grid;
}

export interface TestCase {
  readonly input: Grid;
  /** Present in the file for scoring; the solver never reads it. */
  readonly output?: Grid;
}

export interface Task {
  /** The file name without `.json`. */
  readonly name: string;
  /** Where the task was read from. */
  readonly path: string;
  readonly train: readonly Pair[];
  readonly test: readonly TestCase[];
}

/** What the solver may see of a task: its demonstrations and its test inputs, no test outputs. */
export interface Puzzle {
  readonly name: string;
  readonly train: readonly Pair[];
  readonly testInputs: readonly Grid[];
}

/**
 * Freezes the task's own structure deeply: the task record, its train and test lists and every
 * pair. immer's deep freeze stops at class instances, so the grids themselves are left as they
 * are: a Grid's cells are a Uint8Array, which `Object.freeze` cannot freeze (it throws on a
 * typed array with elements), and a Grid is immutable by construction instead (readonly fields,
 * cells never written after the constructor). Returns the same object.
 */
export function freezeTask(task: Task): Task {
  return freeze(task, true);
}

/** The puzzle of a task, frozen like the task (its train list is the task's own frozen list). */
export function puzzleOf(task: Task): Puzzle {
  return freeze({ name: task.name, train: task.train, testInputs: task.test.map((t) => t.input) }, true);
}
