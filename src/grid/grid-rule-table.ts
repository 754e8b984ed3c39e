/**
 * Grid rules: a table that picks the whole output grid from one property of the whole input:
 * how many colours it holds or which, how many cells are not background, how many objects it
 * has, the shape its non-background cells make, whether it is symmetric. A rule says "inputs
 * alike in this respect have the same output"; it is read off demonstrations whose outputs
 * repeat (src/search/learned-tables.ts).
 *
 * Applying a rule looks the input's value up and gives the grid the table holds for it, or fails
 * (null) when the table has no entry for that value: a rule never guesses.
 */
import { backgroundColour, colourCounts, components } from './components.ts';
import { cellBounds } from './crop.ts';
import { Grid } from './grid.ts';
import { isSymmetricLeftRight, isSymmetricTopBottom } from './symmetry.ts';
import { tableKeyCode, textHash } from './text-hash.ts';

export const GRID_PROPERTIES = [
  'colour_count',
  'colour_set',
  'cells',
  'objects',
  'objects_diagonal',
  'shape',
  'symmetric_left_right',
  'symmetric_top_bottom',
] as const;
export type GridProperty = (typeof GRID_PROPERTIES)[number];

/**
 * A property's value: a whole number (`colour_count`: colours present, the background
 * included; `cells`: cells not of the background colour; `objects` / `objects_diagonal`:
 * one-colour objects other than the background, joined through edges / also corners), 1/0 for
 * yes/no (`symmetric_left_right`, `symmetric_top_bottom`: the grid equals its mirror image), the
 * colours present as their digits in rising order (`colour_set`, "02" for colours 0 and 2), or
 * for `shape` the box of the cells not of the background colour, rows joined by `/`, `x` for
 * such a cell and `.` for the rest. A grid of one colour has no shape: a rule by shape fails on it.
 */
export type GridKey = number | string;

/** What kind of key a property has. */
export function gridPropertyValues(property: GridProperty): 'number' | 'colours' | 'yes or no' | 'shape' {
  switch (property) {
    case 'colour_set':
      return 'colours';
    case 'shape':
      return 'shape';
    case 'symmetric_left_right':
    case 'symmetric_top_bottom':
      return 'yes or no';
    default:
      return 'number';
  }
}

/** An entry: a value of the property and the output grid, as rows of colours (plain data, as program trees are). */
export interface GridRuleEntry {
  readonly key: GridKey;
  readonly rows: readonly (readonly number[])[];
}

/** The value of a property for a grid, or undefined when the grid has none (`shape` of a one-colour grid). */
export function gridKey(g: Grid, property: GridProperty): GridKey | undefined {
  switch (property) {
    case 'colour_count':
    case 'colour_set': {
      const counts = colourCounts(g);
      let n = 0;
      let set = '';
      for (let c = 0; c < 10; c++) {
        if (counts[c]! === 0) continue;
        n++;
        set += String(c);
      }
      return property === 'colour_count' ? n : set;
    }
    case 'cells':
      return g.height * g.width - colourCounts(g)[backgroundColour(g)]!;
    case 'objects':
    case 'objects_diagonal':
      return components(g, { diagonal: property === 'objects_diagonal', multicolour: false, background: backgroundColour(g) }).length;
    case 'shape':
      return backgroundShape(g);
    case 'symmetric_left_right':
      return isSymmetricLeftRight(g) ? 1 : 0;
    case 'symmetric_top_bottom':
      return isSymmetricTopBottom(g) ? 1 : 0;
  }
}

function backgroundShape(g: Grid): string | undefined {
  const background = backgroundColour(g);
  const bounds = cellBounds(g, background, false);
  if (!bounds) return undefined;
  const { top, left, bottom, right } = bounds;
  const { width, cells } = g;
  let text = '';
  for (let r = top; r <= bottom; r++) {
    if (r > top) text += '/';
    for (let c = left; c <= right; c++) text += cells[r * width + c] === background ? '.' : 'x';
  }
  return text;
}

/** A property of the whole grid and a table from its values to output grids. */
export class GridRule {
  readonly property: GridProperty;
  readonly entries: readonly GridRuleEntry[];
  readonly hash: number;
  private readonly table = new Map<string, Grid>();

  /** The first entry for a key counts (the parser rejects repeated keys). */
  constructor(property: GridProperty, entries: readonly GridRuleEntry[]) {
    this.property = property;
    this.entries = entries;
    for (const e of entries) {
      const code = tableKeyCode(e.key);
      if (!this.table.has(code)) this.table.set(code, Grid.fromRows(e.rows));
    }
    let sum = 0;
    for (const [key, grid] of this.table) sum = (sum + Math.imul(textHash(key), 0x9e3779b1) + grid.hash) | 0;
    const h = Math.imul(0x2545f491 ^ GRID_PROPERTIES.indexOf(property), 0x01000193);
    this.hash = (Math.imul(h ^ sum, 0x85ebca6b) ^ this.table.size) >>> 0;
  }

  gridFor(key: GridKey): Grid | undefined {
    return this.table.get(tableKeyCode(key));
  }

  get size(): number {
    return this.table.size;
  }

  equals(other: GridRule): boolean {
    if (this === other) return true;
    if (this.hash !== other.hash || this.property !== other.property || this.table.size !== other.table.size) return false;
    for (const [key, grid] of this.table) {
      const theirs = other.table.get(key);
      if (!theirs || !theirs.equals(grid)) return false;
    }
    return true;
  }
}

/** The grid the rule holds for the input's value; null when the table has none. */
export function applyGridRule(g: Grid, rule: GridRule): Grid | null {
  const key = gridKey(g, rule.property);
  if (key === undefined) return null;
  return rule.gridFor(key) ?? null;
}

/** Rows of digits joined by `/`, such as `505/050`: how a grid rule writes its grids. */
export function gridDigits(rows: readonly (readonly number[])[]): string {
  return rows.map((row) => row.join('')).join('/');
}

