/**
 * Filling primitives: enclosed areas, lines, connections between same-coloured cells,
 * outlines, hollowing, bounding boxes, frames and rays.
 */
import { backgroundColour, components } from '../src/grid/components.ts';
import { Grid } from '../src/grid/grid.ts';
import { fillEnclosed } from '../src/grid/holes.ts';
import { completeRepeatingPattern } from '../src/grid/repeating-pattern.ts';
import { FAILURE, type Failure } from '../src/language/failure.ts';
import type { Point } from '../src/language/point.ts';
import { primitive } from '../src/library/primitive.ts';
import { markNeighbours } from '../src/grid/neighbour-marks.ts';
import { linesThroughColour } from '../src/grid/lines-through-cells.ts';
import { connectAlong } from '../src/grid/connect-along.ts';
import { fillGapsBySize } from '../src/grid/gaps-by-size.ts';

/** A straight (row, column) or diagonal line between two cells of the grid, both ends included. */
export function drawLine(g: Grid, from: Point, to: Point, colour: number): Grid | Failure {
  const { height, width } = g;
  const inside = (p: Point) => p.row >= 0 && p.row < height && p.column >= 0 && p.column < width;
  if (!inside(from) || !inside(to)) return FAILURE;
  const dr = to.row - from.row;
  const dc = to.column - from.column;
  if (dr !== 0 && dc !== 0 && Math.abs(dr) !== Math.abs(dc)) return FAILURE;
  const steps = Math.max(Math.abs(dr), Math.abs(dc));
  const sr = Math.sign(dr);
  const sc = Math.sign(dc);
  const out = g.cells.slice();
  for (let k = 0; k <= steps; k++) out[(from.row + k * sr) * width + from.column + k * sc] = colour;
  return new Grid(height, width, out);
}

/**
 * Along every row, then every column: background cells between two consecutive
 * non-background cells of the same colour take that colour, or `paint` when given (cells
 * the rows filled stay).
 */
export function connectSameColour(g: Grid, paint?: number): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  const connect = (start: number, step: number, length: number) => {
    let last = -1;
    for (let k = 0; k < length; k++) {
      const i = start + k * step;
      const v = cells[i]!;
      if (v === background) continue;
      if (last >= 0 && cells[start + last * step] === v) {
        for (let m = last + 1; m < k; m++) {
          const j = start + m * step;
          if (out[j] === background) out[j] = paint ?? v;
        }
      }
      last = k;
    }
  };
  for (let r = 0; r < height; r++) connect(r * width, 1, width);
  for (let c = 0; c < width; c++) connect(c, width, height);
  return new Grid(height, width, out);
}

/**
 * Background cells with a non-background cell among their 8 neighbours take the colour;
 * with `source` given, only neighbours of that colour count.
 */
export function surround(g: Grid, colour: number, source?: number): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      if (cells[r * width + c] !== background) continue;
      let near = false;
      for (let nr = Math.max(0, r - 1); nr <= Math.min(height - 1, r + 1) && !near; nr++) {
        for (let nc = Math.max(0, c - 1); nc <= Math.min(width - 1, c + 1); nc++) {
          const v = cells[nr * width + nc]!;
          if (source === undefined ? v !== background : v === source) {
            near = true;
            break;
          }
        }
      }
      if (near) out[r * width + c] = colour;
    }
  }
  return new Grid(height, width, out);
}

/** Non-background cells whose four edge neighbours are all inside the grid and non-background become background. */
export function hollow(g: Grid): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  for (let r = 1; r < height - 1; r++) {
    for (let c = 1; c < width - 1; c++) {
      const i = r * width + c;
      if (cells[i] === background) continue;
      if (cells[i - 1] !== background && cells[i + 1] !== background && cells[i - width] !== background && cells[i + width] !== background) {
        out[i] = background;
      }
    }
  }
  return new Grid(height, width, out);
}

/**
 * For every object (non-background cells joined through edges and corners, any colours),
 * paints background cells inside its bounding box (`ring` 0) or on the ring one cell outside
 * it (`ring` 1) with the colour.
 */
