/**
 * Structural hash and equality for values of each base type, used by the search to recognise
 * candidates that compute the same thing, and by tests to compare results.
 */
import { Grid } from '../grid/grid.ts';
import { GridObject } from '../grid/grid-object.ts';
import { CellRule } from '../grid/cell-rule-table.ts';
import { GridRule } from '../grid/grid-rule-table.ts';
import { ObjectRule } from '../grid/object-rule-table.ts';
import { Palette } from './palette.ts';
import { Point } from './point.ts';
import { isFailure } from './failure.ts';
import type { BaseType } from './types.ts';

const FAILURE_HASH = 0x7f4a7c15;

export function hashValue(type: BaseType, value: unknown): number {
  if (isFailure(value)) return FAILURE_HASH;
  switch (type) {
    case 'Grid':
      return (value as Grid).hash;
    case 'Object':
      return (value as GridObject).hash;
    case 'Colour':
    case 'Int':
      return Math.imul((value as number) + 7919, 0x9e3779b1) >>> 0;
    case 'Bool':
      return value ? 0x1234567 : 0x7654321;
    case 'Point':
      return (value as Point).hash;
    case 'Palette':
      return (value as Palette).hash;
    case 'CellRule':
      return (value as CellRule).hash;
    case 'ObjectRule':
      return (value as ObjectRule).hash;
    case 'GridRule':
      return (value as GridRule).hash;
    case 'Objects':
    case 'Grids': {
      const list = value as readonly (Grid | GridObject)[];
      let h = 0x3c6ef372 ^ list.length;
      for (let i = 0; i < list.length; i++) h = Math.imul(h ^ list[i]!.hash, 0x01000193);
      return h >>> 0;
    }
  }
}

export function valuesEqual(type: BaseType, a: unknown, b: unknown): boolean {
  // Each type compares at a place of its own: a `===` that sees values of every type compiles to
  // the engine's generic comparison, one that sees only grids (or only numbers) to a single check.
  if (isFailure(a) || isFailure(b)) return a === b;
  switch (type) {
    case 'Grid':
      return (a as Grid).equals(b as Grid);
    case 'Object':
      return (a as GridObject).equals(b as GridObject);
    case 'Colour':
    case 'Int':
    case 'Bool':
      return a === b;
    case 'Point':
      return (a as Point).equals(b as Point);
    case 'Palette':
      return (a as Palette).equals(b as Palette);
    case 'CellRule':
      return (a as CellRule).equals(b as CellRule);
    case 'ObjectRule':
      return (a as ObjectRule).equals(b as ObjectRule);
    case 'GridRule':
      return (a as GridRule).equals(b as GridRule);
    case 'Objects':
    case 'Grids': {
      const x = a as readonly (Grid | GridObject)[];
      const y = b as readonly (Grid | GridObject)[];
      if (x === y) return true;
      if (x.length !== y.length) return false;
      for (let i = 0; i < x.length; i++) {
        const p = x[i]!;
        const q = y[i]!;
        if (p instanceof Grid ? !p.equals(q as Grid) : !(p as GridObject).equals(q as GridObject)) return false;
      }
      return true;
    }
  }
}

/** Whether a runtime value belongs to a base type (used by the soundness tests). */
export function valueHasType(type: BaseType, value: unknown): boolean {
  switch (type) {
    case 'Grid':
      return value instanceof Grid;
    case 'Object':
      return value instanceof GridObject;
    case 'Colour':
      return typeof value === 'number' && Number.isInteger(value) && value >= 0 && value <= 9;
    case 'Int':
      return typeof value === 'number' && Number.isInteger(value);
    case 'Bool':
      return typeof value === 'boolean';
    case 'Point':
      return value instanceof Point;
    case 'Palette':
      return value instanceof Palette;
    case 'CellRule':
      return value instanceof CellRule;
    case 'ObjectRule':
      return value instanceof ObjectRule;
    case 'GridRule':
      return value instanceof GridRule;
    case 'Objects':
      return Array.isArray(value) && value.every((v) => v instanceof GridObject);
    case 'Grids':
      return Array.isArray(value) && value.every((v) => v instanceof Grid);
  }
}
