/**
 * Geometry primitives: shifting, scaling, tiling, joining and splitting grids, sizes, and
 * gravity (cells or whole objects sliding to a side).
 */
import { backgroundColour } from '../src/grid/components.ts';
import { Grid, getSizeCap, shapeAllowed } from '../src/grid/grid.ts';
import { findSeparatorLines, gaps, splitAtSeparatorLines } from '../src/grid/separator-lines.ts';
import { settleObjects } from '../src/grid/settle-objects.ts';
import { FAILURE, type Failure } from '../src/language/failure.ts';
import type { Point } from '../src/language/point.ts';
import { primitive } from '../src/library/primitive.ts';
import { slideTowardColour } from '../src/grid/slide-toward.ts';
import { continuePatternRight, extendPatternToSize } from '../src/grid/extend-pattern.ts';
import { lineUpWithColour } from '../src/grid/line-up.ts';

/** Largest scale factor or number of copies a primitive accepts. */
const MOST_COPIES = 10;

function isCount(n: number, most: number): boolean {
  return Number.isInteger(n) && n >= 1 && n <= most;
}

export function translate(g: Grid, offset: Point): Grid {
  const { height, width, cells } = g;
  const dr = offset.row;
  const dc = offset.column;
  const out = new Uint8Array(height * width).fill(backgroundColour(g));
  if (Math.abs(dr) >= height || Math.abs(dc) >= width) return new Grid(height, width, out);
  const columnFrom = Math.max(0, -dc);
  const columnTo = Math.min(width, width - dc);
  for (let r = Math.max(0, -dr); r < Math.min(height, height - dr); r++) {
    const source = r * width;
    out.set(cells.subarray(source + columnFrom, source + columnTo), (r + dr) * width + columnFrom + dc);
  }
  return new Grid(height, width, out);
}

export function scaleUp(g: Grid, k: number): Grid | Failure {
  if (!isCount(k, MOST_COPIES) || !shapeAllowed(g.height * k, g.width * k)) return FAILURE;
  const { height, width, cells } = g;
  const outWidth = width * k;
  const out = new Uint8Array(height * k * outWidth);
  for (let r = 0; r < height; r++) {
    const rowStart = r * k * outWidth;
    for (let c = 0; c < width; c++) out.fill(cells[r * width + c]!, rowStart + c * k, rowStart + c * k + k);
    for (let i = 1; i < k; i++) out.copyWithin(rowStart + i * outWidth, rowStart, rowStart + outWidth);
  }
  return new Grid(height * k, outWidth, out);
}

export function scaleDown(g: Grid, k: number): Grid | Failure {
  if (!isCount(k, MOST_COPIES)) return FAILURE;
  const { height, width, cells } = g;
  if (height % k !== 0 || width % k !== 0) return FAILURE;
  const h = height / k;
  const w = width / k;
  const out = new Uint8Array(h * w);
  for (let r = 0; r < h; r++) {
    for (let c = 0; c < w; c++) {
      const v = cells[r * k * width + c * k]!;
      for (let i = 0; i < k; i++) {
        const base = (r * k + i) * width + c * k;
        for (let j = 0; j < k; j++) if (cells[base + j] !== v) return FAILURE;
      }
      out[r * w + c] = v;
    }
  }
  return new Grid(h, w, out);
}

/** Every k×k block becomes its most frequent colour (the lowest on ties). */
export function majorityScaleDown(g: Grid, k: number): Grid | Failure {
  if (!isCount(k, MOST_COPIES)) return FAILURE;
  const { height, width, cells } = g;
  if (height % k !== 0 || width % k !== 0) return FAILURE;
  const h = height / k;
  const w = width / k;
  const out = new Uint8Array(h * w);
  const counts = new Uint32Array(256);
  for (let r = 0; r < h; r++) {
    for (let c = 0; c < w; c++) {
      counts.fill(0);
      for (let i = 0; i < k; i++) {
        const base = (r * k + i) * width + c * k;
        for (let j = 0; j < k; j++) counts[cells[base + j]!]!++;
      }
      let best = 0;
      for (let v = 1; v < 10; v++) if (counts[v]! > counts[best]!) best = v;
      out[r * w + c] = best;
    }
  }
  return new Grid(h, w, out);
}