function boxes(g: Grid, colour: number, ring: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  for (const o of components(g, { diagonal: true, multicolour: true, background })) {
    const top = ring ? o.top - 1 : o.top;
    const left = ring ? o.left - 1 : o.left;
    const bottom = ring ? o.top + o.height : o.top + o.height - 1;
    const right = ring ? o.left + o.width : o.left + o.width - 1;
    for (let r = Math.max(0, top); r <= Math.min(height - 1, bottom); r++) {
      for (let c = Math.max(0, left); c <= Math.min(width - 1, right); c++) {
        if (ring && r !== top && r !== bottom && c !== left && c !== right) continue;
        const i = r * width + c;
        if (cells[i] === background) out[i] = colour;
      }
    }
  }
  return new Grid(height, width, out);
}

/**
 * Rays along every column (or row) in one direction: each background cell takes the colour
 * of the nearest non-background cell behind it, if there is one.
 */
export function shootRays(g: Grid, alongColumns: boolean, forwards: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  const lines = alongColumns ? width : height;
  const length = alongColumns ? height : width;
  const step = alongColumns ? width : 1;
  for (let line = 0; line < lines; line++) {
    const start = alongColumns ? line : line * width;
    let paint = background;
    for (let k = 0; k < length; k++) {
      const i = start + (forwards ? k : length - 1 - k) * step;
      const v = cells[i]!;
      if (v !== background) paint = v;
      else out[i] = paint;
    }
  }
  return new Grid(height, width, out);
}

/**
 * Diagonal rays going down: each background cell takes the colour of the nearest
 * non-background cell up its diagonal (up-left when `towardsRight`, else up-right).
 */
export function shootDiagonalRaysDown(g: Grid, towardsRight: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  const dc = towardsRight ? -1 : 1;
  for (let r = 1; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const i = r * width + c;
      const sc = c + dc;
      if (cells[i] === background && sc >= 0 && sc < width) out[i] = out[(r - 1) * width + sc]!;
    }
  }
  return new Grid(height, width, out);
}

/** The outermost ring of cells takes the colour. */
export function drawBorder(g: Grid, colour: number): Grid {
  const { height, width } = g;
  const out = g.cells.slice();
  for (let c = 0; c < width; c++) {
    out[c] = colour;
    out[(height - 1) * width + c] = colour;
  }
  for (let r = 0; r < height; r++) {
    out[r * width] = colour;
    out[r * width + width - 1] = colour;
  }
  return new Grid(height, width, out);
}

/** Rows and columns made only of background cells take the colour. */
export function fillEmptyLines(g: Grid, colour: number): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  for (let r = 0; r < height; r++) {
    let empty = true;
    for (let c = 0; c < width && empty; c++) if (cells[r * width + c] !== background) empty = false;
    if (empty) out.fill(colour, r * width, (r + 1) * width);
  }
  for (let c = 0; c < width; c++) {
    let empty = true;
    for (let r = 0; r < height && empty; r++) if (cells[r * width + c] !== background) empty = false;
    if (empty) for (let r = 0; r < height; r++) out[r * width + c] = colour;
  }
  return new Grid(height, width, out);
}

/** Non-background cells with fewer than two edge neighbours of their own colour become background. */
export function removeLonelyCells(g: Grid): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const i = r * width + c;
      const v = cells[i]!;
      if (v === background) continue;
      let same = 0;
      if (r > 0 && cells[i - width] === v) same++;
      if (r < height - 1 && cells[i + width] === v) same++;
      if (c > 0 && cells[i - 1] === v) same++;
      if (c < width - 1 && cells[i + 1] === v) same++;
      if (same < 2) out[i] = background;
    }
  }
  return new Grid(height, width, out);
}

/**
 * Squares of k×k background cells take the colour; they are found by their top-left corner in
 * reading order, and a square overlapping one already taken is skipped.
 */
