/**
 * Behavioural signatures of sections. A section (a call with its first argument open, such as
 * `has_colour(_, #3)`) is a function, so it cannot be hashed like a grid; instead it is run on
 * probe arguments drawn from each example input, and two sections whose results agree on every
 * probe of every example are taken to behave alike: the dearer one is pruned. Every
 * higher-order primitive then pairs its lists with one section per behaviour instead of one
 * per way of writing it.
 *
 * The probes for an `Object` parameter are the objects of the example's input grid under the
 * four ways of cutting a grid into objects (edges or corners, one colour or many); a section
 * that differs from a kept one only on objects that appear nowhere in an input (moved or made
 * objects) is pruned too. When an input holds no object at all, sections on that example are
 * told apart by nothing, so signatures are switched off for the whole task.
 */
import { backgroundColour, components } from '../grid/components.ts';
import { HASH_MASK, type Grid } from '../grid/grid.ts';
import type { GridObject } from '../grid/grid-object.ts';
import { hashValue, valuesEqual } from '../language/value-identity.ts';
import { isBaseType, splitFunctionType, type BaseType, type Type } from '../language/types.ts';
import { foldHash } from './tuple-hash.ts';

/** At most this many probe objects per example input. */
const MAXIMUM_PROBES = 48;

export class SectionProbes {
  /** Per example input, the probe arguments for an `Object` parameter. */
  private readonly objectProbes: GridObject[][] = [];
  /** False when some input has no object to probe with: sections are then never pruned. */
  readonly usable: boolean;

  constructor(inputs: readonly Grid[]) {
    let usable = true;
    for (const input of inputs) {
      const background = backgroundColour(input);
      const seen = new Set<number>();
      const probes: GridObject[] = [];
      for (const diagonal of [false, true]) {
        for (const multicolour of [false, true]) {
          for (const o of components(input, { diagonal, multicolour, background })) {
            if (probes.length >= MAXIMUM_PROBES || seen.has(o.hash)) continue;
            seen.add(o.hash);
            probes.push(o);
          }
        }
      }
      if (probes.length === 0) usable = false;
      this.objectProbes.push(probes);
    }
    this.usable = usable;
  }

  /**
   * The results of a section on every probe of every example, in order, or undefined when the
   * section's type has no probes (it is then never pruned).
   */
  signature(type: Type, functions: readonly unknown[]): unknown[] | undefined {
    if (!this.usable) return undefined;
    const parts = splitFunctionType(type);
    if (!parts || parts.parameter !== 'Object') return undefined;
    const results: unknown[] = [];
    for (let i = 0; i < functions.length; i++) {
      const f = functions[i] as (argument: unknown) => unknown;
      const probes = this.objectProbes[i]!;
      for (let k = 0; k < probes.length; k++) results.push(f(probes[k]));
    }
    return results;
  }

  static hash(type: Type, results: readonly unknown[]): number {
    const result = splitFunctionType(type)!.result;
    let h = 0x2545f491;
    for (let i = 0; i < results.length; i++) h = foldHash(h, hashValue(result, results[i]));
    return h & HASH_MASK;
  }

  static equal(type: Type, a: readonly unknown[], b: readonly unknown[]): boolean {
    const result: BaseType = splitFunctionType(type)!.result;
    if (!isBaseType(result) || a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (!valuesEqual(result, a[i], b[i])) return false;
    return true;
  }
}
