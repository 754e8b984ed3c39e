// The memory cap per worker: one number sets the search's byte cap and the worker's heap limit
// so that they agree (the heap limit leaves room for twice the counted bytes); reaching the cap
// stops the task with the reason 'memory', and the run goes on with the next task.
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEFAULT_MEMORY_CAP_MB, workerMemory } from '../src/batch/memory-cap.ts';
import { solveFiles, workerDeathReport } from '../src/batch/solve-files.ts';

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

  it('tells a worker that filled its heap from one that crashed, by what a real V8 process writes as it dies', () => {
    // A real Node process with a 16 MiB heap that keeps every array it makes: V8 aborts it.
    const full = spawnSync(process.execPath, ['--max-old-space-size=16', '-e', 'const kept = []; for (;;) kept.push(new Array(10000).fill(kept.length));'], { encoding: 'utf8' });
    expect(full.status === 0 && full.signal === null).toBe(false);
    const memory = workerDeathReport('a.json', full.stderr, full.status, full.signal, 1500, 1);
    expect(memory.reason).toBe('memory');
    expect(memory.status).toBe('not found');
    // A process that throws is a crash, and the report names how it ended and its last words.
    const thrown = spawnSync(process.execPath, ['-e', 'throw new Error("a broken primitive")'], { encoding: 'utf8' });
    const crash = workerDeathReport('a.json', thrown.stderr, thrown.status, thrown.signal, 1500, 1);
    expect(crash.status).toBe('error');
    expect(crash.failure).toBe('worker crashed');
    expect(crash.error).toContain('exit code 1');
    expect(crash.error).toContain('a broken primitive');
  });

  it('reports a task whose worker is killed as a crash, and the next task gets a fresh worker', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'pithy-killed-'));
    try {
      // Noise in, other noise out: no program fits, so the search runs until it is stopped.
      const noise = (seed: number) => Array.from({ length: 9 }, (_, r) => Array.from({ length: 9 }, (_, c) => (r * 7 + c * 3 + seed * 5 + ((r * c) % 4)) % 10));
      const hopeless = join(folder, 'hopeless.json');
      writeFileSync(hopeless, JSON.stringify({ train: [{ input: noise(1), output: noise(2) }, { input: noise(3), output: noise(8) }], test: [{ input: noise(5), output: noise(6) }] }));
      const files = [hopeless, join(demo, 'marker-buoys.json')];
      // Kill the worker (the only child of this process besides tools) as soon as it exists.
      const killer = setInterval(() => {
        let pids: string[] = [];
        try {
          pids = execFileSync('ps', ['-o', 'pid=,args=', '--ppid', String(process.pid)], { encoding: 'utf8' }).split('\n').filter((l) => l.includes('worker-entry'));
        } catch {
          return;
        }
        for (const line of pids) {
          process.kill(Number(line.trim().split(/\s+/)[0]), 'SIGKILL');
          clearInterval(killer);
        }
      }, 100);
      const reports = await solveFiles(files, { solve: { attempts: 1, timeLimitSeconds: 60 } });
      clearInterval(killer);
      expect(reports[0]!.status).toBe('error');
      expect(reports[0]!.failure).toBe('worker crashed');
      expect(reports[0]!.error).toContain('signal SIGKILL');
      expect(reports[1]!.status).toBe('found');
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });
});
