/** Recolouring: fixed changes, colour maps, swaps, keeping or removing a colour, colour ranks. */
import { backgroundColour, colourCounts, components } from '../src/grid/components.ts';
import { EMPTY, Grid, shapeAllowed } from '../src/grid/grid.ts';
import { GridObject } from '../src/language/grid-object.ts';
import { FAILURE, type Failure } from '../src/language/failure.ts';
import { primitive } from '../src/library/primitive.ts';
import { majorityLines, restoreStripes } from '../src/grid/stripes.ts';
import { colourBands } from '../src/grid/colour-bands.ts';

/** The grid with every colour c replaced by `target[c]`; the same grid when nothing changes. */
export function mapColours(g: Grid, target: Uint8Array): Grid {
  const source = g.cells;
  let changed = false;
  for (let c = 0; c < 10; c++) {
    if (target[c] !== c && hasCell(source, c)) {
      changed = true;
      break;
    }
  }
  if (!changed) return g;
  const cells = new Uint8Array(source.length);
  for (let i = 0; i < source.length; i++) cells[i] = target[source[i]!]!;
  return new Grid(g.height, g.width, cells);
}

function hasCell(cells: Uint8Array, colour: number): boolean {
  return cells.indexOf(colour) >= 0;
}

function identityMap(): Uint8Array {
  const target = new Uint8Array(256);
  for (let c = 0; c < 256; c++) target[c] = c;
  return target;
}

function recolour(g: Grid, from: number, to: number): Grid {
  const source = g.cells;
  const first = from === to ? -1 : source.indexOf(from);
  if (first < 0) return g;
  const cells = source.slice();
  for (let i = first; i < cells.length; i++) if (cells[i] === from) cells[i] = to;
  return new Grid(g.height, g.width, cells);
}

/** Cells of the colour keep it; every other cell becomes the background. */
function keepColour(g: Grid, colour: number): Grid {
  const background = backgroundColour(g);
  const target = new Uint8Array(256).fill(background);
  target[colour] = colour;
  return mapColours(g, target);
}

/** The present colour with the most (sign 1) or fewest (sign -1) cells, lowest on ties. */
function rankColour(g: Grid, sign: 1 | -1, skipBackground: boolean): number | Failure {
  const counts = colourCounts(g);
  const skip = skipBackground ? backgroundColour(g) : -1;
  let best = -1;
  for (let c = 0; c < 10; c++) {
    if (c === skip || counts[c] === 0) continue;
    if (best < 0 || (counts[c]! - counts[best]!) * sign > 0) best = c;
  }
  return best < 0 ? FAILURE : best;
}

export function recolourObject(o: GridObject, colour: number): GridObject {
  const source = o.shape.cells;
  const cells = new Uint8Array(source.length);
  for (let i = 0; i < source.length; i++) cells[i] = source[i] === EMPTY ? EMPTY : colour;
  return new GridObject(o.top, o.left, new Grid(o.height, o.width, cells));
}

/** Paints the cells of an object (at its position) in one colour, onto a copy's cells. */
function paintCellsOf(cells: Uint8Array, width: number, o: GridObject, colour: number): void {
  const shape = o.shape.cells;
  const w = o.width;
  for (let r = 0; r < o.height; r++) {
    for (let c = 0; c < w; c++) if (shape[r * w + c] !== EMPTY) cells[(o.top + r) * width + o.left + c] = colour;
  }
}

/** The first largest object gets `large`, the first smallest `small`; needs two objects. */
function recolourBySize(g: Grid, large: number, small: number): Grid | Failure {
  const objects = components(g, { diagonal: false, multicolour: false, background: backgroundColour(g) });
  if (objects.length < 2) return FAILURE;
  let biggest = 0;
  let least = 0;
  for (let i = 1; i < objects.length; i++) {
    if (objects[i]!.size > objects[biggest]!.size) biggest = i;
    if (objects[i]!.size < objects[least]!.size) least = i;
  }
  if (biggest === least) return FAILURE;
  const cells = g.cells.slice();
  paintCellsOf(cells, g.width, objects[biggest]!, large);
  paintCellsOf(cells, g.width, objects[least]!, small);
  return new Grid(g.height, g.width, cells);
}

