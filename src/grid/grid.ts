/**
 * The grid value: an immutable rectangle of colours 0–9 stored row-major in a Uint8Array,
 * with its hash computed once at construction so the search can dedupe values cheaply.
 */
import { Buffer } from 'node:buffer';

/** Largest height or width a grid may have; raise it with {@link setSizeCap}. */
let sizeCap = 30;

/** The current cap on grid height and width (30 unless raised). */
export function getSizeCap(): number {
  return sizeCap;
}

/**
 * Raise (or lower) the cap on grid height and width for this process, for datasets with
 * larger grids. Primitives refuse to build grids beyond the cap, which keeps every step
 * bounded in output size.
 */
export function setSizeCap(cap: number): void {
  if (!Number.isInteger(cap) || cap < 1 || cap > 1000) {
    throw new RangeError(`grid size cap must be a whole number from 1 to 1000, got ${cap}`);
  }
  sizeCap = cap;
}

/** Cell value used inside objects for "not part of this object"; never a colour. */
export const EMPTY = 255;

export class Grid {
  readonly height: number;
  readonly width: number;
  /**
   * The bytes that hold the cells, row-major from {@link offset}: the whole slab the cells were
   * made in (shared with the other grids made there), or an array of the grid's own. A grid
   * keeps no view of its own cells: a typed-array view is the largest object a kept grid would
   * hold, and the collector copies every kept grid. Callers must not change a grid's cells.
   */
  readonly data: Uint8Array;
  /** Where the cells start in {@link data}. */
  readonly offset: number;
  readonly hash: number;
  /**
   * Analyses computed once and kept with the grid (grids never change): colour counts, the
   * background colour, connected components by options. Filled lazily by src/grid's analysis
   * functions; a field rather than a WeakMap, because weak tables cost the garbage collector
   * time on every collection and the search makes millions of grids.
   */
  colourCountsMemo: Uint32Array | undefined = undefined;
  backgroundMemo = -1;
  /** Components by option key, as key, list, key, list, ... (a grid is cut a few ways at most; a Map per grid costs far more). */
  componentsMemo: unknown[] | undefined = undefined;

  /**
   * Takes ownership of `cells` (length height × width). With `offset`, `cells` is the bytes that
   * hold them (as a grid's or an object's {@link data}) and they start there.
   */
  constructor(height: number, width: number, cells: Uint8Array, offset = -1) {
    this.height = height;
    this.width = width;
    if (offset >= 0) {
      this.data = cells;
      this.offset = offset;
    } else {
      this.data = cellsData(cells);
      this.offset = cellsOffset(cells);
    }
    this.hash = hashCellsAt(height, width, this.data, this.offset);
  }

  /**
   * The cells, row-major, as a view made on each call (read it once per call, not per cell; the
   * hottest code reads {@link data} at {@link offset} instead). Callers must not change them.
   */
  get cells(): Uint8Array {
    return cellsView(this.data, this.offset, this.height * this.width);
  }

  static filled(height: number, width: number, colour: number): Grid {
    return new Grid(height, width, fillCells(newCells(height * width), colour));
  }

  /** Builds a grid from a list of rows; rows must be equally long. */
  static fromRows(rows: readonly (readonly number[])[]): Grid {
    const height = rows.length;
    const width = height === 0 ? 0 : rows[0]!.length;
    const cells = new Uint8Array(height * width);
    for (let r = 0; r < height; r++) {
      const row = rows[r]!;
      if (row.length !== width) throw new RangeError(`row ${r} has ${row.length} cells, expected ${width}`);
      for (let c = 0; c < width; c++) cells[r * width + c] = row[c]!;
    }
    return new Grid(height, width, cells);
  }

  get(row: number, column: number): number {
    return this.data[this.offset + row * this.width + column]!;
  }

  toRows(): number[][] {
    const rows: number[][] = [];
    const { data, offset, width } = this;
    for (let r = 0; r < this.height; r++) {
      const row: number[] = [];
      for (let c = 0; c < width; c++) row.push(data[offset + r * width + c]!);
      rows.push(row);
    }
    return rows;
  }

  equals(other: Grid): boolean {
    if (this === other) return true;
    if (this.hash !== other.hash || this.height !== other.height || this.width !== other.width) return false;
    return sameCellsAt(this.data, this.offset, other.data, other.offset, this.height * this.width);
  }

  toString(): string {
    return this.toRows()
      .map((row) => row.map((v) => (v === EMPTY ? '.' : String(v))).join(''))
      .join('\n');
  }
}

/**
 * Cells come from shared slabs: one ArrayBuffer holds the cells of many grids, each grid a view
 * into it. A fresh ArrayBuffer per grid costs a native allocation and garbage-collector
 * bookkeeping for each of the millions of grids a search makes; views into a slab cost neither.
 * A slab lives while any grid in it does, so the bytes handed out (`cellBytesAllocated`) bound
 * what the cells can hold.
 */
