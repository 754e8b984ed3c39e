/**
 * The defined failure value: what a step yields when its primitive cannot apply (crop of an
 * empty selection, a size over the cap, ...). It propagates through every later step.
 */
export const FAILURE: unique symbol = Symbol('failure');
export type Failure = typeof FAILURE;

/**
 * True for FAILURE. The search asks this of every value it makes, of every type: a bare `===`
 * against a value of any type compiles to a call of the engine's generic comparison, while the
 * `typeof` test is inline and leaves the comparison only symbols to see.
 */
export function isFailure(value: unknown): value is Failure {
  return typeof value === 'symbol' && value === FAILURE;
}
