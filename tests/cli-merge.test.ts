// Sharded runs and `pithy merge` end to end on the demo tasks: four eval shards merged give
// exactly the results of one unsharded eval at the same settings (candidate cap, one attempt,
// so no timing enters); the first line names the shard; a missing shard, a repeated file and
// shards run with other settings are named and nothing is written; predictions files of solve
// shards merge too.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { comparable, linesOf } from './support/results-lines.ts';

const root = new URL('../', import.meta.url).pathname;
const demo = join(root, 'tasks-demo');
const cli = join(root, 'bin', 'pithy.js');
const budget = ['--attempts', '1', '--max-candidates', '3000', '--time-limit', '1000'];
const folder = mkdtempSync(join(tmpdir(), 'pithy-merge-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));
const taskIds = readdirSync(demo)
  .filter((f) => f.endsWith('.json'))
  .map((f) => f.slice(0, -5))
  .sort();

const pithy = (args: readonly string[], env: Record<string, string> = {}) =>
  spawnSync(process.execPath, [cli, ...args], { cwd: root, encoding: 'utf8', env: { ...process.env, ...env } });



const shardFile = (i: number) => join(folder, `shard-${i}.jsonl`);
const single = join(folder, 'single.jsonl');
const shardRuns: ReturnType<typeof pithy>[] = [];

beforeAll(() => {
  for (let i = 0; i < 4; i++) {
    // Shards 0 and 1 by flag, 2 from Slurm's variables, 3 from a Kubernetes index.
    const env: Record<string, string> =
      i === 2 ? { SLURM_ARRAY_TASK_ID: '3', SLURM_ARRAY_TASK_MIN: '1', SLURM_ARRAY_TASK_COUNT: '4' } : i === 3 ? { JOB_COMPLETION_INDEX: '3' } : {};
    const flags = i < 2 ? ['--shard', `${i}/4`] : i === 3 ? ['--shard-count', '4'] : [];
    shardRuns.push(pithy(['eval', demo, '--results', shardFile(i), ...flags, ...budget], env));
  }
  const run = pithy(['eval', demo, '--results', single, ...budget]);
  expect(run.status, run.stderr).toBe(0);
});

describe('eval in shards', () => {
  it('says first which shard it is and where that came from', () => {
    shardRuns.forEach((run, i) => {
      expect(run.status, run.stderr).toBe(0);
      const from = i === 2 ? ' (from SLURM_ARRAY_TASK_ID)' : i === 3 ? ' (from JOB_COMPLETION_INDEX)' : '';
      expect(run.stderr.split('\n')[0]).toMatch(new RegExp(`^shard ${i}/4${from.replace(/[()]/g, '\\$&')}: \\d+ of ${taskIds.length} tasks$`));
    });
  });

  it('splits the tasks into disjoint shards that together hold each task once', () => {
    const tasks = [0, 1, 2, 3].flatMap((i) => linesOf(shardFile(i)).map((l) => l.task));
    expect([...tasks].sort()).toEqual(taskIds);
  });
});

describe('pithy merge', () => {
  it('gives exactly the results of one unsharded eval, with the same summary', () => {
    const merged = join(folder, 'merged.jsonl');
    const run = pithy(['merge', ...[0, 1, 2, 3].map(shardFile), '--output', merged, '--tasks', demo, '--json']);
    expect(run.status, run.stderr).toBe(0);
    expect(comparable(linesOf(merged))).toEqual(comparable(linesOf(single)));
    const summary = JSON.parse(run.stdout) as Record<string, unknown>;
    const again = JSON.parse(pithy(['eval', demo, '--results', single, '--json', ...budget]).stdout) as Record<string, unknown>;
    for (const key of ['tasks', 'solved', 'wrong', 'notFound', 'timeOuts', 'failures']) expect(summary[key], key).toBe(again[key]);
    expect(summary.missingShards).toEqual([]);
  });

  it('names a missing shard and its tasks, and writes nothing', () => {
    const out = join(folder, 'partial.jsonl');
    const run = pithy(['merge', shardFile(0), shardFile(1), shardFile(3), '--output', out, '--tasks', demo]);
    expect(run.status).toBe(1);
    expect(run.stderr).toContain('missing shards: 2/4');
    const missing = linesOf(shardFile(2)).map((l) => l.task).sort();
    expect(run.stderr).toContain(`missing tasks (${missing.length}): ${missing.join(', ')}`);
    expect(existsSync(out)).toBe(false);
  });

  it('refuses a file given twice (every task must appear once) and shards made with other settings', () => {
    const out = join(folder, 'refused.jsonl');
    const twice = pithy(['merge', shardFile(0), shardFile(0), shardFile(1), shardFile(2), shardFile(3), '--output', out]);
    expect(twice.status).toBe(1);
    expect(twice.stderr).toContain(`appear more than once, in ${shardFile(0)} and in ${shardFile(0)}`);
    const other = join(folder, 'other-settings.jsonl');
    expect(pithy(['eval', demo, '--results', other, '--shard', '2/4', '--attempts', '1', '--max-candidates', '2000', '--time-limit', '1000']).status).toBe(0);
    const mixed = pithy(['merge', shardFile(0), shardFile(1), other, shardFile(3), '--output', out]);
    expect(mixed.status).toBe(1);
    expect(mixed.stderr).toContain(`${other}: `);
    expect(mixed.stderr).toContain('candidate cap: 2000 in');
    expect(existsSync(out)).toBe(false);
  });

  it('merges the predictions files of solve shards, with their records', () => {
    const parts = [0, 1].map((i) => join(folder, `predictions-${i}.jsonl`));
    parts.forEach((file, i) => expect(pithy(['solve', demo, '--shard', `${i}/2`, '--predictions', file, ...budget]).status).toBe(0));
    const out = join(folder, 'predictions.jsonl');
    const run = pithy(['merge', ...parts, '--output', out, '--tasks', demo]);
    expect(run.status, run.stderr).toBe(0);
    const merged = linesOf(out);
    expect(merged.map((l) => l.task)).toEqual(taskIds);
    for (const line of merged) expect(Object.keys(line).sort()).toEqual(['task', 'test']);
    // The attempts are the single eval's.
    const expected = Object.fromEntries(linesOf(single).map((l) => [l.task, (l.attempts as unknown[]).map((attempts) => ({ attempts }))]));
    expect(Object.fromEntries(merged.map((l) => [l.task, l.test]))).toEqual(expected);
    expect(existsSync(join(folder, 'predictions.results.jsonl'))).toBe(true);
  });
});
