/**
 * Mirror symmetry of a grid: whether it is symmetric, overlaying it with its mirror image, and
 * completing a symmetric picture whose holes hide some cells.
 */
import { backgroundColour } from './components.ts';
import { Grid, copyCells } from './grid.ts';

/** Whether the grid equals its left-right mirror image. */
export function isSymmetricLeftRight(g: Grid): boolean {
  const { height, width, cells } = g;
  for (let r = 0; r < height; r++) {
    const base = r * width;
    for (let c = 0, d = width - 1; c < d; c++, d--) if (cells[base + c] !== cells[base + d]) return false;
  }
  return true;
}

/** Whether the grid equals its top-bottom mirror image. */
export function isSymmetricTopBottom(g: Grid): boolean {
  const { height, width, cells } = g;
  for (let r = 0, s = height - 1; r < s; r++, s--) {
    for (let c = 0; c < width; c++) if (cells[r * width + c] !== cells[s * width + c]) return false;
  }
  return true;
}

/** Overlays the grid with its mirror image; a background cell takes its mirror cell's colour. */
export function symmetrise(g: Grid, leftRight: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = copyCells(cells);
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
function symmetryMaps(height: number, width: number): readonly Int32Array[] {
  const key = height * 4096 + width;
  let maps = mapsByShape.get(key);
  if (!maps) {
    if (entriesKept + 5 * height * width > MAXIMUM_ENTRIES_KEPT) {
      mapsByShape.clear();
      entriesKept = 0;
    }
    mapsByShape.set(key, (maps = buildSymmetryMaps(height, width)));
    for (const map of maps) entriesKept += map.length;
  }
  return maps;
}

/** The maps depend on the shape alone: built once per shape (a 30 by 30 shape's take 18 kB), at most 8 MB kept. */
const mapsByShape = new Map<number, readonly Int32Array[]>();
const MAXIMUM_ENTRIES_KEPT = 2_000_000;
let entriesKept = 0;

function buildSymmetryMaps(height: number, width: number): Int32Array[] {
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
 * symmetry that agrees with all the known cells; null when no symmetry agrees.
 */
export function completeSymmetry(g: Grid, hole: number): Grid | null {
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
  if (agreeing.length === 0) return null;
  const out = copyCells(cells);
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
