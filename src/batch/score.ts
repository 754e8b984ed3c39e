/**
 * Scoring against the test outputs in the task file, after the solver has finished: a task is
 * solved when every test input has its exact output among the attempts.
 */
import { Grid } from '../grid/grid.ts';
import { readTaskFile } from '../tasks/read-task.ts';
import type { TaskReport } from './task-report.ts';

export interface Score {
  /** True when every test input has its output among the attempts. */
  readonly solved: boolean;
  /** False when the file has no test outputs to score against. */
  readonly scorable: boolean;
}

export function scoreReport(report: TaskReport): Score {
  if (report.status === 'error') return { solved: false, scorable: true };
  const task = readTaskFile(report.file);
  if (task.test.some((t) => t.output === undefined)) return { solved: false, scorable: false };
  const solved = task.test.every((t, i) => (report.attempts[i] ?? []).some((rows) => Grid.fromRows(rows).equals(t.output!)));
  return { solved, scorable: true };
}
