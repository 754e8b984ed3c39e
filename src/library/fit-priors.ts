/**
 * Priors from solutions: each primitive's bits re-estimated from how often it is used in solved
 * programs. With n(p) the uses of primitive p (steps written out where used, as the description
 * length counts them), N the uses of all primitives together and L the number of primitives in
 * the library,
 *
 *   bits(p) = min(cap, max(minimum, round(log2((N + a·L) / (n(p) + a)))))
 *
 * that is, minus the base-2 logarithm of p's smoothed share of all uses, rounded to a whole
 * number because the search fills whole cost levels. The smoothing a (default 1/2, the
 * Krichevsky–Trofimov estimator) adds a pseudo-use to every primitive, so one that no solution
 * uses still has a share above zero and finite bits, never more than the cap (default 10).
 */
import type { Library } from './library.ts';

export interface PriorsParameters {
  /** Pseudo-uses added to every primitive's count (above 0, so unused primitives stay reachable). */
  readonly smoothing: number;
  /** The fewest bits a primitive may cost (a whole number, at least 1). */
  readonly minimumBits: number;
  /** The most bits a primitive may cost, whatever its count (a whole number, at least the minimum). */
  readonly capBits: number;
}

export const DEFAULT_PRIORS_PARAMETERS: PriorsParameters = { smoothing: 0.5, minimumBits: 1, capBits: 10 };

/** The formula in words, written into every priors file. */
export const PRIORS_FORMULA = 'bits(p) = min(cap, max(minimum, round(log2((N + smoothing * L) / (uses(p) + smoothing))))), N = uses of all primitives, L = primitives in the library';

/** Throws with a message naming the parameter when the parameters cannot be used. */
export function checkPriorsParameters(p: PriorsParameters): void {
  if (!(Number.isFinite(p.smoothing) && p.smoothing > 0)) throw new Error(`smoothing must be a number above 0, got ${p.smoothing}`);
  if (!(Number.isInteger(p.minimumBits) && p.minimumBits >= 1)) throw new Error(`minimum bits must be a whole number of at least 1, got ${p.minimumBits}`);
  if (!(Number.isInteger(p.capBits) && p.capBits >= p.minimumBits)) throw new Error(`cap must be a whole number of at least the minimum (${p.minimumBits}), got ${p.capBits}`);
}

/** The bits of one primitive used `uses` times out of `total` uses, in a library of `primitives`. */
export function bitsFromCount(uses: number, total: number, primitives: number, parameters: PriorsParameters): number {
  const { smoothing, minimumBits, capBits } = parameters;
  const bits = Math.round(Math.log2((total + smoothing * primitives) / (uses + smoothing)));
  return Math.min(capBits, Math.max(minimumBits, bits));
}

/**
 * Every primitive's fitted bits, in the library's order, from the uses counted in solved
 * programs. Throws when a counted name is not in the library.
 */
export function fitBits(uses: ReadonlyMap<string, number>, library: Library, parameters: PriorsParameters = DEFAULT_PRIORS_PARAMETERS): Map<string, number> {
  checkPriorsParameters(parameters);
  let total = 0;
  for (const [name, n] of uses) {
    if (!library.get(name)) throw new Error(`no primitive named '${name}' in the library`);
    if (!(Number.isInteger(n) && n >= 0)) throw new Error(`uses of '${name}' must be a whole number, got ${n}`);
    total += n;
  }
  const out = new Map<string, number>();
  for (const p of library.primitives) out.set(p.name, bitsFromCount(uses.get(p.name) ?? 0, total, library.primitives.length, parameters));
  return out;
}
