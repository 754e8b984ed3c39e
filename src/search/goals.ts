/**
 * Goals: working back from the demonstration outputs. A primitive with an inverse (a turn, a
 * reflection, mirrored copies, scaling up, tiling, a colour map, ...) tells, from the output
 * each demonstration wants and the call's other arguments (constants of the task), what its
 * first argument would have to be. Those wanted grids are a goal: any kept candidate whose
 * values on the demonstrations equal them becomes a solution by wrapping it in the calls that
 * led to the goal. Goals are expanded from the outputs, cheapest first, up to a cost bound, so
 * a program of d + 1 calls is found when the search has built its inner d.
 */
import { HASH_MASK, type Grid } from '../grid/grid.ts';
import type { Production } from './productions.ts';
import { foldHash } from './tuple-hash.ts';
import type { Candidate } from './value-store.ts';

/** One call on the way from a goal's grid to the answer; `rest` are its other arguments (constant leaves). */
export interface GoalStep {
  readonly production: Production;
  readonly rest: readonly Candidate[];
  readonly bits: number;
}

export interface Goal {
  /** What the found candidate must equal on each demonstration. */
  readonly wanted: readonly Grid[];
  /** Calls to apply to the found candidate, innermost first. */
  readonly steps: readonly GoalStep[];
  /** Bits of those calls and their constants. */
  readonly cost: number;
}

export interface GoalLimits {
  /** Most bits the calls of one goal may cost. */
  readonly maxCost: number;
  /** Most goals kept. */
  readonly maxGoals: number;
}

/** Hash of the first `count` grids of a value tuple. */
export function demonstrationHash(values: readonly unknown[], count: number): number {
  let h = 0x1b873593;
  for (let i = 0; i < count; i++) h = foldHash(h, (values[i] as Grid).hash);
  return h & HASH_MASK;
}

/** True when the first b.length values equal b's grids, one by one. */
export function sameGrids(a: readonly unknown[], b: readonly Grid[]): boolean {
  for (let i = 0; i < b.length; i++) if (!(a[i] as Grid).equals(b[i]!)) return false;
  return true;
}

/** Every way to fill `types` with constant leaves, as lists. */
function constantChoices(types: readonly number[], leavesByType: ReadonlyMap<number, readonly Candidate[]>): Candidate[][] {
  let choices: Candidate[][] = [[]];
  for (const t of types) {
    const leaves = leavesByType.get(t);
    if (!leaves || leaves.length === 0) return [];
    const next: Candidate[][] = [];
    for (const partial of choices) for (const leaf of leaves) next.push([...partial, leaf]);
    choices = next;
  }
  return choices;
}

export class GoalTable {
  private readonly byHash = new Map<number, Goal[]>();
  /** Hashes of every goal's wanted grid on the first demonstration. */
  private readonly firstHashes = new Set<number>();
  count = 0;

  /**
   * @param invertible productions (not sections) whose primitive has an inverse, whose first
   *   argument and result are grids, with their argument type ids
   * @param leavesByType the task's constant leaves by type id (values equal on every example)
   */
  constructor(
    outputs: readonly Grid[],
    invertible: readonly { production: Production; restTypes: readonly number[] }[],
    leavesByType: ReadonlyMap<number, readonly Candidate[]>,
    limits: GoalLimits,
  ) {
    const trainCount = outputs.length;
    if (trainCount === 0) return;
    const frontier: Goal[] = [{ wanted: outputs, steps: [], cost: 0 }];
    const seen = new Map<number, Goal[]>([[demonstrationHash(outputs, trainCount), [frontier[0]!]]]);
    while (frontier.length > 0 && this.count < limits.maxGoals) {
      // Cheapest goal first, so each wanted tuple is reached by its cheapest calls.
      let best = 0;
      for (let k = 1; k < frontier.length; k++) if (frontier[k]!.cost < frontier[best]!.cost) best = k;
      const goal = frontier.splice(best, 1)[0]!;
      for (const { production, restTypes } of invertible) {
        const inverse = production.primitive.inverse as (wanted: unknown, ...rest: unknown[]) => unknown;
        for (const rest of constantChoices(restTypes, leavesByType)) {
          let cost = goal.cost + production.bits;
          for (const leaf of rest) cost += leaf.cost;
          if (cost > limits.maxCost) continue;
          const wanted: Grid[] = [];
          for (let i = 0; i < trainCount; i++) {
            let w: unknown;
            try {
              w = inverse(goal.wanted[i], ...rest.map((leaf) => leaf.values[i]));
            } catch {
              w = null;
            }
            if (w === null || w === undefined) break;
            wanted.push(w as Grid);
          }
          if (wanted.length < trainCount) continue;
          const hash = demonstrationHash(wanted, trainCount);
          const known = seen.get(hash);
          if (known?.some((g) => sameGrids(g.wanted, wanted))) continue;
          const next: Goal = { wanted, steps: [{ production, rest, bits: production.bits }, ...goal.steps], cost };
          if (known) known.push(next);
          else seen.set(hash, [next]);
          const list = this.byHash.get(hash);
          if (list) list.push(next);
          else this.byHash.set(hash, [next]);
          this.firstHashes.add(wanted[0]!.hash);
          this.count++;
          frontier.push(next);
          if (this.count >= limits.maxGoals) break;
        }
      }
    }
  }

  /** False when no goal wants this grid on the first demonstration (true may still match none). */
  mayWantFirst(grid: Grid): boolean {
    return this.firstHashes.has(grid.hash);
  }

  /** Goals whose wanted grids equal the first `count` values. */
  matching(values: readonly unknown[], count: number): readonly Goal[] {
    if (this.count === 0) return NONE;
    const list = this.byHash.get(demonstrationHash(values, count));
    if (!list) return NONE;
    return list.filter((g) => sameGrids(values, g.wanted));
  }
}

const NONE: readonly Goal[] = [];
