/**
 * Object rules: a table that says what happens to each object of a grid (it keeps its place,
 * is removed, takes one colour, moves by an offset, slides one way as far as it goes, is mirrored
 * in its own box, or has its holes filled with one colour) from one property of the object: what it
 * is (size, colour, height, width, holes, shape, whether it is hollow, wider than high or higher
 * than wide), where it is (touching the edge, inside another object) and how it compares with the
 * others (size rank, whether it is the largest or the smallest, whether its shape or colour is
 * the only one of its kind).
 *
 * Applying a rule cuts the grid into objects (one of four ways), looks each object's property
 * up, and fails (null) when some object's value has no entry: a rule never guesses. Removed,
 * moved and slid objects are lifted first, then recoloured ones are painted, then moved and slid
 * ones put down, then mirrored ones turned over in place and holes filled. How far an object
 * slides is worked out on the grid as it was, before anything moved.
 */
import { backgroundColour, components } from './components.ts';
import type { GridObject } from './grid-object.ts';
import { EMPTY, Grid } from './grid.ts';
import { enclosedCells, holeCount, holeMarks } from './holes.ts';
import { colourCount, holdsCell, isSolidRectangle, touchesEdge, touchesOther } from './object-properties.ts';
import { paintObjectInto } from './paint-object.ts';
import { tableKeyCode, textHash } from './text-hash.ts';

/** How a grid is cut into objects: one colour or many, joined through edges or also corners. */
export const OBJECT_GROUPINGS = ['by_colour', 'by_colour_diagonal', 'multicolour', 'multicolour_diagonal'] as const;
export type ObjectGrouping = (typeof OBJECT_GROUPINGS)[number];

export const OBJECT_PROPERTIES = [
  'size',
  'colour',
  'height',
  'width',
  'size_rank',
  'touches_edge',
  'holes',
  'shape',
  'hollow',
  'wide',
  'tall',
  'inside',
  'unique_shape',
  'unique_colour',
  'largest',
  'smallest',
  'symmetric',
  'above_line',
  'below_line',
  'left_of_line',
  'right_of_line',
  'topmost',
  'bottommost',
  'leftmost',
  'rightmost',
  'solid',
  'square',
  'line',
  'touches_other',
  'colours',
] as const;
export type ObjectProperty = (typeof OBJECT_PROPERTIES)[number];

/**
 * A property's value: a whole number (size, height, width, holes; the size rank, 1 for the
 * largest, objects of equal size sharing a rank), a colour, 1/0 for yes/no, or for `shape` the
 * pattern of the object's box, rows top to bottom joined by `/`, `x` for a cell of the object and
 * `.` for one outside it.
 *
 * The yes/no properties: `touches_edge` (a cell on the grid's border), `hollow` (at least one
 * hole), `wide` / `tall` (its box is wider than high / higher than wide), `inside` (off the
 * border, and no background cell beside it reaches the border through background: it lies in a
 * region another object closes), `unique_shape` / `unique_colour` (no other object of the grid
 * has its shape / its main colour), `largest` / `smallest` (no object of the grid is larger /
 * smaller; ties all count), `symmetric` (its box, cells and gaps alike, equals its mirror image
 * left to right or top to bottom), `above_line` / `below_line` (a line lies below / above it: a
 * whole row of the grid in one colour other than the background, wholly beyond the object's box),
 * `left_of_line` / `right_of_line` (the same with a whole column on its right / left), `topmost` /
 * `bottommost` / `leftmost` / `rightmost` (no object's box reaches higher / lower / further left /
 * further right; ties all count), `solid` (its cells fill its box), `square` (its box is as high
 * as wide), `line` (its box is one row high or one column wide), `touches_other` (a cell of it
 * has an edge neighbour that is neither the background nor the object's own); `colours` is the
 * number of colours among its cells. Unlike a rank, a yes/no key takes the same two values whatever the
 * number of objects, so a test input with more objects than any demonstration still finds its
 * keys in the table.
 */
export type ObjectKey = number | string;

