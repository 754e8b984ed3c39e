/**
 * Runs a checked program on a grid. Every step's value can be kept (the trace). A primitive
 * that cannot apply yields FAILURE, which flows on to the answer; an exception inside a
 * primitive is caught and becomes FAILURE too, so nothing escapes.
 */
import { Grid } from '../grid/grid.ts';
import { CellRule } from '../grid/cell-rule-table.ts';
import { ObjectRule } from '../grid/object-rule-table.ts';
import type { Expression, LiteralValue, Program } from './ast.ts';
import { checkProgram } from './checker.ts';
import { FAILURE, type Failure } from './failure.ts';
import { applyOperation, sectionOf, type OperationLookup } from './operation.ts';
import { Palette } from './palette.ts';
import { Point } from './point.ts';
import type { Type } from './types.ts';

export interface TraceEntry {
  /** The step's name, or 'answer'. */
  readonly name: string;
  readonly type: Type;
  readonly value: unknown;
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
      return new ObjectRule(l.grouping, l.property, l.entries);
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
 * Runs `program` on `input`. The program is type-checked first (a ProgramTypeError is thrown
 * for an ill-typed one); after that, running never throws.
 */
export function runProgram(program: Program, input: Grid, library: OperationLookup, options: { trace?: boolean } = {}): RunResult {
  const types = checkProgram(program, library);
  const env = new Map<string, unknown>([[program.input, input]]);
  const trace: TraceEntry[] = [];
  for (const step of program.steps) {
    const value = evaluateExpression(step.expression, env, library);
    env.set(step.name, value);
    if (options.trace) trace.push({ name: step.name, type: types.steps.get(step.name)!, value });
  }
  const answer = evaluateExpression(program.answer, env, library);
  const output = answer instanceof Grid ? answer : FAILURE;
  if (options.trace) trace.push({ name: 'answer', type: 'Grid', value: output });
  return { output, trace };
}
