/**
 * Object rules: change, in place, the objects of a grid that pass a test. "Recolour the shapes
 * that ..." and "remove the shapes that ..." are among the commonest puzzle rules; as single
 * primitives they cost a program a few bits instead of an extraction, a filter and a repaint.
 * Objects here are one-colour regions joined through edges (as objects_by_colour).
 */
import { paintObjectsWhere } from '../src/grid/object-rules.ts';
import { primitive } from '../src/library/primitive.ts';

export const objectRulePrimitives = [
  primitive({
    name: 'recolour_objects_where',
    category: 'object rules',
    parameters: ['Grid', 'Object -> Bool', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Recolours every one-colour object (edge neighbours) that passes the test; the rest stays.',
    example: {
      input: [[1, 0, 1, 1], [0, 0, 0, 0], [2, 0, 0, 0]],
      expression: 'recolour_objects_where(grid, has_size(_, 1), #5)',
      output: [[5, 0, 1, 1], [0, 0, 0, 0], [5, 0, 0, 0]],
    },
    run: (g, test, colour) => paintObjectsWhere(g, test, true, colour),
  }),
  primitive({
    name: 'erase_objects_where',
    category: 'object rules',
    parameters: ['Grid', 'Object -> Bool'],
    result: 'Grid',
    bits: 6,
    doc: 'Turns to background every one-colour object (edge neighbours) that passes the test.',
    example: {
      input: [[1, 0, 1, 1], [0, 0, 0, 0], [2, 0, 0, 0]],
      expression: 'erase_objects_where(grid, has_size(_, 1))',
      output: [[0, 0, 1, 1], [0, 0, 0, 0], [0, 0, 0, 0]],
    },
    run: (g, test) => paintObjectsWhere(g, test, true, null),
  }),
  primitive({
    name: 'keep_objects_where',
    category: 'object rules',
    parameters: ['Grid', 'Object -> Bool'],
    result: 'Grid',
    bits: 6,
    doc: 'Keeps only the one-colour objects (edge neighbours) that pass the test; the rest becomes background.',
    example: {
      input: [[1, 0, 1, 1], [0, 0, 0, 0], [2, 0, 0, 0]],
      expression: 'keep_objects_where(grid, has_size(_, 1))',
      output: [[1, 0, 0, 0], [0, 0, 0, 0], [2, 0, 0, 0]],
    },
    run: (g, test) => paintObjectsWhere(g, test, false, null),
  }),
];
