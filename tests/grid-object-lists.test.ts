/** Choosing from lists of objects: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GridObject } from '../src/grid/grid-object.ts';
import { Grid } from '../src/grid/grid.ts';
import { firstObjectWhere, objectByKey, objectBySize, objectsWhere, sortObjects } from '../src/grid/object-lists.ts';

/** A one-row bar of `size` cells of the colour, at column `left`. */
const bar = (size: number, left: number, colour = 1) => new GridObject(0, left, Grid.filled(1, size, colour));
const a = bar(2, 0);
const b = bar(3, 3);
const c = bar(1, 7);
const d = bar(3, 9, 2);
const list = [a, b, c, d];
const cannot = Symbol('cannot');

describe('objectBySize and objectByKey', () => {
  it('the first with the most or the fewest cells', () => {
    expect(objectBySize(list, true)).toBe(b);
    expect(objectBySize(list, false)).toBe(c);
    expect(objectBySize([], true)).toBeNull();
  });

  it('by a key, first on ties; null when a key cannot be given', () => {
    expect(objectByKey(list, (o) => o.left, true)).toBe(d);
    expect(objectByKey(list, (o) => -o.size, true)).toBe(c);
    expect(objectByKey(list, (o) => o.mainColour, false)).toBe(a);
    expect(objectByKey(list, () => cannot, true)).toBeNull();
  });
});

describe('tests over a list', () => {
  const wide = (o: GridObject) => o.width >= 3;

  it('objectsWhere keeps the passing or the failing objects in order', () => {
    expect(objectsWhere(list, wide, true)).toEqual([b, d]);
    expect(objectsWhere(list, wide, false)).toEqual([a, c]);
    expect(objectsWhere(list, () => true, true)).toBe(list);
    expect(objectsWhere(list, () => cannot, true)).toBeNull();
  });

  it('firstObjectWhere', () => {
    expect(firstObjectWhere(list, wide)).toBe(b);
    expect(firstObjectWhere(list, () => false)).toBeNull();
    expect(firstObjectWhere(list, () => cannot)).toBeNull();
  });

  it('kept and dropped split the list', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1, max: 5 }), { maxLength: 8 }), fc.integer({ min: 1, max: 5 }), (sizes, limit) => {
        const objects = sizes.map((size, i) => bar(size, i * 6));
        const test = (o: GridObject) => o.size > limit;
        const kept = objectsWhere(objects, test, true)!;
        const dropped = objectsWhere(objects, test, false)!;
        expect(kept.length + dropped.length).toBe(objects.length);
        for (const o of kept) expect(dropped).not.toContain(o);
      }),
    );
  });
});

describe('sortObjects', () => {
  it('smallest key first, equal keys in their order', () => {
    expect(sortObjects(list, (o) => o.size)).toEqual([c, a, b, d]);
    expect(sortObjects(list, () => cannot)).toBeNull();
  });

  it('is a stable sort: a permutation whose keys never go down', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1, max: 5 }), { maxLength: 8 }), (sizes) => {
        const objects = sizes.map((size, i) => bar(size, i * 6));
        const sorted = sortObjects(objects, (o) => o.size)!;
        expect([...sorted].sort((x, y) => x.left - y.left)).toEqual(objects);
        for (let i = 1; i < sorted.length; i++) {
          expect(sorted[i]!.size).toBeGreaterThanOrEqual(sorted[i - 1]!.size);
          if (sorted[i]!.size === sorted[i - 1]!.size) expect(sorted[i]!.left).toBeGreaterThan(sorted[i - 1]!.left);
        }
      }),
    );
  });
});