export function fillEmptySquares(g: Grid, k: number, colour: number): Grid | Failure {
  const { height, width, cells } = g;
  if (!Number.isInteger(k) || k < 1 || k > height || k > width) return FAILURE;
  const background = backgroundColour(g);
  // filled[(r + 1) * (width + 1) + c + 1]: non-background cells above and left of (r, c), inclusive.
  const stride = width + 1;
  const filled = new Uint16Array((height + 1) * stride);
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const own = cells[r * width + c] !== background ? 1 : 0;
      filled[(r + 1) * stride + c + 1] = own + filled[r * stride + c + 1]! + filled[(r + 1) * stride + c]! - filled[r * stride + c]!;
    }
  }
  const taken = new Uint8Array(height * width);
  let out: Uint8Array | undefined;
  for (let r = 0; r + k <= height; r++) {
    for (let c = 0; c + k <= width; c++) {
      const inside = filled[(r + k) * stride + c + k]! - filled[r * stride + c + k]! - filled[(r + k) * stride + c]! + filled[r * stride + c]!;
      if (inside !== 0) continue;
      let free = true;
      for (let dr = 0; dr < k && free; dr++) for (let dc = 0; dc < k; dc++) if (taken[(r + dr) * width + c + dc]) (free = false), (dc = k);
      if (!free) continue;
      out ??= cells.slice();
      for (let dr = 0; dr < k; dr++) {
        const base = (r + dr) * width + c;
        taken.fill(1, base, base + k);
        out.fill(colour, base, base + k);
      }
    }
  }
  return out ? new Grid(height, width, out) : g;
}

/** Every non-background cell paints the background cells along its four diagonals, up to the next non-background cell or the edge; the first ray to reach a cell (reading order) wins. */
export function shootDiagonalRays(g: Grid): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const v = cells[r * width + c]!;
      if (v === background) continue;
      for (let d = 0; d < 4; d++) {
        const dr = d < 2 ? -1 : 1;
        const dc = d % 2 === 0 ? -1 : 1;
        for (let nr = r + dr, nc = c + dc; nr >= 0 && nr < height && nc >= 0 && nc < width; nr += dr, nc += dc) {
          const j = nr * width + nc;
          if (cells[j] !== background) break;
          if (out[j] === background) out[j] = v;
        }
      }
    }
  }
  return new Grid(height, width, out);
}

/** Background cells that touch a non-background cell by a corner (a diagonal neighbour) take the colour. */
export function surroundDiagonally(g: Grid, colour: number): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = cells.slice();
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const i = r * width + c;
      if (cells[i] !== background) continue;
      const filled = (nr: number, nc: number) => nr >= 0 && nr < height && nc >= 0 && nc < width && cells[nr * width + nc] !== background;
      if (filled(r - 1, c - 1) || filled(r - 1, c + 1) || filled(r + 1, c - 1) || filled(r + 1, c + 1)) out[i] = colour;
    }
  }
  return new Grid(height, width, out);
}

/**
 * Every non-background cell not of the target colour that looks along its row or column, over
 * background cells only, straight at a cell of the target colour paints the cells between in its
 * own colour.
 */
export function extendTowardColour(g: Grid, target: number): Grid | Failure {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  if (target === background) return FAILURE;
  const out = cells.slice();
  const steps: [number, number][] = [[-1, 0], [1, 0], [0, -1], [0, 1]];
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) {
      const v = cells[r * width + c]!;
      if (v === background || v === target) continue;
      for (const [dr, dc] of steps) {
        let nr = r + dr;
        let nc = c + dc;
        while (nr >= 0 && nr < height && nc >= 0 && nc < width && cells[nr * width + nc] === background) (nr += dr), (nc += dc);
        if (nr < 0 || nr >= height || nc < 0 || nc >= width || cells[nr * width + nc] !== target) continue;
        for (let pr = r + dr, pc = c + dc; pr !== nr || pc !== nc; pr += dr, pc += dc) out[pr * width + pc] = v;
      }
    }
  }
  return new Grid(height, width, out);
}

