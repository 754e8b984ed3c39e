/**
 * Sliding objects toward the cells of a colour: each one-colour object (cells joined through
 * edges or corners) of another colour moves in a straight line, across, down or diagonally,
 * toward the cells of that colour and stops just before it would overlap them.
 */
import { EMPTY, type Grid } from './grid.ts';
import { objectsAroundColour } from './objects-around-colour.ts';
import { moveObjects } from './paint-object.ts';

/**
 * The direction of travel: along the rows when the object's rows overlap the target's rows,
 * along the columns when its columns overlap, otherwise diagonally toward the target; 0, 0
 * when the object lies inside the target's bounding box.
 */
function direction(from: number, to: number, targetFrom: number, targetTo: number): number {
  if (to < targetFrom) return 1;
  if (from > targetTo) return -1;
  return 0;
}

/**
 * Slides each object toward the colour until it touches (an object whose path misses the colour
 * stays); with `maxSteps` the object moves at most that many cells and need not reach it.
 */
export function slideTowardColour(g: Grid, colour: number, maxSteps = Infinity): Grid {
  const { height, width, cells } = g;
  const scene = objectsAroundColour(g, colour);
  if (!scene) return g;
  const { top, bottom, left, right } = scene.target;
  const objects = scene.objects;
  const moves: number[] = [];
  for (let i = 0; i < objects.length; i++) {
    const o = objects[i]!;
    if (scene.ofTarget[i]) {
      moves.push(0, 0);
      continue;
    }
    const dr = direction(o.top, o.top + o.height - 1, top, bottom);
    const dc = direction(o.left, o.left + o.width - 1, left, right);
    let steps = 0;
    if (dr !== 0 || dc !== 0) {
      // Step until the next step would put a cell on the colour or the object leaves the grid.
      const limit = Math.max(height, width);
      let stopped = false;
      for (let k = 1; k <= limit && !stopped; k++) {
        if (k > maxSteps) {
          steps = maxSteps;
          stopped = true;
          break;
        }
        for (let r = 0; r < o.height && !stopped; r++) {
          for (let c = 0; c < o.width; c++) {
            if (o.data[o.offset + r * o.width + c] === EMPTY) continue;
            const nr = o.top + r + k * dr;
            const nc = o.left + c + k * dc;
            if (nr < 0 || nr >= height || nc < 0 || nc >= width) {
              steps = -1;
              stopped = true;
              break;
            }
            if (cells[nr * width + nc] === colour) {
              steps = k - 1;
              stopped = true;
              break;
            }
          }
        }
      }
      if (!stopped || steps < 0) steps = 0;
    }
    moves.push(dr * steps, dc * steps);
  }
  return moveObjects(g, objects, moves, scene.background);
}
