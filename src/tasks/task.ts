/** A task: demonstration pairs and test inputs (with outputs only where the file has them). */
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

export function puzzleOf(task: Task): Puzzle {
  return { name: task.name, train: task.train, testInputs: task.test.map((t) => t.input) };
}
