/**
 * Case splits: when one kept grid answers some demonstrations and another answers the rest,
 * a kept condition (a Bool-valued candidate) that is true on exactly the first group and false
 * on the second joins them into one program, `choose(condition, first, second)`, which answers
 * every demonstration. The enumerator would build that call itself only at the sum of the three
 * parts' bits; here it is found as soon as the dearest part is kept, as a goal finds a wrapped
 * program early. The joined program costs what the enumerator would charge for it (the choice's
 * bits plus its three arguments'), so it competes with every other program on bits alone, and
 * the condition decides, on each test input, which of the two grids is the answer.
 */
import type { Grid } from '../grid/grid.ts';
import type { Candidate } from './value-store.ts';

/** Demonstrations beyond which no split is looked for (one slot per subset of them). */
const MAXIMUM_DEMONSTRATIONS = 10;

/** A condition and the two grids it chooses between, with the bits of the whole call. */
export interface CaseSplit {
  readonly condition: Candidate;
  readonly whenTrue: Candidate;
  readonly whenFalse: Candidate;
  readonly cost: number;
}

export class CaseSplits {
  /** Every demonstration's bit set. */
  private readonly full: number;
  /** [set of demonstrations answered] → the cheapest kept grid answering exactly those (the first kept: candidates come in order of cost). */
  private readonly byAnswered: (Candidate | undefined)[];
  /** Grids noted since the last join: no new pair can come without one. */
  private fresh = false;
  /** Conditions seen, and [where it holds, as 1s and 0s over every input] → the cheapest, with the demonstrations it holds on. */
  private conditionsSeen = 0;
  private readonly conditionByPattern = new Map<string, { readonly condition: Candidate; readonly holds: number }>();
  /** Joins already made, by their three parts. */
  private readonly made = new Set<string>();
  private readonly ids = new Map<Candidate, number>();

  constructor(
    private readonly outputs: readonly Grid[],
    /** Bits of the choosing call itself. */
    private readonly choiceBits: number,
    /** Joins dearer than this are not made. */
    private readonly maxCost: number,
  ) {
    const n = outputs.length;
    this.full = n >= 2 && n <= MAXIMUM_DEMONSTRATIONS ? (1 << n) - 1 : 0;
    this.byAnswered = new Array<Candidate | undefined>(this.full + 1);
  }

  /** Whether splits can be looked for at all (two to MAXIMUM_DEMONSTRATIONS demonstrations). */
  get open(): boolean {
    return this.full !== 0;
  }

  /** Notes a kept grid: which demonstrations it answers. */
  noteGrid(candidate: Candidate): void {
    const outputs = this.outputs;
    let answered = 0;
    for (let i = 0; i < outputs.length; i++) if ((candidate.values[i] as Grid).equals(outputs[i]!)) answered |= 1 << i;
    if (answered === 0 || answered === this.full || this.byAnswered[answered]) return;
    this.byAnswered[answered] = candidate;
    this.fresh = true;
  }

  /**
   * The new joins of kept grids and kept conditions (`conditions`: every kept Bool candidate,
   * cheapest first; those already seen are skipped by count), of at most `maxCost` bits, with the
   * cheapest condition per pattern of true and false over every input.
   */
  join(conditions: readonly Candidate[]): CaseSplit[] {
    const demonstrations = this.outputs.length;
    let newConditions = false;
    for (let k = this.conditionsSeen; k < conditions.length; k++) {
      const condition = conditions[k]!;
      let holds = 0;
      for (let i = 0; i < demonstrations; i++) if (condition.values[i] === true) holds |= 1 << i;
      if (holds === 0 || holds === this.full) continue;
      // Per pattern on every input, test inputs included: conditions that group the
      // demonstrations alike but the test inputs differently give different answers.
      let pattern = '';
      for (let i = 0; i < condition.values.length; i++) pattern += condition.values[i] === true ? '1' : '0';
      const known = this.conditionByPattern.get(pattern);
      if (!known || known.condition.cost > condition.cost) {
        this.conditionByPattern.set(pattern, { condition, holds });
        newConditions = true;
      }
    }
    this.conditionsSeen = conditions.length;
    if (!this.fresh && !newConditions) return [];
    this.fresh = false;
    const best = this.cheapestCovering();
    const found: CaseSplit[] = [];
    for (const { condition, holds } of this.conditionByPattern.values()) {
      const whenTrue = best[holds];
      const whenFalse = best[this.full & ~holds];
      if (!whenTrue || !whenFalse) continue;
      const cost = this.choiceBits + condition.cost + whenTrue.cost + whenFalse.cost;
      if (cost > this.maxCost) continue;
      const key = `${this.id(condition)},${this.id(whenTrue)},${this.id(whenFalse)}`;
      if (this.made.has(key)) continue;
      this.made.add(key);
      found.push({ condition, whenTrue, whenFalse, cost });
    }
    return found;
  }

  /** [set of demonstrations] → the cheapest noted grid answering at least those. */
  private cheapestCovering(): (Candidate | undefined)[] {
    const best = this.byAnswered.slice();
    const full = this.full;
    for (let bit = 1; bit <= full; bit <<= 1) {
      for (let set = 0; set <= full; set++) {
        if (set & bit) continue;
        const wider = best[set | bit];
        if (wider && (!best[set] || wider.cost < best[set]!.cost)) best[set] = wider;
      }
    }
    return best;
  }

  private id(candidate: Candidate): number {
    let id = this.ids.get(candidate);
    if (id === undefined) {
      id = this.ids.size;
      this.ids.set(candidate, id);
    }
    return id;
  }
}
