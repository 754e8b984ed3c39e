/**
 * What the language needs to know of a primitive to check and run a call: its name, its
 * signature and its implementation. The primitive record (src/library) is one; keeping this
 * interface here lets the checker and the interpreter work without the library above them.
 *
 * `applyOperation` is the one way to apply an operation, shared by the interpreter and the
 * search, so a call means the same thing wherever it is made.
 */
import { Grid, shapeAllowed } from '../grid/grid.ts';
import { FAILURE, isFailure } from './failure.ts';
import type { Type } from './types.ts';

export interface Operation {
  readonly name: string;
  readonly parameters: readonly Type[];
  readonly result: Type;
  /**
   * Pure. Says it cannot apply by returning FAILURE or null (grid algorithms return null, so
   * they need not know the language's failure value); arguments arrive already type-checked.
   */
  readonly run: (...args: never[]) => unknown;
}

/** Finds operations by name: what the checker and the interpreter look calls up in. */
export interface OperationLookup {
  get(name: string): Operation | undefined;
  /** Every name, for suggesting the nearest ones to a name that is not known. */
  names?(): readonly string[];
}

/**
 * Applies an operation to arguments. FAILURE among the arguments, an exception, a null or
 * undefined result and a grid over the size cap all give FAILURE; anything else is the value.
 * Arities up to three are called without spreading, since the search calls this millions of
 * times.
 */
export function applyOperation(operation: Operation, args: readonly unknown[]): unknown {
  const run = operation.run as (...a: unknown[]) => unknown;
  const arity = args.length;
  for (let i = 0; i < arity; i++) if (isFailure(args[i])) return FAILURE;
  let result: unknown;
  try {
    if (arity === 1) result = run(args[0]);
    else if (arity === 2) result = run(args[0], args[1]);
    else if (arity === 3) result = run(args[0], args[1], args[2]);
    else if (arity === 0) result = run();
    else result = run(...args);
  } catch {
    return FAILURE;
  }
  if (result === null || result === undefined) return FAILURE;
  if (result instanceof Grid && !shapeAllowed(result.height, result.width)) return FAILURE;
  return result;
}

/**
 * The function value of a section: the operation with its first argument left open and the
 * others bound. Applying it goes through {@link applyOperation} like any call.
 */
export function sectionOf(operation: Operation, bound: readonly unknown[]): (argument: unknown) => unknown {
  // One argument array per section, reused for every call: a section's bound arguments are
  // never functions, so a call cannot re-enter the same section while the array is in use.
  const call = new Array<unknown>(bound.length + 1);
  for (let j = 0; j < bound.length; j++) call[j + 1] = bound[j];
  return (argument: unknown) => {
    call[0] = argument;
    const result = applyOperation(operation, call);
    call[0] = undefined;
    return result;
  };
}
