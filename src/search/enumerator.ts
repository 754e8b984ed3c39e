/**
 * Bottom-up enumeration in order of cost. Candidates of cost c are built from kept candidates
 * of smaller cost, evaluated on every example input at once, and kept unless they fail on
 * some input or equal (on all inputs) a candidate already kept for their type. A Grid-valued
 * candidate equal to every demonstration output is a solution.
 */
import type { Grid } from '../grid/grid.ts';
import { FAILURE } from '../language/failure.ts';
import { applyOperation, sectionOf } from '../language/operation.ts';
import { literalValue } from '../language/interpreter.ts';
import type { Expression } from '../language/ast.ts';
import type { Type } from '../language/types.ts';
import type { Constant } from './constants.ts';
import type { Production } from './productions.ts';
import { ValueStore, type Candidate } from './value-store.ts';

export type StopReason = 'solved' | 'time' | 'candidates' | 'memory' | 'exhausted';

export interface EnumerationLimits {
  /** Wall-clock deadline (performance.now() value). */
  readonly deadline: number;
  readonly maxCandidates: number;
  /** Cap on the approximate bytes of values held by the store. */
  readonly maxStoreBytes: number;
  readonly maxCost: number;
  /** How many solutions with distinct test outputs to collect. */
  readonly attempts: number;
  /** After the first solution, how many more bits of cost to search for further attempts. */
  readonly extraBits: number;
  readonly pruning: boolean;
}

export interface EnumerationStatistics {
  /** Candidates built and evaluated. */
  candidates: number;
  /** Kept in the store. */
  kept: number;
  /** Dropped as observationally equivalent to a kept candidate. */
  pruned: number;
  /** Dropped because they failed on some input. */
  failed: number;
  /** Highest cost level finished. */
  costReached: number;
  /** Seconds from the start of the search to the first solution (absent when none). */
  secondsToFirstSolution?: number;
}

export interface EnumerationOutcome {
  readonly solutions: readonly Candidate[];
  readonly reason: StopReason;
  readonly statistics: EnumerationStatistics;
}

class Stop extends Error {
  constructor(readonly reason: StopReason) {
    super(reason);
  }
}

