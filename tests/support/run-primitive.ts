/**
 * Test helpers for calling primitives of the default library, directly by name or through an
 * expression of the language over the variable `grid`.
 */
import { Grid } from '../../src/grid/grid.ts';
import { evaluateExpression } from '../../src/language/interpreter.ts';
import { parseExpression } from '../../src/language/parser.ts';
import { defaultLibrary } from '../../dsl/index.ts';
import { applyOperation } from '../../src/language/operation.ts';

/** Calls the named primitive of the default library with already-built arguments. */
export function callPrimitive(name: string, ...args: unknown[]): unknown {
  const p = defaultLibrary.get(name);
  if (!p) throw new Error(`tests/support/run-primitive.ts: callPrimitive: no primitive named '${name}' in the default library`);
  return applyOperation(p, args);
}

/** Evaluates an expression of the language with `grid` bound to the given grid. */
export function evaluate(expression: string, grid: Grid): unknown {
  return evaluateExpression(parseExpression(expression), new Map([['grid', grid]]), defaultLibrary);
}

/** Like `evaluate` but the result must be a grid; throws naming the expression otherwise. */
export function evaluateGrid(expression: string, grid: Grid): Grid {
  const value = evaluate(expression, grid);
  if (!(value instanceof Grid)) throw new Error(`tests/support/run-primitive.ts: evaluateGrid: '${expression}' gave ${String(value)}, expected a grid`);
  return value;
}