/**
 * Square parts along the longer side, each as big as the shorter side, side by side or
 * stacked, with or without one-cell separator lines between them.
 */
export function splitIntoSquares(g: Grid): Grid[] | Failure {
  const { height, width } = g;
  if (height === width) return [g];
  const across = width > height;
  const long = across ? width : height;
  const short = across ? height : width;
  let n: number;
  if (long % short === 0) n = long / short;
  else if ((long + 1) % (short + 1) === 0) n = (long + 1) / (short + 1);
  else return FAILURE;
  return across ? splitAcross(g, n) : splitDown(g, n);
}

/** For each part, how many parts (itself included) have the same key. */
function tally(parts: readonly Grid[], key: (g: Grid) => Grid): number[] {
  const keys = parts.map(key);
  return keys.map((k) => keys.reduce((n, other) => n + (k.equals(other) ? 1 : 0), 0));
}

/** The part's filled pattern: 1 where a cell is not the part's background, 0 elsewhere. */
function filledPattern(g: Grid): Grid {
  const background = backgroundColour(g);
  const out = new Uint8Array(g.cells.length);
  for (let i = 0; i < out.length; i++) out[i] = g.cells[i] === background ? 0 : 1;
  return new Grid(g.height, g.width, out);
}

/**
 * The one part unlike the others: first by exact cells, then, when every part differs (say
 * each is drawn in its own colour), by the pattern of filled cells. Needs three parts or more,
 * exactly one unique and every other part with a twin.
 */
export function oddOneOutPart(parts: readonly Grid[]): Grid | Failure {
  if (parts.length < 3) return FAILURE;
  for (const key of [(g: Grid) => g, filledPattern]) {
    const counts = tally(parts, key);
    const unique = counts.filter((n) => n === 1).length;
    if (unique === 1) return parts[counts.indexOf(1)]!;
    if (unique < parts.length) return FAILURE;
  }
  return FAILURE;
}

/** The part that occurs most often (exact cells; the first on ties). */
export function mostCommonPart(parts: readonly Grid[]): Grid | Failure {
  if (parts.length === 0) return FAILURE;
  const counts = tally(parts, (g) => g);
  return parts[counts.indexOf(Math.max(...counts))]!;
}

/** The grid repeated to fill `height` × `width`, starting at the top-left corner. */
export function repeatToSize(g: Grid, height: number, width: number): Grid | Failure {
  const cap = getSizeCap();
  if (!isCount(height, cap) || !isCount(width, cap)) return FAILURE;
  const { cells } = g;
  const out = new Uint8Array(height * width);
  for (let r = 0; r < height; r++) {
    const source = (r % g.height) * g.width;
    for (let c = 0; c < width; c++) out[r * width + c] = cells[source + (c % g.width)]!;
  }
  return new Grid(height, width, out);
}

export function tile(g: Grid, down: number, across: number): Grid | Failure {
  if (!isCount(down, MOST_COPIES) || !isCount(across, MOST_COPIES)) return FAILURE;
  if (!shapeAllowed(g.height * down, g.width * across)) return FAILURE;
  return repeatToSize(g, g.height * down, g.width * across);
}

/** Each non-background cell becomes a copy of the whole grid, each background cell a blank block. */
export function fractalTile(g: Grid): Grid | Failure {
  const { height, width, cells } = g;
  const outHeight = height * height;
  const outWidth = width * width;
  if (!shapeAllowed(outHeight, outWidth)) return FAILURE;
  const background = backgroundColour(g);
  const out = new Uint8Array(outHeight * outWidth).fill(background);
  for (let br = 0; br < height; br++) {
    for (let bc = 0; bc < width; bc++) {
      if (cells[br * width + bc] === background) continue;
      for (let r = 0; r < height; r++) out.set(cells.subarray(r * width, (r + 1) * width), (br * height + r) * outWidth + bc * width);
    }
  }
  return new Grid(outHeight, outWidth, out);
}