export type ObjectOutcome =
  | { readonly kind: 'keep' }
  | { readonly kind: 'remove' }
  | { readonly kind: 'recolour'; readonly colour: number }
  | { readonly kind: 'move'; readonly rows: number; readonly columns: number }
  /** Its holes (see {@link holeMarks}), where the grid shows the background, take the colour. */
  | { readonly kind: 'fill'; readonly colour: number }
  /** Turned over in its own box: columns reversed (`left_right`) or rows (`top_bottom`). */
  | { readonly kind: 'mirror'; readonly across: MirrorAxis }
  /** Moved whole steps one way while it stays in the grid and lands on nothing but the background or itself (see {@link slideOffset}). */
  | { readonly kind: 'slide'; readonly way: SlideWay };

export type MirrorAxis = 'left_right' | 'top_bottom';
export const MIRROR_AXES: readonly MirrorAxis[] = ['left_right', 'top_bottom'];

/**
 * Which way a slide goes: one of the four, or `toward` the nearest thing in line, the way in
 * which the object, slid as far as it goes, stops against a cell of another object rather than
 * the grid's border, the shortest such slide (no slide when two ways tie or none stops so).
 */
export type SlideWay = 'up' | 'down' | 'left' | 'right' | 'toward';
/** In the order the learner prefers them: `toward` first (the cheapest, see table-bits.ts). */
export const SLIDE_WAYS: readonly SlideWay[] = ['toward', 'up', 'down', 'left', 'right'];

export interface ObjectRuleEntry {
  readonly key: ObjectKey;
  /** The value of the rule's second property, when it has one. */
  readonly secondKey?: ObjectKey;
  readonly outcome: ObjectOutcome;
}

/** An entry, with `secondKey` written only when the rule keys on two properties. */
export function objectRuleEntry(key: ObjectKey, secondKey: ObjectKey | undefined, outcome: ObjectOutcome): ObjectRuleEntry {
  return secondKey === undefined ? { key, outcome } : { key, secondKey, outcome };
}

/** An entry's key as one text: the first property's value, and the second's after a space. */
export function entryKeyCode(key: ObjectKey, secondKey: ObjectKey | undefined): string {
  return secondKey === undefined ? tableKeyCode(key) : `${tableKeyCode(key)} ${tableKeyCode(secondKey)}`;
}

/** What kind of key a property has. */
export function propertyValues(property: ObjectProperty): 'number' | 'colour' | 'yes or no' | 'shape' {
  switch (property) {
    case 'colour':
      return 'colour';
    case 'shape':
      return 'shape';
    case 'touches_edge':
    case 'hollow':
    case 'wide':
    case 'tall':
    case 'inside':
    case 'unique_shape':
    case 'unique_colour':
    case 'largest':
    case 'smallest':
    case 'symmetric':
    case 'above_line':
    case 'below_line':
    case 'left_of_line':
    case 'right_of_line':
    case 'topmost':
    case 'bottommost':
    case 'leftmost':
    case 'rightmost':
    case 'solid':
    case 'square':
    case 'line':
    case 'touches_other':
      return 'yes or no';
    default:
      return 'number';
  }
}

/** A short code naming an outcome, equal for equal outcomes. */
export function outcomeCode(o: ObjectOutcome): string {
  switch (o.kind) {
    case 'keep':
      return 'k';
    case 'remove':
      return 'r';
    case 'recolour':
      return `c${o.colour}`;
    case 'move':
      return `m${o.rows},${o.columns}`;
    case 'fill':
      return `f${o.colour}`;
    case 'mirror':
      return o.across === 'left_right' ? 'x' : 'y';
    case 'slide':
      return `s${o.way}`;
  }
}

/** The objects of a grid under a grouping, with the grid's background colour left out. */
export function objectsOf(g: Grid, grouping: ObjectGrouping): readonly GridObject[] {
  return components(g, {
    diagonal: grouping === 'by_colour_diagonal' || grouping === 'multicolour_diagonal',
    multicolour: grouping === 'multicolour' || grouping === 'multicolour_diagonal',
    background: backgroundColour(g),
  });
}

/** The pattern of an object's box: rows joined by `/`, `x` for its cells and `.` for the rest. */
export function shapePattern(o: GridObject): string {
  const { height, width, cells } = o;
  let text = '';
  for (let r = 0; r < height; r++) {
    if (r > 0) text += '/';
    for (let c = 0; c < width; c++) text += cells[r * width + c] === EMPTY ? '.' : 'x';
  }
  return text;
}

