import type { CellFeature, CellRuleEntry } from '../grid/cell-rule-table.ts';
import type { GridProperty, GridRuleEntry } from '../grid/grid-rule-table.ts';
import type { ObjectGrouping, ObjectProperty, ObjectRuleEntry } from '../grid/object-rule-table.ts';

/**
 * Programs as data. A program names its input grid, computes named steps in order, and ends
 * with an answer expression. Comments are part of the tree so printing keeps them.
 */
export type LiteralValue =
  | { readonly type: 'Colour'; readonly value: number }
  | { readonly type: 'Int'; readonly value: number }
  | { readonly type: 'Bool'; readonly value: boolean }
  | { readonly type: 'Point'; readonly row: number; readonly column: number }
  | { readonly type: 'Palette'; readonly pairs: readonly (readonly [number, number])[] }
  /** A learned table from features of a cell to its output colour (src/grid/cell-rule-table.ts). */
  | { readonly type: 'CellRule'; readonly features: readonly CellFeature[]; readonly entries: readonly CellRuleEntry[] }
  /**
   * A learned table from a property of an object (or two: `second`, and each entry's
   * `secondKey`) to what becomes of it (src/grid/object-rule-table.ts).
   */
  | {
      readonly type: 'ObjectRule';
      readonly grouping: ObjectGrouping;
      readonly property: ObjectProperty;
      readonly second?: ObjectProperty;
      readonly entries: readonly ObjectRuleEntry[];
    }
  /** A learned table from a property of the whole grid to an output grid (src/grid/grid-rule-table.ts). */
  | { readonly type: 'GridRule'; readonly property: GridProperty; readonly entries: readonly GridRuleEntry[] };

/** An object rule literal, with `second` written only when the rule keys on two properties. */
export function objectRuleLiteral(grouping: ObjectGrouping, property: ObjectProperty, second: ObjectProperty | undefined, entries: readonly ObjectRuleEntry[]): Extract<LiteralValue, { type: 'ObjectRule' }> {
  return second === undefined ? { type: 'ObjectRule', grouping, property, entries } : { type: 'ObjectRule', grouping, property, second, entries };
}

export type Expression =
  | { readonly kind: 'variable'; readonly name: string }
  | { readonly kind: 'literal'; readonly literal: LiteralValue }
  | { readonly kind: 'call'; readonly primitive: string; readonly arguments: readonly Expression[] }
  /** `_`: the open first argument of a section such as `has_colour(_, #3)`. */
  | { readonly kind: 'hole' };

export interface Step {
  readonly comments: readonly string[];
  readonly name: string;
  readonly expression: Expression;
}

export interface Program {
  /** Comment lines before `with`. */
  readonly comments: readonly string[];
  readonly input: string;
  readonly steps: readonly Step[];
  /** Comment lines just before `answer`. */
  readonly answerComments: readonly string[];
  readonly answer: Expression;
}
