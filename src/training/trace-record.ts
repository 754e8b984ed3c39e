/**
 * The trace record: one JSON object per task and program, for training and seeding models.
 * It holds the program as text, as tokens and as its syntax tree, its description length, and
 * for every demonstration and test input the value of every step. The JSON Schema is
 * schemas/trace-record.schema.json; README "Trace records" describes the fields.
 */
import { Grid } from '../grid/grid.ts';
import type { Program } from '../language/ast.ts';
import { checkProgram } from '../language/checker.ts';
import { isFailure } from '../language/failure.ts';
import { evaluateExpression } from '../language/interpreter.ts';
import { printProgram } from '../language/printer.ts';
import type { BaseType } from '../language/types.ts';
import type { Library } from '../library/library.ts';
import { taskConstants } from '../search/constants.ts';
import { programBits } from '../search/description-length.ts';
import { puzzleOf, type Task } from '../tasks/task.ts';
import { tokenize } from '../tokens/program-tokens.ts';
import { TokenError } from '../tokens/token-reader.ts';
import { vocabularyOf } from '../tokens/vocabulary.ts';
import { failureReason } from './failure-reason.ts';
import { valueJson, type Rows, type ValueJson } from './value-json.ts';

export const TRACE_FORMAT = 'pithy-trace';
export const TRACE_VERSION = 1;

/** A step's value on one input: its JSON, or null with the reason it failed. */
export type StepValue = { readonly value: ValueJson } | { readonly value: null; readonly failure: string };

export interface PairTrace {
  readonly set: 'train' | 'test';
  /** Position in the task's train or test list. */
  readonly index: number;
  readonly input: Rows;
  /** The output the task file gives, or null (a test input without its output). */
  readonly expected: Rows | null;
  /** One per entry of the record's `steps`, in order; the last is the answer. */
  readonly values: readonly StepValue[];
  /** Whether the answer equals `expected`; null when there is nothing to compare with. */
  readonly correct: boolean | null;
}

export interface TraceRecord {
  readonly format: typeof TRACE_FORMAT;
  readonly version: typeof TRACE_VERSION;
  readonly task: string;
  readonly program: string;
  /** The program's tokens (src/tokens), or null when it has none (a number outside the token range). */
  readonly tokens: readonly string[] | null;
  readonly vocabulary: { readonly version: number; readonly fingerprint: string };
  /** The syntax tree (src/language/ast.ts) as JSON. */
  readonly ast: Program;
  /** Description length in bits, with the task's constant table (README, "Description length"). */
  readonly bits: number;
  /** Every step, then `answer`, with the type of its value. */
  readonly steps: readonly { readonly name: string; readonly type: BaseType }[];
  readonly pairs: readonly PairTrace[];
}

/** Runs a program on every input of a task and records every step. Throws ProgramTypeError for an ill-typed program. */
export function traceRecord(task: Task, program: Program, library: Library): TraceRecord {
  const types = checkProgram(program, library);
  const steps = [...program.steps.map((s) => ({ name: s.name, type: types.steps.get(s.name) as BaseType })), { name: 'answer', type: 'Grid' as BaseType }];
  const vocabulary = vocabularyOf(library);
  let tokens: string[] | null;
  try {
    tokens = tokenize(program, library);
  } catch (error) {
    if (!(error instanceof TokenError)) throw error;
    tokens = null;
  }
  const cases: { set: 'train' | 'test'; index: number; input: Grid; expected: Grid | undefined }[] = [
    ...task.train.map((p, index) => ({ set: 'train' as const, index, input: p.input, expected: p.output as Grid | undefined })),
    ...task.test.map((t, index) => ({ set: 'test' as const, index, input: t.input, expected: t.output })),
  ];
  const pairs = cases.map(({ set, index, input, expected }): PairTrace => {
    const env = new Map<string, unknown>([[program.input, input]]);
    const values: StepValue[] = [];
    const record = (type: BaseType, value: unknown, reason: () => string) => {
      values.push(isFailure(value) ? { value: null, failure: reason() } : { value: valueJson(type, value) });
    };
    for (const [i, step] of program.steps.entries()) {
      const value = evaluateExpression(step.expression, env, library);
      record(steps[i]!.type, value, () => failureReason(step.expression, env, library));
      env.set(step.name, value);
    }
    const answer = evaluateExpression(program.answer, env, library);
    record('Grid', answer, () => failureReason(program.answer, env, library));
    const correct = expected === undefined ? null : answer instanceof Grid && answer.equals(expected);
    return { set, index, input: input.toRows(), expected: expected ? expected.toRows() : null, values, correct };
  });
  return {
    format: TRACE_FORMAT,
    version: TRACE_VERSION,
    task: task.name,
    program: printProgram(program),
    tokens,
    vocabulary: { version: vocabulary.version, fingerprint: vocabulary.fingerprint },
    ast: program,
    bits: programBits(program, library, taskConstants(puzzleOf(task))),
    steps,
    pairs,
  };
}
