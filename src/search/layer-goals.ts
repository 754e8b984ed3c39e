/**
 * Layer goals: working back from the outputs through a call that lays one grid over another with
 * a see-through colour, with the input as one of the two layers. Many tasks draw something (rays,
 * lines, a reflected copy, a filled region) on a grid made from the input and lay it back over the
 * input, or fill the input's background from another grid. The grid to lay is not one wanted grid
 * but any of many (wherever a cell may show through, it may hold anything that does), so these
 * goals are tested cell by cell against a pattern instead of looked up by hash:
 *
 * - **over**: `lay(input, X, t)` equals the output exactly when, on every demonstration, X holds
 *   the output's colour on each cell the output changes, and elsewhere either `t` or the input's
 *   own colour. It applies when no changed cell turns to `t` (nothing laid on top could show it).
 * - **under**: `lay(X, input, t)` equals the output exactly when the input keeps every cell that is
 *   not `t`, and X holds the output's colour on each cell where the input is `t`.
 *
 * Both tests are exact (tests/layer-goals.test.ts checks them against the primitive), so a kept
 * grid that meets one becomes a solution once wrapped in the call; like a goal's, it waits until
 * every cheaper cost has been tried.
 *
 * The fixed layer is the input, or a cheap grid the search made from it (a made layer: the input
 * with an object erased, say, for tasks that move something): the tests are the same with that
 * grid's values in place of the input's. The cells a pattern fixes are listed, and checked
 * before the free ones, so that most grids fail at their first cell.
 */
import type { Grid } from '../grid/grid.ts';
import type { Production } from './productions.ts';
import type { Candidate } from './value-store.ts';

/** In a pattern: the cell may hold anything the test allows there (never a colour). */
const FREE = 255;

export type LayerSide = 'over' | 'under';

export interface LayerGoal {
  /** over: the found grid is laid over the fixed layer; under: the fixed layer is laid over it. */
  readonly side: LayerSide;
  /** The fixed layer: the input, or a grid the search made. */
  readonly layer: Candidate;
  /** The layering call. */
  readonly production: Production;
  /** The see-through colour, a constant of the task. */
  readonly transparent: Candidate;
  /** Per demonstration, what the found grid must hold on each cell (FREE: see the test). */
  readonly patterns: readonly Uint8Array[];
  /** Per demonstration, the cells whose pattern is not FREE. */
  readonly fixed: readonly Int32Array[];
  /** Bits of the call, the fixed layer and the colour. */
  readonly cost: number;
  /** Cells the found grid must add, over all demonstrations: fixed cells whose colour is not see-through. */
  readonly changes: number;
}

/**
 * The goals for one layering production, every see-through colour the task offers and both
 * sides, with `layer` (the input's leaf, or a made grid) as the fixed layer; `inputs` are its
 * values, of which the first `outputs.length` (the demonstrations') are read.
 */
export function layerGoals(inputs: readonly Grid[], outputs: readonly Grid[], production: Production, layer: Candidate, colours: readonly Candidate[]): LayerGoal[] {
  const goals: LayerGoal[] = [];
  if (outputs.length === 0) return goals;
  for (let i = 0; i < outputs.length; i++) if (inputs[i]!.height !== outputs[i]!.height || inputs[i]!.width !== outputs[i]!.width) return goals;
  // The input itself needs no layer: at least one demonstration must change.
  if (outputs.every((o, i) => o.equals(inputs[i]!))) return goals;
  for (const colour of colours) {
    const t = colour.values[0] as number;
    for (const side of ['over', 'under'] as const) {
      const patterns: Uint8Array[] = [];
      for (let i = 0; i < outputs.length; i++) {
        const pattern = side === 'over' ? overPattern(inputs[i]!.cells, outputs[i]!.cells, t) : underPattern(inputs[i]!.cells, outputs[i]!.cells, t);
        if (!pattern) break;
        patterns.push(pattern);
      }
      if (patterns.length < outputs.length) continue;
      const fixed = patterns.map(fixedCells);
      let changes = 0;
      for (let i = 0; i < patterns.length; i++) for (const c of fixed[i]!) if (patterns[i]![c] !== t) changes++;
      goals.push({ side, layer, production, transparent: colour, patterns, fixed, cost: production.bits + layer.cost + colour.cost, changes });
    }
  }
  return goals;
}

/** Over: the output's colour where it changes, FREE elsewhere; null when a changed cell becomes `t`. */
function overPattern(input: Uint8Array, output: Uint8Array, t: number): Uint8Array | null {
  const pattern = new Uint8Array(output.length).fill(FREE);
  for (let c = 0; c < output.length; c++) {
    if (output[c] === input[c]) continue;
    if (output[c] === t) return null;
    pattern[c] = output[c]!;
  }
  return pattern;
}

