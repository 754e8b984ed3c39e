/**
 * Why a step holds the failure value, in one line: the innermost call that could not apply
 * (every argument had a value, the primitive refused them), or the earlier step it depends on.
 */
import type { Expression } from '../language/ast.ts';
import { isFailure } from '../language/failure.ts';
import { evaluateExpression } from '../language/interpreter.ts';
import type { OperationLookup } from '../language/operation.ts';
import { printExpression } from '../language/printer.ts';

export function failureReason(e: Expression, env: ReadonlyMap<string, unknown>, library: OperationLookup): string {
  switch (e.kind) {
    case 'variable':
      return env.has(e.name) ? `'${e.name}' failed earlier` : `'${e.name}' has no value`;
    case 'call': {
      const isSection = e.arguments.length > 0 && e.arguments[0]!.kind === 'hole';
      for (const a of e.arguments) {
        if (a.kind === 'hole') continue;
        if (isFailure(evaluateExpression(a, env, library))) return failureReason(a, env, library);
      }
      if (isSection) return `the section ${printExpression(e)} failed`;
      return `${e.primitive} could not apply to its arguments`;
    }
    default:
      return `${printExpression(e)} failed`;
  }
}
