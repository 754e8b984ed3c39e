/**
 * Crop goals: working back through a cut whose rectangle another argument names. A call such as
 * `crop_to_object(grid, object)` cuts out of its grid the rectangle its other argument gives (the
 * object's box), so it cannot be run backwards to one grid: outside the rectangle the grid may
 * hold anything. But once a kept value names, on every demonstration, a rectangle the size of
 * that demonstration's output, every kept grid can be tested cell by cell: does it hold each
 * output at that rectangle? One that does answers the task when cut there. The call is then found
 * as soon as both its arguments are kept, not when the search reaches the sum of their bits and
 * the call's; like every goal's, the solution waits until every cheaper cost is
 * tried.
 */
import { colourCounts } from '../grid/components.ts';
import type { Grid } from '../grid/grid.ts';
import type { Rectangle } from '../library/primitive.ts';
import type { Production } from './productions.ts';
import type { Candidate } from './value-store.ts';

/** A cut of the outputs' size from kept grids, at the rectangles a kept value names. */
export interface CropGoal {
  readonly production: Production;
  /** The call's second argument, which names the rectangle. */
  readonly argument: Candidate;
  /** Top, left, height, width of the rectangle on each demonstration, in turn. */
  readonly rectangles: Int32Array;
  /** Bits of the call and its second argument (the cut grid's own are added when met). */
  readonly cost: number;
}

export class CropGoals {
  readonly goals: CropGoal[] = [];
  /** The rectangles on every input (test inputs too) of each goal taken, as text: two values naming the same ones make one goal. */
  private readonly seen = new Set<string>();
  /**
   * Row and column, within each demonstration's output, of a cell of the colour that output has
   * least, in turn (the same for every goal): compared first, it turns most grids away at one read
   * (a corner cell is usually background, as is the grid there).
   */
  private readonly outputProbes: Int32Array;
  /** The demonstrations' rectangles of the value being considered, before it becomes a goal. */
  private readonly found: Int32Array;

  constructor(
    private readonly outputs: readonly Grid[],
    private readonly examples: number,
    private readonly maxGoals: number,
  ) {
    this.outputProbes = new Int32Array(2 * outputs.length);
    outputs.forEach((output, i) => {
      const probe = rarestCell(output);
      this.outputProbes[2 * i] = (probe / output.width) | 0;
      this.outputProbes[2 * i + 1] = probe % output.width;
    });
    this.found = new Int32Array(4 * outputs.length);
  }

  /** Room for more goals. */
  get open(): boolean {
    return this.goals.length < this.maxGoals;
  }

  /**
   * A new goal when the value names, on every demonstration, a rectangle of that output's size,
   * and a rectangle on every test input (else the call could give no answer there); undefined
   * otherwise, or when an earlier value names the same rectangles everywhere.
   */
  consider(production: Production, argument: Candidate): CropGoal | undefined {
    if (!this.open) return undefined;
    const cropsAt = production.primitive.cropsAt as ((...rest: unknown[]) => Rectangle | null) | undefined;
    if (!cropsAt) return undefined;
    const train = this.outputs.length;
    // Most values name a rectangle of another size: turned away before anything is built.
    const found = this.found;
    for (let i = 0; i < train; i++) {
      const r = cropsAt(argument.values[i]);
      const output = this.outputs[i]!;
      if (!r || r.height !== output.height || r.width !== output.width || r.top < 0 || r.left < 0) return undefined;
      found[4 * i] = r.top;
      found[4 * i + 1] = r.left;
      found[4 * i + 2] = r.height;
      found[4 * i + 3] = r.width;
    }
    let key = found.join(',');
    for (let i = train; i < this.examples; i++) {
      const r = cropsAt(argument.values[i]);
      if (!r) return undefined;
      key += `;${r.top},${r.left},${r.height},${r.width}`;
    }
    if (this.seen.has(key)) return undefined;
    this.seen.add(key);
    const goal: CropGoal = { production, argument, rectangles: found.slice(), cost: production.bits + argument.cost };
    this.goals.push(goal);
    return goal;
  }

  /** True when the grids hold each demonstration's output at the goal's rectangle (each probe cell checked first). */
  meets(goal: CropGoal, values: readonly unknown[]): boolean {
    const train = this.outputs.length;
    for (let i = 0; i < train; i++) if (!this.probeMatches(goal, i, values[i] as Grid)) return false;
    for (let i = 0; i < train; i++) if (!this.holds(goal, i, values[i] as Grid)) return false;
    return true;
  }

  /** True when some goal's rectangle of this grid holds the first demonstration's output. */
  mayMeetFirst(grid: Grid): boolean {
    for (const goal of this.goals) if (this.probeMatches(goal, 0, grid) && this.holds(goal, 0, grid)) return true;
    return false;
  }

  /** True when the rectangle lies in the grid and the grid holds the output's probe cell there. */
  private probeMatches(goal: CropGoal, i: number, grid: Grid): boolean {
    const r = goal.rectangles;
    const top = r[4 * i]!;
    const left = r[4 * i + 1]!;
    if (top + r[4 * i + 2]! > grid.height || left + r[4 * i + 3]! > grid.width) return false;
    const row = this.outputProbes[2 * i]!;
    const column = this.outputProbes[2 * i + 1]!;
    const output = this.outputs[i]!;
    return grid.data[grid.offset + (top + row) * grid.width + left + column] === output.data[output.offset + row * output.width + column];
  }

  private holds(goal: CropGoal, i: number, grid: Grid): boolean {
    const r = goal.rectangles;
    const top = r[4 * i]!;
    const left = r[4 * i + 1]!;
    const output = this.outputs[i]!;
    const { height, width } = output;
    const source = grid.data;
    const wanted = output.data;
    for (let row = 0; row < height; row++) {
      const from = grid.offset + (top + row) * grid.width + left;
      const at = output.offset + row * width;
      for (let c = 0; c < width; c++) if (source[from + c] !== wanted[at + c]) return false;
    }
    return true;
  }
}

/** Index of the first cell of the colour the grid has least of. */
function rarestCell(g: Grid): number {
  const counts = colourCounts(g);
  let best = 0;
  const cells = g.cells;
  for (let i = 1; i < cells.length; i++) if (counts[cells[i]!]! < counts[cells[best]!]!) best = i;
  return best;
}
