/** Object selection primitives: hand-worked cases and fast-check laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { FAILURE } from '../src/language/failure.ts';
import { GridObject } from '../src/grid/grid-object.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { callPrimitive, evaluate } from './support/run-primitive.ts';

const G = Grid.fromRows;

function objectsOf(g: Grid, extractor = 'objects_by_colour'): GridObject[] {
  return callPrimitive(extractor, g) as GridObject[];
}
const size = (o: GridObject) => callPrimitive('object_size', o) as number;
const EXTRACTORS = ['objects_by_colour', 'objects_multicolour_diagonal', 'colour_groups'] as const;
const arbitraryObjects = fc.tuple(arbitraryGrid(), fc.constantFrom(...EXTRACTORS)).map(([g, e]) => ({ grid: g, objects: objectsOf(g, e) }));

const KEYS = ['object_size', 'object_height', 'object_width', 'object_number_of_colours', 'object_top', 'object_left', 'object_colour', 'hole_count'] as const;
const keyFunction = (name: string) => (o: GridObject) => callPrimitive(name, o) as number;

/**
 * Grids with repeated objects on purpose: solid blocks (1-3 × 1-3, colours 1-9) in slots of a
 * 4 × 4 layout, one cell of background between slots so no two blocks touch. One or two kinds
 * are placed two or three times each, and one other kind once: `planted` is its top-left corner.
 */
const plantedOddOne = fc
  .record({
    kinds: fc.uniqueArray(fc.tuple(fc.integer({ min: 1, max: 3 }), fc.integer({ min: 1, max: 3 }), fc.integer({ min: 1, max: 9 })), {
      minLength: 2,
      maxLength: 3,
      selector: ([h, w, colour]) => `${h}x${w}:${colour}`,
    }),
    copies: fc.array(fc.integer({ min: 2, max: 3 }), { minLength: 2, maxLength: 2 }),
    order: fc.array(fc.nat(), { minLength: 16, maxLength: 16 }),
  })
  .map(({ kinds, copies, order }) => {
    const [odd, ...common] = kinds as [number, number, number][];
    const placements: [number, number, number][] = [odd!, ...common.flatMap((k, i) => Array.from({ length: copies[i]! }, () => k))];
    // Shuffle the 16 slots by the drawn keys, and put the blocks in the first ones.
    const slots = Array.from({ length: 16 }, (_, i) => i).sort((a, b) => order[a]! - order[b]! || a - b);
    const cells = new Uint8Array(16 * 16);
    let planted: [number, number] = [0, 0];
    placements.forEach(([h, w, colour], i) => {
      const top = Math.floor(slots[i]! / 4) * 4;
      const left = (slots[i]! % 4) * 4;
      if (i === 0) planted = [top, left];
      for (let r = 0; r < h; r++) for (let c = 0; c < w; c++) cells[(top + r) * 16 + left + c] = colour;
    });
    const grid = new Grid(16, 16, cells);
    return { grid, objects: objectsOf(grid), planted };
  });

