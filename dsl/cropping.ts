/** Cropping: cutting out the content, an object's box, a given region, or a half of the grid. */
import { backgroundColour } from '../src/grid/components.ts';
import { cellBounds, cropGrid } from '../src/grid/crop.ts';
import { EMPTY, Grid, shapeAllowed } from '../src/grid/grid.ts';
import type { GridObject } from '../src/language/grid-object.ts';
import { FAILURE, type Failure } from '../src/language/failure.ts';
import { primitive } from '../src/library/primitive.ts';

/** The bounding box of the cells that are (match) or are not (!match) of the colour. */
function cropToCells(g: Grid, colour: number, match: boolean): Grid | Failure {
  const b = cellBounds(g, colour, match);
  return b ? cropGrid(g, b.top, b.left, b.bottom - b.top + 1, b.right - b.left + 1) : FAILURE;
}

/** The part of the grid under the object's bounding box (clipped to the grid). */
export function cropToObject(g: Grid, o: GridObject): Grid | Failure {
  const top = Math.max(0, o.top);
  const left = Math.max(0, o.left);
  const bottom = Math.min(g.height, o.top + o.height);
  const right = Math.min(g.width, o.left + o.width);
  if (bottom <= top || right <= left) return FAILURE;
  return cropGrid(g, top, left, bottom - top, right - left);
}

/** The object's own cells on a background of colour 0. */
export function objectPicture(o: GridObject): Grid {
  const source = o.shape.cells;
  const cells = new Uint8Array(source.length);
  for (let i = 0; i < source.length; i++) cells[i] = source[i] === EMPTY ? 0 : source[i]!;
  return new Grid(o.height, o.width, cells);
}

/**
 * Only the middle column (or row) of an odd width (height) keeps its cells; every other cell
 * becomes background. The grid keeps its size.
 */
function keepMiddleLine(g: Grid, column: boolean): Grid | Failure {
  const { height, width, cells } = g;
  const length = column ? width : height;
  if (length % 2 === 0) return FAILURE;
  const middle = (length - 1) / 2;
  const out = new Uint8Array(cells.length).fill(backgroundColour(g));
  if (column) for (let r = 0; r < height; r++) out[r * width + middle] = cells[r * width + middle]!;
  else out.set(cells.subarray(middle * width, (middle + 1) * width), middle * width);
  return new Grid(height, width, out);
}

