/**
 * Symmetry primitives: quarter turns, reflections, transposes, mirrored extensions,
 * symmetry tests and completion of a symmetric picture with holes in it.
 */
import { backgroundColour } from '../src/grid/components.ts';
import { Grid, shapeAllowed } from '../src/grid/grid.ts';
import { FAILURE, type Failure } from '../src/language/failure.ts';
import { primitive } from '../src/library/primitive.ts';

export function rotateClockwise(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = new Uint8Array(height * width);
  // Result is width × height; result (r, c) = source (height - 1 - c, r).
  let i = 0;
  for (let r = 0; r < width; r++) for (let c = 0; c < height; c++) out[i++] = cells[(height - 1 - c) * width + r]!;
  return new Grid(width, height, out);
}

export function rotateCounterclockwise(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = new Uint8Array(height * width);
  // Result (r, c) = source (c, width - 1 - r).
  let i = 0;
  for (let r = 0; r < width; r++) for (let c = 0; c < height; c++) out[i++] = cells[c * width + (width - 1 - r)]!;
  return new Grid(width, height, out);
}

export function rotateHalf(g: Grid): Grid {
  const out = g.cells.slice();
  out.reverse();
  return new Grid(g.height, g.width, out);
}

export function flipUpDown(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = new Uint8Array(height * width);
  for (let r = 0; r < height; r++) out.set(cells.subarray((height - 1 - r) * width, (height - r) * width), r * width);
  return new Grid(height, width, out);
}

export function flipLeftRight(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = new Uint8Array(height * width);
  for (let r = 0; r < height; r++) {
    const base = r * width;
    for (let c = 0; c < width; c++) out[base + c] = cells[base + width - 1 - c]!;
  }
  return new Grid(height, width, out);
}

export function transposeGrid(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = new Uint8Array(height * width);
  let i = 0;
  for (let r = 0; r < width; r++) for (let c = 0; c < height; c++) out[i++] = cells[c * width + r]!;
  return new Grid(width, height, out);
}

/** Mirror along the anti-diagonal (top-right to bottom-left). */
export function transposeAntidiagonal(g: Grid): Grid {
  const { height, width, cells } = g;
  const out = new Uint8Array(height * width);
  // Result (r, c) = source (height - 1 - c, width - 1 - r).
  let i = 0;
  for (let r = 0; r < width; r++) for (let c = 0; c < height; c++) out[i++] = cells[(height - 1 - c) * width + (width - 1 - r)]!;
  return new Grid(width, height, out);
}

/**
 * The grid extended by its mirror images: to the right when `columnsTwice`, below when
 * `rowsTwice` (both: the 2×2 kaleidoscope).
 */
function placeQuadrants(g: Grid, rowsTwice: boolean, columnsTwice: boolean): Grid {
  const { height, width, cells } = g;
  const outHeight = rowsTwice ? height * 2 : height;
  const outWidth = columnsTwice ? width * 2 : width;
  const out = new Uint8Array(outHeight * outWidth);
  for (let r = 0; r < outHeight; r++) {
    const sr = r < height ? r : 2 * height - 1 - r;
    for (let c = 0; c < outWidth; c++) {
      const sc = c < width ? c : 2 * width - 1 - c;
      out[r * outWidth + c] = cells[sr * width + sc]!;
    }
  }
  return new Grid(outHeight, outWidth, out);
}

/**
 * A square grid and its quarter turns in a 2×2 layout, turning clockwise around the centre:
 * the grid top-left, its clockwise quarter turn top-right, its half turn bottom-right and its
 * counterclockwise quarter turn bottom-left. The result looks the same after a quarter turn.
 */
export function fourRotationsSquare(g: Grid): Grid | Failure {
  const n = g.height;
  if (g.width !== n || !shapeAllowed(2 * n, 2 * n)) return FAILURE;
  const quadrants = [g, rotateClockwise(g), rotateCounterclockwise(g), rotateHalf(g)];
  const size = 2 * n;
  const out = new Uint8Array(size * size);
  for (let q = 0; q < 4; q++) {
    const cells = quadrants[q]!.cells;
    const top = q >= 2 ? n : 0;
    const left = q % 2 === 1 ? n : 0;
    for (let r = 0; r < n; r++) out.set(cells.subarray(r * n, (r + 1) * n), (top + r) * size + left);
  }
  return new Grid(size, size, out);
}