describe('selection laws', () => {
  it('largest_object is at least as big as every object, and the first such; smallest_object likewise', () => {
    fc.assert(
      fc.property(arbitraryObjects, ({ objects }) => {
        const largest = callPrimitive('largest_object', objects);
        const smallest = callPrimitive('smallest_object', objects);
        if (objects.length === 0) {
          expect(largest).toBe(FAILURE);
          expect(smallest).toBe(FAILURE);
          return;
        }
        const big = largest as GridObject;
        const small = smallest as GridObject;
        for (const o of objects) {
          expect(big.size).toBeGreaterThanOrEqual(o.size);
          expect(small.size).toBeLessThanOrEqual(o.size);
        }
        expect(objects.findIndex((o) => o.size === big.size)).toBe(objects.indexOf(big));
        expect(objects.findIndex((o) => o.size === small.size)).toBe(objects.indexOf(small));
      }),
    );
  });

  it('keep_objects and drop_objects split the list into the holding and the failing objects, order kept', () => {
    fc.assert(
      fc.property(arbitraryObjects, fc.integer({ min: 0, max: 9 }), fc.integer({ min: 0, max: 6 }), ({ objects }, colour, n) => {
        const tests = [(o: GridObject) => callPrimitive('has_colour', o, colour) as boolean, (o: GridObject) => callPrimitive('is_bigger_than', o, n) as boolean];
        for (const test of tests) {
          const kept = callPrimitive('keep_objects', objects, test) as GridObject[];
          const dropped = callPrimitive('drop_objects', objects, test) as GridObject[];
          expect(kept).toEqual(objects.filter((o) => test(o)));
          expect(dropped).toEqual(objects.filter((o) => !test(o)));
          expect(kept.length + dropped.length).toBe(objects.length);
        }
      }),
    );
  });

  it('sort_objects is a permutation, ordered by the key, equal keys in their old order', () => {
    fc.assert(
      fc.property(arbitraryObjects, fc.constantFrom(...KEYS), ({ objects }, keyName) => {
        const key = keyFunction(keyName);
        const sorted = callPrimitive('sort_objects', objects, key) as GridObject[];
        expect(sorted.length).toBe(objects.length);
        expect(new Set(sorted)).toEqual(new Set(objects));
        for (let i = 1; i < sorted.length; i++) {
          const a = key(sorted[i - 1]!);
          const b = key(sorted[i]!);
          expect(a).toBeLessThanOrEqual(b);
          if (a === b) expect(objects.indexOf(sorted[i - 1]!)).toBeLessThan(objects.indexOf(sorted[i]!));
        }
      }),
    );
  });

  it('object_with_most / object_with_least have the extreme key', () => {
    fc.assert(
      fc.property(arbitraryObjects, fc.constantFrom(...KEYS), ({ objects }, keyName) => {
        const key = keyFunction(keyName);
        const most = callPrimitive('object_with_most', objects, key);
        const least = callPrimitive('object_with_least', objects, key);
        if (objects.length === 0) {
          expect(most).toBe(FAILURE);
          expect(least).toBe(FAILURE);
          return;
        }
        for (const o of objects) {
          expect(key(most as GridObject)).toBeGreaterThanOrEqual(key(o));
          expect(key(least as GridObject)).toBeLessThanOrEqual(key(o));
        }
      }),
    );
  });

  it('first_object, last_object and object_at pick by position and fail out of range', () => {
    fc.assert(
      fc.property(arbitraryObjects, fc.integer({ min: -3, max: 40 }), ({ objects }, index) => {
        expect(callPrimitive('first_object', objects)).toBe(objects.length ? objects[0] : FAILURE);
        expect(callPrimitive('last_object', objects)).toBe(objects.length ? objects[objects.length - 1] : FAILURE);
        expect(callPrimitive('object_at', objects, index)).toBe(index >= 0 && index < objects.length ? objects[index] : FAILURE);
      }),
    );
  });

  it('keys agree with the object itself', () => {
    fc.assert(
      fc.property(arbitraryObjects, ({ objects }) => {
        for (const o of objects) {
          let cells = 0;
          const colours = new Set<number>();
          for (const v of o.shape.cells) if (v !== EMPTY) (cells++, colours.add(v));
          expect(size(o)).toBe(cells);
          expect(callPrimitive('object_number_of_colours', o)).toBe(colours.size);
          expect(callPrimitive('is_single_colour', o)).toBe(colours.size === 1);
          expect(callPrimitive('is_solid_rectangle', o)).toBe(cells === o.height * o.width);
          expect(callPrimitive('object_height', o)).toBe(o.shape.height);
          expect(callPrimitive('object_width', o)).toBe(o.shape.width);
          expect(callPrimitive('has_size', o, cells)).toBe(true);
          expect(callPrimitive('is_bigger_than', o, cells)).toBe(false);
          expect(callPrimitive('is_bigger_than', o, cells - 1)).toBe(true);
          const rows = o.shape.toRows();
          const mirrored = rows.map((row) => [...row].reverse());
          expect(callPrimitive('is_symmetric_object', o)).toBe(JSON.stringify(rows) === JSON.stringify(mirrored));
        }
      }),
    );
  });

  it('odd_one_out, when it succeeds, gives an object no other object looks like while all others have a twin; a planted odd one is found', () => {
    let checked = 0;
    let runs = 0;
    fc.assert(
      fc.property(fc.oneof({ arbitrary: plantedOddOne, weight: 4 }, { arbitrary: arbitraryObjects.map((a) => ({ ...a, planted: undefined })), weight: 1 }), ({ objects, planted }) => {
        runs++;
        const odd = callPrimitive('odd_one_out', objects);
        if (planted !== undefined) {
          // Built by hand: one block of its own kind, every other kind placed at least twice.
          expect(odd).not.toBe(FAILURE);
          expect([(odd as GridObject).top, (odd as GridObject).left]).toEqual(planted);
        }
        if (odd === FAILURE) return;
        checked++;
        const same = (a: GridObject, b: GridObject) => a.shape.equals(b.shape);
        for (const o of objects) {
          const twins = objects.filter((p) => p !== o && same(o, p)).length;
          if (o === odd) expect(twins).toBe(0);
          else expect(twins).toBeGreaterThan(0);
        }
      }),
      { numRuns: 200 },
    );
    expect(checked / runs).toBeGreaterThan(0.6);
  });
});

