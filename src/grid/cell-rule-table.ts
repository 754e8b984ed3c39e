/**
 * Cell rules: a table that gives every output cell's colour from a few features of the input
 * cell and its neighbourhood (its colour, a neighbour's colour, how many neighbours have a
 * colour, whether its row or column holds a colour, the parity of its row or column counted
 * from the top or left or from the bottom or right, whether it is a background cell enclosed by
 * other colours, whether it lies on the grid's border, the first colour other than the background
 * met looking up, down, left or right from it).
 *
 * A rule is a list of features, the first the cell's own colour or whether the cell is the
 * grid's background, and a table from keys (one value per feature) to colours or `keep` (the
 * cell keeps its colour). Starting with `background` makes a rule that does not name the colours
 * of the objects, so it still applies when a test input brings a colour no demonstration shows.
 * Applying a rule to a grid looks every cell's key up; a key the table does not hold makes the
 * whole application fail (null): a rule never guesses.
 *
 * A key may also hold `any` (ANY) for a feature, matching every value of it. A rule with such a
 * key is a list read in order: a cell takes the colour of the first entry its values match (so
 * `yes #1 any -> #2` before `any any any -> keep` says "a background cell below a #1 cell becomes
 * #2, every other cell keeps its colour"). A cell no entry matches still makes the application
 * fail. Such a list states each condition once instead of once per combination of the other
 * features, so it can cover combinations no demonstration shows.
 */
import { backgroundColour } from './components.ts';
import { Grid, newCells } from './grid.ts';
import { enclosedCells } from './holes.ts';

/** The value a neighbour feature takes for a position outside the grid. */
export const EDGE = 10;

/** An entry's output meaning "the cell keeps its colour" (written `keep`). */
export const KEEP = 11;

/** A key value matching every value of its feature (written `any`); a rule holding one is read in order. */
export const ANY = 12;

/** True when some entry's key holds `any`: the rule is then a list read in order. */
export function isOrderedRule(entries: readonly CellRuleEntry[]): boolean {
  for (const e of entries) for (const v of e.key) if (v === ANY) return true;
  return false;
}

/** The features a cell rule may start with: the cell's own colour, or whether it is background. */
export const FIRST_FEATURES = ['colour', 'background'] as const;

export const CELL_FEATURE_NAMES = [
  'colour',
  'background',
  'above',
  'below',
  'left',
  'right',
  'above_left',
  'above_right',
  'below_left',
  'below_right',
  'around',
  'beside',
  'row_holds',
  'column_holds',
  'row_parity',
  'column_parity',
  'row_parity_from_bottom',
  'column_parity_from_right',
  'enclosed',
  'on_border',
  'sees_above',
  'sees_below',
  'sees_left',
  'sees_right',
] as const;
export type CellFeatureName = (typeof CELL_FEATURE_NAMES)[number];

/** A feature of a cell; `colour` is given exactly for the features that count or look for a colour. */
export interface CellFeature {
  readonly name: CellFeatureName;
  readonly colour?: number;
}

/**
 * What values a feature takes: a colour; a colour or EDGE (a neighbour); a count of the 8
 * surrounding cells (0-8) or of the 4 edge neighbours (0-4); yes (1) or no (0); even (0) or
 * odd (1). `enclosed` is yes for a cell of the grid's background colour that cannot reach the
 * border through edge steps over background cells. `sees_above` (and below, left, right) is the
 * first cell's colour that is not the grid's background, going straight up from the cell (the
 * cell itself not counted), or EDGE when only background lies between the cell and the border.
 */
export type CellFeatureValues = 'colour' | 'neighbour' | 'count of 8' | 'count of 4' | 'yes or no' | 'parity';

export interface CellRuleEntry {
  /** One value per feature, in the rule's feature order. */
  readonly key: readonly number[];
  /** The output colour, or KEEP. */
  readonly colour: number;
}

const OFFSETS: Readonly<Record<string, readonly [number, number]>> = {
  above: [-1, 0],
  below: [1, 0],
  left: [0, -1],
  right: [0, 1],
  above_left: [-1, -1],
  above_right: [-1, 1],
  below_left: [1, -1],
  below_right: [1, 1],
};

/** The step each `sees_` feature looks along. */
const SIGHT_LINES: Readonly<Record<string, readonly [number, number]>> = {
  sees_above: [-1, 0],
  sees_below: [1, 0],
  sees_left: [0, -1],
  sees_right: [0, 1],
};

export function isCellFeatureName(text: string): text is CellFeatureName {
  return (CELL_FEATURE_NAMES as readonly string[]).includes(text);
}

/** Whether the feature is about a given colour (`around #2`, `row_holds #5`, ...). */
export function featureTakesColour(name: CellFeatureName): boolean {
  return name === 'around' || name === 'beside' || name === 'row_holds' || name === 'column_holds';
}