/** Under: the output's colour where the input is `t`, FREE elsewhere; null when the input loses a cell that is not `t`. */
function underPattern(input: Uint8Array, output: Uint8Array, t: number): Uint8Array | null {
  const pattern = new Uint8Array(output.length).fill(FREE);
  for (let c = 0; c < output.length; c++) {
    if (input[c] !== t) {
      if (output[c] !== input[c]) return null;
    } else pattern[c] = output[c]!;
  }
  return pattern;
}

/** True when some demonstration's pattern leaves a cell free (one that fixes every cell wants a single grid). */
export function leavesFreeCells(goal: LayerGoal): boolean {
  return goal.fixed.some((fixed, i) => fixed.length < goal.patterns[i]!.length);
}

function fixedCells(pattern: Uint8Array): Int32Array {
  let count = 0;
  for (let c = 0; c < pattern.length; c++) if (pattern[c] !== FREE) count++;
  const fixed = new Int32Array(count);
  count = 0;
  for (let c = 0; c < pattern.length; c++) if (pattern[c] !== FREE) fixed[count++] = c;
  return fixed;
}

/**
 * True when the grid meets the goal on demonstration i (`input` is the fixed layer's value on
 * that demonstration): laid as the goal says, it gives the output there.
 */
export function meetsLayerGoal(goal: LayerGoal, i: number, grid: Grid, input: Grid): boolean {
  if (grid.height !== input.height || grid.width !== input.width) return false;
  const pattern = goal.patterns[i]!;
  const fixed = goal.fixed[i]!;
  // Read in the slab (a view per call would be made for every grid the search keeps).
  const { data, offset } = grid;
  // Under, and the changed cells over: the grid must hold the pattern's colour (over, a changed
  // cell's colour is neither see-through nor the input's, so it shows only if the grid holds it).
  for (let k = 0; k < fixed.length; k++) if (data[offset + fixed[k]!] !== pattern[fixed[k]!]) return false;
  return freeCellsClear(goal, i, grid, input);
}

/**
 * How much of the goal the grid lays right on demonstration i, with nothing laid wrong: the number
 * of cells it must add that it holds (see `changes`), or -1 when some cell it shows would be wrong
 * once laid (a cell that would change, but not to the output's colour). A grid that lays part of
 * the goal right, laid as the goal says, is a fixed layer with less left to add (a partial layer).
 */
export function laysPartOfGoal(goal: LayerGoal, i: number, grid: Grid, layer: Grid): number {
  const covered = fixedCellsLaid(goal, i, grid, layer);
  return covered >= 0 && freeCellsClear(goal, i, grid, layer) ? covered : -1;
}

/**
 * The first half of {@link laysPartOfGoal}, on the goal's fixed cells only (few, so a search asks
 * this of every demonstration first): how many it lays right, or -1 when one is laid wrong.
 */
export function fixedCellsLaid(goal: LayerGoal, i: number, grid: Grid, layer: Grid): number {
  if (grid.height !== layer.height || grid.width !== layer.width) return -1;
  const pattern = goal.patterns[i]!;
  const fixed = goal.fixed[i]!;
  const { data, offset } = grid;
  const under = layer.data;
  const underOffset = layer.offset;
  const t = goal.transparent.values[0] as number;
  let covered = 0;
  for (let k = 0; k < fixed.length; k++) {
    const c = fixed[k]!;
    const v = data[offset + c]!;
    // Shows nothing here, or what the fixed layer has (left for a later layer to change).
    if (v === t || v === under[underOffset + c]) continue;
    if (v !== pattern[c]) return -1;
    covered++;
  }
  return covered;
}

/**
 * The second half of {@link laysPartOfGoal} and {@link meetsLayerGoal}: laid over, the grid shows
 * nothing new on a free cell (under, free cells never show).
 */
export function freeCellsClear(goal: LayerGoal, i: number, grid: Grid, layer: Grid): boolean {
  if (goal.side === 'under') return true;
  const pattern = goal.patterns[i]!;
  const { data, offset } = grid;
  const under = layer.data;
  const underOffset = layer.offset;
  const t = goal.transparent.values[0] as number;
  const length = grid.height * grid.width;
  for (let c = 0; c < length; c++) {
    if (pattern[c] !== FREE) continue;
    // What shows on this cell once laid over the layer: v, unless v is see-through or the same.
    const v = data[offset + c]!;
    if (v !== t && v !== under[underOffset + c]) return false;
  }
  return true;
}
