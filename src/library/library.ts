/** A set of primitives indexed by name, as the checker, interpreter and search see it. */
import type { Primitive } from './primitive.ts';

export class Library {
  readonly primitives: readonly Primitive[];
  private readonly byName = new Map<string, Primitive>();

  constructor(primitives: readonly Primitive[]) {
    this.primitives = primitives;
    for (const p of primitives) {
      if (this.byName.has(p.name)) throw new Error(`primitive '${p.name}' is defined twice`);
      if (!/^[a-z][a-z0-9_]*$/.test(p.name)) throw new Error(`primitive name '${p.name}' must be lower-case words joined by _`);
      this.byName.set(p.name, p);
    }
  }

  get(name: string): Primitive | undefined {
    return this.byName.get(name);
  }

  names(): readonly string[] {
    return this.primitives.map((p) => p.name);
  }

  /**
   * A copy whose named primitives cost the given bits (a priors file); the others keep their
   * record's bits. Order, names and behaviour are unchanged. Throws on a name the library does
   * not hold or on bits that are not a whole number of at least 1 (the search fills whole cost
   * levels).
   */
  withBits(bits: ReadonlyMap<string, number>): Library {
    for (const [name, value] of bits) {
      if (!this.byName.has(name)) throw new Error(`no primitive named '${name}' in the library`);
      if (!Number.isInteger(value) || value < 1) throw new Error(`bits of '${name}' must be a whole number of at least 1, got ${value}`);
    }
    return new Library(this.primitives.map((p) => {
      const b = bits.get(p.name);
      return b === undefined || b === p.bits ? p : { ...p, bits: b };
    }));
  }

  /** A copy without the named primitives (for ablations and tests). */
  without(names: readonly string[]): Library {
    const drop = new Set(names);
    return new Library(this.primitives.filter((p) => !drop.has(p.name)));
  }
}