const SLAB_BYTES = 1 << 18;
/** Larger cell arrays get their own buffer. */
const LARGEST_SLAB_PIECE = 4096;
let slab = new ArrayBuffer(SLAB_BYTES);
/** The current slab as 32-bit words, for hashing four cells at a time (hashCells). */
let slabWords = new Int32Array(slab);
/** The current slab as bytes, for clearing cells handed back (cellsRewind). */
let slabBytes = new Uint8Array(slab);
/** Counts the slabs made, so that a checkpoint knows whether the slab changed since. */
let slabSerial = 0;
let slabOffset = 0;
/** The last cells {@link newCells} handed out of a slab, and where they start in it. */
let lastSlabView: Uint8Array | undefined;
let lastSlabOffset = 0;
let cellBytes = 0;
/** Counts {@link pinCells} calls. */
let pins = 0;
/** The checkpoint (cellsCheckpoint): the slab, the place in it and the pins at the time. */
let checkpointSerial = -1;
let checkpointOffset = 0;
let checkpointPins = 0;

/**
 * The bytes that hold cells just made (the slab, for the last cells {@link newCells} handed out,
 * found without asking the view for its buffer, which is a call into the engine's runtime), or
 * the cells themselves. With {@link cellsOffset}, what a grid or an object keeps instead of a view.
 */
export function cellsData(cells: Uint8Array): Uint8Array {
  return cells === lastSlabView ? slabBytes : cells;
}

/** Where the cells start in {@link cellsData}'s bytes. */
export function cellsOffset(cells: Uint8Array): number {
  return cells === lastSlabView ? lastSlabOffset : 0;
}

/** A view of `length` cells of `data` from `offset` (`data` itself when that is all of it). */
export function cellsView(data: Uint8Array, offset: number, length: number): Uint8Array {
  if (offset === 0 && data.length === length) return data;
  return new Uint8Array(data === slabBytes ? slab : data.buffer, data.byteOffset + offset, length);
}

/** A zeroed cell array of this length, for building a new grid. */
export function newCells(length: number): Uint8Array {
  if (length > LARGEST_SLAB_PIECE) {
    cellBytes += length;
    return new Uint8Array(length);
  }
  if (slabOffset + length > SLAB_BYTES) {
    slab = new ArrayBuffer(SLAB_BYTES);
    slabWords = new Int32Array(slab);
    slabBytes = new Uint8Array(slab);
    slabSerial++;
    slabOffset = 0;
    cellBytes += SLAB_BYTES;
  }
  const view = new Uint8Array(slab, slabOffset, length);
  lastSlabView = view;
  lastSlabOffset = slabOffset;
  slabOffset += (length + 7) & ~7;
  return view;
}

/**
 * Handing cells back. The search builds a candidate's values, compares them with what it holds
 * and drops most of them at once (equal to a kept value, or failed on some input). It marks a
 * checkpoint before building them and rewinds to it when it drops them: the slab space they took
 * is cleared and handed out again, so the next candidate's cells are written where the last
 * one's were (memory the processor has at hand) and slabs fill only with values kept.
 *
 * Rewinding is safe only if nothing made since the checkpoint is still held. Whatever keeps cells
 * beyond the call that made them (an analysis memoised on a grid, such as its components) calls
 * {@link pinCells}, and a rewind after a pin does nothing. One checkpoint at a time.
 */
export function cellsCheckpoint(): void {
  checkpointSerial = slabSerial;
  checkpointOffset = slabOffset;
  checkpointPins = pins;
}

/** Hands back the cells made since the checkpoint, unless the slab changed or something was pinned since. */
export function cellsRewind(): void {
  if (checkpointSerial !== slabSerial || checkpointPins !== pins || slabOffset === checkpointOffset) return;
  slabBytes.fill(0, checkpointOffset, slabOffset);
  slabOffset = checkpointOffset;
}

/** Says that cells made since the last checkpoint are kept beyond the call (a rewind then does nothing). */
export function pinCells(): void {
  pins++;
}

/** From this many cells on, the native fill is faster than a loop (it is a call into the engine's runtime, dear for the short runs most grids have). */
const NATIVE_FILL_FROM = 128;

/** Sets cells from..to-1 to the value, and returns the array. */
export function fillCells(cells: Uint8Array, value: number, from = 0, to = cells.length): Uint8Array {
  if (to - from >= NATIVE_FILL_FROM) return cells.fill(value, from, to);
  for (let i = from; i < to; i++) cells[i] = value;
  return cells;
}

/** A copy of a cell array, for building a changed grid from an old one. */
export function copyCells(cells: Uint8Array): Uint8Array {
  const out = newCells(cells.length);
  out.set(cells);
  return out;
}

