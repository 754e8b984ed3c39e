/**
 * Lining objects up with the cells of a colour: an object beside them (no shared column) moves
 * up or down until its top row is theirs; an object above or below them (no shared row) moves
 * sideways until its left column is theirs.
 */
import type { Grid } from './grid.ts';
import { objectsAroundColour } from './objects-around-colour.ts';
import { moveObjects } from './paint-object.ts';

export function lineUpWithColour(g: Grid, colour: number): Grid {
  const { height, width } = g;
  const scene = objectsAroundColour(g, colour);
  if (!scene) return g;
  const { top, bottom, left, right } = scene.target;
  const objects = scene.objects;
  const moves = new Int32Array(objects.length * 2);
  let moved = false;
  for (let i = 0; i < objects.length; i++) {
    const o = objects[i]!;
    if (scene.ofTarget[i]) continue;
    const sharesColumns = o.left <= right && o.left + o.width - 1 >= left;
    const sharesRows = o.top <= bottom && o.top + o.height - 1 >= top;
    let dr = 0;
    let dc = 0;
    if (!sharesColumns) dr = top - o.top;
    else if (!sharesRows) dc = left - o.left;
    // Objects that would leave the grid stay where they are.
    if (o.top + dr < 0 || o.top + dr + o.height > height || o.left + dc < 0 || o.left + dc + o.width > width) continue;
    moves[2 * i] = dr;
    moves[2 * i + 1] = dc;
    if (dr !== 0 || dc !== 0) moved = true;
  }
  if (!moved) return g;
  return moveObjects(g, objects, moves, scene.background);
}
