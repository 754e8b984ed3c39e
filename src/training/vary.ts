/**
 * Task variation: new demonstration pairs for a solved task. New inputs are drawn like the
 * task's own (its demonstrations' sizes, background, colours and kind of content, see
 * content-kind.ts), the program is run on each, and the pairs on which it succeeds are kept.
 * Inputs equal to a demonstration input or to an input already drawn are skipped.
 */
import type { Grid } from '../grid/grid.ts';
import type { Program } from '../language/ast.ts';
import { isFailure } from '../language/failure.ts';
import { runProgram } from '../language/interpreter.ts';
import type { Library } from '../library/library.ts';
import type { Pair, Task } from '../tasks/task.ts';
import { runOnTask } from '../tasks/run-on-task.ts';
import { profileOf, type TaskProfile } from './content-kind.ts';
import { makeInput } from './input-makers.ts';
import { Random } from './random.ts';

export interface VaryOptions {
  readonly seed: number;
  /** Pairs wanted. */
  readonly count: number;
  /** Draws allowed in all (default 20 per pair wanted). */
  readonly maxDraws?: number;
}

export interface Variation {
  readonly pairs: readonly Pair[];
  readonly profile: TaskProfile;
  readonly draws: number;
  /** Draws on which the program failed. */
  readonly failed: number;
}

/** The pairs of the task the program does not reproduce, as `train 2`, `test 0`. */
export function unreproducedPairs(program: Program, task: Task, library: Library): string[] {
  return runOnTask(program, task, library)
    .filter((r) => !r.passed)
    .map((r) => `${r.set} ${r.index}`);
}

export function varyTask(task: Task, program: Program, library: Library, options: VaryOptions): Variation {
  const profile = profileOf(task);
  const random = new Random(options.seed);
  const maxDraws = options.maxDraws ?? options.count * 20;
  const seen: Grid[] = task.train.map((p) => p.input).concat(task.test.map((t) => t.input));
  const pairs: Pair[] = [];
  let draws = 0;
  let failed = 0;
  while (pairs.length < options.count && draws < maxDraws) {
    draws++;
    const size = random.pick(profile.sizes);
    const input = makeInput(profile.kind, random, { ...size, background: profile.background, colours: profile.colours });
    if (seen.some((g) => g.equals(input))) continue;
    seen.push(input);
    const output = runProgram(program, input, library).output;
    if (isFailure(output)) {
      failed++;
      continue;
    }
    pairs.push({ input, output });
  }
  return { pairs, profile, draws, failed };
}