/**
 * Copies `length` cells from `source` at `from` into `target` at `to`, with no view object: a
 * `subarray` per row costs an allocation, and the search copies rows of millions of grids.
 */
export function copyRun(source: Uint8Array, from: number, target: Uint8Array, to: number, length: number): void {
  for (let i = 0; i < length; i++) target[to + i] = source[from + i]!;
}

/** Bytes of cell storage handed out by {@link newCells} in this process so far (whole slabs). */
export function cellBytesAllocated(): number {
  return cellBytes;
}

/**
 * Hashes are cut to 30 bits: V8 then holds them as small integers, in a grid's field and as Map
 * keys, where a full 32-bit value would be a boxed number (an allocation per grid made).
 */
export const HASH_MASK = 0x3fffffff;

/** Below this many cells a loop in JavaScript compares faster than the native call. */
const NATIVE_COMPARE_FROM = 48;

/** True when two cell arrays of the same length hold the same cells (long ones compared natively). */
export function sameCells(a: Uint8Array, b: Uint8Array): boolean {
  return sameCellsAt(a, 0, b, 0, a.length);
}

/**
 * True when `length` cells of `a` from `aFrom` equal those of `b` from `bFrom`; long runs are
 * compared natively, with no view made for either.
 */
export function sameCellsAt(a: Uint8Array, aFrom: number, b: Uint8Array, bFrom: number, length: number): boolean {
  if (length >= NATIVE_COMPARE_FROM) return compareRanges.call(a, b, bFrom, bFrom + length, aFrom, aFrom + length) === 0;
  for (let i = 0; i < length; i++) if (a[aFrom + i] !== b[bFrom + i]) return false;
  return true;
}

/** Node's comparison of two byte ranges; it takes any Uint8Array as `this`, not only a Buffer. */
const compareRanges = Buffer.prototype.compare as (this: Uint8Array, target: Uint8Array, targetStart: number, targetEnd: number, sourceStart: number, sourceEnd: number) => number;

/** Whether this machine stores the low byte of a word first, as an Int32Array view then reads four cells at once. */
const LITTLE_ENDIAN = new Uint8Array(new Uint32Array([1]).buffer)[0] === 1;

/**
 * Hash of the shape and the cells, four cells at a time (a murmur-style step per 32-bit word, the
 * cells read little end first, then the cells left over one by one), finished with a murmur-style
 * mix. Every grid is hashed when made, so this is on the search's hot path: cells in the current
 * slab are read through its word view; cells anywhere else (an older slab, a buffer of their
 * own) give the same words, built from bytes, so where the cells lie never changes the hash.
 */
export function hashCells(height: number, width: number, cells: Uint8Array): number {
  return cells === lastSlabView ? hashCellsAt(height, width, slabBytes, lastSlabOffset) : hashCellsAt(height, width, cells, 0);
}

/** {@link hashCells} of the height × width cells of `data` from `from`. */
export function hashCellsAt(height: number, width: number, data: Uint8Array, from: number): number {
  let h = 0x811c9dc5 ^ (height * 31 + width);
  const length = height * width;
  const count = length >> 2;
  if (LITTLE_ENDIAN && data === slabBytes && (from & 3) === 0) {
    const words = slabWords;
    const first = from >> 2;
    for (let k = 0; k < count; k++) h = mixWord(h, words[first + k]!);
  } else {
    for (let k = 0; k < count; k++) {
      const i = from + (k << 2);
      h = mixWord(h, data[i]! | (data[i + 1]! << 8) | (data[i + 2]! << 16) | (data[i + 3]! << 24));
    }
  }
  for (let i = count << 2; i < length; i++) {
    h ^= data[from + i]!;
    h = Math.imul(h, 0x01000193);
  }
  h ^= length;
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h & HASH_MASK;
}

function mixWord(h: number, word: number): number {
  let k = Math.imul(word, 0xcc9e2d51);
  k = (k << 15) | (k >>> 17);
  k = Math.imul(k, 0x1b873593);
  h ^= k;
  h = (h << 13) | (h >>> 19);
  return (Math.imul(h, 5) + 0xe6546b64) | 0;
}

/**
 * The last shape refused for being over the cap, and how many were refused so far: a traced run
 * reads it to say that a step failed because of the cap. Written only on a refusal.
 */
export const shapesOverCap = { height: 0, width: 0, count: 0 };

/** True when a grid of this shape is allowed (non-empty and within the cap). */
export function shapeAllowed(height: number, width: number): boolean {
  if (height >= 1 && width >= 1 && height <= sizeCap && width <= sizeCap) return true;
  if (height > sizeCap || width > sizeCap) {
    shapesOverCap.height = height;
    shapesOverCap.width = width;
    shapesOverCap.count++;
  }
  return false;
}