describe('selection, hand-worked cases', () => {
  // 1 1 0 2
  // 0 0 0 2
  // 3 0 1 0
  const g = G([
    [1, 1, 0, 2],
    [0, 0, 0, 2],
    [3, 0, 1, 0],
  ]);
  const picture = (expression: string) => {
    const value = evaluate(expression, g);
    return value instanceof Grid ? value.toRows() : value;
  };

  it('largest and smallest take the first on ties', () => {
    expect(picture('object_picture(largest_object(objects_by_colour(grid)))')).toEqual([[1, 1]]);
    expect(picture('object_picture(smallest_object(objects_by_colour(grid)))')).toEqual([[3]]);
  });

  it('keep_objects with a section, and sort_objects by a key', () => {
    expect(picture('count_objects(keep_objects(objects_by_colour(grid), has_colour(_, #1)))')).toBe(2);
    expect(picture('count_objects(drop_objects(objects_by_colour(grid), is_bigger_than(_, 1)))')).toBe(2);
    expect(picture('object_picture(last_object(sort_objects(objects_by_colour(grid), object_height(_))))')).toEqual([[2], [2]]);
    expect(picture('object_picture(first_object(sort_objects(objects_by_colour(grid), object_left(_))))')).toEqual([[1, 1]]);
  });

  it('object_with_most / least by a key', () => {
    expect(picture('object_picture(object_with_most(objects_by_colour(grid), object_top(_)))')).toEqual([[3]]);
    expect(picture('object_picture(object_with_least(objects_by_colour(grid), object_width(_)))')).toEqual([[2], [2]]);
  });

  it('odd_one_out finds the single different pattern and fails when two differ or none repeat', () => {
    const three = G([
      [5, 0, 5, 0, 5],
      [5, 0, 5, 0, 0],
    ]);
    expect((callPrimitive('odd_one_out', objectsOf(three)) as GridObject).left).toBe(4);
    expect(callPrimitive('odd_one_out', objectsOf(G([[5, 0, 6, 0, 7, 0]])))).toBe(FAILURE);
    expect(callPrimitive('odd_one_out', objectsOf(G([[5, 0, 5, 0, 6, 0, 7]])))).toBe(FAILURE);
    // same shape, other colour: a different pattern
    expect((callPrimitive('odd_one_out', objectsOf(G([[5, 0, 5, 0, 8, 0, 5]]))) as GridObject).left).toBe(4);
  });

  it('unique_colour_object finds the one colour no other object has', () => {
    expect((callPrimitive('unique_colour_object', objectsOf(G([[1, 0, 2, 0, 1]]))) as GridObject).left).toBe(2);
    // colours 1, 2, 3, 1: both 2 and 3 stand alone, so there is no single answer
    expect(callPrimitive('unique_colour_object', objectsOf(g))).toBe(FAILURE);
    expect(callPrimitive('unique_colour_object', objectsOf(G([[1, 0, 2, 0, 3, 0]])))).toBe(FAILURE);
    expect(callPrimitive('unique_colour_object', [])).toBe(FAILURE);
  });

  it('touches_edge: only the middle object stays off the border', () => {
    const board = G([
      [0, 0, 0, 0, 4],
      [0, 6, 0, 0, 0],
      [0, 0, 0, 0, 0],
      [0, 0, 0, 0, 0],
    ]);
    const flags = objectsOf(board).map((o) => callPrimitive('touches_edge', o, board));
    expect(flags).toEqual([true, false]);
  });

  it('hole_count counts separate gaps; a cup open at the top has none', () => {
    const eight = G([
      [0, 7, 7, 7, 0],
      [0, 7, 0, 7, 0],
      [0, 7, 7, 7, 0],
      [0, 7, 0, 7, 0],
      [0, 7, 7, 7, 0],
      [0, 0, 0, 0, 0],
    ]);
    expect(callPrimitive('hole_count', objectsOf(eight)[0])).toBe(2);
    const cup = G([
      [0, 7, 0, 7, 0],
      [0, 7, 7, 7, 0],
      [0, 0, 0, 0, 0],
    ]);
    expect(callPrimitive('hole_count', objectsOf(cup)[0])).toBe(0);
  });

  it('predicates on a plus shape', () => {
    const plus = objectsOf(G([[0, 2, 0, 0], [2, 2, 2, 0], [0, 2, 0, 0], [0, 0, 0, 0]]))[0]!;
    expect(callPrimitive('is_symmetric_object', plus)).toBe(true);
    expect(callPrimitive('is_solid_rectangle', plus)).toBe(false);
    expect(callPrimitive('has_colour', plus, 2)).toBe(true);
    expect(callPrimitive('has_colour', plus, 0)).toBe(false);
    expect(callPrimitive('object_colour', plus)).toBe(2);
    const corner = objectsOf(G([[3, 3, 0], [3, 0, 0], [0, 0, 0]]))[0]!;
    expect(callPrimitive('is_symmetric_object', corner)).toBe(false);
  });

  it('is_line and has_same_shape', () => {
    const scene = G([
      [2, 2, 2, 0, 0],
      [0, 0, 0, 0, 5],
      [3, 3, 3, 0, 5],
      [0, 0, 0, 0, 0],
      [4, 4, 0, 0, 0],
      [4, 0, 0, 0, 0],
    ]);
    const [top, column, middle, corner] = objectsOf(scene);
    expect([top, column, middle, corner].map((o) => callPrimitive('is_line', o))).toEqual([true, true, true, false]);
    expect(callPrimitive('has_same_shape', top, middle)).toBe(true);
    expect(callPrimitive('has_same_shape', top, column)).toBe(false);
    expect(callPrimitive('has_same_shape', corner, corner)).toBe(true);
  });

  it('has_hole: a ring and a frame with a spot inside have holes; a cup and a bar do not', () => {
    const scene = G([
      [4, 4, 4, 0, 6, 0, 6, 0, 0, 0],
      [4, 0, 4, 0, 6, 0, 6, 0, 0, 0],
      [4, 4, 4, 0, 6, 6, 6, 0, 0, 0],
      [0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
      [5, 5, 5, 5, 0, 7, 7, 7, 7, 0],
      [5, 0, 2, 5, 0, 0, 0, 0, 0, 0],
      [5, 5, 5, 5, 0, 0, 0, 0, 0, 0],
    ]);
    // objects_by_colour in reading order: the 4 ring, the 6 cup, the 5 frame, the 7 bar, the 2 spot.
    const [ring, cup, frame, bar, spot] = objectsOf(scene);
    expect([ring, cup, frame, bar, spot].map((o) => o!.mainColour)).toEqual([4, 6, 5, 7, 2]);
    // The frame's inside holds a background cell and a 2: both are not part of the 5 object.
    expect([ring, cup, frame, bar, spot].map((o) => callPrimitive('has_hole', o))).toEqual([true, false, true, false, false]);
  });

  it('has_hole agrees with hole_count', () => {
    fc.assert(
      fc.property(arbitraryObjects, ({ objects }) => {
        for (const o of objects) expect(callPrimitive('has_hole', o)).toBe((callPrimitive('hole_count', o) as number) > 0);
      }),
    );
  });

  it('count_colour_in_object counts one colour of a multicolour object; summed over colours it is the size', () => {
    const scene = G([
      [1, 2, 1, 0, 0],
      [1, 1, 2, 0, 3],
      [0, 0, 0, 0, 3],
    ]);
    const [left, right] = callPrimitive('objects_multicolour', scene) as GridObject[];
    // Left object: 1,2,1 / 1,1,2 -> four 1s and two 2s; right object: two 3s.
    expect(callPrimitive('count_colour_in_object', left, 1)).toBe(4);
    expect(callPrimitive('count_colour_in_object', left, 2)).toBe(2);
    expect(callPrimitive('count_colour_in_object', left, 3)).toBe(0);
    expect(callPrimitive('count_colour_in_object', right, 3)).toBe(2);
    // As a key: the object with the most 2s.
    expect(callPrimitive('object_with_most', [right, left], (o: GridObject) => callPrimitive('count_colour_in_object', o, 2))).toBe(left);
    fc.assert(
      fc.property(arbitraryObjects, ({ objects }) => {
        for (const o of objects) {
          let total = 0;
          for (let c = 0; c < 10; c++) total += callPrimitive('count_colour_in_object', o, c) as number;
          expect(total).toBe(o.size);
        }
      }),
    );
  });

  it('a failing key or test makes the whole selection fail', () => {
    const failing = () => FAILURE;
    const objects = objectsOf(g);
    expect(callPrimitive('keep_objects', objects, failing)).toBe(FAILURE);
    expect(callPrimitive('sort_objects', objects, failing)).toBe(FAILURE);
    expect(callPrimitive('object_with_most', objects, failing)).toBe(FAILURE);
  });
});

describe('first_object_where and most_common_object', () => {
  it('first_object_where is the first object that keep_objects keeps', () => {
    fc.assert(
      fc.property(arbitraryObjects, fc.integer({ min: 0, max: 4 }), ({ objects }, n) => {
        const test = (o: GridObject) => size(o) > n;
        const found = callPrimitive('first_object_where', objects, test);
        const kept = objects.filter(test);
        expect(found).toBe(kept.length > 0 ? kept[0] : FAILURE);
      }),
    );
  });

  it('most_common_object picks the repeated pattern and fails when every pattern is single', () => {
    // Two lone 7s and one 7-7 bar: the lone cell repeats.
    const g = G([
      [7, 7, 0, 7],
      [0, 0, 0, 0],
      [7, 0, 0, 0],
    ]);
    const found = callPrimitive('most_common_object', objectsOf(g)) as GridObject;
    expect([found.top, found.left, found.size]).toEqual([0, 3, 1]);
    expect(callPrimitive('most_common_object', objectsOf(G([[1, 0, 2, 2]])))).toBe(FAILURE);
    expect(callPrimitive('most_common_object', [])).toBe(FAILURE);
  });
});

describe('touches_colour', () => {
  it('counts edge and corner contact with other cells of the colour, never the object itself (worked by hand)', () => {
    const g = G([
      [1, 1, 0, 0, 0],
      [0, 0, 5, 0, 3],
      [0, 0, 0, 0, 3],
      [5, 0, 0, 0, 0],
    ]);
    const [ones, five, threes, lone] = objectsOf(g);
    expect(ones?.mainColour).toBe(1);
    expect(callPrimitive('touches_colour', ones, g, 5)).toBe(true); // (0, 1) and (1, 2) meet at a corner
    expect(callPrimitive('touches_colour', ones, g, 3)).toBe(false);
    expect(callPrimitive('touches_colour', threes, g, 5)).toBe(false); // (1, 2) is two columns away
    expect(callPrimitive('touches_colour', five, g, 5)).toBe(false); // its own cell does not count
    expect(callPrimitive('touches_colour', lone, g, 1)).toBe(false);
  });

  it('an object touches a colour exactly when the colour appears among the neighbours of its cells', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.integer({ min: 0, max: 9 }), (g, colour) => {
        for (const o of objectsOf(g)) {
          let near = false;
          for (let r = 0; r < g.height; r++) {
            for (let c = 0; c < g.width; c++) {
              if (g.get(r, c) !== colour) continue;
              const inside = r >= o.top && r < o.top + o.height && c >= o.left && c < o.left + o.width && o.shape.get(r - o.top, c - o.left) !== EMPTY;
              if (inside) continue;
              for (let dr = -1; dr <= 1; dr++) {
                for (let dc = -1; dc <= 1; dc++) {
                  const sr = r + dr - o.top;
                  const sc = c + dc - o.left;
                  if (sr >= 0 && sr < o.height && sc >= 0 && sc < o.width && o.shape.get(sr, sc) !== EMPTY) near = true;
                }
              }
            }
          }
          expect(callPrimitive('touches_colour', o, g, colour)).toBe(near);
        }
      }),
    );
  });
});
