/**
 * Learned tables: a cell rule, an object rule or a grid rule is a literal table read off the demonstrations
 * (src/search/learned-tables.ts), paid for entry by entry (README, "Description length"). These
 * primitives apply one to a grid; a cell, object or grid whose key the table lacks makes them fail.
 */
import { applyCellRule } from '../src/grid/cell-rule-table.ts';
import { applyGridRule } from '../src/grid/grid-rule-table.ts';
import { applyObjectRule } from '../src/grid/object-rule-table.ts';
import { primitive } from '../src/library/primitive.ts';

export const learnedRulePrimitives = [
  primitive({
    name: 'apply_cell_rule',
    category: 'learned tables',
    parameters: ['Grid', 'CellRule'],
    result: 'Grid',
    bits: 4,
    doc: "Gives every cell the colour the rule's table holds for the cell's features (a rule with `any` in its keys is read in order: the first entry the cell matches); fails on a key the table lacks.",
    example: {
      input: [[1, 0, 0], [0, 1, 0]],
      expression: 'apply_cell_rule(grid, cell_rule[colour, left]{#0 edge -> #0, #0 #0 -> #0, #0 #1 -> #2, #1 edge -> #1, #1 #0 -> #1})',
      output: [[1, 2, 0], [0, 1, 2]],
    },
    run: applyCellRule,
  }),
  primitive({
    name: 'apply_object_rule',
    category: 'learned tables',
    parameters: ['Grid', 'ObjectRule'],
    result: 'Grid',
    bits: 4,
    doc: "Does to every object what the rule's table holds for its property (keep, remove, recolour, move); fails on a value the table lacks.",
    example: {
      input: [[1, 0, 2, 2], [0, 0, 0, 0], [3, 3, 3, 0]],
      expression: 'apply_object_rule(grid, object_rule[by_colour, size]{1 -> remove, 2 -> #5, 3 -> move (-1, 0)})',
      output: [[0, 0, 5, 5], [3, 3, 3, 0], [0, 0, 0, 0]],
    },
    run: applyObjectRule,
  }),
  primitive({
    name: 'apply_grid_rule',
    category: 'learned tables',
    parameters: ['Grid', 'GridRule'],
    result: 'Grid',
    bits: 4,
    doc: "Gives the grid the rule's table holds for a property of the whole input grid (its colours, cells, objects, shape, symmetry); fails on a value the table lacks.",
    example: {
      input: [[0, 3, 0], [3, 3, 3]],
      expression: 'apply_grid_rule(grid, grid_rule[colour_count]{1 -> 0, 2 -> 5})',
      output: [[5]],
    },
    run: applyGridRule,
  }),
];
