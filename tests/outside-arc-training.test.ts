/**
 * Outside check: hand-written programs for tasks of a public puzzle set must reproduce every
 * train and test output of their task.
 *
 * Source of the tasks: ARC-AGI-1 public training set, F. Chollet 2019, Apache-2.0, read from
 * ../shared/datasets/arc-agi-1-training/ (beside the repository; never copied into it).
 * The programs in tests/outside/arc-training/<task id>.pithy are our own text, each written
 * by looking at the task's grids; the file name is the task id.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { checkProgram } from '../src/language/checker.ts';
import { FAILURE } from '../src/language/failure.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { parseProgram } from '../src/language/parser.ts';
import { defaultLibrary } from '../dsl/index.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';

const repoRoot = resolve(fileURLToPath(new URL('.', import.meta.url)), '..');
/** ARC-AGI-1 public training set, F. Chollet 2019, Apache-2.0, read from ../shared/datasets/arc-agi-1-training/ */
const datasetFolder = resolve(repoRoot, '../shared/datasets/arc-agi-1-training');
const programFolder = join(repoRoot, 'tests/outside/arc-training');
const datasetPresent = existsSync(datasetFolder);

const programFiles = readdirSync(programFolder)
  .filter((f) => f.endsWith('.pithy'))
  .sort();

/** Set by .ci/run: there the check must run, so a missing dataset fails instead of skipping. */
const datasetRequired = process.env.PITHY_REQUIRE_DATASETS === '1';

if (!datasetPresent && !datasetRequired) {
  console.log(`outside-arc-training: skipped, the public training set is not at ${datasetFolder}`);
}

describe.runIf(datasetRequired)('the public training set, required here (PITHY_REQUIRE_DATASETS=1)', () => {
  it('is present beside the repository', () => {
    expect(datasetPresent, `the public training set is not at ${datasetFolder}; place it there or unset PITHY_REQUIRE_DATASETS`).toBe(true);
  });
});

/** Describes the first cell where two grids differ, or their shapes. */
function difference(found: Grid | typeof FAILURE, expected: Grid): string {
  if (found === FAILURE || !(found instanceof Grid)) return 'the program failed';
  if (found.height !== expected.height || found.width !== expected.width) {
    return `found a ${found.height}x${found.width} grid, expected ${expected.height}x${expected.width}`;
  }
  for (let r = 0; r < expected.height; r++) {
    for (let c = 0; c < expected.width; c++) {
      if (found.get(r, c) !== expected.get(r, c)) return `cell (${r}, ${c}) is ${found.get(r, c)}, expected ${expected.get(r, c)}`;
    }
  }
  return 'equal';
}

describe.skipIf(!datasetPresent)('outside check: programs for the ARC-AGI-1 public training set', () => {
  it('has at least 25 programs', () => {
    expect(programFiles.length).toBeGreaterThanOrEqual(25);
  });

  for (const file of programFiles) {
    const id = file.replace(/\.pithy$/, '');
    it(`${id}: reproduces every train and test output`, () => {
      const text = readFileSync(join(programFolder, file), 'utf8');
      const program = parseProgram(text, file);
      checkProgram(program, defaultLibrary);
      const task = readTaskFile(join(datasetFolder, `${id}.json`));
      const pairs = [
        ...task.train.map((p, i) => ({ place: `train ${i}`, input: p.input, output: p.output })),
        ...task.test.flatMap((t, i) => (t.output ? [{ place: `test ${i}`, input: t.input, output: t.output }] : [])),
      ];
      expect(pairs.length).toBeGreaterThan(task.train.length);
      const problems: string[] = [];
      for (const pair of pairs) {
        const { output } = runProgram(program, pair.input, defaultLibrary);
        const verdict = difference(output, pair.output);
        if (verdict !== 'equal') problems.push(`${pair.place}: ${verdict}`);
      }
      expect(problems, `${id}: ${problems.join('; ')}`).toEqual([]);
    });
  }
});
