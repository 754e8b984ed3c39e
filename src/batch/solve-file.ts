/**
 * Solves one task file: reads it, hides the test outputs from the solver, and reports. Bad
 * files become error reports so a directory run goes on.
 */
import { solvePuzzle, type SolveOptions } from '../search/solve.ts';
import { readTaskFile, TaskFileError } from '../tasks/read-task.ts';
import { puzzleOf } from '../tasks/task.ts';
import { basename } from 'node:path';
import type { FailureKind, TaskReport } from './task-report.ts';

export function taskNameOf(file: string): string {
  return basename(file).replace(/\.json$/i, '');
}

export function errorReport(file: string, message: string, failure: FailureKind, seconds = 0): TaskReport {
  return { task: taskNameOf(file), file, status: 'error', error: message, failure, solutions: [], attempts: [], reason: 'error', seconds };
}

/** A task whose worker ran out of heap: the memory cap stopped it (see memory-cap.ts). */
export function outOfMemoryReport(file: string, message: string, seconds: number): TaskReport {
  return { task: taskNameOf(file), file, status: 'not found', error: message, solutions: [], attempts: [], reason: 'memory', seconds };
}

export function solveFile(file: string, options: SolveOptions): TaskReport {
  let puzzle;
  try {
    puzzle = puzzleOf(readTaskFile(file));
  } catch (error) {
    if (error instanceof TaskFileError) return errorReport(file, error.message, 'unreadable task');
    throw error;
  }
  const result = solvePuzzle(puzzle, options);
  return {
    task: puzzle.name,
    file,
    status: result.solutions.length > 0 ? 'found' : 'not found',
    solutions: result.solutions.map((s) => ({ program: s.text, bits: s.bits, ...(s.throughGoal ? { throughGoal: true } : {}), ...(s.throughIntermediateTable ? { throughIntermediateTable: true } : {}), ...(s.throughCaseSplit ? { throughCaseSplit: true } : {}), ...(s.breaksSize ? { breaksSize: true } : {}), ...(s.fromTable ? { fromTable: true } : {}) })),
    attempts: puzzle.testInputs.map((_, i) => result.solutions.map((s) => s.testOutputs[i]!.toRows())),
    reason: result.reason,
    seconds: result.seconds,
    statistics: result.statistics,
  };
}
