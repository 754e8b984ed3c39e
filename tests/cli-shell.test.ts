// The command line's shell conventions: --version, '-' for standard input, exit codes (0 success,
// 1 a pair or task failed, 2 bad usage or bad input), file-system errors in plain words, an empty
// folder reported, errors that point at the offending argument and suggest the nearest names,
// the size cap's flag named, singular and plural, and `primitives NAME...` / `--category`.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { nearestNames } from '../src/language/nearest-names.ts';

const root = new URL('../', import.meta.url).pathname;
const demo = join(root, 'tasks-demo');
const pithy = (args: string[], input?: string) =>
  spawnSync(process.execPath, [join(root, 'bin', 'pithy.js'), ...args], { encoding: 'utf8', cwd: root, env: { ...process.env, NO_COLOR: '1' }, input });
const folder = mkdtempSync(join(tmpdir(), 'pithy-shell-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

// Invented for these checks: turning the chart a quarter clockwise.
const turnTask = JSON.stringify({ train: [{ input: [[1, 2], [3, 4]], output: [[3, 1], [4, 2]] }], test: [{ input: [[5, 0], [0, 0]], output: [[0, 5], [0, 0]] }] });
const turnProgram = 'with chart\nanswer rotate_clockwise(chart)\n';

describe('versions and exit codes', () => {
  it('--version prints the version in package.json and exits 0', () => {
    const run = pithy(['--version']);
    expect(run.status).toBe(0);
    expect(run.stdout.trim()).toBe((JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { version: string }).version);
  });

  it('bad usage exits 2: an unknown option, a missing argument, no command', () => {
    expect(pithy(['solve', '--no-such-option', demo]).status).toBe(2);
    expect(pithy(['run', 'only-one-argument.pithy']).status).toBe(2);
    expect(pithy([]).status).toBe(2);
  });

  it('run exits 0 when every pair passes and 1 when one fails', () => {
    const task = join(folder, 'turn.json');
    writeFileSync(task, turnTask);
    const program = join(folder, 'turn.pithy');
    writeFileSync(program, turnProgram);
    expect(pithy(['run', program, task]).status).toBe(0);
    const wrong = join(folder, 'wrong.pithy');
    writeFileSync(wrong, 'with chart\nanswer rotate_counterclockwise(chart)\n');
    const failed = pithy(['run', wrong, task]);
    expect(failed.status).toBe(1);
    // Expected [[3, 1], [4, 2]], got [[2, 4], [1, 3]]: all four cells differ.
    expect(failed.stdout).toContain('4 cells differ');
  });
});

describe("'-' reads standard input", () => {
  it('a program from standard input', () => {
    const task = join(folder, 'turn-stdin.json');
    writeFileSync(task, turnTask);
    const run = pithy(['run', '-', task], turnProgram);
    expect(run.status).toBe(0);
    expect(run.stdout).toContain('2/2 pairs passed');
  });

  it('a task from standard input', () => {
    const program = join(folder, 'turn-stdin.pithy');
    writeFileSync(program, turnProgram);
    const run = pithy(['run', program, '-'], turnTask);
    expect(run.status).toBe(0);
    expect(pithy(['show', '-'], turnTask).stdout).toContain('1 train, 1 test');
  });

  it('check reads a program from standard input', () => {
    expect(pithy(['check', '-'], turnProgram).stdout).toContain('standard input: well typed');
  });

  it('solve reads a task from standard input (worked by hand: the demonstration is a quarter turn clockwise)', () => {
    const run = pithy(['solve', '-', '--max-candidates', '20000', '--json'], turnTask);
    expect(run.status).toBe(0);
    const reports = JSON.parse(run.stdout) as { task: string; attempts: number[][][][] }[];
    expect(reports).toHaveLength(1);
    expect(reports[0]!.task).toBe('stdin');
    expect(reports[0]!.attempts[0]![0]).toEqual([[0, 5], [0, 0]]);
  });
});

describe('errors in plain words', () => {
  it('a missing task file: no such file, no JSON path, exit 2', () => {
    const run = pithy(['show', join(folder, 'absent.json')]);
    expect(run.status).toBe(2);
    expect(run.stderr.trim()).toBe(`${join(folder, 'absent.json')}: no such file or folder`);
  });

  it('a missing program file: no such file, no line and column, exit 2', () => {
    const run = pithy(['check', join(folder, 'absent.pithy')]);
    expect(run.status).toBe(2);
    expect(run.stderr.trim()).toBe(`${join(folder, 'absent.pithy')}: no such file`);
  });

  it('a folder given as a program: is a folder', () => {
    const run = pithy(['check', folder]);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('is a folder');
  });

  it('an empty folder is reported, not a silent success', () => {
    const empty = join(folder, 'empty');
    mkdirSync(empty);
    for (const command of [['show', empty], ['solve', empty], ['eval', empty, '--results', join(folder, 'r.jsonl')]]) {
      const run = pithy(command);
      expect(run.status, command.join(' ')).toBe(2);
      expect(run.stderr).toContain('holds no task files');
    }
  });

  it('a type error points at the column of the offending argument', () => {
    // Line 2: 'n = scale_up(chart, true)': 'true' starts at column 21.
    const run = pithy(['check', '-'], 'with chart\nn = scale_up(chart, true)\nanswer n\n');
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('standard input:2:21:');
    expect(run.stderr).toContain('expected Int, found Bool');
  });

  it('an unknown primitive suggests the nearest names', () => {
    const run = pithy(['check', '-'], 'with chart\nanswer rotate_clockwize(chart)\n');
    expect(run.stderr).toContain('standard input:2:8:');
    expect(run.stderr).toContain('did you mean rotate_clockwise');
  });

  it('a grid over the size cap names --size-cap', () => {
    const wide = JSON.stringify({ train: [{ input: [[1, 2, 3]], output: [[1]] }], test: [{ input: [[1]] }] });
    const run = pithy(['--size-cap', '2', 'show', '-'], wide);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('size cap of 2');
    expect(run.stderr).toContain('--size-cap');
  });
});

describe('nearest names', () => {
  it('prefers names holding every word (shortest first), then names a few edits away', () => {
    expect(nearestNames('count_colour', ['rotate_half', 'count_colour_in_object', 'count_cells_of_colour'])).toEqual(['count_cells_of_colour', 'count_colour_in_object']);
    expect(nearestNames('rotate_clockwize', ['rotate_clockwise', 'rotate_half', 'transpose'])).toEqual(['rotate_clockwise']);
    expect(nearestNames('harbour', ['rotate_clockwise', 'transpose'])).toEqual([]);
  });
});

describe('pithy primitives NAME... and --category', () => {
  it('shows the named primitives in full, with their worked examples', () => {
    const run = pithy(['primitives', 'rotate_clockwise', 'transpose']);
    expect(run.status).toBe(0);
    expect(run.stdout).toContain('rotate_clockwise(Grid) -> Grid');
    expect(run.stdout).toContain('transpose(Grid) -> Grid');
    expect(run.stdout).toContain('example: with grid =');
  });

  it('an unknown name exits 2 with suggestions', () => {
    const run = pithy(['primitives', 'rotate_clockwize']);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('did you mean rotate_clockwise');
  });

  it('--category lists one category only', () => {
    const run = pithy(['primitives', '--category', 'counting', '--json']);
    const records = JSON.parse(run.stdout) as { category: string }[];
    expect(records.length).toBeGreaterThan(0);
    expect(records.every((r) => r.category === 'counting')).toBe(true);
    expect(pithy(['primitives', '--category', 'harbour']).status).toBe(2);
  });
});