export function featureValues(name: CellFeatureName): CellFeatureValues {
  switch (name) {
    case 'colour':
      return 'colour';
    case 'around':
      return 'count of 8';
    case 'beside':
      return 'count of 4';
    case 'background':
    case 'row_holds':
    case 'column_holds':
    case 'enclosed':
    case 'on_border':
      return 'yes or no';
    case 'row_parity':
    case 'column_parity':
    case 'row_parity_from_bottom':
    case 'column_parity_from_right':
      return 'parity';
    default:
      return 'neighbour';
  }
}

/** The largest value a feature of this kind takes. */
export function largestFeatureValue(values: CellFeatureValues): number {
  switch (values) {
    case 'colour':
      return 9;
    case 'neighbour':
      return EDGE;
    case 'count of 8':
      return 8;
    case 'count of 4':
      return 4;
    case 'yes or no':
    case 'parity':
      return 1;
  }
}

/** Keys are packed into one number, 16 values per feature (exact up to 13 features). */
const RADIX = 16;

export function packKey(key: readonly number[]): number {
  let packed = 0;
  for (let i = key.length - 1; i >= 0; i--) packed = packed * RADIX + key[i]!;
  return packed;
}

/** The value of one feature for every cell of the grid, row-major. */
export function featureOfCells(g: Grid, feature: CellFeature): Uint8Array {
  const { height, width, cells } = g;
  const out = new Uint8Array(cells.length);
  const target = feature.colour ?? -1;
  switch (feature.name) {
    case 'colour':
      out.set(cells);
      return out;
    case 'background': {
      const background = backgroundColour(g);
      for (let i = 0; i < cells.length; i++) out[i] = cells[i] === background ? 1 : 0;
      return out;
    }
    case 'row_parity':
      for (let r = 0; r < height; r++) out.fill(r & 1, r * width, (r + 1) * width);
      return out;
    case 'enclosed':
      return enclosedCells(g, backgroundColour(g));
    case 'on_border':
      for (let r = 0; r < height; r++) {
        for (let c = 0; c < width; c++) out[r * width + c] = r === 0 || c === 0 || r === height - 1 || c === width - 1 ? 1 : 0;
      }
      return out;
    case 'column_parity':
      for (let i = 0; i < cells.length; i++) out[i] = (i % width) & 1;
      return out;
    case 'row_parity_from_bottom':
      for (let r = 0; r < height; r++) out.fill((height - 1 - r) & 1, r * width, (r + 1) * width);
      return out;
    case 'column_parity_from_right':
      for (let i = 0; i < cells.length; i++) out[i] = (width - 1 - (i % width)) & 1;
      return out;
    case 'sees_above':
    case 'sees_below':
    case 'sees_left':
    case 'sees_right': {
      const [dr, dc] = SIGHT_LINES[feature.name]!;
      const background = backgroundColour(g);
      // One sweep from the side looked at: the value at a cell is its neighbour's colour when the
      // neighbour is not background, else the neighbour's own value.
      const rowStart = dr > 0 ? height - 1 : 0;
      const rowStep = dr > 0 ? -1 : 1;
      const columnStart = dc > 0 ? width - 1 : 0;
      const columnStep = dc > 0 ? -1 : 1;
      for (let r = rowStart; r >= 0 && r < height; r += rowStep) {
        for (let c = columnStart; c >= 0 && c < width; c += columnStep) {
          const nr = r + dr;
          const nc = c + dc;
          if (nr < 0 || nr >= height || nc < 0 || nc >= width) out[r * width + c] = EDGE;
          else {
            const n = nr * width + nc;
            out[r * width + c] = cells[n] !== background ? cells[n]! : out[n]!;
          }
        }
      }
      return out;
    }
    case 'row_holds':
      for (let r = 0; r < height; r++) {
        let holds = 0;
        for (let c = 0; c < width; c++) if (cells[r * width + c] === target) holds = 1;
        out.fill(holds, r * width, (r + 1) * width);
      }
      return out;
    case 'column_holds':
      for (let c = 0; c < width; c++) {
        let holds = 0;
        for (let r = 0; r < height; r++) if (cells[r * width + c] === target) holds = 1;
        for (let r = 0; r < height; r++) out[r * width + c] = holds;
      }
      return out;
    case 'around':
    case 'beside': {
      const diagonal = feature.name === 'around';
      for (let r = 0; r < height; r++) {
        for (let c = 0; c < width; c++) {
          let count = 0;
          for (let dr = -1; dr <= 1; dr++) {
            const nr = r + dr;
            if (nr < 0 || nr >= height) continue;
            for (let dc = -1; dc <= 1; dc++) {
              if ((dr === 0 && dc === 0) || (!diagonal && dr !== 0 && dc !== 0)) continue;
              const nc = c + dc;
              if (nc >= 0 && nc < width && cells[nr * width + nc] === target) count++;
            }
          }
          out[r * width + c] = count;
        }
      }
      return out;
    }
    default: {
      const [dr, dc] = OFFSETS[feature.name]!;
      for (let r = 0; r < height; r++) {
        const nr = r + dr;
        for (let c = 0; c < width; c++) {
          const nc = c + dc;
          out[r * width + c] = nr >= 0 && nr < height && nc >= 0 && nc < width ? cells[nr * width + nc]! : EDGE;
        }
      }
      return out;
    }
  }
}