/** Each object's value of the property, in the order of `objects` (all objects of `g`). */
export function objectKeys(g: Grid, objects: readonly GridObject[], property: ObjectProperty): ObjectKey[] {
  switch (property) {
    case 'size':
      return objects.map((o) => o.size);
    case 'colour':
      return objects.map((o) => o.mainColour);
    case 'height':
      return objects.map((o) => o.height);
    case 'width':
      return objects.map((o) => o.width);
    case 'touches_edge':
      return objects.map((o) => (touchesEdge(o, g) ? 1 : 0));
    case 'holes':
      return objects.map(holeCount);
    case 'shape':
      return objects.map(shapePattern);
    case 'size_rank':
      return ranks(objects.map((o) => -o.size));
    case 'largest':
      return extremeFlags(objects.map((o) => o.size));
    case 'smallest':
      return extremeFlags(objects.map((o) => -o.size));
    case 'hollow':
      return objects.map((o) => (holeCount(o) > 0 ? 1 : 0));
    case 'wide':
      return objects.map((o) => (o.width > o.height ? 1 : 0));
    case 'tall':
      return objects.map((o) => (o.height > o.width ? 1 : 0));
    case 'inside':
      return insideFlags(g, objects);
    case 'unique_shape':
      return uniqueFlags(objects.map(shapePattern));
    case 'unique_colour':
      return uniqueFlags(objects.map((o) => o.mainColour));
    case 'symmetric':
      return objects.map((o) => (mirrorSymmetric(o) ? 1 : 0));
    case 'above_line':
      return lineFlags(g, objects, true, true);
    case 'below_line':
      return lineFlags(g, objects, true, false);
    case 'left_of_line':
      return lineFlags(g, objects, false, true);
    case 'right_of_line':
      return lineFlags(g, objects, false, false);
    case 'topmost':
      return extremeFlags(objects.map((o) => -o.top));
    case 'bottommost':
      return extremeFlags(objects.map((o) => o.top + o.height));
    case 'leftmost':
      return extremeFlags(objects.map((o) => -o.left));
    case 'rightmost':
      return extremeFlags(objects.map((o) => o.left + o.width));
    case 'solid':
      return objects.map((o) => (isSolidRectangle(o) ? 1 : 0));
    case 'square':
      return objects.map((o) => (o.height === o.width ? 1 : 0));
    case 'line':
      return objects.map((o) => (o.height === 1 || o.width === 1 ? 1 : 0));
    case 'touches_other':
      return objects.map((o) => (touchesOther(o, g, backgroundColour(g)) ? 1 : 0));
    case 'colours':
      return objects.map(colourCount);
  }
}

/** 1 for each value equal to the largest, else 0. */
function extremeFlags(values: readonly number[]): number[] {
  const most = Math.max(...values);
  return values.map((v) => (v === most ? 1 : 0));
}

/** True when the object's box (cells and gaps) equals its mirror image left to right or top to bottom. */
function mirrorSymmetric(o: GridObject): boolean {
  const { height, width, cells } = o;
  let leftRight = true;
  for (let r = 0; r < height && leftRight; r++) for (let c = 0; c < width >> 1; c++) if (cells[r * width + c] !== cells[r * width + width - 1 - c]) leftRight = false;
  if (leftRight) return true;
  for (let r = 0; r < height >> 1; r++) for (let c = 0; c < width; c++) if (cells[r * width + c] !== cells[(height - 1 - r) * width + c]) return false;
  return true;
}

/**
 * 1 for an object with a line (a whole row when `rows`, else a whole column, in one colour other
 * than the background) wholly past its box: after it (below, to the right) when `after`, else before it.
 */
function lineFlags(g: Grid, objects: readonly GridObject[], rows: boolean, after: boolean): number[] {
  const lines = fullLines(g, rows);
  return objects.map((o) => {
    const first = rows ? o.top : o.left;
    const last = first + (rows ? o.height : o.width) - 1;
    return lines.some((k) => (after ? k > last : k < first)) ? 1 : 0;
  });
}

/** The rows (`rows` true) or columns of the grid that are wholly one colour other than the background. */
function fullLines(g: Grid, rows: boolean): number[] {
  const { height, width, cells } = g;
  const background = backgroundColour(g);
  const lines: number[] = [];
  const count = rows ? height : width;
  const length = rows ? width : height;
  // Line k starts at cell `k × first` and goes on `step` cells at a time.
  const first = rows ? width : 1;
  const step = rows ? 1 : width;
  for (let k = 0; k < count; k++) {
    const start = k * first;
    const colour = cells[start]!;
    if (colour === background) continue;
    let whole = true;
    for (let i = 1; i < length && whole; i++) if (cells[start + i * step] !== colour) whole = false;
    if (whole) lines.push(k);
  }
  return lines;
}

