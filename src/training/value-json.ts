/**
 * A step's value as plain JSON, by its type, for trace records (schemas/trace-record.schema.json):
 *
 * - Grid: a list of rows of colours; Grids: a list of such grids.
 * - Object: `{top, left, height, width, colour, cells}` where `cells` lists every cell of the
 *   object as `[row, column, colour]`, row and column on the grid it came from, in reading order,
 *   and `colour` is its most frequent colour; Objects: a list of such objects.
 * - Colour, Int: a number; Bool: true or false.
 * - Point: `{row, column}`.
 * - Palette: the colours it changes, as `[from, to]` pairs in colour order.
 * - CellRule, ObjectRule, GridRule (learned tables): the table as program text.
 *
 * The failure value has no encoding here: a trace writes `null` with a reason instead.
 */
import { EMPTY, Grid } from '../grid/grid.ts';
import { GridObject } from '../grid/grid-object.ts';
import { Palette } from '../language/palette.ts';
import { printExpression } from '../language/printer.ts';
import { objectRuleLiteral } from '../language/ast.ts';
import type { CellRule } from '../grid/cell-rule-table.ts';
import type { GridRule } from '../grid/grid-rule-table.ts';
import type { ObjectRule } from '../grid/object-rule-table.ts';
import { Point } from '../language/point.ts';
import type { BaseType } from '../language/types.ts';

export type Rows = number[][];

export interface ObjectJson {
  readonly top: number;
  readonly left: number;
  readonly height: number;
  readonly width: number;
  readonly colour: number;
  readonly cells: [number, number, number][];
}

export type ValueJson = Rows | Rows[] | ObjectJson | ObjectJson[] | number | boolean | string | { row: number; column: number } | [number, number][];

export function objectJson(o: GridObject): ObjectJson {
  const cells: [number, number, number][] = [];
  const shape = o.shape;
  for (let r = 0; r < shape.height; r++) {
    for (let c = 0; c < shape.width; c++) {
      const v = shape.get(r, c);
      if (v !== EMPTY) cells.push([o.top + r, o.left + c, v]);
    }
  }
  return { top: o.top, left: o.left, height: o.height, width: o.width, colour: o.mainColour, cells };
}

/** The JSON of a (non-failure) value of a base type. */
export function valueJson(type: BaseType, value: unknown): ValueJson {
  switch (type) {
    case 'Grid':
      return (value as Grid).toRows();
    case 'Grids':
      return (value as readonly Grid[]).map((g) => g.toRows());
    case 'Object':
      return objectJson(value as GridObject);
    case 'Objects':
      return (value as readonly GridObject[]).map(objectJson);
    case 'Colour':
    case 'Int':
      return value as number;
    case 'Bool':
      return value as boolean;
    case 'Point':
      return { row: (value as Point).row, column: (value as Point).column };
    case 'Palette':
      return (value as Palette).pairs();
    case 'CellRule': {
      const rule = value as CellRule;
      return printExpression({ kind: 'literal', literal: { type: 'CellRule', features: rule.features, entries: rule.entries } });
    }
    case 'ObjectRule': {
      const rule = value as ObjectRule;
      return printExpression({ kind: 'literal', literal: objectRuleLiteral(rule.grouping, rule.property, rule.second, rule.entries) });
    }
    case 'GridRule': {
      const rule = value as GridRule;
      return printExpression({ kind: 'literal', literal: { type: 'GridRule', property: rule.property, entries: rule.entries } });
    }
  }
}