export const fillingPrimitives = [
  primitive({
    name: 'fill_enclosed',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 5,
    doc: 'Background cells that cannot reach the border through background cells (edge steps) take the colour.',
    example: {
      input: [[0, 0, 0, 0, 0], [0, 1, 1, 1, 0], [0, 1, 0, 1, 0], [0, 1, 1, 1, 0], [0, 0, 0, 0, 0]],
      expression: 'fill_enclosed(grid, #4)',
      output: [[0, 0, 0, 0, 0], [0, 1, 1, 1, 0], [0, 1, 4, 1, 0], [0, 1, 1, 1, 0], [0, 0, 0, 0, 0]],
    },
    run: fillEnclosed,
  }),
  primitive({
    name: 'draw_line',
    category: 'filling',
    parameters: ['Grid', 'Point', 'Point', 'Colour'],
    result: 'Grid',
    bits: 7,
    doc: 'Paints the straight or diagonal line between two cells of the grid, both ends included.',
    example: {
      input: [[0, 0, 0], [0, 0, 0], [0, 0, 0]],
      expression: 'draw_line(grid, (0, 2), (2, 0), #6)',
      output: [[0, 0, 6], [0, 6, 0], [6, 0, 0]],
    },
    run: drawLine,
  }),
  primitive({
    name: 'connect_same_colour',
    category: 'filling',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'In each row, then each column, the background gap between two neighbouring cells of the same colour takes that colour.',
    example: {
      input: [[2, 0, 0, 2], [0, 0, 0, 0], [3, 0, 0, 1]],
      expression: 'connect_same_colour(grid)',
      output: [[2, 2, 2, 2], [0, 0, 0, 0], [3, 0, 0, 1]],
    },
    run: connectSameColour,
  }),
  primitive({
    name: 'surround',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Background cells touching a non-background cell (edges or corners) take the colour.',
    example: {
      input: [[0, 0, 0, 0], [0, 5, 0, 0], [0, 0, 0, 0], [0, 0, 0, 0]],
      expression: 'surround(grid, #2)',
      output: [[2, 2, 2, 0], [2, 5, 2, 0], [2, 2, 2, 0], [0, 0, 0, 0]],
    },
    run: surround,
  }),
  primitive({
    name: 'connect_same_colour_with',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'In each row, then each column, the background gap between two neighbouring cells of the same colour takes the given colour.',
    example: {
      input: [[2, 0, 0, 2], [0, 0, 0, 0], [3, 0, 0, 1]],
      expression: 'connect_same_colour_with(grid, #8)',
      output: [[2, 8, 8, 2], [0, 0, 0, 0], [3, 0, 0, 1]],
    },
    run: (g, colour) => connectSameColour(g, colour),
  }),
  primitive({
    name: 'surround_colour',
    category: 'filling',
    parameters: ['Grid', 'Colour', 'Colour'],
    result: 'Grid',
    bits: 7,
    doc: 'Background cells touching a cell of the first colour (edges or corners) take the second colour.',
    example: {
      input: [[0, 0, 0, 0], [0, 5, 0, 0], [0, 0, 0, 3]],
      expression: 'surround_colour(grid, #5, #2)',
      output: [[2, 2, 2, 0], [2, 5, 2, 0], [2, 2, 2, 3]],
    },
    run: (g, source, colour) => surround(g, colour, source),
  }),
  primitive({
    name: 'draw_border',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'The outermost ring of cells takes the colour.',
    example: {
      input: [[0, 0, 0], [0, 1, 0], [0, 0, 0], [0, 0, 0]],
      expression: 'draw_border(grid, #8)',
      output: [[8, 8, 8], [8, 1, 8], [8, 0, 8], [8, 8, 8]],
    },
    run: drawBorder,
  }),
  primitive({
    name: 'fill_empty_lines',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Every row and every column made only of background cells takes the colour.',
    example: {
      input: [[1, 0, 1], [0, 0, 0], [1, 0, 0]],
      expression: 'fill_empty_lines(grid, #2)',
      output: [[1, 2, 1], [2, 2, 2], [1, 2, 0]],
    },
    run: fillEmptyLines,
  }),
  primitive({
    name: 'remove_lonely_cells',
    category: 'filling',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Non-background cells with fewer than two edge neighbours of their own colour become background: specks and loose ends vanish, blocks stay.',
    example: {
      input: [[4, 4, 0, 0], [4, 4, 0, 4], [0, 0, 0, 0], [0, 4, 0, 0]],
      expression: 'remove_lonely_cells(grid)',
      output: [[4, 4, 0, 0], [4, 4, 0, 0], [0, 0, 0, 0], [0, 0, 0, 0]],
    },
    run: removeLonelyCells,
  }),
  primitive({
    name: 'hollow',
    category: 'filling',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Non-background cells whose four edge neighbours are all non-background become background, leaving outlines.',
    example: {
      input: [[0, 0, 0, 0, 0], [0, 3, 3, 3, 0], [0, 3, 3, 3, 0], [0, 3, 3, 3, 0], [0, 0, 0, 0, 0]],
      expression: 'hollow(grid)',
      output: [[0, 0, 0, 0, 0], [0, 3, 3, 3, 0], [0, 3, 0, 3, 0], [0, 3, 3, 3, 0], [0, 0, 0, 0, 0]],
    },
    run: hollow,
  }),
  primitive({
    name: 'fill_bounding_boxes',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Background cells inside the bounding box of each object (cells joined through edges or corners) take the colour.',
    example: {
      input: [[1, 0, 0, 0], [0, 1, 1, 0], [0, 0, 0, 0]],
      expression: 'fill_bounding_boxes(grid, #8)',
      output: [[1, 8, 8, 0], [8, 1, 1, 0], [0, 0, 0, 0]],
    },
    run: (g, colour) => boxes(g, colour, false),
  }),
  primitive({
    name: 'frame_objects',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Draws a rectangle one cell outside the bounding box of each object (cells joined through edges or corners), over background cells only.',
    example: {
      input: [[0, 0, 0, 0], [0, 0, 0, 0], [0, 0, 7, 0], [0, 0, 0, 0]],
      expression: 'frame_objects(grid, #1)',
      output: [[0, 0, 0, 0], [0, 1, 1, 1], [0, 1, 7, 1], [0, 1, 1, 1]],
    },
    run: (g, colour) => boxes(g, colour, true),
  }),
  primitive({
    name: 'shoot_rays_down',
    category: 'filling',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Every non-background cell paints the background cells below it, down to the next non-background cell or the edge.',
    example: { input: [[1, 0], [0, 2], [0, 0]], expression: 'shoot_rays_down(grid)', output: [[1, 0], [1, 2], [1, 2]] },
    run: (g) => shootRays(g, true, true),
  }),
  primitive({
    name: 'shoot_rays_up',
    category: 'filling',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Every non-background cell paints the background cells above it, up to the next non-background cell or the edge.',
    example: { input: [[0, 0], [0, 2], [1, 0]], expression: 'shoot_rays_up(grid)', output: [[1, 2], [1, 2], [1, 0]] },
    run: (g) => shootRays(g, true, false),
  }),
  primitive({
    name: 'shoot_rays_left',
    category: 'filling',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Every non-background cell paints the background cells to its left, up to the next non-background cell or the edge.',
    example: { input: [[0, 0, 3], [0, 4, 0]], expression: 'shoot_rays_left(grid)', output: [[3, 3, 3], [4, 4, 0]] },
    run: (g) => shootRays(g, false, false),
  }),
  primitive({
    name: 'shoot_rays_right',
    category: 'filling',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Every non-background cell paints the background cells to its right, up to the next non-background cell or the edge.',
    example: { input: [[3, 0, 0], [0, 4, 0]], expression: 'shoot_rays_right(grid)', output: [[3, 3, 3], [0, 4, 4]] },
    run: (g) => shootRays(g, false, true),
  }),
  primitive({
    name: 'shoot_rays_down_right',
    category: 'filling',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'Every non-background cell paints the background cells diagonally down and to the right, up to the next non-background cell or the edge.',
    example: { input: [[3, 0, 0], [0, 0, 0], [0, 4, 0]], expression: 'shoot_rays_down_right(grid)', output: [[3, 0, 0], [0, 3, 0], [0, 4, 3]] },
    run: (g) => shootDiagonalRaysDown(g, true),
  }),
  primitive({
    name: 'shoot_rays_down_left',
    category: 'filling',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 7,
    doc: 'Every non-background cell paints the background cells diagonally down and to the left, up to the next non-background cell or the edge.',
    example: { input: [[0, 0, 3], [0, 0, 0], [0, 0, 0]], expression: 'shoot_rays_down_left(grid)', output: [[0, 0, 3], [0, 3, 0], [3, 0, 0]] },
    run: (g) => shootDiagonalRaysDown(g, false),
  }),
  primitive({
    name: 'complete_repeating_pattern',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Cells of the colour are holes in a repeating pattern: fills them from the smallest tile (repeated at least twice, rows may shift diagonally) that agrees with every other cell; fails when none does.',
    example: {
      input: [[1, 2, 1, 2], [3, 4, 3, 4], [1, 0, 1, 2], [3, 4, 0, 4]],
      expression: 'complete_repeating_pattern(grid, #0)',
      output: [[1, 2, 1, 2], [3, 4, 3, 4], [1, 2, 1, 2], [3, 4, 3, 4]],
    },
    run: (g, hole) => completeRepeatingPattern(g, hole) ?? FAILURE,
  }),
  primitive({
    name: 'fill_empty_squares',
    category: 'filling',
    parameters: ['Grid', 'Int', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Squares of k by k background cells take the colour, found by top-left corner in reading order, skipping any that overlaps one already taken.',
    example: {
      input: [[0, 0, 0, 5], [0, 0, 0, 0], [5, 0, 0, 0]],
      expression: 'fill_empty_squares(grid, 2, #2)',
      output: [[2, 2, 0, 5], [2, 2, 2, 2], [5, 0, 2, 2]],
    },
    run: fillEmptySquares,
  }),
  primitive({
    name: 'shoot_diagonal_rays',
    category: 'filling',
    parameters: ['Grid'],
    result: 'Grid',
    bits: 6,
    doc: 'Every non-background cell paints the background cells along its four diagonals, up to the next non-background cell or the edge.',
    example: {
      input: [[0, 0, 0, 0], [0, 3, 0, 0], [0, 0, 0, 0], [0, 0, 0, 0]],
      expression: 'shoot_diagonal_rays(grid)',
      output: [[3, 0, 3, 0], [0, 3, 0, 0], [3, 0, 3, 0], [0, 0, 0, 3]],
    },
    run: shootDiagonalRays,
  }),
  primitive({
    name: 'surround_diagonally',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Background cells touching a non-background cell by a corner take the colour.',
    example: {
      input: [[0, 0, 0], [0, 4, 0], [0, 0, 0]],
      expression: 'surround_diagonally(grid, #8)',
      output: [[8, 0, 8], [0, 4, 0], [8, 0, 8]],
    },
    run: surroundDiagonally,
  }),
  primitive({
    name: 'extend_toward_colour',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Each cell that sees a cell of the colour straight along its row or column, across background only, draws a line of its own colour up to it.',
    example: {
      input: [[0, 0, 0, 0], [3, 0, 0, 2], [0, 0, 0, 0], [0, 2, 0, 0]],
      expression: 'extend_toward_colour(grid, #3)',
      output: [[0, 0, 0, 0], [3, 2, 2, 2], [0, 0, 0, 0], [0, 2, 0, 0]],
    },
    run: extendTowardColour,
  }),
  primitive({
    name: 'surround_colour_edges',
    category: 'filling',
    parameters: ['Grid', 'Colour', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Background cells sharing an edge with a cell of the first colour take the second colour.',
    example: {
      input: [[0, 0, 0], [0, 2, 0], [0, 0, 3]],
      expression: 'surround_colour_edges(grid, #2, #7)',
      output: [[0, 7, 0], [7, 2, 7], [0, 7, 3]],
    },
    run: (g, source, colour) => markNeighbours(g, source, colour, false),
  }),
  primitive({
    name: 'surround_colour_corners',
    category: 'filling',
    parameters: ['Grid', 'Colour', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Background cells touching a cell of the first colour only by a corner (diagonal neighbours) take the second colour.',
    example: {
      input: [[0, 0, 0], [0, 2, 0], [0, 0, 3]],
      expression: 'surround_colour_corners(grid, #2, #4)',
      output: [[4, 0, 4], [0, 2, 0], [4, 0, 3]],
    },
    run: (g, source, colour) => markNeighbours(g, source, colour, true),
  }),
  primitive({
    name: 'draw_rows_through_colour',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Every row holding a cell of the colour is painted in that colour from edge to edge.',
    example: {
      input: [[0, 0, 0], [0, 3, 0], [2, 0, 0]],
      expression: 'draw_rows_through_colour(grid, #3)',
      output: [[0, 0, 0], [3, 3, 3], [2, 0, 0]],
    },
    run: (g, colour) => linesThroughColour(g, colour, true, false),
  }),
  primitive({
    name: 'draw_columns_through_colour',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Every column holding a cell of the colour is painted in that colour from edge to edge.',
    example: {
      input: [[0, 0, 0], [0, 3, 0], [2, 0, 0]],
      expression: 'draw_columns_through_colour(grid, #3)',
      output: [[0, 3, 0], [0, 3, 0], [2, 3, 0]],
    },
    run: (g, colour) => linesThroughColour(g, colour, false, true),
  }),
  primitive({
    name: 'draw_cross_through_colour',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'Every row and every column holding a cell of the colour is painted in that colour from edge to edge.',
    example: {
      input: [[0, 0, 0], [0, 3, 0], [2, 0, 0]],
      expression: 'draw_cross_through_colour(grid, #3)',
      output: [[0, 3, 0], [3, 3, 3], [2, 3, 0]],
    },
    run: (g, colour) => linesThroughColour(g, colour, true, true),
  }),
  primitive({
    name: 'connect_same_colour_across',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'In each row only, the background gap between two neighbouring cells of the same colour takes the given colour.',
    example: {
      input: [[1, 0, 1, 0], [0, 0, 0, 0], [1, 0, 0, 3]],
      expression: 'connect_same_colour_across(grid, #2)',
      output: [[1, 2, 1, 0], [0, 0, 0, 0], [1, 0, 0, 3]],
    },
    run: (g, colour) => connectAlong(g, colour, true),
  }),
  primitive({
    name: 'connect_same_colour_down',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'In each column only, the background gap between two neighbouring cells of the same colour takes the given colour.',
    example: {
      input: [[1, 0, 1, 0], [0, 0, 0, 0], [1, 0, 0, 3]],
      expression: 'connect_same_colour_down(grid, #2)',
      output: [[1, 0, 1, 0], [2, 0, 0, 0], [1, 0, 0, 3]],
    },
    run: (g, colour) => connectAlong(g, colour, false),
  }),
  primitive({
    name: 'fill_largest_gaps',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'The largest regions of background cells (joined through edges; every one of that size) take the colour.',
    example: {
      input: [[0, 0, 5, 0], [0, 0, 5, 5], [5, 5, 5, 0]],
      expression: 'fill_largest_gaps(grid, #4)',
      output: [[4, 4, 5, 0], [4, 4, 5, 5], [5, 5, 5, 0]],
    },
    run: (g, colour) => fillGapsBySize(g, colour, true),
  }),
  primitive({
    name: 'fill_smallest_gaps',
    category: 'filling',
    parameters: ['Grid', 'Colour'],
    result: 'Grid',
    bits: 6,
    doc: 'The smallest regions of background cells (joined through edges; every one of that size) take the colour.',
    example: {
      input: [[0, 0, 5, 0], [0, 0, 5, 5], [5, 5, 5, 0]],
      expression: 'fill_smallest_gaps(grid, #8)',
      output: [[0, 0, 5, 8], [0, 0, 5, 5], [5, 5, 5, 8]],
    },
    run: (g, colour) => fillGapsBySize(g, colour, false),
  }),
];