/** Each value's rank among the distinct values, 1 for the lowest. */
function ranks(values: readonly number[]): number[] {
  const distinct = [...new Set(values)].sort((a, b) => a - b);
  return values.map((v) => distinct.indexOf(v) + 1);
}

/** 1 for a value no other entry has, else 0. */
function uniqueFlags<T>(values: readonly T[]): number[] {
  const counts = new Map<T, number>();
  for (const v of values) counts.set(v, (counts.get(v) ?? 0) + 1);
  return values.map((v) => (counts.get(v) === 1 ? 1 : 0));
}

/**
 * 1 for an object off the border none of whose edge neighbours is a background cell that
 * reaches the border through background cells; else 0.
 */
function insideFlags(g: Grid, objects: readonly GridObject[]): number[] {
  const background = backgroundColour(g);
  const enclosed = enclosedCells(g, background);
  const { height, width, cells } = g;
  const open = (r: number, c: number): boolean => {
    const i = r * width + c;
    return cells[i] === background && enclosed[i] === 0;
  };
  return objects.map((o) => {
    if (touchesEdge(o, g)) return 0;
    for (let r = 0; r < o.height; r++) {
      for (let c = 0; c < o.width; c++) {
        if (o.data[o.offset + r * o.width + c] === EMPTY) continue;
        const row = o.top + r;
        const column = o.left + c;
        if (open(row - 1, column) || open(row + 1, column) || open(row, column - 1) || open(row, column + 1)) return 0;
      }
    }
    return 1;
  });
}

/**
 * A cut of a grid into objects, a property (or two) and a table from their values to outcomes.
 * With two properties each object's key is the pair of its values: the rule says what becomes of
 * an object from two things about it at once (the topmost of the large ones, say).
 */
export class ObjectRule {
  readonly grouping: ObjectGrouping;
  readonly property: ObjectProperty;
  readonly second: ObjectProperty | undefined;
  readonly entries: readonly ObjectRuleEntry[];
  readonly hash: number;
  private readonly table = new Map<string, ObjectOutcome>();

  /** The first entry for a key counts (the parser rejects repeated keys). */
  constructor(grouping: ObjectGrouping, property: ObjectProperty, entries: readonly ObjectRuleEntry[], second?: ObjectProperty) {
    this.grouping = grouping;
    this.property = property;
    this.second = second;
    this.entries = entries;
    for (const e of entries) {
      const code = entryKeyCode(e.key, second === undefined ? undefined : e.secondKey);
      if (!this.table.has(code)) this.table.set(code, e.outcome);
    }
    const properties = OBJECT_PROPERTIES.indexOf(property) + (second === undefined ? 0 : (OBJECT_PROPERTIES.indexOf(second) + 1) * 64);
    let h = Math.imul(0x3c6ef372 ^ (OBJECT_GROUPINGS.indexOf(grouping) + 4 * properties), 0x01000193);
    let sum = 0;
    for (const [key, outcome] of this.table) sum = (sum + textHash(`${key}=${outcomeCode(outcome)}`)) | 0;
    this.hash = (Math.imul(h ^ sum, 0x85ebca6b) ^ this.table.size) >>> 0;
  }

  outcomeFor(key: ObjectKey, secondKey?: ObjectKey): ObjectOutcome | undefined {
    return this.table.get(entryKeyCode(key, secondKey));
  }

  get size(): number {
    return this.table.size;
  }

  equals(other: ObjectRule): boolean {
    if (this === other) return true;
    if (this.hash !== other.hash || this.grouping !== other.grouping || this.property !== other.property || this.second !== other.second || this.table.size !== other.table.size) return false;
    for (const [key, outcome] of this.table) {
      const theirs = other.table.get(key);
      if (!theirs || outcomeCode(theirs) !== outcomeCode(outcome)) return false;
    }
    return true;
  }
}

