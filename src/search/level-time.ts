/**
 * Whether a level's values other than grids are worth making. They serve only as arguments of
 * the next level, so they are worth it only when the time left can make them and still check a
 * good part of the next level's grids. Both times are guessed from the last level's, grown as
 * this level's grids grew over the last level's.
 *
 * Early levels are too small and uneven to time (a dear primitive's first level, a first cut of
 * big grids into objects, code still being compiled), so the guess decides only once the search
 * has used as much time as it has left, and the growth it assumes is held to at most four times
 * per level. So it never decides under a candidate cap with time to spare.
 */

/** Share of the next level's grid calls that the time left must still allow. */
export const NEXT_GRIDS_SHARE = 0.5;

/** The most a level is taken to grow over the last (levels of one more bit grow about 1.3 to 3 times). */
export const MAXIMUM_GROWTH = 4;

/** Milliseconds a finished level spent on its grids and on its other values. */
export interface LevelTimes {
  readonly grids: number;
  readonly others: number;
}

/**
 * True when this level's other values should be made: `last` is the previous level's times
 * (others 0 when unknown), `grids` the milliseconds this level's grids took; `started`, `now`
 * and `deadline` are performance.now() values (when the search began, now, when it must end).
 */
export function othersInTime(last: LevelTimes, grids: number, started: number, now: number, deadline: number): boolean {
  if (last.others === 0 || now - started < deadline - now) return now <= deadline;
  const growth = Math.min(MAXIMUM_GROWTH, Math.max(1, grids / Math.max(last.grids, 0.5)));
  return now + last.others * growth + NEXT_GRIDS_SHARE * grids * growth <= deadline;
}
