// The solver on every tasks-demo task (invented for this project): it finds a program no longer
// in bits than the task's reference program, and its attempts reproduce the test outputs.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseProgram } from '../src/language/parser.ts';
import { defaultLibrary } from '../dsl/index.ts';
import { taskConstants } from '../src/search/constants.ts';
import { programBits } from '../src/search/description-length.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import { puzzleOf } from '../src/tasks/task.ts';

const folder = new URL('../tasks-demo/', import.meta.url).pathname;
const names = readdirSync(folder)
  .filter((f) => f.endsWith('.json'))
  .map((f) => f.slice(0, -'.json'.length))
  .sort();

describe.each(names)('solving tasks-demo/%s', (name) => {
  it('finds a program at most as long as the reference that reproduces every output', () => {
    const task = readTaskFile(join(folder, `${name}.json`));
    const puzzle = puzzleOf(task);
    const reference = parseProgram(readFileSync(join(folder, `${name}.pithy`), 'utf8'));
    const referenceBits = programBits(reference, defaultLibrary, taskConstants(puzzle));
    // No time limit: the bound is the reference's length in bits, the same on any machine.
    const result = solvePuzzle(puzzle, { timeLimitSeconds: 1e6, maxBits: referenceBits });
    expect(result.solutions.length, `nothing found (${result.reason})`).toBeGreaterThan(0);
    expect(result.solutions[0]!.bits).toBeLessThanOrEqual(referenceBits);
    task.test.forEach((t, i) => {
      const hit = result.solutions.some((s) => s.testOutputs[i]!.equals(t.output!));
      expect(hit, `test ${i}: no attempt matches; found\n${result.solutions.map((s) => s.text).join('\n')}`).toBe(true);
    });
  });
});