export function joinRight(a: Grid, b: Grid): Grid | Failure {
  if (a.height !== b.height || !shapeAllowed(a.height, a.width + b.width)) return FAILURE;
  const width = a.width + b.width;
  const out = new Uint8Array(a.height * width);
  for (let r = 0; r < a.height; r++) {
    out.set(a.cells.subarray(r * a.width, (r + 1) * a.width), r * width);
    out.set(b.cells.subarray(r * b.width, (r + 1) * b.width), r * width + a.width);
  }
  return new Grid(a.height, width, out);
}

export function joinBelow(a: Grid, b: Grid): Grid | Failure {
  if (a.width !== b.width || !shapeAllowed(a.height + b.height, a.width)) return FAILURE;
  const out = new Uint8Array(a.cells.length + b.cells.length);
  out.set(a.cells, 0);
  out.set(b.cells, a.cells.length);
  return new Grid(a.height + b.height, a.width, out);
}

/**
 * Splits a length into n equal parts: either exactly, or with one-cell separator lines
 * between the parts. Returns the part length, and the gap (0 or 1), or undefined.
 */
function partLength(length: number, n: number): [number, number] | undefined {
  if (!Number.isInteger(n) || n < 1 || n > length) return undefined;
  if (length % n === 0) return [length / n, 0];
  const rest = length - (n - 1);
  if (rest >= n && rest % n === 0) return [rest / n, 1];
  return undefined;
}

export function splitAcross(g: Grid, n: number): Grid[] | Failure {
  const sizes = partLength(g.width, n);
  if (!sizes) return FAILURE;
  const [w, gap] = sizes;
  const parts: Grid[] = [];
  for (let p = 0; p < n; p++) {
    const left = p * (w + gap);
    const out = new Uint8Array(g.height * w);
    for (let r = 0; r < g.height; r++) out.set(g.cells.subarray(r * g.width + left, r * g.width + left + w), r * w);
    parts.push(new Grid(g.height, w, out));
  }
  return parts;
}

export function splitDown(g: Grid, n: number): Grid[] | Failure {
  const sizes = partLength(g.height, n);
  if (!sizes) return FAILURE;
  const [h, gap] = sizes;
  const parts: Grid[] = [];
  for (let p = 0; p < n; p++) {
    const top = p * (h + gap);
    parts.push(new Grid(h, g.width, g.cells.slice(top * g.width, (top + h) * g.width)));
  }
  return parts;
}

/** Runs of equal neighbouring rows become one row, then the same for columns. */
export function mergeRepeatedLines(g: Grid): Grid {
  const { height, width, cells } = g;
  const keptRows: number[] = [0];
  for (let r = 1; r < height; r++) {
    let same = true;
    for (let c = 0; c < width && same; c++) if (cells[r * width + c] !== cells[(r - 1) * width + c]) same = false;
    if (!same) keptRows.push(r);
  }
  const keptColumns: number[] = [0];
  for (let c = 1; c < width; c++) {
    let same = true;
    for (let r = 0; r < height && same; r++) if (cells[r * width + c] !== cells[r * width + c - 1]) same = false;
    if (!same) keptColumns.push(c);
  }
  if (keptRows.length === height && keptColumns.length === width) return g;
  const out = new Uint8Array(keptRows.length * keptColumns.length);
  let i = 0;
  for (const r of keptRows) for (const c of keptColumns) out[i++] = cells[r * width + c]!;
  return new Grid(keptRows.length, keptColumns.length, out);
}

/**
 * Gravity on single cells: along every column (or row) the non-background cells slide to
 * the end (towardsEnd) or the start, in their order.
 */
export function fall(g: Grid, alongColumns: boolean, towardsEnd: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = new Uint8Array(height * width).fill(background);
  const lines = alongColumns ? width : height;
  const length = alongColumns ? height : width;
  const step = alongColumns ? width : 1;
  for (let line = 0; line < lines; line++) {
    const start = alongColumns ? line : line * width;
    if (towardsEnd) {
      let write = length - 1;
      for (let i = length - 1; i >= 0; i--) {
        const v = cells[start + i * step]!;
        if (v !== background) out[start + write-- * step] = v;
      }
    } else {
      let write = 0;
      for (let i = 0; i < length; i++) {
        const v = cells[start + i * step]!;
        if (v !== background) out[start + write++ * step] = v;
      }
    }
  }
  return new Grid(height, width, out);
}

