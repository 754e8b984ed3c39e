/**
 * Why a call gave the failure value, for traced runs only. The search and plain runs go through
 * `applyOperation`, which keeps no reasons; a traced run applies each call through
 * {@link explainApplication}, which gives the same value and says why when it is FAILURE.
 */
import { Grid, getSizeCap, shapeAllowed, shapesOverCap } from '../grid/grid.ts';
import { FAILURE, isFailure } from './failure.ts';
import type { Operation } from './operation.ts';

export type FailureReason =
  /** An argument was already the failure value: a named step that failed, or an inner call. */
  | { readonly kind: 'argument failed'; readonly argument: number; readonly name?: string }
  /** The result grid would be larger than the size cap. */
  | { readonly kind: 'over size cap'; readonly height: number; readonly width: number; readonly cap: number }
  /** The primitive threw (a bug the interpreter contains); its message. */
  | { readonly kind: 'exception'; readonly message: string }
  /** The primitive said it cannot apply; `hint` names a likely cause seen in the arguments. */
  | { readonly kind: 'cannot apply'; readonly hint?: string }
  /** A name with no value (a step that is not defined), or an open argument outside a section. */
  | { readonly kind: 'no value'; readonly name: string };

/** Where a step's failure started: the call (as program text) and why it failed. */
export interface FailureOrigin {
  readonly call: string;
  readonly reason: FailureReason;
}

/** A likely cause, read from the arguments, for a primitive that said it cannot apply. */
function hintFrom(args: readonly unknown[], parameters: readonly string[]): string | undefined {
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (Array.isArray(a) && a.length === 0) {
      const what = parameters[i] === 'Objects' ? 'objects' : parameters[i] === 'Grids' ? 'grids' : 'values';
      return `argument ${i + 1} is an empty list: no ${what} were selected`;
    }
  }
  const grids = args.filter((a): a is Grid => a instanceof Grid);
  if (grids.length > 0) {
    for (let i = 0; i < args.length; i++) {
      if (parameters[i] !== 'Colour' || typeof args[i] !== 'number') continue;
      const colour = args[i] as number;
      if (!grids.some((g) => g.cells.includes(colour))) return `colour #${colour} (argument ${i + 1}) does not occur in the grid`;
    }
  }
  return undefined;
}

/**
 * Applies an operation as {@link applyOperation} does and, when the value is FAILURE, says why.
 * `argumentNames` names the steps the arguments came from (undefined for inner calls), so an
 * argument that failed earlier can be named.
 */
export function explainApplication(
  operation: Operation,
  args: readonly unknown[],
  argumentNames: readonly (string | undefined)[] = [],
): { value: unknown; reason?: FailureReason } {
  for (let i = 0; i < args.length; i++) {
    if (isFailure(args[i])) {
      const name = argumentNames[i];
      return { value: FAILURE, reason: name === undefined ? { kind: 'argument failed', argument: i + 1 } : { kind: 'argument failed', argument: i + 1, name } };
    }
  }
  let result: unknown;
  const refusedBefore = shapesOverCap.count;
  try {
    result = (operation.run as (...a: unknown[]) => unknown)(...args);
  } catch (error) {
    return { value: FAILURE, reason: { kind: 'exception', message: error instanceof Error ? error.message : String(error) } };
  }
  if (result === null || result === undefined || isFailure(result)) {
    if (shapesOverCap.count !== refusedBefore) {
      return { value: FAILURE, reason: { kind: 'over size cap', height: shapesOverCap.height, width: shapesOverCap.width, cap: getSizeCap() } };
    }
    const hint = hintFrom(args, operation.parameters);
    return { value: FAILURE, reason: hint === undefined ? { kind: 'cannot apply' } : { kind: 'cannot apply', hint } };
  }
  if (result instanceof Grid && !shapeAllowed(result.height, result.width)) {
    return { value: FAILURE, reason: { kind: 'over size cap', height: result.height, width: result.width, cap: getSizeCap() } };
  }
  return { value: result };
}

/** One line of plain English: why `call` failed. */
export function describeFailure(origin: FailureOrigin): string {
  const r = origin.reason;
  switch (r.kind) {
    case 'argument failed':
      return r.name !== undefined
        ? `${origin.call}: argument ${r.argument} ('${r.name}') had already failed`
        : `${origin.call}: argument ${r.argument} had already failed`;
    case 'over size cap':
      return `${origin.call}: the result would be ${r.height}x${r.width}, over the size cap of ${r.cap} (raise it with --size-cap)`;
    case 'exception':
      return `${origin.call}: the primitive raised an error: ${r.message}`;
    case 'cannot apply':
      return `${origin.call}: cannot apply${r.hint !== undefined ? `: ${r.hint}` : ' to these arguments'}`;
    case 'no value':
      return `${origin.call}: '${r.name}' has no value`;
  }
}
