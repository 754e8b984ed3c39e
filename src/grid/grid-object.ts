/**
 * An object: a set of coloured cells at a position on a larger grid. Its `shape` grid is the
 * bounding box, with EMPTY where a cell is not part of the object.
 *
 * The box's cells are held directly and the `shape` Grid is made only when asked for: the search
 * cuts every grid it keeps into objects several ways, and most of those objects are only counted,
 * compared or painted, which the cells serve without a Grid of their own.
 */
import { EMPTY, Grid, HASH_MASK, cellsData, cellsOffset, cellsView, hashCellsAt, sameCellsAt } from './grid.ts';
import { mostFrequentColour } from './most-frequent-colour.ts';

/** Work buffer for {@link GridObject.mainColour} (asked of most objects the search makes). */
const mainColourCounts = new Uint16Array(10);

export class GridObject {
  readonly top: number;
  readonly left: number;
  /** The bounding box's height and width. */
  readonly height: number;
  readonly width: number;
  /**
   * The bytes that hold the bounding box's cells, row-major from {@link offset}, EMPTY where a
   * cell is not part of the object (a slab shared with other cells, or an array of their own; no
   * view is kept, as for a grid's cells). Never changed.
   */
  readonly data: Uint8Array;
  readonly offset: number;
  /** Number of cells that belong to the object. */
  readonly size: number;
  /** The hash, made on first use (-1 until then): most objects are painted or counted, never compared. */
  private hashMemo = -1;
  private shapeMemo: Grid | undefined;

  /** The object whose bounding box is the grid, at (top, left). */
  constructor(top: number, left: number, shape: Grid);
  /**
   * An object from its bounding box's cells (taken over, not copied), with no Grid made for them
   * yet; `size`, when the caller knows it, is the number of cells that are not EMPTY.
   */
  constructor(top: number, left: number, height: number, width: number, cells: Uint8Array, size?: number);
  constructor(top: number, left: number, shapeOrHeight: Grid | number, width?: number, cells?: Uint8Array, size?: number) {
    const shape = typeof shapeOrHeight === 'number' ? undefined : shapeOrHeight;
    this.top = top;
    this.left = left;
    this.height = shape ? shape.height : (shapeOrHeight as number);
    this.width = shape ? shape.width : width!;
    this.data = shape ? shape.data : cellsData(cells!);
    this.offset = shape ? shape.offset : cellsOffset(cells!);
    this.shapeMemo = shape;
    this.size = size ?? countFilled(this.data, this.offset, this.height * this.width);
  }

  /** The bounding box's cells as a view made on each call (read it once per call, not per cell). */
  get cells(): Uint8Array {
    return cellsView(this.data, this.offset, this.height * this.width);
  }

  get hash(): number {
    if (this.hashMemo < 0) this.hashMemo = objectHash(this.shapeMemo ? this.shapeMemo.hash : hashCellsAt(this.height, this.width, this.data, this.offset), this.top, this.left);
    return this.hashMemo;
  }

  /** The bounding box as a grid (made on first use). */
  get shape(): Grid {
    return (this.shapeMemo ??= new Grid(this.height, this.width, this.data, this.offset));
  }

  equals(other: GridObject): boolean {
    if (this === other) return true;
    if (this.top !== other.top || this.left !== other.left || this.height !== other.height || this.width !== other.width || this.hash !== other.hash) return false;
    return sameCellsAt(this.data, this.offset, other.data, other.offset, this.height * this.width);
  }

  /** The colour of the object's most frequent cell (lowest colour on ties). */
  get mainColour(): number {
    const counts = mainColourCounts.fill(0);
    const { data, offset } = this;
    const end = offset + this.height * this.width;
    for (let i = offset; i < end; i++) if (data[i] !== EMPTY) counts[data[i]!]!++;
    return mostFrequentColour(counts);
  }
}

function countFilled(data: Uint8Array, offset: number, length: number): number {
  let size = 0;
  for (let i = offset; i < offset + length; i++) if (data[i] !== EMPTY) size++;
  return size;
}

function objectHash(shapeHash: number, top: number, left: number): number {
  return (Math.imul(shapeHash ^ (top * 64 + left), 0x85ebca6b) ^ 0x5bd1e995) & HASH_MASK;
}
