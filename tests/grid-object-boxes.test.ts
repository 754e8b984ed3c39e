/** Filling and framing the bounding boxes of objects. */
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { paintObjectBoxes } from '../src/grid/object-boxes.ts';

const G = Grid.fromRows;

describe('paintObjectBoxes', () => {
  it('fills the background inside each bounding box (objects joined through corners)', () => {
    expect(paintObjectBoxes(G([[1, 0, 0, 0], [0, 1, 1, 0], [0, 0, 0, 0]]), 8, false).toRows()).toEqual([[1, 8, 8, 0], [8, 1, 1, 0], [0, 0, 0, 0]]);
  });

  it('frames each box one cell outside, clipped at the edges', () => {
    expect(paintObjectBoxes(G([[0, 0, 0, 0], [0, 0, 0, 0], [0, 0, 7, 0], [0, 0, 0, 0]]), 1, true).toRows()).toEqual([
      [0, 0, 0, 0],
      [0, 1, 1, 1],
      [0, 1, 7, 1],
      [0, 1, 1, 1],
    ]);
    expect(paintObjectBoxes(G([[7, 0], [0, 0]]), 1, true).toRows()).toEqual([[7, 1], [1, 1]]);
  });

  it('a frame never covers a drawn cell', () => {
    expect(paintObjectBoxes(G([[2, 0, 3]]), 1, true).toRows()).toEqual([[2, 1, 3]]);
  });
});
