/**
 * Object selection: picking one object or a sub-list by size, position, colour, shape or
 * uniqueness; the predicates and keys that feed keep_objects, sort_objects and friends.
 */
import { EMPTY, type Grid } from '../src/grid/grid.ts';
import { countEnclosedRegions } from '../src/grid/holes.ts';
import type { GridObject } from '../src/language/grid-object.ts';
import { FAILURE, type Failure } from '../src/language/failure.ts';
import { primitive } from '../src/library/primitive.ts';
import { touchesColour } from '../src/grid/touches-colour.ts';

type Objects = readonly GridObject[];
type Key = (object: GridObject) => number | Failure;
type Test = (object: GridObject) => boolean | Failure;

/** The first object with the largest (sign 1) or smallest (sign -1) cell count. */
function bySize(objects: Objects, sign: 1 | -1): GridObject | Failure {
  if (objects.length === 0) return FAILURE;
  let best = objects[0]!;
  for (let i = 1; i < objects.length; i++) if ((objects[i]!.size - best.size) * sign > 0) best = objects[i]!;
  return best;
}

/** The first object with the largest (sign 1) or smallest (sign -1) key. */
function byKey(objects: Objects, key: Key, sign: 1 | -1): GridObject | Failure {
  if (objects.length === 0) return FAILURE;
  let best: GridObject | undefined;
  let bestKey = 0;
  for (const o of objects) {
    const k = key(o);
    if (k === FAILURE) return FAILURE;
    if (best === undefined || (k - bestKey) * sign > 0) {
      best = o;
      bestKey = k;
    }
  }
  return best!;
}

/** The objects for which `test` gives `wanted`, in their order; FAILURE if a test fails. */
function filter(objects: Objects, test: Test, wanted: boolean): Objects | Failure {
  const kept: GridObject[] = [];
  for (const o of objects) {
    const t = test(o);
    if (t === FAILURE) return FAILURE;
    if (t === wanted) kept.push(o);
  }
  return kept.length === objects.length ? objects : kept;
}

export function sortObjects(objects: Objects, key: Key): Objects | Failure {
  const n = objects.length;
  const keys = new Float64Array(n);
  const order = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    const k = key(objects[i]!);
    if (k === FAILURE) return FAILURE;
    keys[i] = k;
    order[i] = i;
  }
  order.sort((a, b) => keys[a]! - keys[b]! || a - b);
  return order.map((i) => objects[i]!);
}

/** The object whose shape-and-colours pattern occurs most often (the first on ties); fails unless some pattern repeats. */
export function mostCommonObject(objects: Objects): GridObject | Failure {
  const n = objects.length;
  let best = -1;
  let bestCount = 1;
  for (let i = 0; i < n; i++) {
    const shape = objects[i]!.shape;
    let count = 0;
    for (let j = 0; j < n; j++) if (shape.equals(objects[j]!.shape)) count++;
    if (count > bestCount) (best = i), (bestCount = count);
  }
  return best < 0 ? FAILURE : objects[best]!;
}

/** The only object whose shape-and-colours pattern occurs once, when every other pattern repeats. */
export function oddOneOut(objects: Objects): GridObject | Failure {
  const n = objects.length;
  if (n < 3) return FAILURE;
  let unique: GridObject | undefined;
  for (let i = 0; i < n; i++) {
    const shape = objects[i]!.shape;
    let repeated = false;
    for (let j = 0; j < n && !repeated; j++) if (j !== i && shape.equals(objects[j]!.shape)) repeated = true;
    if (repeated) continue;
    if (unique !== undefined) return FAILURE;
    unique = objects[i]!;
  }
  return unique ?? FAILURE;
}

/** The only object whose main colour no other object has. */
export function uniqueColourObject(objects: Objects): GridObject | Failure {
  const n = objects.length;
  if (n < 2) return FAILURE;
  const counts = new Uint32Array(10);
  const colours = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    colours[i] = objects[i]!.mainColour;
    counts[colours[i]!]!++;
  }
  let unique: GridObject | undefined;
  for (let i = 0; i < n; i++) {
    if (counts[colours[i]!] !== 1) continue;
    if (unique !== undefined) return FAILURE;
    unique = objects[i]!;
  }
  return unique ?? FAILURE;
}

export function hasColour(o: GridObject, colour: number): boolean {
  const cells = o.shape.cells;
  for (let i = 0; i < cells.length; i++) if (cells[i] === colour) return true;
  return false;
}

