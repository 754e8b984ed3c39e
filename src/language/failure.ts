/**
 * The defined failure value: what a step yields when its primitive cannot apply (crop of an
 * empty selection, a size over the cap, ...). It propagates through every later step.
 */
export const FAILURE: unique symbol = Symbol('failure');
export type Failure = typeof FAILURE;

export function isFailure(value: unknown): value is Failure {
  return value === FAILURE;
}
