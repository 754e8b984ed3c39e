// `pithy fit-priors` and `--priors` end to end: the counts read from results files (worked by
// hand from the programs below), byte-identical priors files, the usage report, bad priors files
// rejected with file and place, solve charging the priors' bits, and eval recording them.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { usageFromResults, usageReport } from '../src/batch/primitive-usage.ts';

const root = new URL('../', import.meta.url).pathname;
const demo = join(root, 'tasks-demo');
const pithy = (cwd: string, ...args: string[]) => spawnSync(process.execPath, [join(root, 'bin', 'pithy.js'), ...args], { encoding: 'utf8', cwd });

/** A results line as `pithy eval --results` writes it (only what fit-priors reads matters). */
function line(task: string, solved: boolean, program: string): string {
  return JSON.stringify({ task, file: `${task}.json`, status: 'found', solutions: [{ program, bits: 10 }], attempts: [], reason: 'solved', seconds: 0.1, solved });
}

const dir = mkdtempSync(join(tmpdir(), 'pithy-priors-'));
const first = join(dir, 'first.jsonl');
const second = join(dir, 'second.jsonl');
writeFileSync(
  first,
  [
    line('aa01', true, 'with chart\nanswer mirror_right(crop_to_content(chart))\n'),
    // the step is used twice, so crop_to_content is used twice here
    line('aa02', true, 'with chart\npart = crop_to_content(chart)\nanswer join_right(part, part)\n'),
    line('aa03', false, 'with chart\nanswer rotate_half(chart)\n'),
  ].join('\n') + '\n',
);
// aa02 again (counted once, from the first file) and one more solved task
writeFileSync(second, [line('aa02', true, 'with chart\nanswer rotate_half(chart)\n'), line('aa04', true, 'with chart\nanswer crop_to_content(chart)\n')].join('\n') + '\n');

describe('counting the solved programs of results files', () => {
  it('counts each solved task once, its cheapest program with steps written out', () => {
    const usage = usageFromResults([first, second], defaultLibrary);
    expect(usage.solvedTasks).toEqual(['aa01', 'aa02', 'aa04']);
    // crop_to_content: 1 (aa01) + 2 (aa02) + 1 (aa04); mirror_right 1; join_right 1; rotate_half 0
    expect([...usage.uses].sort()).toEqual([
      ['crop_to_content', 4],
      ['join_right', 1],
      ['mirror_right', 1],
    ]);
    expect(usage.totalUses).toBe(6);
    expect(usage.tasks.get('crop_to_content')).toEqual(['aa01', 'aa02', 'aa04']);
  });

  it('reports primitives in no solution and in exactly one solved task', () => {
    const report = usageReport(usageFromResults([first, second], defaultLibrary), defaultLibrary);
    expect(report.singleTask).toEqual([
      { primitive: 'mirror_right', task: 'aa01' },
      { primitive: 'join_right', task: 'aa02' },
    ].sort((a, b) => defaultLibrary.primitives.findIndex((p) => p.name === a.primitive) - defaultLibrary.primitives.findIndex((p) => p.name === b.primitive)));
    expect(report.severalTasks).toBe(1);
    expect(report.unused.length).toBe(defaultLibrary.primitives.length - 3);
    expect(report.unused).toContain('rotate_half');
  });

  it('rejects a program that calls a primitive the library does not hold, naming the file and the task', () => {
    const odd = join(dir, 'odd.jsonl');
    writeFileSync(odd, line('bb01', true, 'with chart\nanswer spin_around(chart)\n') + '\n');
    expect(() => usageFromResults([odd], defaultLibrary)).toThrow(/odd\.jsonl: task bb01: .*'spin_around'/);
    expect(() => usageFromResults([join(dir, 'missing.jsonl')], defaultLibrary)).toThrow(/missing\.jsonl: no such results file/);
  });
});

