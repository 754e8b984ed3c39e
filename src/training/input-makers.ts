/**
 * pithy's family of input makers: random grids of five kinds of content, each drawn from a
 * size, a background colour and the colours the content may use.
 *
 * - `scattered`: single cells of the content colours strewn over the background;
 * - `objects`: a few separate shapes (rectangles and grown blobs, mostly of one colour) on the
 *   background, never touching one another, corners included;
 * - `symmetric`: a picture that is its own mirror image left to right, top to bottom, both, or
 *   turned half round;
 * - `separated`: the grid cut into panes by full lines of one colour, each pane with content;
 * - `pattern`: a small tile repeated over the whole grid, sometimes with a patch blanked out in
 *   the background colour.
 */
import { Grid } from '../grid/grid.ts';
import type { Random } from './random.ts';

export const INPUT_KINDS = ['scattered', 'objects', 'symmetric', 'separated', 'pattern'] as const;
export type InputKind = (typeof INPUT_KINDS)[number];

export interface InputSettings {
  readonly height: number;
  readonly width: number;
  readonly background: number;
  /** Colours the content may use (at least one; the background is not among them). */
  readonly colours: readonly number[];
}

/** Cells being drawn: row-major, mutable until turned into a Grid. */
class Canvas {
  readonly cells: Uint8Array;
  constructor(
    readonly height: number,
    readonly width: number,
    fill: number,
  ) {
    this.cells = new Uint8Array(height * width).fill(fill);
  }
  get(r: number, c: number): number {
    return this.cells[r * this.width + c]!;
  }
  set(r: number, c: number, colour: number): void {
    this.cells[r * this.width + c] = colour;
  }
  inside(r: number, c: number): boolean {
    return r >= 0 && c >= 0 && r < this.height && c < this.width;
  }
  toGrid(): Grid {
    return new Grid(this.height, this.width, this.cells);
  }
}

/** Makes sure at least one cell differs from the background. */
function markOne(canvas: Canvas, random: Random, s: InputSettings): void {
  if (canvas.cells.some((v) => v !== s.background)) return;
  canvas.set(random.below(s.height), random.below(s.width), random.pick(s.colours));
}

function scattered(random: Random, s: InputSettings): Grid {
  const canvas = new Canvas(s.height, s.width, s.background);
  const density = 0.08 + random.fraction() * 0.27;
  for (let i = 0; i < canvas.cells.length; i++) if (random.chance(density)) canvas.cells[i] = random.pick(s.colours);
  markOne(canvas, random, s);
  return canvas.toGrid();
}

/** Cells of a shape relative to its top-left corner. */
function shapeCells(random: Random, maxSide: number): [number, number][] {
  if (random.chance(0.5)) {
    const h = random.between(1, maxSide);
    const w = random.between(1, maxSide);
    const cells: [number, number][] = [];
    for (let r = 0; r < h; r++) for (let c = 0; c < w; c++) cells.push([r, c]);
    return cells;
  }
  // A blob grown one neighbour at a time inside a maxSide square.
  const target = random.between(2, Math.max(2, Math.min(maxSide * maxSide, 7)));
  const cells: [number, number][] = [[0, 0]];
  const taken = new Set(['0,0']);
  for (let tries = 0; cells.length < target && tries < 40; tries++) {
    const [r, c] = random.pick(cells);
    const [dr, dc] = random.pick([[0, 1], [1, 0], [0, -1], [-1, 0]] as const);
    const nr = r + dr;
    const nc = c + dc;
    if (nr < 0 || nc < 0 || nr >= maxSide || nc >= maxSide || taken.has(`${nr},${nc}`)) continue;
    taken.add(`${nr},${nc}`);
    cells.push([nr, nc]);
  }
  return cells;
}

function objects(random: Random, s: InputSettings): Grid {
  const canvas = new Canvas(s.height, s.width, s.background);
  const count = random.between(1, Math.max(1, Math.min(6, Math.floor((s.height * s.width) / 10))));
  const maxSide = Math.max(1, Math.min(4, Math.floor(Math.min(s.height, s.width) / 2)));
  for (let k = 0; k < count; k++) {
    const cells = shapeCells(random, maxSide);
    const colour = random.pick(s.colours);
    const second = s.colours.length > 1 && random.chance(0.15) ? random.pick(s.colours) : colour;
    for (let attempt = 0; attempt < 30; attempt++) {
      const top = random.below(s.height);
      const left = random.below(s.width);
      const fits = cells.every(([r, c]) => {
        if (!canvas.inside(top + r, left + c)) return false;
        for (let dr = -1; dr <= 1; dr++) for (let dc = -1; dc <= 1; dc++) if (canvas.inside(top + r + dr, left + c + dc) && canvas.get(top + r + dr, left + c + dc) !== s.background) return false;
        return true;
      });
      if (!fits) continue;
      for (const [r, c] of cells) canvas.set(top + r, left + c, random.chance(0.3) ? second : colour);
      break;
    }
  }
  markOne(canvas, random, s);
  return canvas.toGrid();
}

