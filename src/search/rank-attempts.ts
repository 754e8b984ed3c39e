/**
 * The order in which programs that fit every demonstration become attempts: by description
 * length, a program whose output breaks the size the demonstrations settle charged
 * {@link SIZE_BREAK_BITS} for the exception. On equal terms the one that keeps the size goes
 * first, then the one found first. Attempts then take the first ones with distinct test outputs.
 */
import type { Grid } from '../grid/grid.ts';
import { distinctAttempts } from './distinct-attempts.ts';
import { SIZE_BREAK_BITS } from './output-size.ts';

export interface Rankable {
  readonly bits: number;
  readonly breaksSize: boolean;
  readonly testOutputs: readonly Grid[];
}

/** The bits a program is ranked by: its own, plus the size exception's when it breaks the settled size. */
export function rankingBits(s: { readonly bits: number; readonly breaksSize?: boolean }): number {
  return s.bits + (s.breaksSize ? SIZE_BREAK_BITS : 0);
}

/** Up to `attempts` of `found` (in the order found), best first, with distinct test outputs. */
export function rankAttempts<T extends Rankable>(found: readonly T[], attempts: number): T[] {
  const ordered = found
    .map((s, i) => ({ s, i }))
    .sort((a, b) => rankingBits(a.s) - rankingBits(b.s) || Number(a.s.breaksSize) - Number(b.s.breaksSize) || a.i - b.i)
    .map(({ s }) => s);
  return distinctAttempts(ordered, (s) => s.testOutputs, attempts);
}
