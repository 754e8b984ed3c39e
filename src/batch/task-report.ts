/**
 * What solving one task file gives, in a form that crosses threads and lands in JSON lines.
 * Built in one expression and never updated, so immer has nothing to do here (DEVELOPERS.md,
 * "immer").
 */
import type { EnumerationStatistics, StopReason } from '../search/enumerator.ts';

export type FailureKind = 'unreadable task' | 'internal error' | 'worker crashed' | 'overran';

/** Failures that may not happen again: a resumed run solves their tasks again (unless --no-retry). */
export function isRetryable(report: Pick<TaskReport, 'status' | 'failure'>): boolean {
  return report.status === 'error' && (report.failure === 'worker crashed' || report.failure === 'overran');
}

export interface ReportedSolution {
  readonly program: string;
  readonly bits: number;
  /** True when the search met it by working back from the outputs through inverses. */
  readonly throughGoal?: boolean;
  /** True when it applies a table learned from a grid the search made (not the input). */
  readonly throughIntermediateTable?: boolean;
  /** True when it chooses between two grids by a condition that tells the demonstrations apart (a case split). */
  readonly throughCaseSplit?: boolean;
  /** True when its output on some test input breaks the size the demonstrations settle (ranked as SIZE_BREAK_BITS dearer, src/search/output-size.ts). */
  readonly breaksSize?: boolean;
  /** True when it applies a table read off the demonstrations straight to the input (not a program the search composed). */
  readonly fromTable?: boolean;
}

export interface TaskReport {
  /** The file name without `.json`. */
  readonly task: string;
  readonly file: string;
  /** 'found': at least one program fits every demonstration; 'error': the task could not be read or the solver crashed. */
  readonly status: 'found' | 'not found' | 'error';
  /** For 'error' (and a worker that ran out of heap): what went wrong, naming the file. */
  readonly error?: string;
  /**
   * For 'error', what kind: the task file could not be read, the solver threw, or its worker
   * died or overran the time limit. The last two are retried when a run resumes.
   */
  readonly failure?: FailureKind;
  /** Cheapest first. */
  readonly solutions: readonly ReportedSolution[];
  /** Per test input in file order: the attempted output grids as rows. */
  readonly attempts: readonly (readonly number[][])[][];
  readonly reason: StopReason | 'error';
  readonly seconds: number;
  readonly statistics?: EnumerationStatistics;
}
