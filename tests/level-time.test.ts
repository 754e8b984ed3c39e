/**
 * The guess that decides, near the deadline, whether a level's values other than grids are still
 * worth making (src/search/level-time.ts): worked by hand, and its laws under fast-check.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { othersInTime } from '../src/search/level-time.ts';

const times = fc.record({ grids: fc.double({ min: 0, max: 1e5, noNaN: true }), others: fc.double({ min: 0, max: 1e5, noNaN: true }) });
const milliseconds = fc.double({ min: 0, max: 1e5, noNaN: true });
/** A search begun long ago: the guess is asked. */
const LONG_AGO = -1e6;

describe('whether a level\'s other values are made in time', () => {
  it('grows the last level\'s times by this level\'s growth (worked by hand)', () => {
    // Grids took 100 ms last level and 300 ms now: growth 3, so the others would take 3 × 200 =
    // 600 ms and half the next level's grids 0.5 × 3 × 300 = 450 ms: 1050 ms in all.
    const last = { grids: 100, others: 200 };
    expect(othersInTime(last, 300, LONG_AGO, 0, 1050)).toBe(true);
    expect(othersInTime(last, 300, LONG_AGO, 0, 1049)).toBe(false);
    // A level faster than the last is not taken to shrink: growth 1, 200 + 0.5 × 50 = 225 ms.
    expect(othersInTime(last, 50, LONG_AGO, 1000, 1225)).toBe(true);
    expect(othersInTime(last, 50, LONG_AGO, 1000, 1224)).toBe(false);
    // Growth is held to 4: 10 ms then 1000 ms counts as 4 times, 4 × 100 + 0.5 × 4 × 1000 = 2400 ms.
    expect(othersInTime({ grids: 10, others: 100 }, 1000, LONG_AGO, 0, 2400)).toBe(true);
    expect(othersInTime({ grids: 10, others: 100 }, 1000, LONG_AGO, 0, 2399)).toBe(false);
  });

  it('does not guess before the search has used as much time as it has left', () => {
    // 4 s used, 16 s left: yes, however dear the level looks; 12 s used, 8 s left: the guess says no.
    expect(othersInTime({ grids: 10, others: 5000 }, 1000, 0, 4000, 20000)).toBe(true);
    expect(othersInTime({ grids: 10, others: 5000 }, 1000, 0, 12000, 20000)).toBe(false);
  });

  it('always makes them with no deadline in sight, and never after the deadline', () => {
    fc.assert(
      fc.property(times, milliseconds, milliseconds, milliseconds, (last, grids, started, now) => {
        expect(othersInTime(last, grids, started, now, Infinity)).toBe(true);
        expect(othersInTime(last, grids, Math.min(started, now), now, now - 1)).toBe(false);
      }),
    );
  });

  it('more time never turns a yes into a no', () => {
    fc.assert(
      fc.property(times, milliseconds, milliseconds, milliseconds, milliseconds, (last, grids, now, deadline, more) => {
        if (othersInTime(last, grids, LONG_AGO, now, deadline)) expect(othersInTime(last, grids, LONG_AGO, now, deadline + more)).toBe(true);
      }),
    );
  });

  it('a dearer level never turns a no into a yes', () => {
    fc.assert(
      fc.property(times, milliseconds, milliseconds, milliseconds, milliseconds, (last, grids, now, deadline, more) => {
        if (!othersInTime(last, grids, LONG_AGO, now, deadline)) expect(othersInTime(last, grids + more, LONG_AGO, now, deadline)).toBe(false);
      }),
    );
  });
});