export function enumerate(
  inputs: readonly Grid[],
  outputs: readonly Grid[],
  constants: readonly Constant[],
  productions: readonly Production[],
  limits: EnumerationLimits,
  inputName = 'grid',
): EnumerationOutcome {
  const store = new ValueStore(limits.pruning);
  const stats: EnumerationStatistics = { candidates: 0, kept: 0, pruned: 0, failed: 0, costReached: 0 };
  const solutions: Candidate[] = [];
  const examples = inputs.length;
  const trainCount = outputs.length;
  let firstSolutionCost = Infinity;
  const started = performance.now();
  let deadline = limits.deadline;

  /** Keeps a candidate unless an equal one is kept; `values` may be a scratch array (copied when kept). */
  const offer = (type: Type, cost: number, values: readonly unknown[], production: Production | undefined, parts: readonly Candidate[], leaf: Expression | undefined): void => {
    const hash = ValueStore.hashValues(type, values);
    if (store.has(type, hash, values)) {
      stats.pruned++;
      return;
    }
    const candidate: Candidate = { type, cost, values: values.slice(), production, arguments: parts.slice(), leaf };
    store.add(candidate, hash);
    stats.kept++;
    if (type === 'Grid') {
      for (let i = 0; i < trainCount; i++) if (!(values[i] as Grid).equals(outputs[i]!)) return;
      // Attempts must differ on the test inputs (pruning guarantees it; without pruning, check).
      if (!limits.pruning && solutions.some((s) => sameTestOutputs(s.values, values, trainCount))) return;
      solutions.push(candidate);
      if (solutions.length === 1) {
        firstSolutionCost = cost;
        stats.secondsToFirstSolution = (performance.now() - started) / 1000;
        // Further attempts get as long again as the first took (at least a second), within the limit.
        const now = performance.now();
        deadline = Math.min(deadline, now + Math.max(1000, now - started));
      }
      if (solutions.length >= limits.attempts) throw new Stop('solved');
    }
  };

  const checkBudget = (): void => {
    if (performance.now() > deadline) throw new Stop('time');
    if (stats.candidates >= limits.maxCandidates) throw new Stop('candidates');
    if (store.bytes >= limits.maxStoreBytes) throw new Stop('memory');
  };

  // Leaves: the input grid and the task's constants.
  const leaves: Candidate[] = [
    { type: 'Grid', cost: 1, values: inputs, production: undefined, arguments: [], leaf: { kind: 'variable', name: inputName } },
  ];
  for (const c of constants) {
    const value = literalValue(c.literal);
    leaves.push({ type: c.literal.type, cost: c.bits, values: new Array(examples).fill(value), production: undefined, arguments: [], leaf: { kind: 'literal', literal: c.literal } });
  }

  const args: Candidate[] = [];
  const scratch = new Array<unknown>(examples);
  /** One reused argument array per arity. */
  const callScratch: unknown[][] = [];
  let reason: StopReason = 'exhausted';

  const evaluate = (production: Production, cost: number): void => {
    stats.candidates++;
    if ((stats.candidates & 1023) === 0) checkBudget();
    const operation = production.primitive;
    const values = scratch;
    const arity = args.length;
    const call = (callScratch[arity] ??= new Array<unknown>(arity));
    if (production.section) {
      for (let i = 0; i < examples; i++) {
        const bound = new Array<unknown>(arity);
        for (let j = 0; j < arity; j++) bound[j] = args[j]!.values[i];
        values[i] = sectionOf(operation, bound);
      }
    } else {
      for (let i = 0; i < examples; i++) {
        for (let j = 0; j < arity; j++) call[j] = args[j]!.values[i];
        const v = applyOperation(operation, call);
        if (v === FAILURE) {
          stats.failed++;
          return;
        }
        values[i] = v;
      }
    }
    offer(production.result, cost, values, production, args, undefined);
  };

  const fill = (production: Production, position: number, remaining: number, cost: number): void => {
    const types = production.argumentTypes;
    if (position === types.length) {
      if (remaining === 0) evaluate(production, cost);
      return;
    }
    const type = types[position]!;
    let restMinimum = 0;
    for (let j = position + 1; j < types.length; j++) restMinimum += minimumCost.get(types[j]!) ?? Infinity;
    const low = minimumCost.get(type) ?? Infinity;
    const high = position === types.length - 1 ? remaining : remaining - restMinimum;
    for (let c = position === types.length - 1 ? remaining : low; c <= high; c++) {
      const bucket = store.at(type, c);
      for (let k = 0; k < bucket.length; k++) {
        args[position] = bucket[k]!;
        fill(production, position + 1, remaining - c, cost);
      }
    }
    args.length = position;
  };

  const minimumCost = new Map<string, number>();
  const refreshMinimums = (): void => {
    for (const p of productions) {
      for (const t of [...p.argumentTypes, p.result]) minimumCost.set(t, store.cheapest(t));
    }
  };

  try {
    const byCost = [...leaves].sort((a, b) => a.cost - b.cost);
    let nextLeaf = 0;
    for (let cost = 1; cost <= limits.maxCost; cost++) {
      if (solutions.length > 0 && cost > firstSolutionCost + limits.extraBits) break;
      while (nextLeaf < byCost.length && byCost[nextLeaf]!.cost === cost) {
        const leaf = byCost[nextLeaf++]!;
        offer(leaf.type, leaf.cost, leaf.values, undefined, [], leaf.leaf);
      }
      refreshMinimums();
      for (const production of productions) {
        const remaining = cost - production.bits;
        if (remaining < 0) continue;
        args.length = 0;
        if (production.argumentTypes.length === 0) {
          if (remaining === 0) evaluate(production, cost);
          continue;
        }
        let minimum = 0;
        for (const t of production.argumentTypes) minimum += minimumCost.get(t) ?? Infinity;
        if (minimum > remaining) continue;
        fill(production, 0, remaining, cost);
      }
      stats.costReached = cost;
      checkBudget();
    }
  } catch (error) {
    if (!(error instanceof Stop)) throw error;
    reason = error.reason;
  }
  if (solutions.length > 0) reason = 'solved';
  return { solutions, reason, statistics: stats };
}

function sameTestOutputs(a: readonly unknown[], b: readonly unknown[], from: number): boolean {
  for (let i = from; i < a.length; i++) if (!(a[i] as Grid).equals(b[i] as Grid)) return false;
  return true;
}