/**
 * One-colour objects (edge neighbours) recoloured by the rank of their size: every object of
 * the largest size gets colour 1, of the next size down colour 2, and so on; fails with no
 * objects or more than nine different sizes.
 */
function recolourBySizeRank(g: Grid): Grid | Failure {
  const objects = components(g, { diagonal: false, multicolour: false, background: backgroundColour(g) });
  if (objects.length === 0) return FAILURE;
  const sizes = [...new Set(objects.map((o) => o.size))].sort((a, b) => b - a);
  if (sizes.length > 9) return FAILURE;
  const cells = g.cells.slice();
  for (const o of objects) paintCellsOf(cells, g.width, o, sizes.indexOf(o.size) + 1);
  return new Grid(g.height, g.width, cells);
}

/** A one-column grid of the non-background colours, most cells first (lower colour first on ties). */
function coloursByFrequency(g: Grid): Grid | Failure {
  const counts = colourCounts(g);
  const background = backgroundColour(g);
  const colours: number[] = [];
  for (let c = 0; c < 10; c++) if (c !== background && counts[c]! > 0) colours.push(c);
  if (colours.length === 0) return FAILURE;
  colours.sort((a, b) => counts[b]! - counts[a]! || a - b);
  return new Grid(colours.length, 1, Uint8Array.from(colours));
}

/** Columns of the colours other than 0, most frequent first, each as tall as the colour's count. */
function colourHistogram(g: Grid): Grid | Failure {
  const counts = colourCounts(g);
  const colours: number[] = [];
  for (let c = 1; c < 10; c++) if (counts[c]! > 0) colours.push(c);
  if (colours.length === 0) return FAILURE;
  colours.sort((a, b) => counts[b]! - counts[a]! || a - b);
  const height = counts[colours[0]!]!;
  const width = colours.length;
  if (!shapeAllowed(height, width)) return FAILURE;
  const out = new Uint8Array(height * width);
  for (let j = 0; j < width; j++) for (let r = 0; r < counts[colours[j]!]!; r++) out[r * width + j] = colours[j]!;
  return new Grid(height, width, out);
}

