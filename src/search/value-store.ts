/**
 * What the search has kept: for each type (by integer id), the candidates found so far,
 * bucketed by cost, each with its values on every example input. A candidate whose values
 * equal a kept one of the same type is observationally equivalent and is dropped (the kept one
 * is never dearer, since candidates arrive in order of cost). Sections are compared by their
 * behavioural signature (see section-probes.ts).
 */
import type { Expression } from '../language/ast.ts';
import { Grid, HASH_MASK } from '../grid/grid.ts';
import { GridObject } from '../grid/grid-object.ts';
import type { BaseType, Type } from '../language/types.ts';
import { hashValue, valuesEqual } from '../language/value-identity.ts';
import type { Production } from './productions.ts';
import { SectionProbes } from './section-probes.ts';
import { foldHash } from './tuple-hash.ts';

export interface Candidate {
  readonly type: Type;
  readonly typeId: number;
  readonly cost: number;
  /** One value per example input: the demonstration inputs, then the test inputs. */
  readonly values: readonly unknown[];
  readonly production: Production | undefined;
  readonly arguments: readonly Candidate[];
  /** For leaves (the input, a constant): the expression itself. */
  readonly leaf: Expression | undefined;
  /** For sections: the results on the probe arguments, compared instead of the values. */
  readonly signature: readonly unknown[] | undefined;
}

/**
 * Bytes a value holds, counted honestly enough to bound memory: object headers and the cells
 * of grids (typed arrays live outside the JavaScript heap limit). What grids memoise (colour
 * counts, components) is counted where it is made (`analysisBytes` in src/grid/components.ts).
 */
export function approximateBytes(value: unknown): number {
  if (value instanceof Grid) return gridBytes(value);
  // The object, and its box as a grid would hold it (counted whether or not its shape Grid is made yet).
  if (value instanceof GridObject) return 64 + 120 + value.height * value.width;
  if (Array.isArray(value)) {
    let sum = 48 + 8 * value.length;
    for (const v of value) sum += approximateBytes(v);
    return sum;
  }
  if (typeof value === 'function') return 96;
  return 16;
}

function gridBytes(g: Grid): number {
  return 120 + g.height * g.width;
}

const EMPTY_LIST: readonly Candidate[] = [];

export class ValueStore {
  /** [type id][cost] → candidates. */
  private readonly buckets: Candidate[][][] = [];
  private readonly byHash: Map<number, Candidate | Candidate[]>[] = [];
  /** [type id] → cheapest cost kept, or Infinity. */
  private readonly cheapestCost: number[] = [];
  count = 0;
  bytes = 0;

  constructor(
    readonly pruning: boolean,
    /** [type id] → the type's name, and whether it is a function type. */
    private readonly typeNames: readonly Type[],
    private readonly isFunction: readonly boolean[],
  ) {
    for (let t = 0; t < typeNames.length; t++) {
      this.buckets.push([]);
      this.byHash.push(new Map());
      this.cheapestCost.push(Infinity);
    }
  }

  /** Candidates of a type at exactly this cost (empty when none). */
  at(typeId: number, cost: number): readonly Candidate[] {
    return this.buckets[typeId]![cost] ?? EMPTY_LIST;
  }

  /** Cheapest cost with a candidate of this type, or Infinity. */
  cheapest(typeId: number): number {
    return this.cheapestCost[typeId]!;
  }

  /** Hash of a tuple of values (base types) or of a section's signature. */
  hashOf(typeId: number, values: readonly unknown[], signature: readonly unknown[] | undefined): number {
    const type = this.typeNames[typeId]!;
    if (this.isFunction[typeId]) return signature ? SectionProbes.hash(type, signature) : 0;
    let h = 0x9747b28c;
    for (let i = 0; i < values.length; i++) h = foldHash(h, hashValue(type as BaseType, values[i]));
    return h & HASH_MASK;
  }

  /** True when a candidate with equal values (or, for a section, an equal signature) is kept. */
  has(typeId: number, hash: number, values: readonly unknown[], signature: readonly unknown[] | undefined): boolean {
    if (!this.pruning) return false;
    const isFunction = this.isFunction[typeId]!;
    if (isFunction && !signature) return false;
    const slot = this.byHash[typeId]!.get(hash);
    if (slot === undefined) return false;
    const type = this.typeNames[typeId]!;
    if (!Array.isArray(slot)) return this.same(type, isFunction, slot as Candidate, values, signature);
    for (let k = 0; k < slot.length; k++) if (this.same(type, isFunction, slot[k]!, values, signature)) return true;
    return false;
  }

  private same(type: Type, isFunction: boolean, kept: Candidate, values: readonly unknown[], signature: readonly unknown[] | undefined): boolean {
    return isFunction ? SectionProbes.equal(type, kept.signature!, signature!) : sameValues(type as BaseType, kept.values, values);
  }

  add(candidate: Candidate, hash: number): void {
    const typeId = candidate.typeId;
    const list = this.buckets[typeId]!;
    while (list.length <= candidate.cost) list.push([]);
    list[candidate.cost]!.push(candidate);
    if (candidate.cost < this.cheapestCost[typeId]!) this.cheapestCost[typeId] = candidate.cost;
    this.count++;
    this.bytes += 160;
    for (const v of candidate.values) this.bytes += approximateBytes(v);
    if (candidate.signature) this.bytes += 8 * candidate.signature.length;
    if (!this.pruning || (this.isFunction[typeId] && !candidate.signature)) return;
    const table = this.byHash[typeId]!;
    const slot = table.get(hash);
    if (slot === undefined) table.set(hash, candidate);
    else if (Array.isArray(slot)) slot.push(candidate);
    else table.set(hash, [slot as Candidate, candidate]);
  }
}

function sameValues(type: BaseType, a: readonly unknown[], b: readonly unknown[]): boolean {
  for (let i = 0; i < a.length; i++) if (!valuesEqual(type, a[i], b[i])) return false;
  return true;
}
