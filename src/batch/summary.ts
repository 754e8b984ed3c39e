/** The end-of-run summary of an evaluation. */
import type { ResultLine } from './results-file.ts';
import type { TaskReport } from './task-report.ts';

export interface EvaluationSummary {
  readonly tasks: number;
  readonly solved: number;
  /** A program fit every demonstration but no attempt matched some test output. */
  readonly wrong: number;
  readonly notFound: number;
  /** Tasks where the time limit ran out with nothing found. */
  readonly timeOuts: number;
  /** Unreadable task files and solver errors. */
  readonly failures: number;
  /** Median seconds to the first program fitting every demonstration, over the solved tasks (null when none). */
  readonly medianSecondsToSolution: number | null;
  readonly totalSeconds: number;
}

/** Seconds until the first program that fits every demonstration (the whole task's time if unknown). */
export function secondsToSolution(report: TaskReport): number {
  return report.statistics?.secondsToFirstSolution ?? report.seconds;
}

export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

export function summarise(lines: readonly ResultLine[]): EvaluationSummary {
  return {
    tasks: lines.length,
    solved: lines.filter((l) => l.solved).length,
    wrong: lines.filter((l) => !l.solved && l.status === 'found').length,
    notFound: lines.filter((l) => l.status === 'not found').length,
    timeOuts: lines.filter((l) => l.status === 'not found' && l.reason === 'time').length,
    failures: lines.filter((l) => l.status === 'error').length,
    medianSecondsToSolution: median(lines.filter((l) => l.solved).map(secondsToSolution)),
    totalSeconds: lines.reduce((sum, l) => sum + l.seconds, 0),
  };
}

export function summaryLines(s: EvaluationSummary): string[] {
  const pct = s.tasks > 0 ? ((100 * s.solved) / s.tasks).toFixed(1) : '0.0';
  return [
    `solved ${s.solved} of ${s.tasks} task${s.tasks === 1 ? '' : 's'} (${pct}%)`,
    `  fit the demonstrations but missed a test output: ${s.wrong}`,
    `  no program found: ${s.notFound} (time limit reached: ${s.timeOuts})`,
    `  failures (bad files, solver errors): ${s.failures}`,
    `  median time to a solution: ${s.medianSecondsToSolution === null ? 'n/a' : `${s.medianSecondsToSolution.toFixed(2)} s`}`,
    `  solver time summed over tasks: ${s.totalSeconds.toFixed(0)} s`,
  ];
}
