/**
 * Tables read off intermediate grids. The search's constants hold tables learned from each
 * demonstration input to its output (learned-tables.ts), so `apply_cell_rule(input, ...)` is
 * found; but many rules apply a table to something made first: the input turned, cropped, cut
 * to its objects. For a kept grid candidate whose values have the outputs' shapes, this learns
 * the colour map, cell rules and object rules from its values to the outputs (reading its values
 * on the test inputs only to check that every key is known, as for the input's tables), and
 * returns the tables with the production that applies each. The enumerator wraps the candidate
 * in that call; the program costs the candidate's bits, the call's and the table's, and waits
 * like any other until every cheaper cost level is done.
 *
 * Learning a table reads every cell many times (tens of milliseconds for small grids), so only
 * the cheapest few such candidates are tried: a fixed number per task and a fixed number of
 * cells in all, in the order the search keeps them, and only up to a cost bound. Counts, not
 * time, so that a search at a candidate cap gives the same programs on every run. Object rules
 * keyed on two properties are read off the inputs only, not off these grids: learning them costs
 * several times the single properties per grid, and no task of the public training set was
 * solved through one read off a made grid (BENCHMARKS.md, 2026-12-04).
 */
import type { Grid } from '../grid/grid.ts';
import type { LiteralValue } from '../language/ast.ts';
import type { Puzzle } from '../tasks/task.ts';
import { demonstratedPalette } from './constants.ts';
import { learnCellRules, learnObjectRules } from './learned-tables.ts';
import type { Production } from './productions.ts';
import { tableBits } from './table-bits.ts';

export interface IntermediateLimits {
  /** Candidates tried per task, at most. */
  readonly maxGrids: number;
  /** Costliest candidate (bits) tried. */
  readonly maxCost: number;
  /** Cells (over every value of every candidate tried) learned from per task, at most. */
  readonly maxCells: number;
}

export interface IntermediateTable {
  readonly literal: LiteralValue;
  readonly bits: number;
  /** The production `(Grid, table) -> Grid` that applies it. */
  readonly production: Production;
}

const TABLE_TYPES = ['Palette', 'CellRule', 'ObjectRule'] as const;

export class IntermediateTables {
  /** Candidates learned from so far. */
  tried = 0;
  private cellsLeft: number;
  private readonly appliers = new Map<string, Production>();

  constructor(
    private readonly outputs: readonly Grid[],
    productions: readonly Production[],
    private readonly limits: IntermediateLimits,
  ) {
    this.cellsLeft = limits.maxCells;
    for (const type of TABLE_TYPES) {
      const p = productions.find((q) => !q.section && q.result === 'Grid' && q.argumentTypes.length === 2 && q.argumentTypes[0] === 'Grid' && q.argumentTypes[1] === type);
      if (p) this.appliers.set(type, p);
    }
  }

  /** True while more candidates may be tried. */
  get open(): boolean {
    return this.appliers.size > 0 && this.tried < this.limits.maxGrids;
  }

  /**
   * Tables from a kept grid candidate's values (demonstrations first, then test inputs) to the
   * outputs; empty when the candidate is too dear, a value's shape differs from its output's, or
   * nothing is learned. Only tables with which the program (candidate, applying call, table) costs
   * at most `maxTotal` bits are returned; a cell rule whose entries already put it over is not built.
   */
  learn(values: readonly unknown[], cost: number, maxTotal = Infinity): IntermediateTable[] {
    if (!this.open || cost > this.limits.maxCost) return [];
    const outputs = this.outputs;
    let equal = true;
    for (let i = 0; i < outputs.length; i++) {
      const v = values[i] as Grid;
      const o = outputs[i]!;
      if (v.height !== o.height || v.width !== o.width) return [];
      if (equal && !v.equals(o)) equal = false;
    }
    // Equal to every output: a solution by itself, no table needed.
    if (equal) return [];
    let cells = 0;
    for (const v of values) cells += (v as Grid).height * (v as Grid).width;
    if (cells > this.cellsLeft) return [];
    this.cellsLeft -= cells;
    this.tried++;
    const puzzle: Puzzle = {
      name: 'intermediate',
      train: outputs.map((output, i) => ({ input: values[i] as Grid, output })),
      testInputs: values.slice(outputs.length) as Grid[],
    };
    const found: IntermediateTable[] = [];
    const palette = this.appliers.get('Palette') && demonstratedPalette(puzzle);
    if (palette) {
      const literal: LiteralValue = { type: 'Palette', pairs: palette };
      const production = this.appliers.get('Palette')!;
      const bits = tableBits(literal)!;
      if (cost + production.bits + bits <= maxTotal) found.push({ literal, bits, production });
      // A colour map explains every cell: a cell or object rule could only cost more.
      return found;
    }
    const cell = this.appliers.get('CellRule');
    if (cell) for (const t of learnCellRules(puzzle, 1, maxTotal - cost - cell.bits)) found.push({ literal: t.literal, bits: t.bits, production: cell });
    const object = this.appliers.get('ObjectRule');
    if (object) for (const t of learnObjectRules(puzzle, 1, maxTotal - cost - object.bits, false)) found.push({ literal: t.literal, bits: t.bits, production: object });
    return found;
  }
}