/** The grid after every object's outcome; null when some object's key has no entry. */
export function applyObjectRule(g: Grid, rule: ObjectRule): Grid | null {
  const objects = objectsOf(g, rule.grouping);
  const keys = objectKeys(g, objects, rule.property);
  const secondKeys = rule.second === undefined ? undefined : objectKeys(g, objects, rule.second);
  const outcomes: ObjectOutcome[] = [];
  for (let i = 0; i < keys.length; i++) {
    const outcome = rule.outcomeFor(keys[i]!, secondKeys?.[i]);
    if (!outcome) return null;
    outcomes.push(outcome);
  }
  return paintOutcomes(g, objects, outcomes);
}

/**
 * Lifts removed, moved and slid objects, paints recoloured ones, puts moved and slid ones down,
 * then mirrors and fills in place. Null when an object should slide `toward` something and no one
 * way is the nearest.
 */
export function paintOutcomes(g: Grid, objects: readonly GridObject[], outcomes: readonly ObjectOutcome[]): Grid | null {
  const { height, width } = g;
  const background = backgroundColour(g);
  // Slides are measured on the grid before anything is lifted or painted.
  let slides: ([number, number] | undefined)[] | undefined;
  for (let i = 0; i < objects.length; i++) {
    const o = outcomes[i]!;
    if (o.kind !== 'slide') continue;
    const offset = slideOffset(objects[i]!, g, o.way, background);
    if (!offset) return null;
    (slides ??= [])[i] = offset;
  }
  const out = g.cells.slice();
  for (let i = 0; i < objects.length; i++) {
    const kind = outcomes[i]!.kind;
    if (kind === 'remove' || kind === 'move' || kind === 'slide') paintObjectInto(out, height, width, objects[i]!, background);
  }
  for (let i = 0; i < objects.length; i++) {
    const o = outcomes[i]!;
    if (o.kind === 'recolour') paintObjectInto(out, height, width, objects[i]!, o.colour);
  }
  for (let i = 0; i < objects.length; i++) {
    const o = outcomes[i]!;
    if (o.kind === 'move') paintObjectInto(out, height, width, objects[i]!, undefined, o.rows, o.columns);
    else if (o.kind === 'slide') paintObjectInto(out, height, width, objects[i]!, undefined, slides![i]![0], slides![i]![1]);
  }
  for (let i = 0; i < objects.length; i++) {
    const o = outcomes[i]!;
    if (o.kind === 'mirror') paintMirrored(out, width, objects[i]!, o.across === 'left_right', background);
    else if (o.kind === 'fill') paintHoles(out, width, objects[i]!, o.colour, background);
  }
  return new Grid(height, width, out);
}

/**
 * The outcomes that would turn the object of `input` into what `output` (the same size) shows,
 * in order of preference: fill (where it has holes and the output fills them: keeping or
 * recolouring it to its own colour would leave them unexplained), keep, remove, recolour (by
 * colour), mirror (left to right, then top to bottom), slides (toward, up, down, left, right;
 * each where it moves the object and the output shows it there), then moves by distance (the
 * shifted object must lie inside the grid and match the output cell for cell). Slides and moves
 * come straight after keep instead when one of them puts the object where the input showed
 * something else: the output changed there, and the object going there explains it. Whether the
 * rest of the output agrees is for the caller to check by applying the whole rule.
 */
