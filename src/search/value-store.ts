/**
 * What the search has kept: for each type, the candidates found so far, bucketed by cost, each
 * with its values on every example input. A candidate whose values equal a kept one of the
 * same type is observationally equivalent and is dropped (the kept one is never dearer, since
 * candidates arrive in order of cost).
 */
import type { Expression } from '../language/ast.ts';
import { Grid } from '../grid/grid.ts';
import { GridObject } from '../grid/grid-object.ts';
import { splitFunctionType, type BaseType, type Type } from '../language/types.ts';
import { hashValue, valuesEqual } from '../language/value-identity.ts';
import type { Production } from './productions.ts';

export interface Candidate {
  readonly type: Type;
  readonly cost: number;
  /** One value per example input: the demonstration inputs, then the test inputs. */
  readonly values: readonly unknown[];
  readonly production: Production | undefined;
  readonly arguments: readonly Candidate[];
  /** For leaves (the input, a constant): the expression itself. */
  readonly leaf: Expression | undefined;
}

function approximateBytes(value: unknown): number {
  if (value instanceof Grid) return 96 + value.cells.length;
  if (value instanceof GridObject) return 160 + value.shape.cells.length;
  if (Array.isArray(value)) {
    let sum = 48 + 8 * value.length;
    for (const v of value) sum += approximateBytes(v);
    return sum;
  }
  return 16;
}

export class ValueStore {
  private readonly buckets = new Map<Type, Candidate[][]>();
  private readonly byHash = new Map<Type, Map<number, Candidate | Candidate[]>>();
  count = 0;
  bytes = 0;

  constructor(readonly pruning: boolean) {}

  /** Candidates of a type at exactly this cost (empty when none). */
  at(type: Type, cost: number): readonly Candidate[] {
    return this.buckets.get(type)?.[cost] ?? EMPTY_LIST;
  }

  /** Cheapest cost with a candidate of this type, or Infinity. */
  cheapest(type: Type): number {
    const list = this.buckets.get(type);
    if (!list) return Infinity;
    for (let c = 0; c < list.length; c++) if (list[c] && list[c]!.length > 0) return c;
    return Infinity;
  }

  /** Hash of a tuple of values, or 0 for function types (never deduplicated). */
  static hashValues(type: Type, values: readonly unknown[]): number {
    if (splitFunctionType(type)) return 0;
    let h = 0x9747b28c;
    for (let i = 0; i < values.length; i++) h = Math.imul(h ^ hashValue(type as BaseType, values[i]), 0x5bd1e995) ^ (h >>> 15);
    return h >>> 0;
  }

  /** True when a candidate with equal values is already kept. */
  has(type: Type, hash: number, values: readonly unknown[]): boolean {
    if (!this.pruning || splitFunctionType(type)) return false;
    const slot = this.byHash.get(type)?.get(hash);
    if (slot === undefined) return false;
    if (Array.isArray(slot)) {
      for (const c of slot) if (sameValues(type as BaseType, c.values, values)) return true;
      return false;
    }
    return sameValues(type as BaseType, (slot as Candidate).values, values);
  }

  add(candidate: Candidate, hash: number): void {
    let list = this.buckets.get(candidate.type);
    if (!list) this.buckets.set(candidate.type, (list = []));
    while (list.length <= candidate.cost) list.push([]);
    list[candidate.cost]!.push(candidate);
    this.count++;
    for (const v of candidate.values) this.bytes += approximateBytes(v);
    if (!this.pruning || splitFunctionType(candidate.type)) return;
    let table = this.byHash.get(candidate.type);
    if (!table) this.byHash.set(candidate.type, (table = new Map()));
    const slot = table.get(hash);
    if (slot === undefined) table.set(hash, candidate);
    else if (Array.isArray(slot)) slot.push(candidate);
    else table.set(hash, [slot as Candidate, candidate]);
  }
}

const EMPTY_LIST: readonly Candidate[] = [];

function sameValues(type: BaseType, a: readonly unknown[], b: readonly unknown[]): boolean {
  for (let i = 0; i < a.length; i++) if (!valuesEqual(type, a[i], b[i])) return false;
  return true;
}
