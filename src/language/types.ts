/**
 * The type language. Base types name the kinds of value a step can hold; a function type
 * `A -> B` is the type of a section (a call with its first argument left open), which is
 * how higher-order primitives receive predicates, key functions and per-object transforms.
 * Types are plain strings so signatures are data a search can index.
 */
import type { Grid } from '../grid/grid.ts';
import type { GridObject } from '../grid/grid-object.ts';
import type { CellRule } from '../grid/cell-rule-table.ts';
import type { GridRule } from '../grid/grid-rule-table.ts';
import type { ObjectRule } from '../grid/object-rule-table.ts';
import type { Palette } from './palette.ts';
import type { Point } from './point.ts';
import type { Failure } from './failure.ts';

export const BASE_TYPES = ['Grid', 'Colour', 'Int', 'Bool', 'Object', 'Objects', 'Point', 'Grids', 'Palette', 'CellRule', 'ObjectRule', 'GridRule'] as const;
export type BaseType = (typeof BASE_TYPES)[number];
export type FunctionType = `${BaseType} -> ${BaseType}`;
export type Type = BaseType | FunctionType;

/** The runtime value each base type holds. */
export interface BaseValues {
  Grid: Grid;
  Colour: number;
  Int: number;
  Bool: boolean;
  Object: GridObject;
  Objects: readonly GridObject[];
  Point: Point;
  Grids: readonly Grid[];
  Palette: Palette;
  CellRule: CellRule;
  ObjectRule: ObjectRule;
  GridRule: GridRule;
}

export type ValueOf<T extends Type> = T extends BaseType
  ? BaseValues[T]
  : T extends `${infer A extends BaseType} -> ${infer B extends BaseType}`
    ? (argument: BaseValues[A]) => BaseValues[B] | Failure
    : never;

/** Any runtime value of the language. */
export type Value = BaseValues[BaseType] | ((argument: never) => unknown);

export function isBaseType(text: string): text is BaseType {
  return (BASE_TYPES as readonly string[]).includes(text);
}

export function functionType(parameter: BaseType, result: BaseType): FunctionType {
  return `${parameter} -> ${result}`;
}

/** Splits `A -> B` into its parts, or returns undefined for a base type. */
export function splitFunctionType(type: Type): { parameter: BaseType; result: BaseType } | undefined {
  const arrow = type.indexOf(' -> ');
  if (arrow < 0) return undefined;
  return { parameter: type.slice(0, arrow) as BaseType, result: type.slice(arrow + 4) as BaseType };
}

export function isType(text: string): text is Type {
  if (isBaseType(text)) return true;
  const arrow = text.indexOf(' -> ');
  return arrow > 0 && isBaseType(text.slice(0, arrow)) && isBaseType(text.slice(arrow + 4));
}
