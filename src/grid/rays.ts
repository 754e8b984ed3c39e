/**
 * Rays: drawn cells paint the background cells along a direction, up to the next drawn cell or
 * the edge, or toward a cell of a target colour.
 */
import { paintBackgroundRuns } from './background-runs.ts';
import { backgroundColour } from './components.ts';
import { Grid, copyCells } from './grid.ts';

/**
 * Rays along every column (or row) in one direction: each background cell takes the colour
 * of the nearest non-background cell behind it, if there is one.
 */
export function shootRays(g: Grid, alongColumns: boolean, forwards: boolean): Grid {
  const out = copyCells(g.cells);
  paintBackgroundRuns(g, backgroundColour(g), !alongColumns, forwards ? 'behind' : 'ahead', -1, out);
  return new Grid(g.height, g.width, out);
}

/**
 * Diagonal rays going down: each background cell takes the colour of the nearest
 * non-background cell up its diagonal (up-left when `towardsRight`, else up-right).
 */
export function shootDiagonalRaysDown(g: Grid, towardsRight: boolean): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = copyCells(cells);
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

/** Every non-background cell paints the background cells along its four diagonals, up to the next non-background cell or the edge; the first ray to reach a cell (reading order) wins. */
export function shootDiagonalRays(g: Grid): Grid {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const out = copyCells(cells);
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

/**
 * Every non-background cell not of the target colour that looks along its row or column, over
 * background cells only, straight at a cell of the target colour paints the cells between in its
 * own colour. Null when the target is the background colour.
 */
export function extendTowardColour(g: Grid, target: number): Grid | null {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  if (target === background) return null;
  const out = copyCells(cells);
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