export function isSymmetricLeftRight(g: Grid): boolean {
  const { height, width, cells } = g;
  for (let r = 0; r < height; r++) {
    const base = r * width;
    for (let c = 0, d = width - 1; c < d; c++, d--) if (cells[base + c] !== cells[base + d]) return false;
  }
  return true;
}

export function isSymmetricTopBottom(g: Grid): boolean {
  const { height, width, cells } = g;
  for (let r = 0, s = height - 1; r < s; r++, s--) {
    for (let c = 0; c < width; c++) if (cells[r * width + c] !== cells[s * width + c]) return false;
  }
  return true;
}

/** Overlays the grid with its mirror image; a background cell takes its mirror cell's colour. */
function symmetrise(g: Grid, leftRight: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const i = r * width + c;
      if (out[i] !== background) continue;
      out[i] = leftRight ? cells[r * width + (width - 1 - c)]! : cells[(height - 1 - r) * width + c]!;
    }
  }
  return new Grid(height, width, out);
}

/**
 * The index maps of the grid-centred symmetries that fit the shape: left-right, top-bottom,
 * half turn, and for square grids the two diagonal mirrors.
 */
function symmetryMaps(height: number, width: number): Int32Array[] {
  const n = height * width;
  const maps: Int32Array[] = [];
  const leftRight = new Int32Array(n);
  const topBottom = new Int32Array(n);
  const half = new Int32Array(n);
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const i = r * width + c;
      leftRight[i] = r * width + (width - 1 - c);
      topBottom[i] = (height - 1 - r) * width + c;
      half[i] = n - 1 - i;
    }
  }
  maps.push(leftRight, topBottom, half);
  if (height === width) {
    const diagonal = new Int32Array(n);
    const anti = new Int32Array(n);
    for (let r = 0; r < height; r++) {
      for (let c = 0; c < width; c++) {
        diagonal[r * width + c] = c * width + r;
        anti[r * width + c] = (width - 1 - c) * width + (height - 1 - r);
      }
    }
    maps.push(diagonal, anti);
  }
  return maps;
}

/**
 * Fills the cells of colour `hole` from their mirror images under every grid-centred
 * symmetry that agrees with all the known cells. FAILURE when no symmetry agrees.
 */
