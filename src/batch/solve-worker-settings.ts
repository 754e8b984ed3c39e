/** Settings a worker process takes over from the process that started it (through the environment). */
import { setSizeCap } from '../grid/grid.ts';
import { defaultLibrary } from '../../dsl/index.ts';
import type { Library } from '../library/library.ts';

/** Environment variable carrying the grid size cap (`pithy --size-cap N`) into worker processes. */
export const SIZE_CAP_VARIABLE = 'PITHY_SIZE_CAP';

export function applyWorkerSettings(): void {
  const cap = process.env[SIZE_CAP_VARIABLE];
  if (cap !== undefined) setSizeCap(Number(cap));
}

/** Primitive bits from a priors file, as plain data that crosses to worker processes (name → bits). */
export type PriorBits = Readonly<Record<string, number>>;

let priorsLibrary: { key: string; library: Library } | undefined;

/** The default library with the priors' bits (built once per distinct priors). */
export function libraryWithPriors(priors: PriorBits | undefined): Library {
  if (priors === undefined) return defaultLibrary;
  const key = JSON.stringify(priors);
  if (priorsLibrary?.key !== key) priorsLibrary = { key, library: defaultLibrary.withBits(new Map(Object.entries(priors))) };
  return priorsLibrary.library;
}
