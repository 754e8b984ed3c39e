/**
 * Whether a level's values other than grids are worth making. They serve only as arguments of
 * the next level, so they are worth it only when the time left can make them and still check a
 * good part of the next level's grids. Both times are guessed from the last level's, grown as
 * this level's grids grew over the last level's (levels grow by a fairly steady factor per bit).
 * Early levels take a small part of the time left, so the guess decides only near the deadline,
 * and never under a candidate cap with time to spare.
 */

/** Share of the next level's grid calls that the time left must still allow. */
export const NEXT_GRIDS_SHARE = 0.5;

/** Milliseconds a finished level spent on its grids and on its other values. */
export interface LevelTimes {
  readonly grids: number;
  readonly others: number;
}

/**
 * True when this level's other values should be made: `last` is the previous level's times
 * (others 0 when unknown), `grids` the milliseconds this level's grids took, `now` and `deadline`
 * performance.now() values.
 */
export function othersInTime(last: LevelTimes, grids: number, now: number, deadline: number): boolean {
  if (last.others === 0) return now <= deadline;
  const growth = Math.max(1, grids / Math.max(last.grids, 0.5));
  return now + last.others * growth + NEXT_GRIDS_SHARE * grids * growth <= deadline;
}
