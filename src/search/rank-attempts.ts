/**
 * The order in which programs that fit every demonstration become attempts: by description
 * length, a program whose output breaks the size the demonstrations settle charged
 * {@link SIZE_BREAK_BITS} for the exception. On equal terms the one that keeps the size goes
 * first, then the one found first. Attempts then take the first ones with distinct test outputs.
 *
 * One hedge between the two ways a program is found: when every attempt taken is a program the
 * search composed, or every one a table read off the demonstrations and applied to the input
 * (src/search/table-programs.ts), and a program of the other way fits too, the last attempt is
 * the cheapest of the other way instead. The first attempt is always the shortest program. The
 * bits of a composition (its calls' priors) and of a table (mostly its entries) are not measured
 * on one scale that the demonstrations can check, so the next-cheapest program of the same way,
 * often a near copy of the first, is a poorer second guess than the best of the other way.
 */
import type { Grid } from '../grid/grid.ts';
import { distinctAttempts } from './distinct-attempts.ts';
import { SIZE_BREAK_BITS } from './output-size.ts';

export interface Rankable {
  readonly bits: number;
  readonly breaksSize: boolean;
  readonly testOutputs: readonly Grid[];
  /** True for a table read off the demonstrations and applied straight to the input; false for a program the search composed. */
  readonly fromTable: boolean;
}

/** The bits a program is ranked by: its own, plus the size exception's when it breaks the settled size. */
export function rankingBits(s: { readonly bits: number; readonly breaksSize?: boolean }): number {
  return s.bits + (s.breaksSize ? SIZE_BREAK_BITS : 0);
}

/** Up to `attempts` of `found` (in the order found), best first, with distinct test outputs, the last of the other way when all else are of one (see above). */
export function rankAttempts<T extends Rankable>(found: readonly T[], attempts: number): T[] {
  const ordered = found
    .map((s, i) => ({ s, i }))
    .sort((a, b) => rankingBits(a.s) - rankingBits(b.s) || Number(a.s.breaksSize) - Number(b.s.breaksSize) || a.i - b.i)
    .map(({ s }) => s);
  const taken = distinctAttempts(ordered, (s) => s.testOutputs, attempts);
  if (attempts < 2 || taken.length < attempts) return taken;
  const way = taken[0]!.fromTable;
  if (taken.some((s) => s.fromTable !== way)) return taken;
  const kept = taken.slice(0, attempts - 1);
  const other = distinctAttempts([...kept, ...ordered.filter((s) => s.fromTable !== way)], (s) => s.testOutputs, attempts)[attempts - 1];
  return other ? [...kept, other] : taken;
}
