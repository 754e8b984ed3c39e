// `pithy solve --explain` and `--programs DIR` end to end on the demo task marker-buoys (solved
// within a few hundred candidates, so the run is short and does not depend on timing).
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const root = new URL('../', import.meta.url).pathname;
const task = join(root, 'tasks-demo', 'marker-buoys.json');
const pithy = (...args: string[]) => spawnSync(process.execPath, [join(root, 'bin', 'pithy.js'), ...args], { encoding: 'utf8', cwd: root, env: { ...process.env, NO_COLOR: '1' } });
const folder = mkdtempSync(join(tmpdir(), 'pithy-explain-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

/** A grid as pithy draws it in plain text: digits, '.' for 0, one space between cells. */
function plainRows(rows: number[][]): string[] {
  return rows.map((row) => row.map((v) => (v === 0 ? '.' : String(v))).join(' '));
}

describe('pithy solve --explain --programs', () => {
  const programs = join(folder, 'programs');
  const run = pithy('solve', task, '--explain', '--programs', programs, '--attempts', '1', '--max-candidates', '200000');
  const file = JSON.parse(readFileSync(task, 'utf8')) as { train: { input: number[][] }[]; test: { input: number[][]; output: number[][] }[] };

  it('draws every step on the first demonstration and the predicted test output', () => {
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).toContain('step by step on demonstration 1:');
    expect(run.stdout).toMatch(/answer : Grid = grid \d+x\d+/);
    expect(run.stdout).toContain('its predictions:');
    // The demo task is solvable, so the drawn prediction is the test output of the task file;
    // each of its rows appears on a line beside the test input.
    const lines = run.stdout.split('\n');
    for (const row of plainRows(file.test[0]!.output)) expect(lines.some((l) => l.trimEnd().endsWith(row))).toBe(true);
  });

  it('writes the program as DIR/<task>.pithy, which pithy check and pithy run accept', () => {
    const written = join(programs, 'marker-buoys.pithy');
    expect(existsSync(written)).toBe(true);
    expect(pithy('check', written).status).toBe(0);
    const replay = pithy('run', written, task);
    expect(replay.status).toBe(0);
    expect(replay.stdout).toContain('3/3 pairs passed');
  });

  it('never overwrites a program file without --force', () => {
    const written = join(programs, 'marker-buoys.pithy');
    writeFileSync(written, '-- mine\nwith chart\nanswer chart\n');
    const again = pithy('solve', task, '--programs', programs, '--max-candidates', '200000');
    expect(again.status).toBe(2);
    expect(again.stderr).toContain('already exists');
    expect(readFileSync(written, 'utf8')).toBe('-- mine\nwith chart\nanswer chart\n');
    expect(pithy('solve', task, '--programs', programs, '--force', '--max-candidates', '200000').status).toBe(0);
    expect(readFileSync(written, 'utf8')).toContain('Found by pithy solve for marker-buoys');
  });
});
