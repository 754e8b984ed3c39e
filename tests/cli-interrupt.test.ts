// Interrupted batch runs end to end: `pithy eval` killed with SIGKILL part-way and resumed gives
// the results of an uninterrupted run (same tasks, no duplicates, no torn lines); Ctrl-C
// (SIGINT) stops eval and solve with exit code 130, keeps every finished line and prints the
// summary so far, and a rerun finishes the job. Every run is bounded by a candidate cap and
// gives one attempt (the search for further attempts is bounded by time), so the results of
// two runs are equal exactly, whatever the machine's speed.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const root = new URL('../', import.meta.url).pathname;
const demo = join(root, 'tasks-demo');
const cli = join(root, 'bin', 'pithy.js');
const budget = ['--attempts', '1', '--max-candidates', '10000', '--time-limit', '1000', '--jobs', '2'];
const taskCount = readdirSync(demo).filter((f) => f.endsWith('.json')).length;

const folder = mkdtempSync(join(tmpdir(), 'pithy-interrupt-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

type Line = Record<string, unknown> & { task: string; statistics?: Record<string, unknown> };

/** Lines of a JSON-lines file; fails the test on a torn line. */
function linesOf(path: string): Line[] {
  const text = readFileSync(path, 'utf8');
  expect(text.endsWith('\n')).toBe(true);
  return text
    .trimEnd()
    .split('\n')
    .map((l) => JSON.parse(l) as Line);
}

/** A line without what depends on timing (seconds), keyed by task. */
function comparable(lines: readonly Line[]): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const line of lines) {
    const { seconds: _seconds, statistics, ...rest } = line;
    const { secondsToFirstSolution: _first, ...counts } = statistics ?? {};
    out[line.task] = { ...rest, statistics: counts };
  }
  return out;
}

function lineCount(path: string): number {
  if (!existsSync(path)) return 0;
  return readFileSync(path, 'utf8').split('\n').filter((l) => l.endsWith('}')).length;
}

function start(args: readonly string[]): { child: ChildProcess; done: Promise<{ code: number | null; signal: NodeJS.Signals | null; stdout: string; stderr: string }> } {
  const child = spawn(process.execPath, [cli, ...args], { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] });
  let stdout = '';
  let stderr = '';
  child.stdout!.on('data', (d: Buffer) => (stdout += d.toString()));
  child.stderr!.on('data', (d: Buffer) => (stderr += d.toString()));
  const done = new Promise<{ code: number | null; signal: NodeJS.Signals | null; stdout: string; stderr: string }>((resolve) =>
    child.on('close', (code, signal) => resolve({ code, signal, stdout, stderr })),
  );
  return { child, done };
}

/** Waits until the file holds at least `lines` whole lines (polling; no timing is asserted). */
async function waitForLines(path: string, lines: number, child: ChildProcess): Promise<void> {
  while (lineCount(path) < lines) {
    if (child.exitCode !== null) throw new Error(`the run ended before ${path} had ${lines} lines`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

const reference = join(folder, 'reference.jsonl');

beforeAll(() => {
  const run = spawnSync(process.execPath, [cli, 'eval', demo, '--results', reference, ...budget], { cwd: root, encoding: 'utf8' });
  expect(run.status, run.stderr).toBe(0);
});

describe('an eval killed with SIGKILL part-way', () => {
  it('resumes to exactly the results of an uninterrupted run', async () => {
    expect(taskCount).toBeGreaterThanOrEqual(10);
    const results = join(folder, 'killed.jsonl');
    const { child, done } = start(['eval', demo, '--results', results, ...budget]);
    await waitForLines(results, 3, child);
    child.kill('SIGKILL');
    const killed = await done;
    expect(killed.signal).toBe('SIGKILL');
    const before = lineCount(results);
    expect(before).toBeLessThan(taskCount); // it really was part-way
    const resumed = spawnSync(process.execPath, [cli, 'eval', demo, '--results', results, ...budget], { cwd: root, encoding: 'utf8' });
    expect(resumed.status, resumed.stderr).toBe(0);
    expect(resumed.stderr).toMatch(/resuming from .*killed\.jsonl: \d+ of \d+ tasks already done/);
    const finalLines = linesOf(results);
    const tasks = finalLines.map((l) => l.task);
    expect(new Set(tasks).size).toBe(tasks.length); // no duplicates
    expect(tasks.length).toBe(taskCount);
    expect(comparable(finalLines)).toEqual(comparable(linesOf(reference)));
  });
});

describe('Ctrl-C (SIGINT)', () => {
  it('stops eval with exit code 130, keeps the finished lines and prints the summary so far; a rerun completes it', async () => {
    const results = join(folder, 'interrupted.jsonl');
    const { child, done } = start(['eval', demo, '--results', results, '--json', ...budget]);
    await waitForLines(results, 2, child);
    child.kill('SIGINT');
    const stopped = await done;
    expect(stopped.code).toBe(130);
    const kept = linesOf(results);
    expect(kept.length).toBeLessThan(taskCount);
    const summary = JSON.parse(stopped.stdout) as { tasks: number; interrupted: boolean };
    expect(summary.interrupted).toBe(true);
    expect(summary.tasks).toBe(kept.length);
    expect(stopped.stderr).toContain(`interrupted: ${kept.length} of ${taskCount} tasks finished`);
    const finished = spawnSync(process.execPath, [cli, 'eval', demo, '--results', results, ...budget], { cwd: root, encoding: 'utf8' });
    expect(finished.status, finished.stderr).toBe(0);
    expect(comparable(linesOf(results))).toEqual(comparable(linesOf(reference)));
  });

  it('a second Ctrl-C quits at once, still with exit code 130, and leaves only whole lines', async () => {
    const results = join(folder, 'twice.jsonl');
    const { child, done } = start(['eval', demo, '--results', results, ...budget]);
    await waitForLines(results, 1, child);
    child.kill('SIGINT');
    child.kill('SIGINT');
    const stopped = await done;
    expect(stopped.code).toBe(130);
    expect(linesOf(results).length).toBeGreaterThanOrEqual(1);
  });

  it('stops solve --predictions with exit code 130; a rerun resumes and gives the predictions of an uninterrupted run', async () => {
    const predictions = join(folder, 'predictions.jsonl');
    const { child, done } = start(['solve', demo, '--predictions', predictions, ...budget]);
    await waitForLines(predictions, 2, child);
    child.kill('SIGINT');
    const stopped = await done;
    expect(stopped.code).toBe(130);
    expect(stopped.stderr).toMatch(/interrupted: \d+ of \d+ tasks finished, every one kept in/);
    const resumed = spawnSync(process.execPath, [cli, 'solve', demo, '--predictions', predictions, ...budget], { cwd: root, encoding: 'utf8' });
    expect(resumed.status, resumed.stderr).toBe(0);
    expect(resumed.stderr).toMatch(/resuming .*predictions\.jsonl: \d+ of \d+ tasks already done/);
    const expected: Record<string, unknown> = {};
    for (const line of linesOf(reference)) expected[line.task] = (line.attempts as unknown[]).map((attempts) => ({ attempts }));
    const found: Record<string, unknown> = {};
    for (const line of linesOf(predictions)) {
      expect(found[line.task]).toBeUndefined();
      found[line.task] = line.test;
    }
    expect(found).toEqual(expected);
  });
});
