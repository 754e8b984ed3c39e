/** Range checks for whole numbers. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boundedWholeNumber, isCount, LARGEST_WHOLE_NUMBER } from '../src/grid/whole-numbers.ts';

describe('isCount', () => {
  it('whole numbers from 1 to the most', () => {
    expect(isCount(1, 10)).toBe(true);
    expect(isCount(10, 10)).toBe(true);
    expect(isCount(0, 10)).toBe(false);
    expect(isCount(11, 10)).toBe(false);
    expect(isCount(2.5, 10)).toBe(false);
  });
});

describe('boundedWholeNumber', () => {
  it('passes whole numbers within the limit and refuses the rest', () => {
    expect(boundedWholeNumber(-10_000)).toBe(-10_000);
    expect(boundedWholeNumber(10_001)).toBeNull();
    expect(boundedWholeNumber(0.5)).toBeNull();
    expect(boundedWholeNumber(Number.NaN)).toBeNull();
  });

  it('is the identity exactly on the whole numbers within the limit', () => {
    fc.assert(
      fc.property(fc.integer({ min: -3 * LARGEST_WHOLE_NUMBER, max: 3 * LARGEST_WHOLE_NUMBER }), (n) => {
        expect(boundedWholeNumber(n)).toBe(Math.abs(n) <= LARGEST_WHOLE_NUMBER ? n : null);
      }),
    );
  });
});
