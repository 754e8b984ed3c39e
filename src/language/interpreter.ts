/**
 * Runs a checked program on a grid. Every step's value can be kept (the trace). A primitive
 * that cannot apply yields FAILURE, which flows on to the answer; an exception inside a
 * primitive is caught and becomes FAILURE too, so nothing escapes.
 */
import { Grid } from '../grid/grid.ts';
import { CellRule } from '../grid/cell-rule-table.ts';
import { GridRule } from '../grid/grid-rule-table.ts';
import { ObjectRule } from '../grid/object-rule-table.ts';
import type { Expression, LiteralValue, Program } from './ast.ts';
import { checkProgram } from './checker.ts';
import { FAILURE, isFailure, type Failure } from './failure.ts';
import { explainApplication, type FailureOrigin } from './failure-reason.ts';
import { applyOperation, sectionOf, type OperationLookup } from './operation.ts';
import { Palette } from './palette.ts';
import { Point } from './point.ts';
import { printExpression } from './printer.ts';
import type { Type } from './types.ts';

/** A call nested inside a step's expression, with the value it gave (traced runs only). */
export interface CallTrace {
  /** The call as program text. */
  readonly call: string;
  readonly type: Type;
  readonly value: unknown;
}

export interface TraceEntry {
  /** The step's name, or 'answer'. */
  readonly name: string;
  readonly type: Type;
  readonly value: unknown;
  /** When the value is FAILURE: the call where the failure started, and why. */
  readonly failure?: FailureOrigin;
  /** The calls nested inside the step's expression, innermost first, each with its value. */
  readonly calls?: readonly CallTrace[];
}

export interface RunResult {
  /** The answer grid, or FAILURE. */
  readonly output: Grid | Failure;
  /** Every step in order, then the answer; empty unless a trace was asked for. */
  readonly trace: readonly TraceEntry[];
}

export function literalValue(l: LiteralValue): unknown {
  switch (l.type) {
    case 'Colour':
    case 'Int':
    case 'Bool':
      return l.value;
    case 'Point':
      return new Point(l.row, l.column);
    case 'Palette':
      return Palette.fromPairs(l.pairs);
    case 'CellRule':
      return new CellRule(l.features, l.entries);
    case 'ObjectRule':
      return new ObjectRule(l.grouping, l.property, l.entries, l.second);
    case 'GridRule':
      return new GridRule(l.property, l.entries);
  }
}

export function evaluateExpression(e: Expression, env: ReadonlyMap<string, unknown>, library: OperationLookup): unknown {
  switch (e.kind) {
    case 'variable':
      return env.has(e.name) ? env.get(e.name) : FAILURE;
    case 'literal':
      return literalValue(e.literal);
    case 'hole':
      return FAILURE;
    case 'call': {
      const p = library.get(e.primitive);
      if (!p) return FAILURE;
      if (e.arguments.length > 0 && e.arguments[0]!.kind === 'hole') {
        const bound = e.arguments.slice(1).map((a) => evaluateExpression(a, env, library));
        return sectionOf(p, bound);
      }
      const args = e.arguments.map((a) => evaluateExpression(a, env, library));
      return applyOperation(p, args);
    }
  }
}

/**
 * Evaluates like {@link evaluateExpression} but records every nested call's value in `calls`
 * and, when the value is FAILURE, where and why the failure started. Only traced runs use it,
 * so the search's path keeps no reasons.
 */
function evaluateTraced(
  e: Expression,
  env: ReadonlyMap<string, unknown>,
  library: OperationLookup,
  calls: CallTrace[],
  nested: boolean,
): { value: unknown; origin?: FailureOrigin } {
  switch (e.kind) {
    case 'variable':
      return env.has(e.name) ? { value: env.get(e.name) } : { value: FAILURE, origin: { call: e.name, reason: { kind: 'no value', name: e.name } } };
    case 'literal':
      return { value: literalValue(e.literal) };
    case 'hole':
      return { value: FAILURE, origin: { call: '_', reason: { kind: 'no value', name: '_' } } };
    case 'call': {
      const text = printExpression(e);
      const p = library.get(e.primitive);
      if (!p) return { value: FAILURE, origin: { call: text, reason: { kind: 'no value', name: e.primitive } } };
      const isSection = e.arguments.length > 0 && e.arguments[0]!.kind === 'hole';
      const args: unknown[] = [];
      const names: (string | undefined)[] = [];
      let inner: FailureOrigin | undefined;
      for (let i = isSection ? 1 : 0; i < e.arguments.length; i++) {
        const a = e.arguments[i]!;
        const r = evaluateTraced(a, env, library, calls, true);
        args.push(r.value);
        names.push(a.kind === 'variable' ? a.name : undefined);
        if (inner === undefined && r.origin !== undefined) inner = r.origin;
      }
      if (isSection) {
        if (inner !== undefined) return { value: FAILURE, origin: inner };
        return { value: sectionOf(p, args) };
      }
      let value: unknown;
      let origin: FailureOrigin | undefined;
      if (inner !== undefined) {
        value = FAILURE;
        origin = inner;
      } else {
        const applied = explainApplication(p, args, names);
        value = applied.value;
        if (applied.reason !== undefined) origin = { call: text, reason: applied.reason };
      }
      if (nested) calls.push({ call: text, type: p.result, value });
      return origin === undefined ? { value } : { value, origin };
    }
  }
}

/**
 * Runs `program` on `input`. The program is type-checked first (a ProgramTypeError is thrown
 * for an ill-typed one); after that, running never throws.
 */
export function runProgram(program: Program, input: Grid, library: OperationLookup, options: { trace?: boolean } = {}): RunResult {
  const types = checkProgram(program, library);
  const env = new Map<string, unknown>([[program.input, input]]);
  const trace: TraceEntry[] = [];
  if (!options.trace) {
    for (const step of program.steps) env.set(step.name, evaluateExpression(step.expression, env, library));
    const answer = evaluateExpression(program.answer, env, library);
    return { output: answer instanceof Grid ? answer : FAILURE, trace };
  }
  const traceStep = (name: string, type: Type, expression: Expression): unknown => {
    const calls: CallTrace[] = [];
    const { value, origin } = evaluateTraced(expression, env, library, calls, false);
    const failure = isFailure(value) ? (origin ?? { call: printExpression(expression), reason: { kind: 'cannot apply' as const } }) : undefined;
    trace.push({ name, type, value, ...(failure ? { failure } : {}), ...(calls.length > 0 ? { calls } : {}) });
    return value;
  };
  for (const step of program.steps) env.set(step.name, traceStep(step.name, types.steps.get(step.name)!, step.expression));
  const answer = traceStep('answer', 'Grid', program.answer);
  return { output: answer instanceof Grid ? answer : FAILURE, trace };
}