export const colourPrimitives = [
  primitive({
    name: 'recolour',
    category: 'colour',
    parameters: ['Grid', 'Colour', 'Colour'],
    result: 'Grid',
    bits: 4,
    doc: 'Cells of the first colour get the second colour.',
    example: { input: [[1, 2], [2, 1]], expression: 'recolour(grid, #1, #7)', output: [[7, 2], [2, 7]] },
    run: recolour,
  }),
  primitive({
    name: 'recolour_all',
    category: 'colour',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 5,
    doc: 'Every non-background cell gets the colour.',
    example: { input: [[0, 1, 0], [2, 0, 3]], expression: 'recolour_all(grid, #4)', output: [[0, 4, 0], [4, 0, 4]] },
    run: (g, colour) => {
      const target = new Uint8Array(256).fill(colour);
      const background = backgroundColour(g);
      target[background] = background;
      return mapColours(g, target);
    },
  }),
  primitive({
    name: 'apply_palette',
    category: 'colour',
    parameters: ['Grid', 'Palette'],
    result: 'Grid',
    bits: 4,
    doc: 'Replaces every colour by what the palette maps it to, all at once.',
    example: { input: [[1, 2], [3, 1]], expression: 'apply_palette(grid, {#1 -> #2, #2 -> #1})', output: [[2, 1], [3, 2]] },
    run: (g, palette) => {
      const target = identityMap();
      for (let c = 0; c < 10; c++) target[c] = palette.target[c]!;
      return mapColours(g, target);
    },
  }),
  primitive({
    name: 'swap_colours',
    category: 'colour',
    parameters: ['Grid', 'Colour', 'Colour'],
    result: 'Grid',
    bits: 5,
    doc: 'Cells of the first colour get the second and cells of the second get the first.',
    example: { input: [[1, 0, 2]], expression: 'swap_colours(grid, #1, #2)', output: [[2, 0, 1]] },
    run: (g, a, b) => {
      const target = identityMap();
      target[a] = b;
      target[b] = a;
      return mapColours(g, target);
    },
  }),
  primitive({
    name: 'keep_colour',
    category: 'colour',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 5,
    doc: 'Cells of the colour stay; every other cell becomes the background colour.',
    example: { input: [[0, 1, 2], [2, 0, 0]], expression: 'keep_colour(grid, #2)', output: [[0, 0, 2], [2, 0, 0]] },
    run: keepColour,
  }),
  primitive({
    name: 'remove_colour',
    category: 'colour',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 5,
    doc: 'Cells of the colour become the background colour.',
    example: { input: [[0, 1, 2], [2, 0, 0]], expression: 'remove_colour(grid, #2)', output: [[0, 1, 0], [0, 0, 0]] },
    run: (g, colour) => recolour(g, colour, backgroundColour(g)),
  }),
  primitive({
    name: 'most_common_colour',
    category: 'colour',
    parameters: ['Grid'],
    result: 'Colour',
    bits: 5,
    doc: 'The non-background colour with the most cells (the lowest on ties); fails when there is none.',
    example: { input: [[0, 3, 0], [4, 4, 0]], expression: 'most_common_colour(grid)', output: 4 },
    run: (g) => rankColour(g, 1, true),
  }),
  primitive({
    name: 'least_common_colour',
    category: 'colour',
    parameters: ['Grid'],
    result: 'Colour',
    bits: 5,
    doc: 'The colour present with the fewest cells, background included (the lowest on ties).',
    example: { input: [[0, 3, 0], [4, 4, 0]], expression: 'least_common_colour(grid)', output: 3 },
    run: (g) => rankColour(g, -1, false),
  }),
  primitive({
    name: 'majority_colour',
    category: 'colour',
    parameters: ['Grid'],
    result: 'Colour',
    bits: 6,
    doc: 'The colour with the most cells, background included (the lowest on ties).',
    example: { input: [[0, 3, 0], [4, 4, 0]], expression: 'majority_colour(grid)', output: 0 },
    run: (g) => rankColour(g, 1, false),
  }),
  primitive({
    name: 'recolour_object',
    category: 'colour',
    parameters: ['Object', 'Colour'],
    result: 'Object',
    bits: 5,
    doc: 'The same object with every cell in the colour.',
    example: { input: [[1, 2, 0], [0, 0, 0]], expression: 'object_picture(recolour_object(first_object(objects_multicolour(grid)), #6))', output: [[6, 6]] },
    run: recolourObject,
  }),
  primitive({
    name: 'recolour_objects_by_size',
    category: 'colour',
    parameters: ['Grid', 'Colour', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Among the one-colour objects (edge neighbours), the largest gets the first colour and the smallest the second; fails with fewer than two.',
    example: {
      input: [[1, 1, 0, 1], [0, 0, 0, 0], [1, 0, 1, 1]],
      expression: 'recolour_objects_by_size(grid, #2, #3)',
      output: [[2, 2, 0, 3], [0, 0, 0, 0], [1, 0, 1, 1]],
    },
    run: recolourBySize,
  }),
  primitive({
    name: 'recolour_objects_by_size_rank',
    category: 'colour',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'One-colour objects (edge neighbours) take the rank of their size as colour: the largest size 1, the next size down 2, and so on; equal sizes share a colour.',
    example: {
      input: [[5, 0, 5, 0], [5, 0, 5, 0], [5, 0, 0, 5]],
      expression: 'recolour_objects_by_size_rank(grid)',
      output: [[1, 0, 2, 0], [1, 0, 2, 0], [1, 0, 0, 3]],
    },
    run: recolourBySizeRank,
  }),
  primitive({
    name: 'colours_by_frequency',
    category: 'colour',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'A one-column grid of the non-background colours, the colour with the most cells first (the lower colour first on ties).',
    example: { input: [[0, 4, 4], [2, 4, 7], [7, 0, 0]], expression: 'colours_by_frequency(grid)', output: [[4], [7], [2]] },
    run: coloursByFrequency,
  }),
  primitive({
    name: 'replace_background',
    category: 'colour',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 5,
    doc: 'Background cells get the colour.',
    example: { input: [[0, 1], [0, 0]], expression: 'replace_background(grid, #5)', output: [[5, 1], [5, 5]] },
    run: (g, colour) => recolour(g, backgroundColour(g), colour),
  }),
  primitive({
    name: 'most_common_object_colour',
    category: 'colour',
    parameters: ['Objects'],
    result: 'Colour',
    bits: 6,
    doc: 'The main colour shared by the most objects (the lowest on ties); fails on an empty list.',
    example: { input: [[1, 0, 2, 0, 2], [0, 0, 0, 0, 0]], expression: 'most_common_object_colour(objects_by_colour(grid))', output: 2 },
    run: (objects) => {
      if (objects.length === 0) return FAILURE;
      const counts = new Uint32Array(10);
      for (const o of objects) counts[o.mainColour]!++;
      let best = 0;
      for (let c = 1; c < 10; c++) if (counts[c]! > counts[best]!) best = c;
      return best;
    },
  }),
  primitive({
    name: 'colour_of_cell',
    category: 'colour',
    parameters: ['Grid', 'Point'],
    result: 'Colour',
    bits: 7,
    doc: 'The colour of the cell at (row, column); fails outside the grid.',
    example: { input: [[1, 2], [3, 4]], expression: 'colour_of_cell(grid, (1, 0))', output: 3 },
    run: (g, p) => (p.row >= 0 && p.column >= 0 && p.row < g.height && p.column < g.width ? g.cells[p.row * g.width + p.column]! : FAILURE),
  }),
  primitive({
    name: 'colour_histogram',
    category: 'colour',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'A bar chart of the colours other than 0: one column per colour, the most frequent first (lower colour on ties), each filled from the top with as many cells as the colour has, 0 below.',
    example: { input: [[2, 2, 1], [2, 3, 1]], expression: 'colour_histogram(grid)', output: [[2, 1, 3], [2, 1, 0], [2, 0, 0]] },
    run: colourHistogram,
  }),
  primitive({
    name: 'majority_per_row',
    category: 'colour',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Every row becomes its most frequent colour (the lowest on ties).',
    example: { input: [[1, 1, 2], [3, 4, 4]], expression: 'majority_per_row(grid)', output: [[1, 1, 1], [4, 4, 4]] },
    run: (g) => majorityLines(g, true),
  }),
  primitive({
    name: 'majority_per_column',
    category: 'colour',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Every column becomes its most frequent colour (the lowest on ties).',
    example: { input: [[1, 2], [1, 3], [5, 3]], expression: 'majority_per_column(grid)', output: [[1, 3], [1, 3], [1, 3]] },
    run: (g) => majorityLines(g, false),
  }),
  primitive({
    name: 'restore_stripes',
    category: 'colour',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Removes specks from stripes: majority_per_row or majority_per_column, whichever keeps more cells unchanged (rows on ties).',
    example: { input: [[1, 2, 2], [1, 2, 3], [1, 4, 2]], expression: 'restore_stripes(grid)', output: [[1, 2, 2], [1, 2, 2], [1, 2, 2]] },
    run: restoreStripes,
  }),
  primitive({
    name: 'colour_bands',
    category: 'colour',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'The colours other than 0 in the order their bands run: one row by mean column when they spread more across, else one column by mean row.',
    example: { input: [[4, 4, 2, 2, 8], [4, 2, 2, 8, 8]], expression: 'colour_bands(grid)', output: [[4, 2, 8]] },
    run: colourBands,
  }),
];