export const croppingPrimitives = [
  primitive({
    name: 'crop_to_content',
    category: 'cropping',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 4,
    doc: 'The smallest rectangle holding every non-background cell; fails when there is none.',
    example: { input: [[0, 0, 0, 0], [0, 2, 0, 0], [0, 0, 3, 0]], expression: 'crop_to_content(grid)', output: [[2, 0], [0, 3]] },
    run: (g) => cropToCells(g, backgroundColour(g), false),
  }),
  primitive({
    name: 'crop_to_object',
    category: 'cropping',
    parameters: ['Grid', 'Object'],
    result: 'Grid',
    bits: 4,
    doc: 'The grid\'s cells under the object\'s bounding box, other colours included; fails when the box misses the grid.',
    example: {
      input: [[0, 0, 0, 0], [0, 4, 4, 0], [0, 1, 4, 0], [0, 0, 0, 0]],
      expression: 'crop_to_object(grid, largest_object(objects_by_colour(grid)))',
      output: [[4, 4], [1, 4]],
    },
    run: cropToObject,
  }),
  primitive({
    name: 'object_picture',
    category: 'cropping',
    parameters: ['Object'],
    result: 'Grid',
    bits: 4,
    doc: 'The object on its own, the size of its bounding box, colour 0 where it has no cell.',
    example: { input: [[0, 0, 0], [0, 5, 5], [0, 0, 5]], expression: 'object_picture(first_object(objects_by_colour(grid)))', output: [[5, 5], [0, 5]] },
    run: objectPicture,
  }),
  primitive({
    name: 'crop_region',
    category: 'cropping',
    parameters: ['Grid', 'Point', 'Point'],
    result: 'Grid',
    bits: 7,
    doc: 'The rectangle with the first point as its top-left corner and the second as (height, width); fails unless it lies inside the grid.',
    example: { input: [[1, 2, 3], [4, 5, 6], [7, 8, 9]], expression: 'crop_region(grid, (1, 0), (2, 2))', output: [[4, 5], [7, 8]] },
    run: (g, corner, size) => {
      const { row, column } = corner;
      const h = size.row;
      const w = size.column;
      if (!shapeAllowed(h, w) || row < 0 || column < 0 || row + h > g.height || column + w > g.width) return FAILURE;
      return cropGrid(g, row, column, h, w);
    },
  }),
  primitive({
    name: 'crop_to_colour',
    category: 'cropping',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'The smallest rectangle holding every cell of the colour, with everything inside it; fails when the colour is absent.',
    example: { input: [[0, 0, 0, 0], [0, 8, 1, 8], [0, 0, 0, 0]], expression: 'crop_to_colour(grid, #8)', output: [[8, 1, 8]] },
    run: (g, colour) => cropToCells(g, colour, true),
  }),
  primitive({
    name: 'remove_border',
    category: 'cropping',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'The grid without its outermost ring of cells; fails when fewer than 3 rows or columns.',
    example: { input: [[5, 5, 5, 5], [5, 1, 2, 5], [5, 5, 5, 5]], expression: 'remove_border(grid)', output: [[1, 2]] },
    run: (g) => (g.height < 3 || g.width < 3 ? FAILURE : cropGrid(g, 1, 1, g.height - 2, g.width - 2)),
  }),
  primitive({
    name: 'top_half',
    category: 'cropping',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'The top half of the rows (an odd middle row is left out); fails on a single row.',
    example: { input: [[1, 1], [5, 5], [2, 2]], expression: 'top_half(grid)', output: [[1, 1]] },
    run: (g) => (g.height < 2 ? FAILURE : cropGrid(g, 0, 0, g.height >> 1, g.width)),
  }),
  primitive({
    name: 'bottom_half',
    category: 'cropping',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'The bottom half of the rows (an odd middle row is left out); fails on a single row.',
    example: { input: [[1, 1], [5, 5], [2, 2]], expression: 'bottom_half(grid)', output: [[2, 2]] },
    run: (g) => {
      const h = g.height >> 1;
      return h < 1 ? FAILURE : cropGrid(g, g.height - h, 0, h, g.width);
    },
  }),
  primitive({
    name: 'left_half',
    category: 'cropping',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'The left half of the columns (an odd middle column is left out); fails on a single column.',
    example: { input: [[1, 2, 3, 4]], expression: 'left_half(grid)', output: [[1, 2]] },
    run: (g) => (g.width < 2 ? FAILURE : cropGrid(g, 0, 0, g.height, g.width >> 1)),
  }),
  primitive({
    name: 'right_half',
    category: 'cropping',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'The right half of the columns (an odd middle column is left out); fails on a single column.',
    example: { input: [[1, 2, 5, 3, 4]], expression: 'right_half(grid)', output: [[3, 4]] },
    run: (g) => {
      const w = g.width >> 1;
      return w < 1 ? FAILURE : cropGrid(g, 0, g.width - w, g.height, w);
    },
  }),
  primitive({
    name: 'keep_middle_column',
    category: 'cropping',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'Keeps the middle column of an odd-width grid where it is and turns every other cell to background; fails on an even width.',
    example: { input: [[6, 4, 0], [0, 3, 9], [1, 0, 0]], expression: 'keep_middle_column(grid)', output: [[0, 4, 0], [0, 3, 0], [0, 0, 0]] },
    run: (g) => keepMiddleLine(g, true),
  }),
  primitive({
    name: 'keep_middle_row',
    category: 'cropping',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'Keeps the middle row of an odd-height grid where it is and turns every other cell to background; fails on an even height.',
    example: { input: [[6, 4, 0], [0, 3, 9], [1, 0, 0]], expression: 'keep_middle_row(grid)', output: [[0, 0, 0], [0, 3, 9], [0, 0, 0]] },
    run: (g) => keepMiddleLine(g, false),
  }),
  primitive({
    name: 'crop_to_colour_in',
    category: 'cropping',
    parameters: ['Grid', 'Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: "The first grid's cells under the smallest rectangle holding every cell of the colour in the second grid (same sizes); fails when the colour is absent.",
    example: {
      input: [[1, 0, 3], [4, 0, 6]],
      expression: 'crop_to_colour_in(recolour(grid, #0, #5), grid, #0)',
      output: [[5], [5]],
    },
    run: (g, marks, colour) => {
      if (g.height !== marks.height || g.width !== marks.width) return FAILURE;
      const b = cellBounds(marks, colour, true);
      return b ? cropGrid(g, b.top, b.left, b.bottom - b.top + 1, b.right - b.left + 1) : FAILURE;
    },
  }),
];
