/**
 * Attempts with distinct answers: programs (or tables) that all fit the demonstrations differ
 * only on the test inputs, so a second one with the same test outputs as an earlier one adds
 * nothing. Used by the solver, by the table learners and by `bench:tables`.
 */
import type { Grid } from '../grid/grid.ts';

/**
 * The first `limit` of `ordered` (best first) whose test outputs differ from those of every
 * earlier one taken. A missing output (null: the program fails on that test input) equals
 * nothing. `testOutputs` is asked once per item.
 */
export function distinctAttempts<T>(ordered: readonly T[], testOutputs: (t: T) => readonly (Grid | null)[], limit: number): T[] {
  const taken: T[] = [];
  const takenOutputs: (readonly (Grid | null)[])[] = [];
  for (const t of ordered) {
    if (taken.length >= limit) break;
    const mine = testOutputs(t);
    if (takenOutputs.some((theirs) => theirs.every((g, i) => g !== null && mine[i] !== null && g.equals(mine[i]!)))) continue;
    taken.push(t);
    takenOutputs.push(mine);
  }
  return taken;
}
