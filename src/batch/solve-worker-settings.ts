/** Settings a worker thread takes over from the process that started it. */
import { setSizeCap } from '../grid/grid.ts';

/** Environment variable carrying the grid size cap (`pithy --size-cap N`) into worker threads. */
export const SIZE_CAP_VARIABLE = 'PITHY_SIZE_CAP';

export function applyWorkerSettings(): void {
  const cap = process.env[SIZE_CAP_VARIABLE];
  if (cap !== undefined) setSizeCap(Number(cap));
}
