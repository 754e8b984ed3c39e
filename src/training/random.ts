/**
 * pithy's own seedable pseudo-random numbers, so that generated data depends on nothing but the
 * seed: not on the platform, the Node version or Math.random. A 32-bit counter advanced by an
 * odd constant, each output scrambled by two multiply-and-xor-shift rounds. Fast, small and good
 * enough for drawing puzzles; not for anything secret.
 */

/** Mixes a 32-bit number thoroughly (used to scramble outputs and to derive seeds). */
export function mix32(x: number): number {
  let z = x >>> 0;
  z = Math.imul(z ^ (z >>> 16), 0x7feb352d);
  z = Math.imul(z ^ (z >>> 15), 0x846ca68b);
  return (z ^ (z >>> 16)) >>> 0;
}

/** A seed for an independent stream, from a base seed and any number of labels (indices, purposes). */
export function deriveSeed(seed: number, ...labels: readonly (number | string)[]): number {
  let h = mix32(seed ^ 0x5bd1e995);
  for (const label of labels) {
    if (typeof label === 'number') h = mix32(h ^ mix32(label + 0x27d4eb2f));
    else for (let i = 0; i < label.length; i++) h = mix32(h ^ (label.charCodeAt(i) + 0x165667b1));
  }
  return h;
}

export class Random {
  private state: number;

  constructor(seed: number) {
    this.state = mix32(seed >>> 0) ^ 0x9e3779b9;
  }

  /** A whole number from 0 to 2^32 - 1. */
  next(): number {
    this.state = (this.state + 0x6d2b79f5) >>> 0;
    return mix32(this.state);
  }

  /** A number in [0, 1). */
  fraction(): number {
    return this.next() / 4294967296;
  }

  /** A whole number from 0 to count - 1 (count ≥ 1). */
  below(count: number): number {
    return Math.floor(this.fraction() * count);
  }

  /** A whole number from low to high, both included. */
  between(low: number, high: number): number {
    return low + this.below(high - low + 1);
  }

  chance(probability: number): boolean {
    return this.fraction() < probability;
  }

  pick<T>(items: readonly T[]): T {
    if (items.length === 0) throw new RangeError('cannot pick from an empty list');
    return items[this.below(items.length)]!;
  }

  /** An index drawn with probability proportional to its weight (weights ≥ 0, not all 0). */
  weighted(weights: readonly number[]): number {
    let total = 0;
    for (const w of weights) total += w;
    let target = this.fraction() * total;
    for (let i = 0; i < weights.length; i++) {
      target -= weights[i]!;
      if (target < 0) return i;
    }
    for (let i = weights.length - 1; i >= 0; i--) if (weights[i]! > 0) return i;
    throw new RangeError('every weight is 0');
  }

  /** `count` distinct items in random order. */
  sample<T>(items: readonly T[], count: number): T[] {
    const pool = items.slice();
    for (let i = pool.length - 1; i > 0; i--) {
      const j = this.below(i + 1);
      [pool[i], pool[j]] = [pool[j]!, pool[i]!];
    }
    return pool.slice(0, count);
  }
}
