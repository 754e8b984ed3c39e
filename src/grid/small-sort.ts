/**
 * Sorting the short lists primitives make (a few colours, a few dozen objects) in place by
 * insertion: stable, and with no allocation, where the built-in sort sets up work space on every
 * call and the search sorts millions of such lists.
 */

/** Lists longer than this are sorted by the built-in sort. */
const LONGEST = 40;

/** Sorts `list` in place so that `before(a, b) < 0` puts a first; equal items keep their order. */
export function sortSmall<T>(list: T[], before: (a: T, b: T) => number): T[] {
  // Insertion takes time growing with the square of the length: longer lists take the built-in (also stable) sort.
  if (list.length > LONGEST) return list.sort(before);
  for (let i = 1; i < list.length; i++) {
    const item = list[i]!;
    let j = i;
    while (j > 0 && before(list[j - 1]!, item) > 0) {
      list[j] = list[j - 1]!;
      j--;
    }
    list[j] = item;
  }
  return list;
}
