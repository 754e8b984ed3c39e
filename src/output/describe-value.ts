/**
 * Shows a runtime value of the language to a person (lines of text, grids drawn) or as plain
 * JSON data (for --json output and exported traces).
 */
import { EMPTY, Grid } from '../grid/grid.ts';
import { isFailure } from '../language/failure.ts';
import { GridObject } from '../grid/grid-object.ts';
import { Palette } from '../language/palette.ts';
import { printLiteral } from '../language/printer.ts';
import { objectRuleLiteral } from '../language/ast.ts';
import { CellRule } from '../grid/cell-rule-table.ts';
import { GridRule } from '../grid/grid-rule-table.ts';
import { ObjectRule } from '../grid/object-rule-table.ts';
import { Point } from '../language/point.ts';
import type { Type } from '../language/types.ts';
import { drawGrid, type ColourMode, type DrawOptions } from './terminal-grid.ts';

/** JSON-ready data: grids as rows (EMPTY cells of object shapes as null). */
export type ValueData =
  | number
  | boolean
  | string
  | null
  | readonly ValueData[]
  | { readonly [key: string]: ValueData };

/** A learned table as the program text that writes it. */
function tableText(value: CellRule | ObjectRule | GridRule): string {
  if (value instanceof CellRule) return printLiteral({ type: 'CellRule', features: value.features, entries: value.entries });
  if (value instanceof GridRule) return printLiteral({ type: 'GridRule', property: value.property, entries: value.entries });
  return printLiteral(objectRuleLiteral(value.grouping, value.property, value.second, value.entries));
}

function rowsWithEmpty(grid: Grid): (number | null)[][] {
  return grid.toRows().map((row) => row.map((v) => (v === EMPTY ? null : v)));
}

export function valueToData(value: unknown): ValueData {
  if (isFailure(value)) return 'FAILURE';
  if (value instanceof Grid) return rowsWithEmpty(value);
  if (value instanceof GridObject) return { top: value.top, left: value.left, size: value.size, colour: value.mainColour, shape: rowsWithEmpty(value.shape) };
  if (value instanceof Point) return { row: value.row, column: value.column };
  if (value instanceof Palette) return value.pairs().map(([from, to]) => [from, to]);
  if (value instanceof CellRule || value instanceof ObjectRule || value instanceof GridRule) return tableText(value);
  if (Array.isArray(value)) return value.map(valueToData);
  if (typeof value === 'number' || typeof value === 'boolean') return value;
  if (typeof value === 'function') return 'function';
  return String(value);
}

function describeObject(o: GridObject, mode: ColourMode, options: DrawOptions): string[] {
  return [`object at (${o.top}, ${o.left}), ${o.height}x${o.width}, ${o.size} cells, colour #${o.mainColour}`, ...drawGrid(o.shape, mode, options).map((l) => `  ${l}`)];
}

/** Lines showing the value; grids and object shapes are drawn (with a legend line if asked). */
export function describeValue(type: Type, value: unknown, mode: ColourMode, options: DrawOptions = {}): string[] {
  if (isFailure(value)) return ['FAILURE'];
  if (value instanceof Grid) return [`grid ${value.height}x${value.width}`, ...drawGrid(value, mode, options)];
  if (value instanceof GridObject) return describeObject(value, mode, options);
  if (value instanceof Point) return [`(${value.row}, ${value.column})`];
  if (value instanceof Palette) return [`{${value.pairs().map(([a, b]) => `#${a} -> #${b}`).join(', ')}}`];
  if (value instanceof CellRule || value instanceof ObjectRule || value instanceof GridRule) return [tableText(value)];
  if (Array.isArray(value)) {
    const out = [`${value.length} ${type === 'Objects' ? 'object' : 'grid'}${value.length === 1 ? '' : 's'}`];
    value.forEach((item, i) => {
      const lines = item instanceof GridObject ? describeObject(item, mode, options) : describeValue('Grid', item, mode, options);
      out.push(`[${i}] ${lines[0]}`, ...lines.slice(1).map((l) => `    ${l}`));
    });
    return out;
  }
  if (type === 'Colour' && typeof value === 'number') return [`#${value}`];
  if (typeof value === 'number' || typeof value === 'boolean') return [String(value)];
  return [String(value)];
}
