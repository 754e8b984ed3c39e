// The solve and eval commands end to end: the predictions file format, refusing to overwrite,
// resumable results and predictions, settings recorded and checked on resume, and bad files
// reported without stopping the run. Runs are bounded by candidate caps, not by time.
import { spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

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
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  const tasks = ['lighthouse-mirror', 'marker-buoys'];
  for (const t of tasks) copyFileSync(join(demo, `${t}.json`), join(dir, `${t}.json`));
  writeFileSync(join(dir, 'broken.json'), '{"train": [{"input": [[1, 2], [3]], "output": [[1]]}], "test": []}');
  const predictions = join(dir, 'out.jsonl');
  const budget = ['--max-candidates', '300000', '--time-limit', '600'];
  const run = pithy('solve', dir, '--predictions', predictions, ...budget);

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

  it('resumes with the same settings: nothing is solved again and the file stays as it was', () => {
    const before = readFileSync(predictions, 'utf8');
    const again = pithy('solve', dir, '--predictions', predictions, ...budget);
    expect(again.stderr).toContain('3 of 3 tasks already done');
    expect(again.status).toBe(1); // the broken file is still reported
    expect(readFileSync(predictions, 'utf8')).toBe(before);
  });

  it('refuses to resume with other settings, naming each one that differs, and changes nothing', () => {
    const before = readFileSync(predictions, 'utf8');
    const again = pithy('solve', dir, '--predictions', predictions, '--attempts', '3', '--max-candidates', '300000', '--time-limit', '600');
    expect(again.status).toBe(2);
    expect(again.stderr).toContain('attempts: 2 in the file, 3 now');
    expect(again.stderr).not.toContain('time limit');
    expect(readFileSync(predictions, 'utf8')).toBe(before);
  });

  it('refuses to overwrite a predictions file it did not write (no record beside it)', () => {
    const mine = join(dir, 'mine.jsonl');
    writeFileSync(mine, 'my own notes\n');
    const again = pithy('solve', join(dir, 'marker-buoys.json'), '--predictions', mine, ...budget);
    expect(again.status).toBe(2);
    expect(again.stderr).toContain('already exists');
    expect(readFileSync(mine, 'utf8')).toBe('my own notes\n');
  });
});