/** Every cell's packed key under the features, row-major. */
export function cellKeys(g: Grid, features: readonly CellFeature[]): Float64Array {
  const keys = new Float64Array(g.height * g.width);
  for (let f = features.length - 1; f >= 0; f--) {
    const values = featureOfCells(g, features[f]!);
    for (let i = 0; i < keys.length; i++) keys[i] = keys[i]! * RADIX + values[i]!;
  }
  return keys;
}

export function sameFeatures(a: readonly CellFeature[], b: readonly CellFeature[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i]!.name !== b[i]!.name || a[i]!.colour !== b[i]!.colour) return false;
  return true;
}

/** A learned or written cell rule: features and a table from keys to colours (or, with `any` in a key, a list read in order). */
export class CellRule {
  readonly features: readonly CellFeature[];
  readonly entries: readonly CellRuleEntry[];
  readonly hash: number;
  /** True when some key holds `any`: the first entry a cell matches counts, so order matters. */
  readonly ordered: boolean;
  private readonly table = new Map<number, number>();

  /** The first entry for a key counts (the parser rejects repeated keys). */
  constructor(features: readonly CellFeature[], entries: readonly CellRuleEntry[]) {
    this.features = features;
    this.entries = entries;
    this.ordered = isOrderedRule(entries);
    for (const e of entries) {
      const packed = packKey(e.key);
      if (!this.table.has(packed)) this.table.set(packed, e.colour);
    }
    let h = 0x6a09e667 ^ features.length;
    for (const f of features) h = Math.imul(h ^ (CELL_FEATURE_NAMES.indexOf(f.name) * 16 + (f.colour ?? 15)), 0x01000193);
    let sum = 0;
    if (this.ordered) {
      // A list read in order: its hash follows the order.
      for (const e of entries) sum = Math.imul(sum ^ (hashKey(packKey(e.key)) ^ e.colour), 0x01000193);
    } else {
      // Order-free over entries, so equal tables written in another order hash alike.
      for (const [key, colour] of this.table) sum = (sum + (hashKey(key) ^ colour)) | 0;
    }
    this.hash = (Math.imul(h ^ sum, 0x85ebca6b) ^ this.table.size) >>> 0;
  }

  /** The colour for a packed key, or undefined when the table has no entry for it (a rule without `any`). */
  colourFor(packedKey: number): number | undefined {
    return this.table.get(packedKey);
  }

  /** For a list read in order: the colour of the first entry cell i matches, given each feature's values. */
  firstMatch(columns: readonly Uint8Array[], i: number): number | undefined {
    for (const e of this.entries) {
      const key = e.key;
      let matches = true;
      for (let f = 0; f < key.length; f++) {
        const v = key[f]!;
        if (v !== ANY && v !== columns[f]![i]) {
          matches = false;
          break;
        }
      }
      if (matches) return e.colour;
    }
    return undefined;
  }

  get size(): number {
    return this.table.size;
  }

  equals(other: CellRule): boolean {
    if (this === other) return true;
    if (this.hash !== other.hash || this.ordered !== other.ordered || this.table.size !== other.table.size || !sameFeatures(this.features, other.features)) return false;
    if (this.ordered) {
      if (this.entries.length !== other.entries.length) return false;
      for (let k = 0; k < this.entries.length; k++) {
        const a = this.entries[k]!;
        const b = other.entries[k]!;
        if (a.colour !== b.colour || packKey(a.key) !== packKey(b.key)) return false;
      }
      return true;
    }
    for (const [key, colour] of this.table) if (other.table.get(key) !== colour) return false;
    return true;
  }
}

function hashKey(key: number): number {
  return Math.imul((key % 0x7fffffff) ^ Math.floor(key / 0x7fffffff), 0x9e3779b1);
}

export function isFirstFeature(name: string): name is (typeof FIRST_FEATURES)[number] {
  return (FIRST_FEATURES as readonly string[]).includes(name);
}

/**
 * The grid with every cell recoloured by the rule; null when some cell's key has no entry, or
 * when the rule's first feature is neither the cell's colour nor `background`.
 */
export function applyCellRule(g: Grid, rule: CellRule): Grid | null {
  if (rule.features.length === 0 || !isFirstFeature(rule.features[0]!.name)) return null;
  if (rule.ordered) {
    const columns = rule.features.map((f) => featureOfCells(g, f));
    const out = newCells(g.height * g.width);
    for (let i = 0; i < out.length; i++) {
      const colour = rule.firstMatch(columns, i);
      if (colour === undefined) return null;
      out[i] = colour === KEEP ? g.data[g.offset + i]! : colour;
    }
    return new Grid(g.height, g.width, out);
  }
  const keys = cellKeys(g, rule.features);
  const out = newCells(keys.length);
  for (let i = 0; i < keys.length; i++) {
    const colour = rule.colourFor(keys[i]!);
    if (colour === undefined) return null;
    out[i] = colour === KEEP ? g.data[g.offset + i]! : colour;
  }
  return new Grid(g.height, g.width, out);
}
