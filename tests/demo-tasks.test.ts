// Every tasks-demo reference program reproduces all train and test outputs of its task. The
// tasks are invented for this project (a harbour at dusk); each .pithy file sits beside its
// .json task.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkProgram } from '../src/language/checker.ts';
import { parseProgram } from '../src/language/parser.ts';
import { defaultLibrary } from '../dsl/index.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import { describeDifference, runOnTask } from '../src/tasks/run-on-task.ts';

const folder = new URL('../tasks-demo/', import.meta.url).pathname;
const names = readdirSync(folder)
  .filter((f) => f.endsWith('.json'))
  .map((f) => f.slice(0, -'.json'.length))
  .sort();

describe('tasks-demo', () => {
  it('has at least 15 tasks, each with its reference program', () => {
    expect(names.length).toBeGreaterThanOrEqual(15);
    for (const name of names) expect(existsSync(join(folder, `${name}.pithy`)), `${name}.pithy`).toBe(true);
  });

  describe.each(names)('%s', (name) => {
    const task = readTaskFile(join(folder, `${name}.json`));
    const file = join(folder, `${name}.pithy`);

    it('has 2-4 train pairs and 1-2 test pairs, all with outputs', () => {
      expect(task.train.length).toBeGreaterThanOrEqual(2);
      expect(task.train.length).toBeLessThanOrEqual(4);
      expect(task.test.length).toBeGreaterThanOrEqual(1);
      expect(task.test.length).toBeLessThanOrEqual(2);
      for (const t of task.test) expect(t.output).toBeDefined();
    });

    it('its reference program is short (at most 3 statements) and well typed', () => {
      const program = parseProgram(readFileSync(file, 'utf8'), file);
      expect(program.steps.length).toBeLessThanOrEqual(2);
      expect(checkProgram(program, defaultLibrary).answer).toBe('Grid');
    });

    it('its reference program reproduces every train and test output', () => {
      const program = parseProgram(readFileSync(file, 'utf8'), file);
      const results = runOnTask(program, task, defaultLibrary);
      const failures = results.filter((r) => !r.passed).map((r) => `${r.set} ${r.index}: ${describeDifference(r.difference!)}`);
      expect(failures).toEqual([]);
      expect(results).toHaveLength(task.train.length + task.test.length);
    });
  });
});
