/**
 * A batch run that survives interruption: tasks already in the results file are skipped (when
 * it was made with the same settings), each finished task is appended and flushed at once,
 * and a predictions file, when asked for, is kept in step with the results file.
 */
import { existsSync, readFileSync } from 'node:fs';
import { predictionsText } from './predictions.ts';
import { readResultsFile, replaceFile, ResultsWriter, resultsText, type ResultLine } from './results-file.ts';
import { planResume, type ResumePlan } from './resume.ts';
import type { RunSettings } from './run-settings.ts';
import { scoreReport } from './score.ts';
import { solveFiles, type BatchOptions } from './solve-files.ts';
import type { TaskReport } from './task-report.ts';

export interface ResumableRunOptions {
  /** This run's task files. */
  readonly files: readonly string[];
  readonly resultsFile: string;
  readonly settings: RunSettings;
  /** Recorded on each line, as "I/N". */
  readonly shard?: string;
  /** The hash of the priors file in use (`--priors`), recorded on each line. */
  readonly priors?: string;
  /** Solve again the tasks whose worker crashed or overran (default true). */
  readonly retry?: boolean;
  /** Score each report against the task file's test outputs (eval), after solving. */
  readonly score?: boolean;
  /** A predictions file written in step with the results file. */
  readonly predictionsFile?: string;
  readonly batch?: Omit<BatchOptions, 'onReport'>;
  /** Called once the plan is made, before any task runs. */
  readonly onPlan?: (plan: ResumePlan) => void;
  /** Called as each task finishes, after its line is on disk. */
  readonly onLine?: (line: ResultLine) => void;
  /** Called when a finished task cannot be scored (its line records it as unsolved). */
  readonly onScoreProblem?: (report: TaskReport, problem: string) => void;
}

export interface ResumableRunOutcome {
  readonly plan: ResumePlan;
  /** This run's finished tasks: those done before, then the new ones in finishing order. */
  readonly lines: ResultLine[];
  /** True when the signal stopped the run before every task finished. */
  readonly interrupted: boolean;
}

export async function runResumable(options: ResumableRunOptions): Promise<ResumableRunOutcome> {
  const contents = readResultsFile(options.resultsFile);
  const plan = planResume(options.resultsFile, options.files, contents, options.settings, options.retry ?? true);
  if (plan.rewrite) replaceFile(options.resultsFile, resultsText(plan.rewrite));
  if (options.predictionsFile !== undefined) {
    const expected = predictionsText(plan.rewrite ?? contents.lines);
    const current = existsSync(options.predictionsFile) ? readFileSync(options.predictionsFile, 'utf8') : undefined;
    if (current !== expected) replaceFile(options.predictionsFile, expected);
  }
  options.onPlan?.(plan);
  const lines = [...plan.done];
  const results = new ResultsWriter(options.resultsFile);
  const predictions = options.predictionsFile !== undefined ? new ResultsWriter(options.predictionsFile) : undefined;
  try {
    const reports = await solveFiles(plan.todo, {
      ...options.batch,
      onReport: (report) => {
        let solved: boolean | undefined;
        if (options.score) {
          solved = false;
          try {
            solved = scoreReport(report).solved;
          } catch (error) {
            options.onScoreProblem?.(report, (error as Error).message);
          }
        }
        const line: ResultLine = {
          ...report,
          ...(solved !== undefined ? { solved } : {}),
          settings: options.settings,
          ...(options.shard !== undefined ? { shard: options.shard } : {}),
          ...(options.priors !== undefined ? { priors: options.priors } : {}),
        };
        results.append(line);
        predictions?.appendText(predictionsText([line]));
        lines.push(line);
        options.onLine?.(line);
      },
    });
    return { plan, lines, interrupted: reports.length < plan.todo.length };
  } finally {
    results.close();
    predictions?.close();
  }
}
