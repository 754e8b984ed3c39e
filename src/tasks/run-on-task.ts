/**
 * Runs one program on every pair of a task that has an expected output and says, for each,
 * whether it passed and, if not, where the answer first differs from the expected grid.
 */
import type { Grid } from '../grid/grid.ts';
import type { OperationLookup } from '../language/operation.ts';
import type { Program } from '../language/ast.ts';
import { isFailure } from '../language/failure.ts';
import { describeFailure } from '../language/failure-reason.ts';
import { runProgram, type TraceEntry } from '../language/interpreter.ts';
import type { Task } from './task.ts';

/** How an answer differs from the expected grid. */
export type Difference =
  | { readonly kind: 'failure' }
  | { readonly kind: 'size'; readonly expected: { height: number; width: number }; readonly got: { height: number; width: number } }
  | { readonly kind: 'cell'; readonly row: number; readonly column: number; readonly expected: number; readonly got: number };

export interface PairResult {
  readonly set: 'train' | 'test';
  readonly index: number;
  readonly input: Grid;
  readonly expected: Grid;
  /** The program's answer, or undefined when it failed. */
  readonly got: Grid | undefined;
  readonly passed: boolean;
  readonly difference?: Difference;
  /** Present when a trace was asked for. */
  readonly trace?: readonly TraceEntry[];
  /** When the program failed: the first step that failed and why, in plain words. */
  readonly failedStep?: { readonly step: string; readonly why: string };
}

/** The first step of a trace whose value is FAILURE, and why (in plain words). */
export function firstFailedStep(trace: readonly TraceEntry[]): { step: string; why: string } | undefined {
  const entry = trace.find((t) => t.failure !== undefined);
  return entry ? { step: entry.name, why: describeFailure(entry.failure!) } : undefined;
}

/** The first difference in reading order, or undefined when the grids are equal. */
export function firstDifference(expected: Grid, got: Grid): Difference | undefined {
  if (expected.height !== got.height || expected.width !== got.width) {
    return { kind: 'size', expected: { height: expected.height, width: expected.width }, got: { height: got.height, width: got.width } };
  }
  for (let r = 0; r < expected.height; r++) {
    for (let c = 0; c < expected.width; c++) {
      const e = expected.get(r, c);
      const g = got.get(r, c);
      if (e !== g) return { kind: 'cell', row: r, column: c, expected: e, got: g };
    }
  }
  return undefined;
}

/** One line of plain English for a difference. */
export function describeDifference(d: Difference): string {
  switch (d.kind) {
    case 'failure':
      return 'the program failed (a step could not apply)';
    case 'size':
      return `size mismatch: expected ${d.expected.height}x${d.expected.width}, got ${d.got.height}x${d.got.width}`;
    case 'cell':
      return `first differing cell at row ${d.row}, column ${d.column}: expected ${d.expected}, got ${d.got}`;
  }
}

/**
 * Runs a (type-checked) program on every train pair and every test pair that has an output.
 * Throws ProgramTypeError for an ill-typed program; never throws while running.
 */
export function runOnTask(program: Program, task: Task, library: OperationLookup, options: { trace?: boolean } = {}): PairResult[] {
  const cases: { set: 'train' | 'test'; index: number; input: Grid; expected: Grid }[] = [];
  task.train.forEach((p, index) => cases.push({ set: 'train', index, input: p.input, expected: p.output }));
  task.test.forEach((t, index) => {
    if (t.output) cases.push({ set: 'test', index, input: t.input, expected: t.output });
  });
  return cases.map(({ set, index, input, expected }) => {
    const { output, trace } = runProgram(program, input, library, { trace: options.trace });
    const got = isFailure(output) ? undefined : output;
    const difference: Difference | undefined = got ? firstDifference(expected, got) : { kind: 'failure' };
    // A failed run is run again with a trace (off the hot path) to say which step failed and why.
    const failedStep = got ? undefined : firstFailedStep(options.trace ? trace : runProgram(program, input, library, { trace: true }).trace);
    return {
      set,
      index,
      input,
      expected,
      got,
      passed: difference === undefined,
      ...(difference ? { difference } : {}),
      ...(options.trace ? { trace } : {}),
      ...(failedStep ? { failedStep } : {}),
    };
  });
}