/** The majority colour of each pane between separator lines, as a grid of panes. */
function paneColours(g: Grid): Grid | Failure {
  const lines = findSeparatorLines(g);
  if (!lines) return FAILURE;
  const rowRuns = gaps(lines.rows);
  const columnRuns = gaps(lines.columns);
  const out = new Uint8Array(rowRuns.length * columnRuns.length);
  const counts = new Uint32Array(10);
  const { width, cells } = g;
  let k = 0;
  for (const [top, bottom] of rowRuns) {
    for (const [left, right] of columnRuns) {
      counts.fill(0);
      for (let r = top; r < bottom; r++) for (let c = left; c < right; c++) counts[cells[r * width + c]!]!++;
      let best = 0;
      for (let c = 1; c < 10; c++) if (counts[c]! > counts[best]!) best = c;
      out[k++] = best;
    }
  }
  return new Grid(rowRuns.length, columnRuns.length, out);
}

export const geometryPrimitives = [
  primitive({
    name: 'translate',
    category: 'geometry',
    parameters: ['Grid', 'Point'],
    result: 'Grid',
    bits: 6,
    doc: 'Shifts the picture by (rows, columns); cells shifted out are lost and vacated cells become background.',
    example: { input: [[1, 2, 0], [3, 0, 0], [0, 0, 0]], expression: 'translate(grid, (1, 1))', output: [[0, 0, 0], [0, 1, 2], [0, 3, 0]] },
    run: translate,
  }),
  primitive({
    name: 'scale_up',
    category: 'geometry',
    parameters: ['Grid', 'Int'],
    result: 'Grid',
    bits: 5,
    doc: 'Enlarges the grid: every cell becomes a k×k block (k from 1 to 10).',
    example: { input: [[1, 0], [0, 2]], expression: 'scale_up(grid, 2)', output: [[1, 1, 0, 0], [1, 1, 0, 0], [0, 0, 2, 2], [0, 0, 2, 2]] },
    run: scaleUp,
  }),
  primitive({
    name: 'scale_down',
    category: 'geometry',
    parameters: ['Grid', 'Int'],
    result: 'Grid',
    bits: 5,
    doc: 'Shrinks the grid: every k×k block, which must be of one colour, becomes one cell.',
    example: { input: [[3, 3, 0, 0], [3, 3, 0, 0]], expression: 'scale_down(grid, 2)', output: [[3, 0]] },
    run: scaleDown,
  }),
  primitive({
    name: 'majority_scale_down',
    category: 'geometry',
    parameters: ['Grid', 'Int'],
    result: 'Grid',
    bits: 6,
    doc: 'Shrinks the grid: every k×k block becomes one cell of its most frequent colour (the lowest on ties), so stray specks vanish.',
    example: { input: [[3, 3, 0, 0], [3, 5, 0, 4]], expression: 'majority_scale_down(grid, 2)', output: [[3, 0]] },
    run: majorityScaleDown,
  }),
  primitive({
    name: 'tile',
    category: 'geometry',
    parameters: ['Grid', 'Int', 'Int'],
    result: 'Grid',
    bits: 5,
    doc: 'Repeats the grid: copies down, then copies across (each 1 to 10).',
    example: { input: [[1, 2]], expression: 'tile(grid, 2, 2)', output: [[1, 2, 1, 2], [1, 2, 1, 2]] },
    run: tile,
  }),
  primitive({
    name: 'repeat_to_size',
    category: 'geometry',
    parameters: ['Grid', 'Int', 'Int'],
    result: 'Grid',
    bits: 7,
    doc: 'Repeats the pattern from the top-left corner until it fills a grid of the given height and width.',
    example: { input: [[1, 2], [3, 4]], expression: 'repeat_to_size(grid, 3, 3)', output: [[1, 2, 1], [3, 4, 3], [1, 2, 1]] },
    run: repeatToSize,
  }),
  primitive({
    name: 'fractal_tile',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Each non-background cell becomes a copy of the whole grid and each background cell a blank block of the same size.',
    example: {
      input: [[1, 0], [0, 1]],
      expression: 'fractal_tile(grid)',
      output: [[1, 0, 0, 0], [0, 1, 0, 0], [0, 0, 1, 0], [0, 0, 0, 1]],
    },
    run: fractalTile,
  }),
  primitive({
    name: 'join_right',
    category: 'geometry',
    parameters: ['Grid', 'Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'Places the second grid to the right of the first (their heights must match).',
    example: { input: [[1], [2]], expression: 'join_right(grid, reflect_vertically(grid))', output: [[1, 2], [2, 1]] },
    run: joinRight,
  }),
  primitive({
    name: 'join_below',
    category: 'geometry',
    parameters: ['Grid', 'Grid'],
    result: 'Grid',
    bits: 5,
    doc: 'Places the second grid below the first (their widths must match).',
    example: { input: [[1, 2]], expression: 'join_below(grid, reflect_horizontally(grid))', output: [[1, 2], [2, 1]] },
    run: joinBelow,
  }),
  primitive({
    name: 'split_across',
    category: 'geometry',
    parameters: ['Grid', 'Int'],
    result: 'Grids',
    bits: 5,
    doc: 'Cuts the grid into n equally wide parts side by side, left to right; one-column separators between the parts are dropped.',
    example: { input: [[1, 2, 5, 3, 4]], expression: 'part(split_across(grid, 2), 1)', output: [[3, 4]] },
    run: splitAcross,
  }),
  primitive({
    name: 'split_down',
    category: 'geometry',
    parameters: ['Grid', 'Int'],
    result: 'Grids',
    bits: 5,
    doc: 'Cuts the grid into n equally tall parts stacked top to bottom; one-row separators between the parts are dropped.',
    example: { input: [[1], [2], [3], [4]], expression: 'part(split_down(grid, 2), 1)', output: [[3], [4]] },
    run: splitDown,
  }),
  primitive({
    name: 'split_at_lines',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grids',
    bits: 5,
    doc: 'The panes between full rows and columns of one colour (a non-background colour preferred), in reading order.',
    example: {
      input: [[1, 5, 0, 0], [5, 5, 5, 5], [0, 5, 2, 2], [0, 5, 2, 2]],
      expression: 'part(split_at_lines(grid), 3)',
      output: [[2, 2], [2, 2]],
    },
    run: (g) => splitAtSeparatorLines(g) ?? FAILURE,
  }),
  primitive({
    name: 'part',
    category: 'geometry',
    parameters: ['Grids', 'Int'],
    result: 'Grid',
    bits: 4,
    doc: 'The part at the position (counting from 0).',
    example: { input: [[1, 2]], expression: 'part(split_across(grid, 2), 0)', output: [[1]] },
    run: (parts, index) => (Number.isInteger(index) && index >= 0 && index < parts.length ? parts[index]! : FAILURE),
  }),
  primitive({
    name: 'split_into_squares',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grids',
    bits: 6,
    doc: 'Cuts a long grid into squares as big as its short side, in order (one-cell separators allowed); a square grid is its own one part.',
    example: { input: [[1, 0, 2, 2], [1, 1, 2, 0]], expression: 'part(split_into_squares(grid), 1)', output: [[2, 2], [2, 0]] },
    run: splitIntoSquares,
  }),
  primitive({
    name: 'odd_one_out_part',
    category: 'geometry',
    parameters: ['Grids'],
    result: 'Grid',
    bits: 6,
    doc: 'The one part unlike the others (by cells, else by the pattern of filled cells); fails unless exactly one is unique and the rest have twins.',
    example: { input: [[1, 0, 2, 0, 3, 3]], expression: 'odd_one_out_part(split_across(grid, 3))', output: [[3, 3]] },
    run: oddOneOutPart,
  }),
  primitive({
    name: 'most_common_part',
    category: 'geometry',
    parameters: ['Grids'],
    result: 'Grid',
    bits: 6,
    doc: 'The part that occurs most often, cell for cell (the first on ties); fails on no parts.',
    example: { input: [[1, 2, 1, 1]], expression: 'most_common_part(split_across(grid, 4))', output: [[1]] },
    run: mostCommonPart,
  }),
  primitive({
    name: 'height_of',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Int',
    bits: 5,
    doc: 'The number of rows.',
    example: { input: [[1, 2, 3], [4, 5, 6]], expression: 'height_of(grid)', output: 2 },
    run: (g) => g.height,
  }),
  primitive({
    name: 'width_of',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Int',
    bits: 5,
    doc: 'The number of columns.',
    example: { input: [[1, 2, 3], [4, 5, 6]], expression: 'width_of(grid)', output: 3 },
    run: (g) => g.width,
  }),
  primitive({
    name: 'blank_like',
    category: 'geometry',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 5,
    doc: 'A grid of the same size filled with the colour.',
    example: { input: [[1, 2, 3]], expression: 'blank_like(grid, #4)', output: [[4, 4, 4]] },
    run: (g, colour) => Grid.filled(g.height, g.width, colour),
  }),
  primitive({
    name: 'merge_repeated_lines',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Each run of identical neighbouring rows becomes one row, then each run of identical neighbouring columns one column.',
    example: {
      input: [[1, 1, 2], [1, 1, 2], [3, 3, 3]],
      expression: 'merge_repeated_lines(grid)',
      output: [[1, 2], [3, 3]],
    },
    run: mergeRepeatedLines,
  }),
  primitive({
    name: 'fall_down',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'In every column the non-background cells drop to the bottom, keeping their order.',
    example: { input: [[1, 0], [0, 2], [3, 0]], expression: 'fall_down(grid)', output: [[0, 0], [1, 0], [3, 2]] },
    run: (g) => fall(g, true, true),
  }),
  primitive({
    name: 'fall_up',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'In every column the non-background cells rise to the top, keeping their order.',
    example: { input: [[1, 0], [0, 2], [3, 0]], expression: 'fall_up(grid)', output: [[1, 2], [3, 0], [0, 0]] },
    run: (g) => fall(g, true, false),
  }),
  primitive({
    name: 'fall_left',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'In every row the non-background cells slide to the left edge, keeping their order.',
    example: { input: [[0, 1, 0, 2], [3, 0, 0, 0]], expression: 'fall_left(grid)', output: [[1, 2, 0, 0], [3, 0, 0, 0]] },
    run: (g) => fall(g, false, false),
  }),
  primitive({
    name: 'fall_right',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'In every row the non-background cells slide to the right edge, keeping their order.',
    example: { input: [[0, 1, 0, 2], [3, 0, 0, 0]], expression: 'fall_right(grid)', output: [[0, 0, 1, 2], [0, 0, 0, 3]] },
    run: (g) => fall(g, false, true),
  }),
  primitive({
    name: 'settle_objects_down',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'Whole objects (touching non-background cells) drop without changing shape until they rest on the bottom or on another object; lowest first.',
    example: {
      input: [[1, 1, 0], [0, 0, 0], [0, 2, 0], [0, 0, 0]],
      expression: 'settle_objects_down(grid)',
      output: [[0, 0, 0], [0, 0, 0], [1, 1, 0], [0, 2, 0]],
    },
    run: (g) => settleObjects(g, 1, 0),
  }),
  primitive({
    name: 'settle_objects_up',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'Whole objects rise without changing shape until they meet the top or another object; highest first.',
    example: {
      input: [[0, 0, 0], [0, 2, 0], [0, 0, 0], [1, 1, 0]],
      expression: 'settle_objects_up(grid)',
      output: [[0, 2, 0], [1, 1, 0], [0, 0, 0], [0, 0, 0]],
    },
    run: (g) => settleObjects(g, -1, 0),
  }),
  primitive({
    name: 'settle_objects_left',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'Whole objects slide left without changing shape until they meet the left edge or another object; leftmost first.',
    example: { input: [[0, 0, 3, 0, 4, 4]], expression: 'settle_objects_left(grid)', output: [[3, 4, 4, 0, 0, 0]] },
    run: (g) => settleObjects(g, 0, -1),
  }),
  primitive({
    name: 'settle_objects_right',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'Whole objects slide right without changing shape until they meet the right edge or another object; rightmost first.',
    example: { input: [[3, 0, 4, 4, 0, 0]], expression: 'settle_objects_right(grid)', output: [[0, 0, 0, 3, 4, 4]] },
    run: (g) => settleObjects(g, 0, 1),
  }),
  primitive({
    name: 'pane_colours',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'One cell per pane between the separator lines (see split_at_lines), laid out as the panes are, holding the colour most of the pane has (the lowest on ties).',
    example: {
      input: [[1, 1, 5, 2], [1, 0, 5, 2], [5, 5, 5, 5], [3, 3, 5, 0]],
      expression: 'pane_colours(grid)',
      output: [[1, 2], [3, 0]],
    },
    run: paneColours,
  }),
  primitive({
    name: 'slide_toward_colour',
    category: 'geometry',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Each one-colour object (edges or corners) of another colour slides straight, across, down or diagonally, toward the cells of the colour and stops as it touches them.',
    example: {
      input: [[0, 0, 0, 0, 0], [0, 0, 0, 8, 8], [3, 0, 0, 8, 8], [0, 0, 0, 0, 0], [0, 6, 0, 0, 0]],
      expression: 'slide_toward_colour(grid, #8)',
      output: [[0, 0, 0, 0, 0], [0, 0, 0, 8, 8], [0, 0, 3, 8, 8], [0, 0, 6, 0, 0], [0, 0, 0, 0, 0]],
    },
    run: slideTowardColour,
  }),
  primitive({
    name: 'extend_pattern_to_size',
    category: 'geometry',
    parameters: ['Grid', 'Int', 'Int'],
    result: 'Grid',
    bits: 6,
    doc: 'Grows (or cuts) the grid to the given height and width, continuing the smallest repeat of its rows and of its columns.',
    example: {
      input: [[1, 2, 1], [0, 3, 0]],
      expression: 'extend_pattern_to_size(grid, 3, 5)',
      output: [[1, 2, 1, 2, 1], [0, 3, 0, 3, 0], [1, 2, 1, 2, 1]],
    },
    run: extendPatternToSize,
  }),
  primitive({
    name: 'continue_pattern_right',
    category: 'geometry',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'The empty columns right of the last non-background cell continue the smallest repeat of the columns before them.',
    example: {
      input: [[1, 2, 1, 2, 0, 0, 0], [3, 0, 3, 0, 0, 0, 0]],
      expression: 'continue_pattern_right(grid)',
      output: [[1, 2, 1, 2, 1, 2, 1], [3, 0, 3, 0, 3, 0, 3]],
    },
    run: continuePatternRight,
  }),
  primitive({
    name: 'step_toward_colour',
    category: 'geometry',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Each one-colour object (edges or corners) of another colour moves one cell, straight or diagonally, toward the cells of the colour, unless that would cover them.',
    example: {
      input: [[3, 0, 0, 0], [0, 0, 0, 0], [0, 0, 0, 4], [1, 0, 0, 4]],
      expression: 'step_toward_colour(grid, #4)',
      output: [[0, 0, 0, 0], [0, 3, 0, 0], [0, 0, 0, 4], [0, 1, 0, 4]],
    },
    run: (g, colour) => slideTowardColour(g, colour, 1),
  }),
  primitive({
    name: 'line_up_with_colour',
    category: 'geometry',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Each one-colour object beside the cells of the colour moves up or down to share their top row; one above or below them moves sideways to share their left column.',
    example: {
      input: [[0, 0, 0, 2], [1, 1, 0, 2], [0, 0, 0, 0], [0, 3, 0, 0]],
      expression: 'line_up_with_colour(grid, #1)',
      output: [[0, 0, 0, 0], [1, 1, 0, 2], [0, 0, 0, 2], [3, 0, 0, 0]],
    },
    run: lineUpWithColour,
  }),
];