describe('pithy eval', () => {
  const dir = mkdtempSync(join(tmpdir(), 'pithy-eval-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  for (const t of ['lighthouse-mirror', 'lagoon-view']) copyFileSync(join(demo, `${t}.json`), join(dir, `${t}.json`));
  const results = join(dir, 'results.jsonl');

  it('scores every task, appends a line per task, and resumes without solving again', () => {
    const first = pithy('eval', dir, '--results', results, '--json', '--max-candidates', '300000', '--time-limit', '600');
    expect(first.status).toBe(0);
    const summary = JSON.parse(first.stdout) as { tasks: number; solved: number };
    expect(summary.tasks).toBe(2);
    expect(summary.solved).toBe(2);
    const lines = readFileSync(results, 'utf8').trimEnd().split('\n');
    expect(lines.length).toBe(2);
    const second = pithy('eval', dir, '--results', results, '--json', '--max-candidates', '300000', '--time-limit', '600');
    expect(second.stderr).toContain('2 of 2 tasks already done');
    expect(readFileSync(results, 'utf8').trimEnd().split('\n').length).toBe(2);
    expect((JSON.parse(second.stdout) as { solved: number }).solved).toBe(2);
  });

  it('solves a task again whose result line was torn by an interruption', () => {
    const text = readFileSync(results, 'utf8').trimEnd().split('\n');
    writeFileSync(results, text[0] + '\n' + text[1]!.slice(0, 20));
    const third = pithy('eval', dir, '--results', results, '--json', '--max-candidates', '300000', '--time-limit', '600');
    expect(third.stderr).toContain('1 of 2 tasks already done');
    expect((JSON.parse(third.stdout) as { tasks: number }).tasks).toBe(2);
    // The torn line is gone: two whole lines, one per task.
    const after = readFileSync(results, 'utf8').trimEnd().split('\n').map((l) => JSON.parse(l) as { task: string });
    expect(after.map((l) => l.task).sort()).toEqual(['lagoon-view', 'lighthouse-mirror']);
  });

  it('records on every line the settings that shape it', () => {
    const lines = readFileSync(results, 'utf8').trimEnd().split('\n').map((l) => JSON.parse(l) as { settings: Record<string, unknown> });
    for (const line of lines) {
      expect(line.settings).toMatchObject({ timeLimitSeconds: 600, attempts: 2, pruning: true, maxCandidates: 300000, goals: true, intermediateTables: true, memoryCapMb: 1500, sizeCap: 30, priors: null });
      expect(line.settings.library).toMatch(/^sha256:[0-9a-f]{16}$/);
      expect(line.settings.version).toBe(JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')).version);
    }
  });

  it('refuses to resume with another time limit or pruning, naming both, and leaves the file alone', () => {
    const before = readFileSync(results, 'utf8');
    const run = pithy('eval', dir, '--results', results, '--max-candidates', '300000', '--time-limit', '5', '--no-pruning');
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('time limit (s): 600 in the file, 5 now');
    expect(run.stderr).toContain('pruning: true in the file, false now');
    expect(readFileSync(results, 'utf8')).toBe(before);
  });

  it('refuses to resume with goals or intermediate tables switched off, naming them', () => {
    const before = readFileSync(results, 'utf8');
    const run = pithy('eval', dir, '--results', results, '--max-candidates', '300000', '--time-limit', '600', '--no-goals', '--no-intermediate-tables');
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('goals: true in the file, false now');
    expect(run.stderr).toContain('intermediate tables: true in the file, false now');
    expect(readFileSync(results, 'utf8')).toBe(before);
  });

  it('resumes a file written before goals and intermediate tables were recorded (they were on then)', () => {
    const before = readFileSync(results, 'utf8');
    const older = before
      .trimEnd()
      .split('\n')
      .map((l) => {
        const line = JSON.parse(l) as { settings: Record<string, unknown> };
        delete line.settings.goals;
        delete line.settings.intermediateTables;
        return JSON.stringify(line) + '\n';
      })
      .join('');
    writeFileSync(results, older);
    const run = pithy('eval', dir, '--results', results, '--json', '--max-candidates', '300000', '--time-limit', '600');
    expect(run.stderr).toContain('2 of 2 tasks already done');
    const refused = pithy('eval', dir, '--results', results, '--max-candidates', '300000', '--time-limit', '600', '--no-goals');
    expect(refused.status).toBe(2);
    expect(refused.stderr).toContain('goals: true in the file, false now');
    writeFileSync(results, before);
  });

  it('solves again a task whose worker crashed, unless --no-retry', () => {
    const lines = readFileSync(results, 'utf8').trimEnd().split('\n').map((l) => JSON.parse(l) as Record<string, unknown>);
    const crashed: Record<string, unknown> = { ...lines[0]!, status: 'error', failure: 'worker crashed', error: 'the worker died', solutions: [], attempts: [], reason: 'error', solved: false };
    writeFileSync(results, [crashed, lines[1]].map((l) => JSON.stringify(l) + '\n').join(''));
    const kept = pithy('eval', dir, '--results', results, '--json', '--no-retry', '--max-candidates', '300000', '--time-limit', '600');
    expect(kept.stderr).toContain('2 of 2 tasks already done');
    expect((JSON.parse(kept.stdout) as { solved: number; failures: number })).toMatchObject({ solved: 1, failures: 1 });
    const retried = pithy('eval', dir, '--results', results, '--json', '--max-candidates', '300000', '--time-limit', '600');
    expect(retried.stderr).toContain(`solving again (worker crashed or overran): ${String(crashed.task)}`);
    expect((JSON.parse(retried.stdout) as { solved: number; failures: number })).toMatchObject({ solved: 2, failures: 0 });
    const after = readFileSync(results, 'utf8').trimEnd().split('\n').map((l) => JSON.parse(l) as { task: string; status: string });
    expect(after.length).toBe(2);
    expect(after.every((l) => l.status === 'found')).toBe(true);
  });

  it('refuses a results file that is not one, and leaves it alone', () => {
    const notes = join(dir, 'notes.txt');
    writeFileSync(notes, 'a line of my own\n');
    const run = pithy('eval', dir, '--results', notes);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain(`${notes}: line 1: not a results line`);
    expect(readFileSync(notes, 'utf8')).toBe('a line of my own\n');
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
