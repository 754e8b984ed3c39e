/**
 * The most frequent colour of a count table: the one rule behind the background colour, an
 * object's main colour, majority lines and majority blocks.
 */

/**
 * The colour 0–9 with the largest count in `counts` (indexed by colour), the lowest colour on
 * ties; 0 when every count is 0. Entries past 9 are not looked at.
 */
export function mostFrequentColour(counts: ArrayLike<number>): number {
  let best = 0;
  for (let c = 1; c < 10; c++) if (counts[c]! > counts[best]!) best = c;
  return best;
}

/**
 * The background rule on a count table: 0 whenever any cell is 0, otherwise the
 * most frequent colour (the lowest on ties).
 */
export function backgroundOfCounts(counts: ArrayLike<number>): number {
  return counts[0]! > 0 ? 0 : mostFrequentColour(counts);
}
