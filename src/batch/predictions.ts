/**
 * The predictions file: one JSON line per task,
 * `{"task": "<file name without .json>", "test": [{"attempts": [GRID, ...]}, ...]}`,
 * one entry per test input in file order (empty attempts where nothing was found).
 */
import type { TaskReport } from './task-report.ts';

export function predictionLine(report: TaskReport): string {
  return JSON.stringify({ task: report.task, test: report.attempts.map((attempts) => ({ attempts })) });
}
