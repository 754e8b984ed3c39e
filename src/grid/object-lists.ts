/**
 * Choosing from a list of objects: the one with the most or fewest cells, the one with the
 * highest or lowest key, those that pass a test, the first that passes, the list sorted by a key.
 *
 * Keys and tests come from the caller (in the language they are sections); one may give
 * something other than a number or a boolean (the language's failure value) when it cannot
 * apply, and then the choice cannot be made either: the function gives null.
 */
import type { GridObject } from './grid-object.ts';
import { sortSmall } from './small-sort.ts';

type Objects = readonly GridObject[];

/** The first object with the highest key (`most`) or the lowest; null for an empty list. */
export function objectByKey<Other>(objects: Objects, key: (o: GridObject) => number | Other, most: boolean): GridObject | null {
  if (objects.length === 0) return null;
  const sign = most ? 1 : -1;
  let best: GridObject | undefined;
  let bestKey = 0;
  for (const o of objects) {
    const k = key(o);
    if (typeof k !== 'number') return null;
    if (best === undefined || (k - bestKey) * sign > 0) {
      best = o;
      bestKey = k;
    }
  }
  return best!;
}

const sizeOf = (o: GridObject): number => o.size;

/** The first object with the most cells (`largest`) or the fewest; null for an empty list. */
export function objectBySize(objects: Objects, largest: boolean): GridObject | null {
  return objectByKey(objects, sizeOf, largest);
}

/** The objects whose verdict is `wanted`, in their order (the same list when all are). */
export function objectsWhere<Other>(objects: Objects, test: (o: GridObject) => boolean | Other, wanted: boolean): Objects | null {
  const kept: GridObject[] = [];
  for (const o of objects) {
    const verdict = test(o);
    if (typeof verdict !== 'boolean') return null;
    if (verdict === wanted) kept.push(o);
  }
  return kept.length === objects.length ? objects : kept;
}

/** The first object that passes the test; null when none does. */
export function firstObjectWhere<Other>(objects: Objects, test: (o: GridObject) => boolean | Other): GridObject | null {
  for (const o of objects) {
    const verdict = test(o);
    if (typeof verdict !== 'boolean') return null;
    if (verdict) return o;
  }
  return null;
}

/** The objects ordered by the key, smallest first; equal keys keep their order. */
export function sortObjects<Other>(objects: Objects, key: (o: GridObject) => number | Other): Objects | null {
  const n = objects.length;
  const keys = new Float64Array(n);
  const order = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    const k = key(objects[i]!);
    if (typeof k !== 'number') return null;
    keys[i] = k;
    order[i] = i;
  }
  sortSmall(order, (a, b) => keys[a]! - keys[b]! || a - b);
  return order.map((i) => objects[i]!);
}