describe('pithy fit-priors', () => {
  it('writes byte-identical priors files from the same results files, wherever they lie', () => {
    const again = join(dir, 'copy');
    mkdirSync(again);
    copyFileSync(first, join(again, 'first.jsonl'));
    copyFileSync(second, join(again, 'second.jsonl'));
    const a = pithy(dir, 'fit-priors', 'first.jsonl', 'second.jsonl', '--output', 'a.json');
    const b = pithy(again, 'fit-priors', join(again, 'first.jsonl'), join(again, 'second.jsonl'), '--output', join(again, 'b.json'));
    expect(a.status).toBe(0);
    expect(b.status).toBe(0);
    expect(a.stderr).toContain('fitted on 3 solved tasks (6 primitive uses)');
    const text = readFileSync(join(dir, 'a.json'), 'utf8');
    expect(readFileSync(join(again, 'b.json'), 'utf8')).toBe(text);
    const file = JSON.parse(text) as { version: number; bits: Record<string, number>; parameters: Record<string, number> };
    expect(file.version).toBe(1);
    expect(Object.keys(file.bits)).toEqual(defaultLibrary.primitives.map((p) => p.name));
    // used 4 times < used once < unused, and unused within the default cap of 10
    expect(file.bits.crop_to_content!).toBeLessThan(file.bits.mirror_right!);
    expect(file.bits.mirror_right!).toBeLessThan(file.bits.rotate_half!);
    expect(file.bits.rotate_half!).toBeLessThanOrEqual(10);
    expect(file.parameters).toEqual({ smoothing: 0.5, minimumBits: 1, capBits: 10 });
  });

  it('never overwrites an existing file without --force', () => {
    const target = join(dir, 'mine.json');
    writeFileSync(target, 'my own notes\n');
    const run = pithy(dir, 'fit-priors', 'first.jsonl', '--output', target);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('already exists');
    expect(readFileSync(target, 'utf8')).toBe('my own notes\n');
  });

  it('--report --json gives the counts and writes no file', () => {
    const run = pithy(dir, 'fit-priors', 'first.jsonl', 'second.jsonl', '--report', '--json', '--output', 'not-written.json');
    expect(run.status).toBe(0);
    const report = JSON.parse(run.stdout) as { solvedTasks: number; unused: string[]; singleTask: unknown[] };
    expect(report.solvedTasks).toBe(3);
    expect(report.singleTask.length).toBe(2);
    expect(report.unused.length).toBe(defaultLibrary.primitives.length - 3);
    expect(() => readFileSync(join(dir, 'not-written.json'))).toThrow();
  });
});

describe('solve and eval with --priors', () => {
  const tasks = mkdtempSync(join(tmpdir(), 'pithy-priors-tasks-'));
  copyFileSync(join(demo, 'lighthouse-mirror.json'), join(tasks, 'lighthouse-mirror.json'));
  const priors = join(dir, 'cheap.json');
  writeFileSync(priors, '{"version": 1, "bits": {"mirror_right": 2, "crop_to_content": 3}}\n');

  it('solve reports the bits the priors give: 2 + 3 + 1 for mirror_right(crop_to_content(input))', () => {
    const run = pithy(tasks, 'solve', 'lighthouse-mirror.json', '--priors', priors, '--json', '--max-candidates', '2000000', '--time-limit', '60');
    expect(run.status).toBe(0);
    const [report] = JSON.parse(run.stdout) as { solutions: { program: string; bits: number }[] }[];
    expect(report!.solutions[0]!.bits).toBe(6);
    expect(report!.solutions[0]!.program).toContain('mirror_right');
  });

  it('rejects a bad priors file naming the file and the place, before solving anything', () => {
    const bad = join(dir, 'bad.json');
    writeFileSync(bad, '{"version": 1, "bits": {"mirror_right": "two"}}\n');
    const run = pithy(tasks, 'solve', 'lighthouse-mirror.json', '--priors', bad);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain(`${bad}: at $.bits.mirror_right: expected a whole number of bits`);
    expect(run.stdout).toBe('');
  });

  it('eval records the priors file hash with each result and will not mix runs with other priors', () => {
    const results = join(dir, 'results.jsonl');
    const run = pithy(tasks, 'eval', tasks, '--priors', priors, '--results', results, '--json', '--time-limit', '60');
    expect(run.status).toBe(0);
    const expected = 'sha256:' + createHash('sha256').update(readFileSync(priors)).digest('hex');
    const lines = readFileSync(results, 'utf8').trimEnd().split('\n').map((l) => JSON.parse(l) as { priors?: string; solutions: { bits: number }[] });
    expect(lines.length).toBe(1);
    expect(lines[0]!.priors).toBe(expected);
    expect(lines[0]!.solutions[0]!.bits).toBe(6);
    const mixed = pithy(tasks, 'eval', tasks, '--results', results);
    expect(mixed.status).toBe(2);
    // The settings check names the difference with the hash's first 16 hex digits.
    expect(mixed.stderr).toContain(`priors: ${expected.slice(0, 'sha256:'.length + 16)} in the file, none now`);
    expect(readFileSync(results, 'utf8').trimEnd().split('\n').length).toBe(1);
  });
});
