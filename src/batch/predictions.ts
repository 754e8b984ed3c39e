/**
 * The predictions file: one JSON line per task,
 * `{"task": "<file name without .json>", "test": [{"attempts": [GRID, ...]}, ...]}`,
 * one entry per test input in file order (empty attempts where nothing was found).
 *
 * Beside it pithy keeps the run's results file (its record: settings, status and statistics
 * of every task), from which the predictions can always be written again; that record is what
 * lets `solve --predictions` resume, and `pithy merge` check and combine shards.
 */
import type { TaskReport } from './task-report.ts';

export function predictionLine(report: Pick<TaskReport, 'task' | 'attempts'>): string {
  return JSON.stringify({ task: report.task, test: report.attempts.map((attempts) => ({ attempts })) });
}

export function predictionsText(reports: readonly Pick<TaskReport, 'task' | 'attempts'>[]): string {
  return reports.map((r) => predictionLine(r) + '\n').join('');
}

/** The record kept beside a predictions file: `out.jsonl` → `out.results.jsonl`. */
export function recordPathFor(predictions: string): string {
  return predictions.replace(/\.jsonl$/i, '') + '.results.jsonl';
}
