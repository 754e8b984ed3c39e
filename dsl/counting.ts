/** Counting and comparison: counts of objects, colours and cells; small arithmetic; choice. */
import { backgroundColour, colourCounts } from '../src/grid/components.ts';
import { Grid, shapeAllowed } from '../src/grid/grid.ts';
import { FAILURE } from '../src/language/failure.ts';
import { primitive } from '../src/library/primitive.ts';

/** Arithmetic results beyond this size fail: no puzzle quantity comes near it. */
const INT_LIMIT = 10_000;

function bounded(n: number): number | typeof FAILURE {
  return Number.isInteger(n) && n >= -INT_LIMIT && n <= INT_LIMIT ? n : FAILURE;
}

export const countingPrimitives = [
  primitive({
    name: 'count_objects',
    category: 'counting',
    parameters: ['Objects'],
    result: 'Int',
    bits: 5,
    doc: 'How many objects there are.',
    example: { input: [[1, 0, 1], [0, 0, 0]], expression: 'count_objects(objects_by_colour(grid))', output: 2 },
    run: (objects) => objects.length,
  }),
  primitive({
    name: 'count_colour',
    category: 'counting',
    parameters: ['Grid', 'Colour'],
    result: 'Int',
    bits: 5,
    doc: 'How many cells have the colour.',
    example: { input: [[3, 0, 3], [0, 3, 1]], expression: 'count_colour(grid, #3)', output: 3 },
    run: (g, colour) => colourCounts(g)[colour]!,
  }),
  primitive({
    name: 'count_colours',
    category: 'counting',
    parameters: ['Grid'],
    result: 'Int',
    bits: 5,
    doc: 'How many different non-background colours the grid has.',
    example: { input: [[0, 2, 0], [5, 2, 0]], expression: 'count_colours(grid)', output: 2 },
    run: (g) => {
      const counts = colourCounts(g);
      const background = backgroundColour(g);
      let n = 0;
      for (let c = 0; c < 10; c++) if (c !== background && counts[c]! > 0) n++;
      return n;
    },
  }),
  primitive({
    name: 'count_cells',
    category: 'counting',
    parameters: ['Grid'],
    result: 'Int',
    bits: 5,
    doc: 'How many cells are not the background colour.',
    example: { input: [[0, 2, 0], [5, 2, 0]], expression: 'count_cells(grid)', output: 3 },
    run: (g) => g.cells.length - colourCounts(g)[backgroundColour(g)]!,
  }),
  primitive({
    name: 'add',
    category: 'counting',
    parameters: ['Int', 'Int'],
    result: 'Int',
    bits: 6,
    doc: 'The sum of two numbers.',
    example: { input: [[1, 0, 1], [0, 0, 0]], expression: 'add(count_objects(objects_by_colour(grid)), 3)', output: 5 },
    run: (a, b) => bounded(a + b),
  }),
  primitive({
    name: 'subtract',
    category: 'counting',
    parameters: ['Int', 'Int'],
    result: 'Int',
    bits: 6,
    doc: 'The first number minus the second.',
    example: { input: [[1, 0, 1], [0, 0, 0]], expression: 'subtract(5, count_objects(objects_by_colour(grid)))', output: 3 },
    run: (a, b) => bounded(a - b),
  }),
  primitive({
    name: 'multiply',
    category: 'counting',
    parameters: ['Int', 'Int'],
    result: 'Int',
    bits: 7,
    doc: 'The product of two numbers.',
    example: { input: [[1, 0, 1], [0, 0, 0]], expression: 'multiply(count_objects(objects_by_colour(grid)), 3)', output: 6 },
    run: (a, b) => bounded(a * b),
  }),
  primitive({
    name: 'is_greater',
    category: 'counting',
    parameters: ['Int', 'Int'],
    result: 'Bool',
    bits: 6,
    doc: 'Whether the first number is greater than the second.',
    example: { input: [[1, 0, 1], [0, 0, 0]], expression: 'is_greater(count_objects(objects_by_colour(grid)), 2)', output: false },
    run: (a, b) => a > b,
  }),
  primitive({
    name: 'is_equal',
    category: 'counting',
    parameters: ['Int', 'Int'],
    result: 'Bool',
    bits: 6,
    doc: 'Whether the two numbers are the same.',
    example: { input: [[1, 0, 1], [0, 0, 0]], expression: 'is_equal(count_objects(objects_by_colour(grid)), 2)', output: true },
    run: (a, b) => a === b,
  }),
  primitive({
    name: 'choose',
    category: 'counting',
    parameters: ['Bool', 'Grid', 'Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'The first grid when the condition holds, else the second.',
    example: { input: [[1, 0], [0, 0]], expression: 'choose(is_greater(count_colour(grid, #1), 1), grid, top_half(grid))', output: [[1, 0]] },
    run: (condition, yes, no) => (condition ? yes : no),
  }),
  primitive({
    name: 'grid_of_size',
    category: 'counting',
    parameters: ['Int', 'Int', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'A new grid of the given height and width filled with the colour; fails beyond the size cap.',
    example: { input: [[1, 0, 1], [0, 0, 0]], expression: 'grid_of_size(1, count_objects(objects_by_colour(grid)), #4)', output: [[4, 4]] },
    run: (height, width, colour) => (Number.isInteger(height) && Number.isInteger(width) && shapeAllowed(height, width) ? Grid.filled(height, width, colour) : FAILURE),
  }),
];