function symmetric(random: Random, s: InputSettings): Grid {
  const canvas = new Canvas(s.height, s.width, s.background);
  const density = 0.25 + random.fraction() * 0.45;
  for (let i = 0; i < canvas.cells.length; i++) if (random.chance(density)) canvas.cells[i] = random.pick(s.colours);
  const mode = random.pick(['left-right', 'top-bottom', 'both', 'half-turn'] as const);
  const { height: h, width: w } = s;
  for (let r = 0; r < h; r++) {
    for (let c = 0; c < w; c++) {
      // Each cell copies the cell it mirrors when that one comes first in reading order.
      if ((mode === 'left-right' || mode === 'both') && c > w - 1 - c) canvas.set(r, c, canvas.get(r, w - 1 - c));
      if ((mode === 'top-bottom' || mode === 'both') && r > h - 1 - r) canvas.set(r, c, canvas.get(h - 1 - r, c));
      if (mode === 'half-turn' && r * w + c > (h - 1 - r) * w + (w - 1 - c)) canvas.set(r, c, canvas.get(h - 1 - r, w - 1 - c));
    }
  }
  if (canvas.cells.every((v) => v === s.background)) {
    // Nothing drawn: one cell and its mirror images, so the picture stays symmetric.
    const r = random.below(h);
    const c = random.below(w);
    const colour = random.pick(s.colours);
    for (const [rr, cc] of [[r, c], [r, w - 1 - c], [h - 1 - r, c], [h - 1 - r, w - 1 - c]] as const) canvas.set(rr, cc, colour);
  }
  return canvas.toGrid();
}

/** Positions of n - 1 lines cutting `size` cells into n parts as equal as they come. */
function linePositions(size: number, parts: number): number[] {
  const out: number[] = [];
  for (let i = 1; i < parts; i++) out.push(Math.round((i * (size + 1)) / parts) - 1);
  return out;
}

function separated(random: Random, s: InputSettings): Grid {
  const canvas = new Canvas(s.height, s.width, s.background);
  const lineColour = s.colours[0]!;
  const content = s.colours.length > 1 ? s.colours.slice(1) : s.colours;
  const across = s.height >= 5 && (s.width < 5 || random.chance(0.7));
  const down = s.width >= 5 && (!across || random.chance(0.6));
  const rows = across ? linePositions(s.height, random.between(2, Math.min(3, Math.floor((s.height + 1) / 3)))) : [];
  const columns = down ? linePositions(s.width, random.between(2, Math.min(3, Math.floor((s.width + 1) / 3)))) : [];
  const style = random.pick(['scattered', 'solid', 'sparse'] as const);
  const density = style === 'sparse' ? 0.15 : 0.4;
  const rowSet = new Set(rows);
  const columnSet = new Set(columns);
  // Pane colours for the solid style, one per pane, keyed by the pane's row and column band.
  const paneColour = new Map<string, number>();
  const band = (lines: number[], i: number) => lines.filter((p) => p < i).length;
  for (let r = 0; r < s.height; r++) {
    for (let c = 0; c < s.width; c++) {
      if (rowSet.has(r) || columnSet.has(c)) {
        canvas.set(r, c, lineColour);
        continue;
      }
      if (style === 'solid') {
        const key = `${band(rows, r)},${band(columns, c)}`;
        if (!paneColour.has(key)) paneColour.set(key, random.chance(0.3) ? s.background : random.pick(content));
        canvas.set(r, c, paneColour.get(key)!);
      } else if (random.chance(density)) canvas.set(r, c, random.pick(content));
    }
  }
  markOne(canvas, random, s);
  return canvas.toGrid();
}

function pattern(random: Random, s: InputSettings): Grid {
  const th = random.between(1, Math.max(1, Math.min(4, s.height - 1)));
  const tw = random.between(th === 1 ? 2 : 1, Math.max(2, Math.min(4, s.width - 1)));
  const tile: number[] = [];
  for (let i = 0; i < th * tw; i++) tile.push(random.pick(s.colours));
  if (s.colours.length > 1 && tile.every((v) => v === tile[0])) tile[tile.length - 1] = s.colours.find((c) => c !== tile[0])!;
  const canvas = new Canvas(s.height, s.width, s.background);
  for (let r = 0; r < s.height; r++) for (let c = 0; c < s.width; c++) canvas.set(r, c, tile[(r % th) * tw + (c % tw)]!);
  if (random.chance(0.5)) {
    const ph = random.between(1, Math.max(1, Math.min(3, s.height - 1)));
    const pw = random.between(1, Math.max(1, Math.min(3, s.width - 1)));
    const top = random.below(s.height - ph + 1);
    const left = random.below(s.width - pw + 1);
    for (let r = top; r < top + ph; r++) for (let c = left; c < left + pw; c++) canvas.set(r, c, s.background);
  }
  return canvas.toGrid();
}

const MAKERS: Readonly<Record<InputKind, (random: Random, s: InputSettings) => Grid>> = { scattered, objects, symmetric, separated, pattern };

/** A random input grid of the kind; pure given the random stream's state. */
export function makeInput(kind: InputKind, random: Random, settings: InputSettings): Grid {
  if (settings.colours.length === 0) throw new RangeError('an input needs at least one content colour');
  return MAKERS[kind](random, settings);
}
