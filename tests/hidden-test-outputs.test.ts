// The boundary between solving and scoring: solving a task gives the same report whether its
// test outputs are present, removed, or altered (other colours, another shape), so the search
// cannot have seen them. Reports are compared without their timings; the search is bounded by
// a candidate cap and gives one attempt, so equal inputs give equal reports on any machine.
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { solveFile } from '../src/batch/solve-file.ts';
import type { TaskReport } from '../src/batch/task-report.ts';

const demo = new URL('../tasks-demo/', import.meta.url).pathname;
const folder = mkdtempSync(join(tmpdir(), 'pithy-hidden-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

type Rows = number[][];
interface TaskJson {
  train: { input: Rows; output: Rows }[];
  test: { input: Rows; output?: Rows }[];
}

const variants: Record<string, (task: TaskJson) => TaskJson> = {
  removed: (task) => ({ ...task, test: task.test.map(({ input }) => ({ input })) }),
  recoloured: (task) => ({ ...task, test: task.test.map((t) => ({ input: t.input, output: t.output!.map((row) => row.map((c) => (c + 1) % 10)) })) }),
  reshaped: (task) => ({ ...task, test: task.test.map((t) => ({ input: t.input, output: [[7, 7, 7], [7, 0, 7]] })) }),
  'the train output instead': (task) => ({ ...task, test: task.test.map((t) => ({ input: t.input, output: task.train[0]!.output })) }),
};

function solveVariant(name: string, label: string, task: TaskJson): TaskReport {
  const dir = join(folder, label);
  mkdirSync(dir, { recursive: true });
  const file = join(dir, `${name}.json`);
  writeFileSync(file, JSON.stringify(task));
  return solveFile(file, { attempts: 1, maxCandidates: 20_000, timeLimitSeconds: 1000 });
}

function withoutTimings(report: TaskReport): unknown {
  const { seconds: _seconds, file: _file, statistics, ...rest } = report;
  const { secondsToFirstSolution: _first, ...counts } = statistics ?? { candidates: 0 };
  return { ...rest, statistics: counts };
}

describe('solving never sees the test outputs', () => {
  // One task the search solves within the cap, one it solves with a composition, one it misses.
  for (const name of ['lighthouse-mirror', 'chart-zoom', 'tallest-mast']) {
    it(`${name}: the same report with the test outputs present, removed or altered`, () => {
      const task = JSON.parse(readFileSync(join(demo, `${name}.json`), 'utf8')) as TaskJson;
      expect(task.test.every((t) => t.output !== undefined)).toBe(true);
      const original = withoutTimings(solveVariant(name, 'original', task));
      for (const [label, change] of Object.entries(variants)) {
        const changed = change(task);
        expect(JSON.stringify(changed.test)).not.toBe(JSON.stringify(task.test));
        expect(withoutTimings(solveVariant(name, label, changed)), label).toEqual(original);
      }
    });
  }
});