export function touchesEdge(o: GridObject, g: Grid): boolean {
  const { height, width, cells } = o.shape;
  for (let r = 0; r < height; r++) {
    const row = o.top + r;
    for (let c = 0; c < width; c++) {
      if (cells[r * width + c] === EMPTY) continue;
      const column = o.left + c;
      if (row === 0 || column === 0 || row === g.height - 1 || column === g.width - 1) return true;
    }
  }
  return false;
}

export function isSolidRectangle(o: GridObject): boolean {
  return o.size === o.shape.cells.length;
}

export function isMirrorSymmetric(o: GridObject): boolean {
  const { height, width, cells } = o.shape;
  for (let r = 0; r < height; r++) {
    const base = r * width;
    for (let c = 0, d = width - 1; c < d; c++, d--) if (cells[base + c] !== cells[base + d]) return false;
  }
  return true;
}

/** Whether two objects occupy the same cells of their boxes, colours aside. */
export function sameShape(a: GridObject, b: GridObject): boolean {
  if (a.height !== b.height || a.width !== b.width || a.size !== b.size) return false;
  const x = a.shape.cells;
  const y = b.shape.cells;
  for (let i = 0; i < x.length; i++) if ((x[i] === EMPTY) !== (y[i] === EMPTY)) return false;
  return true;
}

export function colourCount(o: GridObject): number {
  let seen = 0;
  const cells = o.shape.cells;
  for (let i = 0; i < cells.length; i++) if (cells[i] !== EMPTY) seen |= 1 << cells[i]!;
  let count = 0;
  for (; seen; seen &= seen - 1) count++;
  return count;
}

