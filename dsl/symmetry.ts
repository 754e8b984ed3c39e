/** Symmetry primitives: quarter turns, reflections, transpose. */
import { Grid } from '../src/grid/grid.ts';
import { primitive } from '../src/library/primitive.ts';

/** Builds a new grid of the given shape whose cell (r, c) is `source` at `pick(r, c)`. */
function remap(source: Grid, height: number, width: number, pick: (r: number, c: number) => number): Grid {
  const cells = new Uint8Array(height * width);
  for (let r = 0; r < height; r++) for (let c = 0; c < width; c++) cells[r * width + c] = source.cells[pick(r, c)]!;
  return new Grid(height, width, cells);
}

export function rotateClockwise(g: Grid): Grid {
  return remap(g, g.width, g.height, (r, c) => (g.height - 1 - c) * g.width + r);
}
export function flipUpDown(g: Grid): Grid {
  return remap(g, g.height, g.width, (r, c) => (g.height - 1 - r) * g.width + c);
}
export function flipLeftRight(g: Grid): Grid {
  return remap(g, g.height, g.width, (r, c) => r * g.width + (g.width - 1 - c));
}
export function transposeGrid(g: Grid): Grid {
  return remap(g, g.width, g.height, (r, c) => c * g.width + r);
}

export const symmetryPrimitives = [
  primitive({
    name: 'rotate_clockwise',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'Turns the grid a quarter turn clockwise.',
    example: { input: [[1, 2], [3, 4]], expression: 'rotate_clockwise(grid)', output: [[3, 1], [4, 2]] },
    run: rotateClockwise,
  }),
  primitive({
    name: 'reflect_vertically',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'Mirrors the grid top to bottom (the first row becomes the last).',
    example: { input: [[1, 2], [3, 4]], expression: 'reflect_vertically(grid)', output: [[3, 4], [1, 2]] },
    run: flipUpDown,
  }),
  primitive({
    name: 'reflect_horizontally',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'Mirrors the grid left to right (the first column becomes the last).',
    example: { input: [[1, 2], [3, 4]], expression: 'reflect_horizontally(grid)', output: [[2, 1], [4, 3]] },
    run: flipLeftRight,
  }),
  primitive({
    name: 'transpose',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'Swaps rows and columns (mirror along the main diagonal).',
    example: { input: [[1, 2], [3, 4]], expression: 'transpose(grid)', output: [[1, 3], [2, 4]] },
    run: transposeGrid,
  }),
];
