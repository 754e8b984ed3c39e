/**
 * Hashing a tuple of values from the hashes of its elements, one step per element: what the
 * value store (a candidate's values on every example), the goals (the grids wanted on every
 * demonstration) and section signatures (results on every probe) each need. Each starts from a
 * seed of its own and cuts the result to HASH_MASK (src/grid/grid.ts) at the end.
 */

/** Folds the next element's hash into the tuple hash `h`. */
export function foldHash(h: number, element: number): number {
  return Math.imul(h ^ element, 0x5bd1e995) ^ (h >>> 15);
}
