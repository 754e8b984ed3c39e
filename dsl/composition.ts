/**
 * Composition primitives: painting and erasing objects, moving and mirroring objects,
 * layering grids over each other, and cell-wise masks of two grids.
 */
import { MASK_RULES, mask } from '../src/grid/mask.ts';
import { reflectObjectLeftRight, reflectObjectUpDown, shiftObject } from '../src/grid/object-transforms.ts';
import { overlay, overlayAll } from '../src/grid/overlay.ts';
import { eraseObjects, keepOnlyObject, mapObjects, paintObjects } from '../src/grid/paint-object.ts';
import { stampObjectOnColour } from '../src/grid/stamp-object.ts';
import { primitive } from '../src/library/primitive.ts';

const MASKS = [
  ['mask_both', MASK_RULES.both, 'both grids are filled', [[3, 0, 0, 0]]],
  ['mask_either', MASK_RULES.either, 'at least one grid is filled', [[3, 3, 3, 0]]],
  ['mask_exactly_one', MASK_RULES.exactlyOne, 'exactly one grid is filled', [[0, 3, 3, 0]]],
  ['mask_neither', MASK_RULES.neither, 'neither grid is filled', [[0, 0, 0, 3]]],
] as const;

export const compositionPrimitives = [
  primitive({
    name: 'paint_object',
    category: 'composition',
    parameters: ['Grid', 'Object'],
    result: 'Grid',
    bits: 5,
    doc: "Draws the object's cells onto the grid at the object's position; cells falling outside are dropped.",
    example: {
      input: [[0, 0, 0], [0, 4, 4]],
      expression: 'paint_object(blank_like(grid, #1), first_object(objects_by_colour(grid)))',
      output: [[1, 1, 1], [1, 4, 4]],
    },
    run: (g, o) => paintObjects(g, [o]),
  }),
  primitive({
    name: 'paint_objects',
    category: 'composition',
    parameters: ['Grid', 'Objects'],
    result: 'Grid',
    bits: 5,
    doc: 'Draws every object onto the grid in order; later objects cover earlier ones.',
    example: {
      input: [[2, 0, 3]],
      expression: 'paint_objects(blank_like(grid, #5), objects_by_colour(grid))',
      output: [[2, 5, 3]],
    },
    run: paintObjects,
  }),
  primitive({
    name: 'erase_object',
    category: 'composition',
    parameters: ['Grid', 'Object'],
    result: 'Grid',
    bits: 5,
    doc: "Turns the cells under the object to the grid's background colour.",
    example: {
      input: [[1, 0, 2, 2, 0, 0]],
      expression: 'erase_object(grid, largest_object(objects_by_colour(grid)))',
      output: [[1, 0, 0, 0, 0, 0]],
    },
    run: (g, o) => eraseObjects(g, [o]),
  }),
  primitive({
    name: 'erase_objects',
    category: 'composition',
    parameters: ['Grid', 'Objects'],
    result: 'Grid',
    bits: 5,
    doc: "Turns the cells under every object to the grid's background colour.",
    example: {
      input: [[1, 0, 2, 2], [0, 0, 0, 3]],
      expression: 'erase_objects(grid, drop_objects(objects_by_colour(grid), has_colour(_, #2)))',
      output: [[0, 0, 2, 2], [0, 0, 0, 0]],
    },
    run: eraseObjects,
  }),
  primitive({
    name: 'keep_only_object',
    category: 'composition',
    parameters: ['Grid', 'Object'],
    result: 'Grid',
    bits: 6,
    doc: 'Keeps the object where it is and turns every other cell to background.',
    example: {
      input: [[1, 0, 2, 2], [0, 0, 0, 0], [3, 0, 0, 0]],
      expression: 'keep_only_object(grid, largest_object(objects_by_colour(grid)))',
      output: [[0, 0, 2, 2], [0, 0, 0, 0], [0, 0, 0, 0]],
    },
    run: keepOnlyObject,
  }),
  primitive({
    name: 'overlay',
    category: 'composition',
    parameters: ['Grid', 'Grid', 'Colour'],
    result: 'Grid',
    bits: 5,
    doc: "Lays the second grid over the first (same size); the second grid's cells of the colour are see-through.",
    example: {
      input: [[1, 0], [0, 0]],
      expression: 'overlay(grid, rotate_half(grid), #0)',
      output: [[1, 0], [0, 1]],
    },
    run: overlay,
    laysOver: true,
  }),
  primitive({
    name: 'overlay_all',
    category: 'composition',
    parameters: ['Grids'],
    result: 'Grid',
    bits: 6,
    doc: "Stacks same-sized grids in order; each later grid's non-background cells cover what is below.",
    example: {
      input: [[1, 0, 5, 0, 0, 5, 0, 2]],
      expression: 'overlay_all(split_across(grid, 3))',
      output: [[1, 2]],
    },
    run: overlayAll,
  }),
  ...MASKS.map(([name, rule, when, output]) =>
    primitive({
      name,
      category: 'composition',
      parameters: ['Grid', 'Grid', 'Colour'],
      result: 'Grid',
      bits: 6,
      doc: `Compares two same-sized grids cell by cell (0 is empty): the colour where ${when}, 0 elsewhere.`,
      example: {
        input: [[1, 1, 0, 0, 9, 2, 0, 2, 0]],
        expression: `${name}(part(split_across(grid, 2), 0), part(split_across(grid, 2), 1), #3)`,
        output,
      },
      run: (a, b, colour) => mask(a, b, colour, rule),
    }),
  ),
  primitive({
    name: 'map_objects',
    category: 'composition',
    parameters: ['Grid', 'Objects', 'Object -> Object'],
    result: 'Grid',
    bits: 5,
    doc: 'Erases every object from the grid, then paints each one as the transform changes it.',
    example: {
      input: [[1, 0, 0], [0, 0, 2]],
      expression: 'map_objects(grid, objects_by_colour(grid), move_object(_, (1, 0)))',
      output: [[0, 0, 0], [1, 0, 0]],
    },
    run: mapObjects,
  }),
  primitive({
    name: 'move_object',
    category: 'composition',
    parameters: ['Object', 'Point'],
    result: 'Object',
    bits: 5,
    doc: 'The object shifted by (rows, columns).',
    example: {
      input: [[3, 0, 0], [0, 0, 0]],
      expression: 'map_objects(grid, objects_by_colour(grid), move_object(_, (1, 2)))',
      output: [[0, 0, 0], [0, 0, 3]],
    },
    run: (o, offset) => shiftObject(o, offset.row, offset.column),
  }),
  primitive({
    name: 'reflect_object_horizontally',
    category: 'composition',
    parameters: ['Object'],
    result: 'Object',
    bits: 6,
    doc: 'The object mirrored left to right in place (within its own bounding box).',
    example: {
      input: [[0, 0, 0, 0], [0, 1, 2, 0], [0, 1, 0, 0]],
      expression: 'map_objects(grid, objects_multicolour(grid), reflect_object_horizontally(_))',
      output: [[0, 0, 0, 0], [0, 2, 1, 0], [0, 0, 1, 0]],
    },
    run: reflectObjectLeftRight,
  }),
  primitive({
    name: 'reflect_object_vertically',
    category: 'composition',
    parameters: ['Object'],
    result: 'Object',
    bits: 6,
    doc: 'The object mirrored top to bottom in place (within its own bounding box).',
    example: {
      input: [[0, 0, 0, 0], [0, 1, 2, 0], [0, 1, 0, 0]],
      expression: 'map_objects(grid, objects_multicolour(grid), reflect_object_vertically(_))',
      output: [[0, 0, 0, 0], [0, 1, 0, 0], [0, 1, 2, 0]],
    },
    run: reflectObjectUpDown,
  }),
  primitive({
    name: 'overlay_all_first_on_top',
    category: 'composition',
    parameters: ['Grids'],
    result: 'Grid',
    bits: 6,
    doc: "Stacks same-sized grids with the first on top: each earlier grid's non-background cells cover the later ones.",
    example: {
      input: [[1, 0, 5, 2, 2, 5, 0, 3]],
      expression: 'overlay_all_first_on_top(split_across(grid, 3))',
      output: [[1, 2]],
    },
    run: (grids) => overlayAll([...grids].reverse()),
  }),
  primitive({
    name: 'stamp_object_on_colour',
    category: 'composition',
    parameters: ['Grid', 'Object', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Every patch of the colour (cells joined through edges or corners) is cleared and the object is drawn centred on it (rounding toward the top left).',
    example: {
      input: [[1, 2, 0, 0, 0], [0, 0, 0, 0, 0], [0, 0, 0, 5, 0], [0, 0, 0, 0, 0]],
      expression: 'stamp_object_on_colour(grid, largest_object(objects_multicolour(grid)), #5)',
      output: [[1, 2, 0, 0, 0], [0, 0, 0, 0, 0], [0, 0, 1, 2, 0], [0, 0, 0, 0, 0]],
    },
    run: stampObjectOnColour,
  }),
];
