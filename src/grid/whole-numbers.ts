/**
 * Range checks for the whole numbers primitives take and compute: counts of copies or scale
 * factors, and arithmetic results, which no puzzle quantity takes anywhere near the limits.
 */

/** Largest scale factor or number of copies a primitive accepts. */
export const MOST_COPIES = 10;

/** Arithmetic results beyond this size (either sign) are refused. */
export const LARGEST_WHOLE_NUMBER = 10_000;

/** Whether n is a whole number from 1 to `most`. */
export function isCount(n: number, most: number): boolean {
  return Number.isInteger(n) && n >= 1 && n <= most;
}

/** n itself when it is a whole number within the limit either side of 0; null otherwise. */
export function boundedWholeNumber(n: number): number | null {
  return Number.isInteger(n) && n >= -LARGEST_WHOLE_NUMBER && n <= LARGEST_WHOLE_NUMBER ? n : null;
}
