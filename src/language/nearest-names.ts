/** The known names nearest to a name that is not known, for "did you mean ...?" hints. */

/** Edits (insert, delete, replace a character) that turn `a` into `b`. */
export function editDistance(a: string, b: string): number {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      current[j] = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + (a[i - 1] === b[j - 1] ? 0 : 1));
    }
    previous = current;
  }
  return previous[b.length]!;
}

/**
 * Up to `most` names: first those that hold every word of `name` (words split at '_'),
 * shortest first, then those within a few edits, nearest first.
 */
export function nearestNames(name: string, known: Iterable<string>, most = 3): string[] {
  const words = name.split('_').filter((w) => w !== '');
  const names = [...new Set(known)].filter((k) => k !== name);
  const holding = names
    .filter((k) => {
      const own = new Set(k.split('_'));
      return words.length > 0 && words.every((w) => own.has(w));
    })
    .sort((a, b) => a.length - b.length || a.localeCompare(b));
  const limit = Math.max(2, Math.floor(name.length / 3));
  const close = names
    .map((k) => ({ k, d: editDistance(name, k) }))
    .filter((c) => c.d <= limit)
    .sort((a, b) => a.d - b.d || a.k.localeCompare(b.k))
    .map((c) => c.k);
  return [...new Set([...holding, ...close])].slice(0, most);
}
