// The solve and eval commands end to end: the predictions file format, refusing to overwrite,
// resumable results, and bad files reported without stopping the run.
import { spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = new URL('../', import.meta.url).pathname;
const demo = join(root, 'tasks-demo');
const pithy = (...args: string[]) => spawnSync(process.execPath, [join(root, 'bin', 'pithy.js'), ...args], { encoding: 'utf8', cwd: root });

function isGrid(value: unknown): boolean {
  return (
    Array.isArray(value) &&
    value.length > 0 &&
    value.every((row) => Array.isArray(row) && row.length === value[0].length && row.every((c) => Number.isInteger(c) && c >= 0 && c <= 9))
  );
}

describe('pithy solve --predictions', () => {
  const dir = mkdtempSync(join(tmpdir(), 'pithy-solve-'));
  const tasks = ['lighthouse-mirror', 'marker-buoys'];
  for (const t of tasks) copyFileSync(join(demo, `${t}.json`), join(dir, `${t}.json`));
  writeFileSync(join(dir, 'broken.json'), '{"train": [{"input": [[1, 2], [3]], "output": [[1]]}], "test": []}');
  const predictions = join(dir, 'out.jsonl');
  const run = pithy('solve', dir, '--predictions', predictions, '--time-limit', '30');

  it('reports the bad file with its JSON path, goes on, and exits non-zero', () => {
    expect(run.stdout + run.stderr).toContain('broken.json');
    expect(run.stdout + run.stderr).toContain('$.train[0].input[1]');
    expect(run.status).toBe(1);
    for (const t of tasks) expect(run.stdout).toContain(`${t}: `);
  });

  it('writes one line per task in exactly the documented shape', () => {
    const lines = readFileSync(predictions, 'utf8').trimEnd().split('\n').map((l) => JSON.parse(l) as Record<string, unknown>);
    const good = lines.filter((l) => tasks.includes(l.task as string));
    expect(good.map((l) => l.task).sort()).toEqual([...tasks].sort());
    for (const line of good) {
      expect(Object.keys(line).sort()).toEqual(['task', 'test']);
      const file = JSON.parse(readFileSync(join(dir, `${line.task}.json`), 'utf8')) as { test: { output: number[][] }[] };
      const test = line.test as { attempts: unknown[] }[];
      expect(test.length).toBe(file.test.length);
      test.forEach((entry, i) => {
        expect(Object.keys(entry)).toEqual(['attempts']);
        expect(entry.attempts.length).toBeGreaterThan(0);
        expect(entry.attempts.length).toBeLessThanOrEqual(2);
        for (const grid of entry.attempts) expect(isGrid(grid)).toBe(true);
        // The demo tasks are solvable: the first attempt is the expected output.
        expect(entry.attempts[0]).toEqual(file.test[i]!.output);
      });
    }
  });

  it('refuses to overwrite an existing predictions file', () => {
    const before = readFileSync(predictions, 'utf8');
    const again = pithy('solve', join(dir, 'marker-buoys.json'), '--predictions', predictions);
    expect(again.status).toBe(2);
    expect(again.stderr).toContain('already exists');
    expect(readFileSync(predictions, 'utf8')).toBe(before);
  });
});

describe('pithy eval', () => {
  const dir = mkdtempSync(join(tmpdir(), 'pithy-eval-'));
  for (const t of ['lighthouse-mirror', 'lagoon-view']) copyFileSync(join(demo, `${t}.json`), join(dir, `${t}.json`));
  const results = join(dir, 'results.jsonl');

  it('scores every task, appends a line per task, and resumes without solving again', () => {
    const first = pithy('eval', dir, '--results', results, '--json', '--time-limit', '30');
    expect(first.status).toBe(0);
    const summary = JSON.parse(first.stdout) as { tasks: number; solved: number };
    expect(summary.tasks).toBe(2);
    expect(summary.solved).toBe(2);
    const lines = readFileSync(results, 'utf8').trimEnd().split('\n');
    expect(lines.length).toBe(2);
    const second = pithy('eval', dir, '--results', results, '--json');
    expect(second.stderr).toContain('2 of 2 tasks already done');
    expect(readFileSync(results, 'utf8').trimEnd().split('\n').length).toBe(2);
    expect((JSON.parse(second.stdout) as { solved: number }).solved).toBe(2);
  });

  it('solves a task again whose result line was torn by an interruption', () => {
    const text = readFileSync(results, 'utf8').trimEnd().split('\n');
    writeFileSync(results, text[0] + '\n' + text[1]!.slice(0, 20));
    const third = pithy('eval', dir, '--results', results, '--json', '--time-limit', '30');
    expect(third.stderr).toContain('1 of 2 tasks already done');
    expect((JSON.parse(third.stdout) as { tasks: number }).tasks).toBe(2);
    expect(existsSync(results)).toBe(true);
  });
});

describe('pithy --size-cap', () => {
  it('rejects grids over a lowered cap, naming the file, the place and the cap', () => {
    const run = pithy('--size-cap', '2', 'solve', join(demo, 'lagoon-view.json'));
    expect(run.status).toBe(1);
    expect(run.stderr + run.stdout).toMatch(/lagoon-view\.json.*\$\.train\[0\]\.input.*size cap of 2/);
  });

  it('refuses a cap outside 1 to 1000', () => {
    const run = pithy('--size-cap', '5000', 'primitives');
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('from 1 to 1000');
  });
});
