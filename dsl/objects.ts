/** Object extraction: connected regions, by one colour or many, with 4 or 8 neighbours. */
import { backgroundColour, components } from '../src/grid/components.ts';
import { cellsOfColour } from '../src/grid/colour-cells.ts';
import { Grid } from '../src/grid/grid.ts';
import { enclosedCells } from '../src/grid/holes.ts';
import type { GridObject } from '../src/language/grid-object.ts';
import { FAILURE } from '../src/language/failure.ts';
import { primitive } from '../src/library/primitive.ts';

/** Marks cells that are in no region; never a colour and never EMPTY. */
const OUTSIDE = 10;

/** One object per non-background colour present, holding all its cells, in colour order. */
export function colourGroups(grid: Grid): GridObject[] {
  const background = backgroundColour(grid);
  const groups: GridObject[] = [];
  for (let colour = 0; colour < 10; colour++) {
    if (colour === background) continue;
    const group = cellsOfColour(grid, colour);
    if (group) groups.push(group);
  }
  return groups;
}

/** Regions of background cells (edge neighbours) that cannot reach the border, reading order. */
export function enclosedRegions(grid: Grid): readonly GridObject[] {
  const background = backgroundColour(grid);
  const enclosed = enclosedCells(grid, background);
  const cells = new Uint8Array(enclosed.length);
  let any = false;
  for (let i = 0; i < enclosed.length; i++) {
    if (enclosed[i]) {
      cells[i] = background;
      any = true;
    } else cells[i] = OUTSIDE;
  }
  if (!any) return [];
  return components(new Grid(grid.height, grid.width, cells), { diagonal: false, multicolour: false, background: OUTSIDE });
}

export const objectPrimitives = [
  primitive({
    name: 'objects_by_colour',
    category: 'objects',
    parameters: ['Grid'],
    result: 'Objects',
    bits: 4,
    doc: 'Regions of one colour joined through edges, leaving out the background colour.',
    example: { input: [[1, 1, 0], [0, 0, 2], [0, 2, 2]], expression: 'count_objects(objects_by_colour(grid))', output: 2 },
    run: (g) => components(g, { diagonal: false, multicolour: false, background: backgroundColour(g) }),
  }),
  primitive({
    name: 'objects_by_colour_diagonal',
    category: 'objects',
    parameters: ['Grid'],
    result: 'Objects',
    bits: 5,
    doc: 'Regions of one colour joined through edges or corners, leaving out the background colour.',
    example: { input: [[1, 0, 0], [0, 1, 0], [0, 0, 2]], expression: 'count_objects(objects_by_colour_diagonal(grid))', output: 2 },
    run: (g) => components(g, { diagonal: true, multicolour: false, background: backgroundColour(g) }),
  }),
  primitive({
    name: 'objects_multicolour',
    category: 'objects',
    parameters: ['Grid'],
    result: 'Objects',
    bits: 5,
    doc: 'Regions of any non-background colours joined through edges (one object may hold several colours).',
    example: { input: [[1, 2, 0], [0, 0, 0], [0, 0, 3]], expression: 'count_objects(objects_multicolour(grid))', output: 2 },
    run: (g) => components(g, { diagonal: false, multicolour: true, background: backgroundColour(g) }),
  }),
  primitive({
    name: 'objects_multicolour_diagonal',
    category: 'objects',
    parameters: ['Grid'],
    result: 'Objects',
    bits: 6,
    doc: 'Regions of any non-background colours joined through edges or corners.',
    example: { input: [[1, 0, 0], [0, 2, 0], [0, 0, 0], [3, 0, 0]], expression: 'count_objects(objects_multicolour_diagonal(grid))', output: 2 },
    run: (g) => components(g, { diagonal: true, multicolour: true, background: backgroundColour(g) }),
  }),
  primitive({
    name: 'colour_groups',
    category: 'objects',
    parameters: ['Grid'],
    result: 'Objects',
    bits: 6,
    doc: 'One object per non-background colour present, holding every cell of that colour, in colour order.',
    example: { input: [[3, 0, 3], [0, 1, 0], [0, 0, 0]], expression: 'count_objects(colour_groups(grid))', output: 2 },
    run: colourGroups,
  }),
  primitive({
    name: 'objects_apart_from',
    category: 'objects',
    parameters: ['Grid', 'Colour'],
    result: 'Objects',
    bits: 6,
    doc: 'Regions of cells not of the given colour, joined through edges, any colours together: the areas between separator lines.',
    example: { input: [[0, 5, 0, 5, 1], [0, 5, 0, 5, 0]], expression: 'count_objects(objects_apart_from(grid, #5))', output: 3 },
    run: (g, separator) => components(g, { diagonal: false, multicolour: true, background: separator }),
  }),
  primitive({
    name: 'cells_of_colour',
    category: 'objects',
    parameters: ['Grid', 'Colour'],
    result: 'Object',
    bits: 6,
    doc: 'Every cell of the colour, wherever it lies, as one object; fails when the colour is absent.',
    example: { input: [[2, 0, 0], [0, 0, 0], [0, 0, 2]], expression: 'count_objects(objects_by_colour(object_picture(cells_of_colour(grid, #2))))', output: 2 },
    run: (g, colour) => cellsOfColour(g, colour) ?? FAILURE,
  }),
  primitive({
    name: 'enclosed_regions',
    category: 'objects',
    parameters: ['Grid'],
    result: 'Objects',
    bits: 6,
    doc: 'Regions of background cells (joined through edges) that cannot reach the border: the holes inside shapes.',
    example: { input: [[1, 1, 1, 0], [1, 0, 1, 0], [1, 1, 1, 0], [0, 0, 0, 0]], expression: 'count_objects(enclosed_regions(grid))', output: 1 },
    run: enclosedRegions,
  }),
  primitive({
    name: 'background',
    category: 'objects',
    parameters: ['Grid'],
    result: 'Colour',
    bits: 4,
    doc: 'The background colour: 0 when the grid holds any cell of colour 0, otherwise the most frequent colour (the lowest on ties).',
    example: { input: [[2, 2, 1], [2, 0, 2]], expression: 'background(grid)', output: 0 },
    run: (g) => backgroundColour(g),
  }),
];
