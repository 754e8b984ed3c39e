// The memory cap per worker: one number sets the search's byte cap and the worker's heap limit
// so that they agree (the heap limit leaves room for twice the counted bytes); reaching the cap
// stops the task with the reason 'memory', and the run goes on with the next task.
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEFAULT_MEMORY_CAP_MB, workerMemory } from '../src/batch/memory-cap.ts';
import { solveFiles } from '../src/batch/solve-files.ts';

const demo = new URL('../tasks-demo/', import.meta.url).pathname;

describe('the memory cap per worker', () => {
  it('sets the store cap in bytes and a heap limit above twice it (worked by hand)', () => {
    // 1500 MB = 1.5e9 bytes; twice that is 3e9 bytes = 2861.02 MiB, rounded up to 2862, plus 512.
    expect(DEFAULT_MEMORY_CAP_MB).toBe(1500);
    expect(workerMemory(1500)).toEqual({ maxStoreBytes: 1_500_000_000, heapMib: 3374 });
    // 100 MB: 2e8 bytes = 190.73 MiB → 191, plus 512.
    expect(workerMemory(100)).toEqual({ maxStoreBytes: 100_000_000, heapMib: 703 });
  });

  it('stops a task that reaches it with the reason memory, and the run goes on', async () => {
    const files = [join(demo, 'lagoon-view.json'), join(demo, 'marker-buoys.json')];
    // 0.2 MB: lagoon-view keeps thousands of candidates before its solution, far more than that.
    const reports = await solveFiles(files, { memoryCapMb: 0.2, solve: { attempts: 1, maxCandidates: 1_000_000, timeLimitSeconds: 1000, lastStepsWhenFull: false } });
    expect(reports.map((r) => r.task)).toEqual(['lagoon-view', 'marker-buoys']);
    expect(reports[0]!.status).toBe('not found');
    expect(reports[0]!.reason).toBe('memory');
    expect(reports[1]!.status).not.toBe('error');
  });
});
