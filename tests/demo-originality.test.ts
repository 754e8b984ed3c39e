/**
 * Outside check: the invented demo tasks do not repeat a public task. No tasks-demo reference
 * program, with its colour constants set to any colours 0–9, reproduces every train and test
 * output of any task of the public training set: a demo that did would share that task's
 * structure (the colours being the only difference).
 *
 * Source of the public tasks: ARC-AGI-1 public training set, F. Chollet 2019, Apache-2.0, read
 * from ../shared/datasets/arc-agi-1-training/ (beside the repository; never copied into it).
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { parseProgram } from '../src/language/parser.ts';
import type { Program } from '../src/language/ast.ts';
import { defaultLibrary } from '../dsl/index.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';

const repoRoot = resolve(fileURLToPath(new URL('.', import.meta.url)), '..');
/** ARC-AGI-1 public training set, F. Chollet 2019, Apache-2.0, read from ../shared/datasets/arc-agi-1-training/ */
const datasetFolder = resolve(repoRoot, '../shared/datasets/arc-agi-1-training');
const demoFolder = join(repoRoot, 'tasks-demo');
const datasetPresent = existsSync(datasetFolder);

/** Set by .ci/run: there the check must run, so a missing dataset fails instead of skipping. */
const datasetRequired = process.env.PITHY_REQUIRE_DATASETS === '1';

if (!datasetPresent && !datasetRequired) {
  console.log(`demo-originality: skipped, the public training set is not at ${datasetFolder}`);
}

describe.runIf(datasetRequired)('the public training set, required here (PITHY_REQUIRE_DATASETS=1)', () => {
  it('is present beside the repository', () => {
    expect(datasetPresent, `the public training set is not at ${datasetFolder}; place it there or unset PITHY_REQUIRE_DATASETS`).toBe(true);
  });
});

/** Every program the text gives when each colour literal `#d` takes every colour 0–9. */
function colourVariants(text: string): string[] {
  const code = text
    .split('\n')
    .filter((line) => !line.trimStart().startsWith('--'))
    .join('\n');
  const pieces = code.split(/#\d/);
  let variants = [pieces[0]!];
  for (const piece of pieces.slice(1)) {
    variants = variants.flatMap((start) => Array.from({ length: 10 }, (_, colour) => `${start}#${colour}${piece}`));
  }
  return variants;
}

function reproducesAll(program: Program, pairs: readonly { input: Grid; output: Grid }[]): boolean {
  for (const pair of pairs) {
    const { output } = runProgram(program, pair.input, defaultLibrary);
    if (!(output instanceof Grid) || !output.equals(pair.output)) return false;
  }
  return true;
}

describe('colourVariants', () => {
  it('gives ten programs per colour literal and leaves comments out', () => {
    // Worked by hand: two literals give 10 × 10 programs; the comment's #7 is not a literal.
    const variants = colourVariants('-- turns #7 around\nwith g\nanswer recolour(g, #1, #2)\n');
    expect(variants).toHaveLength(100);
    expect(variants[0]).toBe('with g\nanswer recolour(g, #0, #0)\n');
    expect(variants[23]).toBe('with g\nanswer recolour(g, #2, #3)\n');
    expect(colourVariants('with g\nanswer rotate_half(g)\n')).toEqual(['with g\nanswer rotate_half(g)\n']);
  });
});

describe.skipIf(!datasetPresent)('outside check: no demo task repeats a task of the ARC-AGI-1 public training set', () => {
  const publicTasks = datasetPresent
    ? readdirSync(datasetFolder)
        .filter((f) => f.endsWith('.json'))
        .sort()
        .map((f) => {
          const task = readTaskFile(join(datasetFolder, f));
          const pairs = [...task.train, ...task.test.flatMap((t) => (t.output ? [{ input: t.input, output: t.output }] : []))];
          return { name: task.name, pairs };
        })
    : [];
  const demos = readdirSync(demoFolder)
    .filter((f) => f.endsWith('.pithy'))
    .sort();

  it('reads the public tasks', () => {
    expect(publicTasks.length).toBeGreaterThanOrEqual(400);
  });

  for (const file of demos) {
    it(`${file}: solves no public task, whatever its colours`, () => {
      const text = readFileSync(join(demoFolder, file), 'utf8');
      const repeated: string[] = [];
      for (const variant of colourVariants(text)) {
        const program = parseProgram(variant, file);
        for (const task of publicTasks) {
          if (reproducesAll(program, task.pairs)) repeated.push(`${task.name} with\n${variant}`);
        }
      }
      expect(repeated).toEqual([]);
    });
  }
});
