/** Counting and comparison primitives. */
import { primitive, type Primitive } from '../src/library/primitive.ts';

export const countingPrimitives: Primitive[] = [
  primitive({
    name: 'count_objects',
    category: 'counting',
    parameters: ['Objects'],
    result: 'Int',
    bits: 5,
    doc: 'How many objects there are.',
    example: { input: [[1, 0, 1]], expression: 'count_objects(objects_by_colour(grid))', output: 2 },
    run: (objects) => objects.length,
  }),
];