export function completeSymmetry(g: Grid, hole: number): Grid | Failure {
  const { height, width, cells } = g;
  let holes = 0;
  for (let i = 0; i < cells.length; i++) if (cells[i] === hole) holes++;
  if (holes === 0) return g;
  const agreeing: Int32Array[] = [];
  for (const map of symmetryMaps(height, width)) {
    let ok = true;
    let compared = 0;
    for (let i = 0; i < cells.length && ok; i++) {
      const a = cells[i]!;
      const b = cells[map[i]!]!;
      if (a === hole || b === hole) continue;
      compared++;
      if (a !== b) ok = false;
    }
    if (ok && compared > 0) agreeing.push(map);
  }
  if (agreeing.length === 0) return FAILURE;
  const out = cells.slice();
  // Each pass copies known cells into holes; a few passes cover compositions of the maps.
  for (let pass = 0; pass < 4 && holes > 0; pass++) {
    let changed = false;
    for (let i = 0; i < out.length; i++) {
      if (out[i] !== hole) continue;
      for (const map of agreeing) {
        const v = out[map[i]!]!;
        if (v !== hole) {
          out[i] = v;
          holes--;
          changed = true;
          break;
        }
      }
    }
    if (!changed) break;
  }
  return new Grid(height, width, out);
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
    name: 'rotate_counterclockwise',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'Turns the grid a quarter turn counterclockwise.',
    example: { input: [[1, 2, 3], [4, 5, 6]], expression: 'rotate_counterclockwise(grid)', output: [[3, 6], [2, 5], [1, 4]] },
    run: rotateCounterclockwise,
  }),
  primitive({
    name: 'rotate_half',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'Turns the grid half a turn (upside down and back to front).',
    example: { input: [[1, 2, 3], [4, 5, 6]], expression: 'rotate_half(grid)', output: [[6, 5, 4], [3, 2, 1]] },
    run: rotateHalf,
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
  primitive({
    name: 'reflect_antidiagonal',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Mirrors the grid along the diagonal from the top-right corner to the bottom-left corner.',
    example: { input: [[1, 2, 3], [4, 5, 6]], expression: 'reflect_antidiagonal(grid)', output: [[6, 3], [5, 2], [4, 1]] },
    run: transposeAntidiagonal,
  }),
  primitive({
    name: 'complete_symmetry',
    category: 'symmetry',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Treats cells of the colour as holes and fills them from their mirror images under every grid-centred symmetry (left-right, top-bottom, half turn, diagonals) that agrees with the rest.',
    example: {
      input: [[1, 2, 2, 1], [3, 4, 4, 3], [3, 4, 0, 0], [1, 2, 2, 1]],
      expression: 'complete_symmetry(grid, #0)',
      output: [[1, 2, 2, 1], [3, 4, 4, 3], [3, 4, 4, 3], [1, 2, 2, 1]],
    },
    run: completeSymmetry,
  }),
  primitive({
    name: 'mirror_right',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'The grid followed on its right by its left-right mirror image (twice as wide).',
    example: { input: [[1, 2], [3, 0]], expression: 'mirror_right(grid)', output: [[1, 2, 2, 1], [3, 0, 0, 3]] },
    run: (g) => (shapeAllowed(g.height, g.width * 2) ? placeQuadrants(g, false, true) : FAILURE),
  }),
  primitive({
    name: 'mirror_down',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'The grid followed below by its top-bottom mirror image (twice as tall).',
    example: { input: [[1, 2], [3, 0]], expression: 'mirror_down(grid)', output: [[1, 2], [3, 0], [3, 0], [1, 2]] },
    run: (g) => (shapeAllowed(g.height * 2, g.width) ? placeQuadrants(g, true, false) : FAILURE),
  }),
  primitive({
    name: 'mirror_four_ways',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'A kaleidoscope: the grid top-left, its mirror images top-right and bottom-left, its half turn bottom-right.',
    example: {
      input: [[1, 2], [3, 0]],
      expression: 'mirror_four_ways(grid)',
      output: [[1, 2, 2, 1], [3, 0, 0, 3], [3, 0, 0, 3], [1, 2, 2, 1]],
    },
    run: (g) => (shapeAllowed(g.height * 2, g.width * 2) ? placeQuadrants(g, true, true) : FAILURE),
  }),
  primitive({
    name: 'four_rotations_square',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'A square grid with its quarter turns around it: the grid top-left, clockwise turn top-right, half turn bottom-right, counterclockwise turn bottom-left.',
    example: {
      input: [[1, 2], [3, 0]],
      expression: 'four_rotations_square(grid)',
      output: [[1, 2, 3, 1], [3, 0, 0, 2], [2, 0, 0, 3], [1, 3, 2, 1]],
    },
    run: fourRotationsSquare,
  }),
  primitive({
    name: 'is_symmetric_left_right',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Bool',
    bits: 6,
    doc: 'Whether the grid equals its left-right mirror image.',
    example: { input: [[1, 2, 1], [3, 3, 3]], expression: 'is_symmetric_left_right(grid)', output: true },
    run: isSymmetricLeftRight,
  }),
  primitive({
    name: 'is_symmetric_top_bottom',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Bool',
    bits: 6,
    doc: 'Whether the grid equals its top-bottom mirror image.',
    example: { input: [[1, 2, 1], [3, 3, 3]], expression: 'is_symmetric_top_bottom(grid)', output: false },
    run: isSymmetricTopBottom,
  }),
  primitive({
    name: 'symmetrise_left_right',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Overlays the grid with its left-right mirror image: each background cell takes the colour of its mirror cell.',
    example: { input: [[1, 0, 0], [0, 2, 0], [0, 0, 0]], expression: 'symmetrise_left_right(grid)', output: [[1, 0, 1], [0, 2, 0], [0, 0, 0]] },
    run: (g) => symmetrise(g, true),
  }),
  primitive({
    name: 'symmetrise_top_bottom',
    category: 'symmetry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Overlays the grid with its top-bottom mirror image: each background cell takes the colour of its mirror cell.',
    example: { input: [[1, 0, 2], [0, 0, 0], [0, 0, 0]], expression: 'symmetrise_top_bottom(grid)', output: [[1, 0, 2], [0, 0, 0], [1, 0, 2]] },
    run: (g) => symmetrise(g, false),
  }),
];
