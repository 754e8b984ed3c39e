/** Where the object-moving rules start: the target's rectangle and the objects around it. */
import { describe, expect, it } from 'vitest';
import { GridObject } from '../src/grid/grid-object.ts';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { lineUpWithColour } from '../src/grid/line-up.ts';
import { firstCellColour, objectsAroundColour } from '../src/grid/objects-around-colour.ts';
import { slideTowardColour } from '../src/grid/slide-toward.ts';

const G = Grid.fromRows;
const g = G([
  [0, 0, 0, 0, 0],
  [0, 0, 0, 8, 8],
  [3, 0, 0, 8, 8],
  [0, 0, 0, 0, 0],
  [0, 6, 0, 8, 0],
]);

describe('objectsAroundColour', () => {
  it('the rectangle around every cell of the colour, and which objects are of it', () => {
    const scene = objectsAroundColour(g, 8)!;
    expect(scene.background).toBe(0);
    expect(scene.target).toEqual({ top: 1, left: 3, bottom: 4, right: 4 });
    // reading order of first cells: the 8 block (1,3), the 3 (2,0), the 6 (4,1), the lone 8 (4,3)
    expect(scene.objects.map((o) => [o.top, o.left])).toEqual([[1, 3], [2, 0], [4, 1], [4, 3]]);
    expect([...scene.ofTarget]).toEqual([1, 0, 0, 1]);
  });

  it('is null for the background colour or an absent one', () => {
    expect(objectsAroundColour(g, 0)).toBeNull();
    expect(objectsAroundColour(g, 5)).toBeNull();
  });

  it('firstCellColour reads past the empty corner of a shape', () => {
    expect(firstCellColour(new GridObject(0, 0, G([[EMPTY, 4], [4, 4]])))).toBe(4);
  });

  it('both moving rules leave the grid as it is when the colour is the background or absent', () => {
    for (const colour of [0, 5]) {
      expect(slideTowardColour(g, colour)).toBe(g);
      expect(lineUpWithColour(g, colour)).toBe(g);
    }
  });
});