export function possibleOutcomes(o: GridObject, input: Grid, output: Grid): ObjectOutcome[] {
  const found: ObjectOutcome[] = [];
  if (input.height !== output.height || input.width !== output.width) return found;
  const { width } = input;
  const background = backgroundColour(input);
  let kept = true;
  let single = -1;
  for (let r = 0; r < o.height; r++) {
    for (let c = 0; c < o.width; c++) {
      if (o.data[o.offset + r * o.width + c] === EMPTY) continue;
      const i = (o.top + r) * width + o.left + c;
      const after = output.data[output.offset + i]!;
      if (after !== input.data[input.offset + i]) kept = false;
      if (single === -1) single = after;
      else if (single !== after) single = -2;
    }
  }
  // Slides, then moves by distance, that put the object where the output shows it. When one of
  // them puts it on a cell the input did not already show so, the output's change there is
  // explained by the object going there: such outcomes come before removing (its old cells then
  // show the background too) and recolouring.
  const displaced: ObjectOutcome[] = [];
  let explainsChange = false;
  // An outcome that puts the object where the output shows it, at this offset.
  const take = (outcome: ObjectOutcome, rows: number, columns: number): void => {
    displaced.push(outcome);
    if (!matchesAt(o, input, o.top + rows, o.left + columns)) explainsChange = true;
  };
  for (const way of SLIDE_WAYS) {
    const offset = slideOffset(o, input, way, background);
    if (offset && (offset[0] !== 0 || offset[1] !== 0) && matchesAt(o, output, o.top + offset[0], o.left + offset[1])) take({ kind: 'slide', way }, offset[0], offset[1]);
  }
  const moves: [number, number][] = [];
  for (let dr = 0 - o.top; dr + o.top + o.height <= input.height; dr++) {
    for (let dc = 0 - o.left; dc + o.left + o.width <= input.width; dc++) {
      if (dr === 0 && dc === 0) continue;
      if (matchesAt(o, output, o.top + dr, o.left + dc)) moves.push([dr, dc]);
    }
  }
  moves.sort((a, b) => Math.abs(a[0]) + Math.abs(a[1]) - Math.abs(b[0]) - Math.abs(b[1]) || a[0] - b[0] || a[1] - b[1]);
  for (const [rows, columns] of moves) take({ kind: 'move', rows, columns }, rows, columns);
  if (kept) found.push({ kind: 'keep' });
  if (explainsChange) found.push(...displaced);
  if (single === background) found.push({ kind: 'remove' });
  else if (single >= 0) found.push({ kind: 'recolour', colour: single });
  mirrors(o, input, output, background, found);
  if (!explainsChange) found.push(...displaced);
  const fill = holesFill(o, input, output, background);
  if (fill) found.unshift(fill);
  return found;
}

/** Steps of rows and columns one way: up, down, left, right (the slide ways after `toward`, in order). */
const SLIDE_STEPS: readonly (readonly [number, number])[] = [
  [-1, 0],
  [1, 0],
  [0, -1],
  [0, 1],
];

/**
 * Where a slide takes the object, as an offset of rows and columns: whole steps one way while
 * every cell of the moved object stays in the grid and lands on the background or on a cell of
 * the object itself (what it would meet is read from `g` as it is). For `toward`, the shortest
 * of the four slides that stops against another object's cell rather than the border; undefined
 * when two ways tie for it or none stops so.
 */
export function slideOffset(o: GridObject, g: Grid, way: SlideWay, background: number): [number, number] | undefined {
  if (way !== 'toward') {
    const [dr, dc] = SLIDE_STEPS[SLIDE_WAYS.indexOf(way) - 1]!;
    return stepsOffset(slideSteps(o, g, dr, dc, background), dr, dc);
  }
  let best: [number, number] | undefined;
  let bestSteps = Infinity;
  let tied = false;
  for (const [dr, dc] of SLIDE_STEPS) {
    const steps = slideSteps(o, g, dr, dc, background);
    if (!landsInside(o, g, (steps + 1) * dr, (steps + 1) * dc)) continue;
    if (steps < bestSteps) {
      bestSteps = steps;
      best = stepsOffset(steps, dr, dc);
      tied = false;
    } else if (steps === bestSteps) tied = true;
  }
  return tied ? undefined : best;
}

/** `steps` steps of (dr, dc) as an offset of rows and columns (no negative zero). */
function stepsOffset(steps: number, dr: number, dc: number): [number, number] {
  return steps === 0 ? [0, 0] : [steps * dr, steps * dc];
}

/** How many whole steps (dr, dc) the object can take: each cell moved lies in the grid on the background or on the object's own cells. */
function slideSteps(o: GridObject, g: Grid, dr: number, dc: number, background: number): number {
  let steps = 0;
  for (;;) {
    const r0 = (steps + 1) * dr;
    const c0 = (steps + 1) * dc;
    if (!landsInside(o, g, r0, c0)) return steps;
    for (let r = 0; r < o.height; r++) {
      for (let c = 0; c < o.width; c++) {
        if (o.data[o.offset + r * o.width + c] === EMPTY) continue;
        const rr = r + r0;
        const cc = c + c0;
        // A cell of the object itself is left by the move: not in the way.
        if (holdsCell(o, rr, cc)) continue;
        if (g.data[g.offset + (o.top + rr) * g.width + o.left + cc] !== background) return steps;
      }
    }
    steps++;
  }
}

