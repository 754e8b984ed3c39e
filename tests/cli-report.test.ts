// `pithy report` without a browser: a task file is solved first; the page is self-contained (no
// address outside the page, no external style, script or image); eval's JSON-lines results are
// read, a results line whose task file is gone is still listed with a note; bad inputs exit 2.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const root = new URL('../', import.meta.url).pathname;
const task = join(root, 'tasks-demo', 'marker-buoys.json');
const pithy = (...args: string[]) => spawnSync(process.execPath, [join(root, 'bin', 'pithy.js'), ...args], { encoding: 'utf8', cwd: root });
const folder = mkdtempSync(join(tmpdir(), 'pithy-report-cli-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

/** The JSON data the page holds for each task. */
function taskData(html: string): { name: string; verdict: string; programs: { text: string }[]; train: unknown[]; note?: string }[] {
  return [...html.matchAll(/<script type="application\/json" id="data-\d+">(.*?)<\/script>/gs)].map((m) => JSON.parse(m[1]!));
}

describe('pithy report', () => {
  it('solves a task file first and writes a page that loads nothing from elsewhere', () => {
    const out = join(folder, 'one.html');
    const run = pithy('report', task, '--out', out, '--max-candidates', '200000');
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).toContain('1 task (1 solved)');
    const html = readFileSync(out, 'utf8');
    expect(html).not.toMatch(/https?:\/\//);
    expect(html).not.toMatch(/<link\b|<img\b|\bsrc=|@import|url\(/);
    const [data] = taskData(html);
    expect(data!.name).toBe('marker-buoys');
    expect(data!.verdict).toBe('solved');
    expect(data!.train.length).toBe(2);
    expect(html).toContain(data!.programs[0]!.text.split('\n')[1]!.replace(/>/g, '&gt;'));
  });

  it('reads eval results (JSON lines), keeps a task whose file is gone with a note, and starts with numbers on when asked', () => {
    const results = join(folder, 'results.jsonl');
    const line = (name: string, file: string, solved: boolean) =>
      JSON.stringify({ task: name, file, status: 'found', solutions: [{ program: 'with chart\nanswer chart\n', bits: 1 }], attempts: [[[[1]]]], reason: 'solved', seconds: 0.5, solved });
    writeFileSync(results, line('marker-buoys', task, false) + '\n' + line('gone', join(folder, 'gone.json'), true) + '\n');
    const out = join(folder, 'results.html');
    const run = pithy('report', results, '--out', out, '--numbers');
    expect(run.status, run.stderr).toBe(0);
    const html = readFileSync(out, 'utf8');
    const data = taskData(html);
    // 'answer chart' returns the input, which is not marker-buoys' test output, so it missed.
    expect(data.map((d) => [d.name, d.verdict])).toEqual([['marker-buoys', 'wrong'], ['gone', 'solved']]);
    expect(data[1]!.note).toContain('gone.json');
    expect(html).toContain('<body class="numbers">');
    expect(html).toMatch(/id="numbers" checked/);
  });

  it('exits 2 on a missing input, an empty folder, or a file that is neither tasks nor results', () => {
    expect(pithy('report', join(folder, 'absent.json'), '--out', join(folder, 'a.html')).status).toBe(2);
    const empty = join(folder, 'empty');
    mkdirSync(empty);
    const none = pithy('report', empty, '--out', join(folder, 'b.html'));
    expect(none.status).toBe(2);
    expect(none.stderr).toContain('holds no task files');
    const odd = join(folder, 'odd.json');
    writeFileSync(odd, '{"harbour": 1}');
    expect(pithy('report', odd, '--out', join(folder, 'c.html')).status).toBe(2);
  });
});
