/**
 * An object: a set of coloured cells at a position on a larger grid. Its `shape` grid is the
 * bounding box, with EMPTY where a cell is not part of the object.
 */
import { EMPTY, Grid } from './grid.ts';
import { mostFrequentColour } from './most-frequent-colour.ts';

/** Work buffer for {@link GridObject.mainColour} (asked of most objects the search makes). */
const mainColourCounts = new Uint16Array(10);

export class GridObject {
  readonly top: number;
  readonly left: number;
  readonly shape: Grid;
  /** Number of cells that belong to the object. */
  readonly size: number;
  readonly hash: number;

  constructor(top: number, left: number, shape: Grid) {
    this.top = top;
    this.left = left;
    this.shape = shape;
    let size = 0;
    const cells = shape.cells;
    for (let i = 0; i < cells.length; i++) if (cells[i] !== EMPTY) size++;
    this.size = size;
    this.hash = (Math.imul(shape.hash ^ (top * 64 + left), 0x85ebca6b) ^ 0x5bd1e995) >>> 0;
  }

  get height(): number {
    return this.shape.height;
  }

  get width(): number {
    return this.shape.width;
  }

  equals(other: GridObject): boolean {
    return this.top === other.top && this.left === other.left && this.shape.equals(other.shape);
  }

  /** The colour of the object's most frequent cell (lowest colour on ties). */
  get mainColour(): number {
    const counts = mainColourCounts.fill(0);
    const cells = this.shape.cells;
    for (let i = 0; i < cells.length; i++) if (cells[i] !== EMPTY) counts[cells[i]!]!++;
    return mostFrequentColour(counts);
  }
}