export const selectionPrimitives = [
  primitive({
    name: 'largest_object',
    category: 'selection',
    parameters: ['Objects'],
    result: 'Object',
    bits: 4,
    doc: 'The object with the most cells (the first one on ties); fails on an empty list.',
    example: { input: [[1, 0, 2, 2], [0, 0, 0, 2]], expression: 'object_picture(largest_object(objects_by_colour(grid)))', output: [[2, 2], [0, 2]] },
    run: (objects) => bySize(objects, 1),
  }),
  primitive({
    name: 'smallest_object',
    category: 'selection',
    parameters: ['Objects'],
    result: 'Object',
    bits: 4,
    doc: 'The object with the fewest cells (the first one on ties); fails on an empty list.',
    example: { input: [[1, 0, 2, 2], [0, 0, 0, 2]], expression: 'object_picture(smallest_object(objects_by_colour(grid)))', output: [[1]] },
    run: (objects) => bySize(objects, -1),
  }),
  primitive({
    name: 'first_object',
    category: 'selection',
    parameters: ['Objects'],
    result: 'Object',
    bits: 5,
    doc: 'The first object of the list (reading order for extracted objects); fails on an empty list.',
    example: { input: [[0, 3, 0], [4, 0, 0]], expression: 'object_picture(first_object(objects_by_colour(grid)))', output: [[3]] },
    run: (objects) => objects[0] ?? FAILURE,
  }),
  primitive({
    name: 'last_object',
    category: 'selection',
    parameters: ['Objects'],
    result: 'Object',
    bits: 5,
    doc: 'The last object of the list; fails on an empty list.',
    example: { input: [[0, 3, 0], [4, 0, 0]], expression: 'object_picture(last_object(objects_by_colour(grid)))', output: [[4]] },
    run: (objects) => objects[objects.length - 1] ?? FAILURE,
  }),
  primitive({
    name: 'object_at',
    category: 'selection',
    parameters: ['Objects', 'Int'],
    result: 'Object',
    bits: 6,
    doc: 'The object at a position in the list, counting from 0; fails when out of range.',
    example: { input: [[1, 0, 2, 0, 3]], expression: 'object_picture(object_at(objects_by_colour(grid), 1))', output: [[2]] },
    run: (objects, index) => (Number.isInteger(index) && index >= 0 && index < objects.length ? objects[index]! : FAILURE),
  }),
  primitive({
    name: 'keep_objects',
    category: 'selection',
    parameters: ['Objects', 'Object -> Bool'],
    result: 'Objects',
    bits: 5,
    doc: 'The objects for which the test holds, in their order.',
    example: { input: [[1, 0, 2, 0, 1]], expression: 'count_objects(keep_objects(objects_by_colour(grid), has_colour(_, #1)))', output: 2 },
    run: (objects, test) => filter(objects, test, true),
  }),
  primitive({
    name: 'drop_objects',
    category: 'selection',
    parameters: ['Objects', 'Object -> Bool'],
    result: 'Objects',
    bits: 5,
    doc: 'The objects for which the test does not hold, in their order.',
    example: { input: [[1, 0, 2, 0, 1]], expression: 'count_objects(drop_objects(objects_by_colour(grid), has_colour(_, #1)))', output: 1 },
    run: (objects, test) => filter(objects, test, false),
  }),
  primitive({
    name: 'object_with_most',
    category: 'selection',
    parameters: ['Objects', 'Object -> Int'],
    result: 'Object',
    bits: 5,
    doc: 'The object with the highest key (the first one on ties); fails on an empty list.',
    example: { input: [[1, 0, 2], [0, 0, 2]], expression: 'object_picture(object_with_most(objects_by_colour(grid), object_height(_)))', output: [[2], [2]] },
    run: (objects, key) => byKey(objects, key, 1),
  }),
  primitive({
    name: 'object_with_least',
    category: 'selection',
    parameters: ['Objects', 'Object -> Int'],
    result: 'Object',
    bits: 5,
    doc: 'The object with the lowest key (the first one on ties); fails on an empty list.',
    example: { input: [[0, 0, 2], [1, 0, 2]], expression: 'object_picture(object_with_least(objects_by_colour(grid), object_top(_)))', output: [[2], [2]] },
    run: (objects, key) => byKey(objects, key, -1),
  }),
  primitive({
    name: 'sort_objects',
    category: 'selection',
    parameters: ['Objects', 'Object -> Int'],
    result: 'Objects',
    bits: 6,
    doc: 'The objects ordered by a key, smallest first; equal keys keep their order.',
    example: { input: [[2, 2, 0, 1, 0]], expression: 'object_picture(first_object(sort_objects(objects_by_colour(grid), object_size(_))))', output: [[1]] },
    run: sortObjects,
  }),
  primitive({
    name: 'odd_one_out',
    category: 'selection',
    parameters: ['Objects'],
    result: 'Object',
    bits: 6,
    doc: 'The one object whose shape and colours occur only once while every other pattern repeats; fails otherwise.',
    example: { input: [[1, 0, 1, 0, 2]], expression: 'object_picture(odd_one_out(objects_by_colour(grid)))', output: [[2]] },
    run: oddOneOut,
  }),
  primitive({
    name: 'unique_colour_object',
    category: 'selection',
    parameters: ['Objects'],
    result: 'Object',
    bits: 6,
    doc: 'The one object whose main colour no other object has; fails when there is not exactly one.',
    example: { input: [[3, 0, 4, 4], [0, 0, 0, 0], [3, 3, 0, 3]], expression: 'object_picture(unique_colour_object(objects_by_colour(grid)))', output: [[4, 4]] },
    run: uniqueColourObject,
  }),
  primitive({
    name: 'has_colour',
    category: 'selection',
    parameters: ['Object', 'Colour'],
    result: 'Bool',
    bits: 5,
    doc: 'Whether any cell of the object has the colour.',
    example: { input: [[1, 2, 0], [0, 0, 0]], expression: 'has_colour(first_object(objects_multicolour(grid)), #2)', output: true },
    run: hasColour,
  }),
  primitive({
    name: 'is_bigger_than',
    category: 'selection',
    parameters: ['Object', 'Int'],
    result: 'Bool',
    bits: 6,
    doc: 'Whether the object has more cells than the number.',
    example: { input: [[1, 1, 0], [0, 0, 0]], expression: 'is_bigger_than(first_object(objects_by_colour(grid)), 2)', output: false },
    run: (o, n) => o.size > n,
  }),
  primitive({
    name: 'has_size',
    category: 'selection',
    parameters: ['Object', 'Int'],
    result: 'Bool',
    bits: 6,
    doc: 'Whether the object has exactly that many cells.',
    example: { input: [[1, 1, 0], [0, 0, 0]], expression: 'has_size(first_object(objects_by_colour(grid)), 2)', output: true },
    run: (o, n) => o.size === n,
  }),
  primitive({
    name: 'touches_edge',
    category: 'selection',
    parameters: ['Object', 'Grid'],
    result: 'Bool',
    bits: 6,
    doc: 'Whether a cell of the object lies on the outer border of the grid.',
    example: { input: [[0, 0, 0], [0, 5, 0], [0, 0, 0]], expression: 'touches_edge(first_object(objects_by_colour(grid)), grid)', output: false },
    run: touchesEdge,
  }),
  primitive({
    name: 'is_solid_rectangle',
    category: 'selection',
    parameters: ['Object'],
    result: 'Bool',
    bits: 6,
    doc: 'Whether the object fills its whole bounding box.',
    example: { input: [[4, 4, 0], [4, 0, 0], [0, 0, 0]], expression: 'is_solid_rectangle(first_object(objects_by_colour(grid)))', output: false },
    run: isSolidRectangle,
  }),
  primitive({
    name: 'is_symmetric_object',
    category: 'selection',
    parameters: ['Object'],
    result: 'Bool',
    bits: 7,
    doc: 'Whether the object, in its bounding box, is the same as its left-right mirror image.',
    example: { input: [[6, 6, 6], [0, 6, 0], [0, 0, 0]], expression: 'is_symmetric_object(first_object(objects_by_colour(grid)))', output: true },
    run: isMirrorSymmetric,
  }),
  primitive({
    name: 'is_single_colour',
    category: 'selection',
    parameters: ['Object'],
    result: 'Bool',
    bits: 7,
    doc: 'Whether every cell of the object has the same colour.',
    example: { input: [[1, 2, 0], [0, 0, 0]], expression: 'is_single_colour(first_object(objects_multicolour(grid)))', output: false },
    run: (o) => colourCount(o) === 1,
  }),
  primitive({
    name: 'is_line',
    category: 'selection',
    parameters: ['Object'],
    result: 'Bool',
    bits: 7,
    doc: 'Whether the object is a straight line one cell thick: a single row or a single column.',
    example: { input: [[0, 0, 0], [3, 3, 3], [0, 0, 0]], expression: 'is_line(first_object(objects_by_colour(grid)))', output: true },
    run: (o) => (o.height === 1 || o.width === 1) && o.size === o.height * o.width,
  }),
  primitive({
    name: 'has_same_shape',
    category: 'selection',
    parameters: ['Object', 'Object'],
    result: 'Bool',
    bits: 7,
    doc: 'Whether the two objects cover the same pattern of cells, whatever their colours and positions.',
    example: {
      input: [[1, 0, 2], [1, 0, 2], [0, 0, 0]],
      expression: 'has_same_shape(first_object(objects_by_colour(grid)), last_object(objects_by_colour(grid)))',
      output: true,
    },
    run: sameShape,
  }),
  primitive({
    name: 'object_size',
    category: 'selection',
    parameters: ['Object'],
    result: 'Int',
    bits: 5,
    doc: 'How many cells the object has.',
    example: { input: [[0, 7, 7], [0, 7, 0]], expression: 'object_size(first_object(objects_by_colour(grid)))', output: 3 },
    run: (o) => o.size,
  }),
  primitive({
    name: 'object_height',
    category: 'selection',
    parameters: ['Object'],
    result: 'Int',
    bits: 6,
    doc: 'How many rows the object spans.',
    example: { input: [[0, 7, 7], [0, 7, 0]], expression: 'object_height(first_object(objects_by_colour(grid)))', output: 2 },
    run: (o) => o.height,
  }),
  primitive({
    name: 'object_width',
    category: 'selection',
    parameters: ['Object'],
    result: 'Int',
    bits: 6,
    doc: 'How many columns the object spans.',
    example: { input: [[7, 7, 7], [0, 7, 0], [0, 0, 0]], expression: 'object_width(first_object(objects_by_colour(grid)))', output: 3 },
    run: (o) => o.width,
  }),
  primitive({
    name: 'colour_count',
    category: 'selection',
    parameters: ['Object'],
    result: 'Int',
    bits: 6,
    doc: 'How many different colours the object has.',
    example: { input: [[1, 2, 1], [0, 0, 0]], expression: 'colour_count(first_object(objects_multicolour(grid)))', output: 2 },
    run: colourCount,
  }),
  primitive({
    name: 'object_top',
    category: 'selection',
    parameters: ['Object'],
    result: 'Int',
    bits: 6,
    doc: 'The row of the object\'s top edge, counting from 0.',
    example: { input: [[0, 0], [0, 3], [0, 0]], expression: 'object_top(first_object(objects_by_colour(grid)))', output: 1 },
    run: (o) => o.top,
  }),
  primitive({
    name: 'object_left',
    category: 'selection',
    parameters: ['Object'],
    result: 'Int',
    bits: 6,
    doc: 'The column of the object\'s left edge, counting from 0.',
    example: { input: [[0, 0, 3], [0, 0, 0]], expression: 'object_left(first_object(objects_by_colour(grid)))', output: 2 },
    run: (o) => o.left,
  }),
  primitive({
    name: 'object_colour',
    category: 'selection',
    parameters: ['Object'],
    result: 'Colour',
    bits: 5,
    doc: 'The object\'s main colour: its most frequent, the lowest on ties.',
    example: { input: [[2, 5, 5], [0, 0, 0], [0, 0, 0]], expression: 'object_colour(first_object(objects_multicolour(grid)))', output: 5 },
    run: (o) => o.mainColour,
  }),
  primitive({
    name: 'hole_count',
    category: 'selection',
    parameters: ['Object'],
    result: 'Int',
    bits: 7,
    doc: 'How many separate gaps the object closes in: regions inside its bounding box, not part of it, that cannot reach the box edge.',
    example: { input: [[3, 3, 3, 0], [3, 0, 3, 0], [3, 3, 3, 0], [0, 0, 0, 0]], expression: 'hole_count(first_object(objects_by_colour(grid)))', output: 1 },
    run: (o) => countEnclosedRegions(o.shape, EMPTY),
  }),
  primitive({
    name: 'has_hole',
    category: 'selection',
    parameters: ['Object'],
    result: 'Bool',
    bits: 6,
    doc: 'Whether the object closes in at least one gap (see hole_count): a ring, a frame, a loop.',
    example: { input: [[3, 3, 3, 0], [3, 0, 3, 0], [3, 3, 3, 0], [0, 0, 0, 0]], expression: 'has_hole(first_object(objects_by_colour(grid)))', output: true },
    run: (o) => countEnclosedRegions(o.shape, EMPTY) > 0,
  }),
  primitive({
    name: 'count_colour_in_object',
    category: 'selection',
    parameters: ['Object', 'Colour'],
    result: 'Int',
    bits: 6,
    doc: 'How many cells of the object have the colour (a key: for example the shape with the most spots of colour 2).',
    example: { input: [[1, 2, 1], [2, 1, 0]], expression: 'count_colour_in_object(first_object(objects_multicolour(grid)), #2)', output: 2 },
    run: (o, colour) => {
      const cells = o.shape.cells;
      let n = 0;
      for (let i = 0; i < cells.length; i++) if (cells[i] === colour) n++;
      return n;
    },
  }),
  primitive({
    name: 'first_object_where',
    category: 'selection',
    parameters: ['Objects', 'Object -> Bool'],
    result: 'Object',
    bits: 5,
    doc: 'The first object for which the test holds; fails when none passes.',
    example: {
      input: [[2, 0, 3, 3], [0, 0, 3, 0]],
      expression: 'object_picture(first_object_where(objects_by_colour(grid), is_bigger_than(_, 1)))',
      output: [[3, 3], [3, 0]],
    },
    run: (objects, test) => {
      for (const o of objects) {
        const verdict = test(o);
        if (verdict === FAILURE) return FAILURE;
        if (verdict) return o;
      }
      return FAILURE;
    },
  }),
  primitive({
    name: 'most_common_object',
    category: 'selection',
    parameters: ['Objects'],
    result: 'Object',
    bits: 6,
    doc: 'The object whose shape and colours occur most often (the first on ties); fails when no pattern repeats.',
    example: {
      input: [[5, 0, 4, 4, 0, 5], [0, 0, 0, 0, 0, 0], [4, 0, 0, 0, 0, 0]],
      expression: 'object_picture(most_common_object(objects_by_colour(grid)))',
      output: [[5]],
    },
    run: mostCommonObject,
  }),
  primitive({
    name: 'touches_colour',
    category: 'selection',
    parameters: ['Object', 'Grid', 'Colour'],
    result: 'Bool',
    bits: 6,
    doc: 'Whether a cell of the grid of the colour, outside the object, touches one of its cells by an edge or a corner.',
    example: { input: [[1, 1, 0], [0, 0, 5]], expression: 'touches_colour(first_object(objects_by_colour(grid)), grid, #5)', output: true },
    run: touchesColour,
  }),
];