/** True when the object's box moved by (rows, columns) lies wholly in the grid. */
function landsInside(o: GridObject, g: Grid, rows: number, columns: number): boolean {
  return o.top + rows >= 0 && o.left + columns >= 0 && o.top + rows + o.height <= g.height && o.left + columns + o.width <= g.width;
}

function matchesAt(o: GridObject, g: Grid, top: number, left: number): boolean {
  for (let r = 0; r < o.height; r++) {
    for (let c = 0; c < o.width; c++) {
      const v = o.data[o.offset + r * o.width + c]!;
      if (v !== EMPTY && g.data[g.offset + (top + r) * g.width + left + c] !== v) return false;
    }
  }
  return true;
}

/**
 * What the object mirrored in its own box puts at (r, c) of the box: its colour where a mirrored
 * cell comes, the background where the object leaves a cell, -1 where neither (the grid's own cell).
 */
function mirroredColour(o: GridObject, r: number, c: number, leftRight: boolean, background: number): number {
  const v = leftRight ? o.data[o.offset + r * o.width + (o.width - 1 - c)]! : o.data[o.offset + (o.height - 1 - r) * o.width + c]!;
  if (v !== EMPTY) return v;
  return o.data[o.offset + r * o.width + c] !== EMPTY ? background : -1;
}

/** The object mirrored in its own box. */
function paintMirrored(out: Uint8Array, width: number, o: GridObject, leftRight: boolean, background: number): void {
  for (let r = 0; r < o.height; r++) {
    for (let c = 0; c < o.width; c++) {
      const v = mirroredColour(o, r, c, leftRight, background);
      if (v >= 0) out[(o.top + r) * width + o.left + c] = v;
    }
  }
}

/** The object's holes, where the grid shows the background, painted one colour. */
function paintHoles(out: Uint8Array, width: number, o: GridObject, colour: number, background: number): void {
  const { marks, count } = holeMarks(o);
  if (count === 0) return;
  for (let r = 0; r < o.height; r++) {
    for (let c = 0; c < o.width; c++) {
      const i = (o.top + r) * width + o.left + c;
      if (marks[r * o.width + c] === 1 && out[i] === background) out[i] = colour;
    }
  }
}

/**
 * Adds the object mirrored either way in its own box, where that gives what the output shows
 * there; also for an object its mirror leaves alike and the output keeps (then the same as keeping
 * it, offered after keep so that objects under one key, some lopsided and some not, can share
 * `mirror`, as an unchanged object is offered its own colour).
 */
function mirrors(o: GridObject, input: Grid, output: Grid, background: number, found: ObjectOutcome[]): void {
  const { width } = input;
  const outputCells = output.cells;
  for (const across of MIRROR_AXES) {
    const leftRight = across === 'left_right';
    let fits = true;
    for (let r = 0; r < o.height && fits; r++) {
      for (let c = 0; c < o.width && fits; c++) {
        const wanted = mirroredColour(o, r, c, leftRight, background);
        if (wanted >= 0 && outputCells[(o.top + r) * width + o.left + c] !== wanted) fits = false;
      }
    }
    if (fits) found.push({ kind: 'mirror', across });
  }
}

/**
 * The object's holes filled with one colour other than the background, where that gives what the
 * output shows: it has holes, its own cells stay, and every hole cell showing the background in
 * the input shows that colour in the output. Undefined otherwise.
 */
function holesFill(o: GridObject, input: Grid, output: Grid, background: number): ObjectOutcome | undefined {
  const { marks, count } = holeMarks(o);
  if (count === 0) return undefined;
  const { width } = input;
  const inputCells = input.cells;
  const outputCells = output.cells;
  let colour = -1;
  for (let r = 0; r < o.height; r++) {
    for (let c = 0; c < o.width; c++) {
      const i = (o.top + r) * width + o.left + c;
      const own = o.data[o.offset + r * o.width + c]!;
      if (own !== EMPTY) {
        if (outputCells[i] !== own) return undefined;
        continue;
      }
      if (marks[r * o.width + c] !== 1 || inputCells[i] !== background) continue;
      const v = outputCells[i]!;
      if (colour === -1) colour = v;
      else if (colour !== v) return undefined;
    }
  }
  return colour >= 0 && colour !== background ? { kind: 'fill', colour } : undefined;
}
