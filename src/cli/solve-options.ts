/** Options that `solve` and `eval` share, and their checking. */
import { InvalidArgumentError, type Command } from 'commander';
import { DEFAULT_MEMORY_CAP_MB } from '../batch/memory-cap.ts';
import { runSettings, type RunSettings } from '../batch/run-settings.ts';
import type { SolveOptions } from '../search/solve.ts';

export function positiveNumber(name: string, whole: boolean) {
  return (text: string): number => {
    const value = Number(text);
    if (!Number.isFinite(value) || value <= 0 || (whole && !Number.isInteger(value))) {
      throw new InvalidArgumentError(`${name} must be a ${whole ? 'whole ' : ''}number above 0, got '${text}'`);
    }
    return value;
  };
}

export interface SharedSolveFlags {
  timeLimit: number;
  attempts: number;
  jobs: number;
  maxCandidates?: number;
  pruning: boolean;
  goals: boolean;
  intermediateTables: boolean;
  lastSteps: boolean;
  caseSplits: boolean;
  memoryCap: number;
  retry: boolean;
  priors?: string;
}

export function addSolveFlags(command: Command): Command {
  return command
    .option('--time-limit <seconds>', 'wall-time limit per task', positiveNumber('--time-limit', false), 20)
    .option('--attempts <n>', 'attempts per test input, from the cheapest programs with distinct outputs', positiveNumber('--attempts', true), 2)
    .option('--jobs <n>', 'tasks solved in parallel (worker processes)', positiveNumber('--jobs', true), 1)
    .option('--max-candidates <n>', 'cap on candidate programs evaluated per task', positiveNumber('--max-candidates', true))
    .option('--memory-cap <MB>', 'memory cap per worker in megabytes: once the search holds this much it keeps no more values, tries only last steps on those it holds, and reports the reason memory if nothing is found', positiveNumber('--memory-cap', false), DEFAULT_MEMORY_CAP_MB)
    .option('--no-retry', 'when resuming, keep tasks whose worker crashed or overran instead of solving them again')
    .option('--no-pruning', 'keep observationally equivalent candidates (for measuring the pruning only)')
    .option('--no-goals', 'do not work back from the outputs through inverses or layers (for measuring what goals add)')
    .option('--no-intermediate-tables', 'do not learn tables from the grids the search makes (for measuring what they add)')
    .option('--no-last-steps', 'stop a task at the memory cap instead of going on with last steps on the values held (for measuring what they add)')
    .option('--no-case-splits', 'do not choose between two grids by a condition that tells the demonstrations apart (for measuring what case splits add)')
    .option('--priors <file>', 'primitive bits from a priors file (written by pithy fit-priors)');
}

export function solveOptionsFrom(flags: SharedSolveFlags): Omit<SolveOptions, 'library'> {
  return {
    timeLimitSeconds: flags.timeLimit,
    attempts: flags.attempts,
    pruning: flags.pruning,
    ...(flags.maxCandidates !== undefined ? { maxCandidates: flags.maxCandidates } : {}),
    ...(flags.goals ? {} : { goalBits: 0 }),
    ...(flags.intermediateTables ? {} : { intermediateGrids: 0 }),
    ...(flags.lastSteps ? {} : { lastStepsWhenFull: false }),
    ...(flags.caseSplits ? {} : { caseSplits: false }),
  };
}

/** The settings recorded on every results line (a `priors` flag, where the command has one, is read too). */
export function settingsFrom(flags: SharedSolveFlags & { priors?: string }): RunSettings {
  return runSettings({
    timeLimitSeconds: flags.timeLimit,
    attempts: flags.attempts,
    pruning: flags.pruning,
    ...(flags.maxCandidates !== undefined ? { maxCandidates: flags.maxCandidates } : {}),
    goals: flags.goals,
    intermediateTables: flags.intermediateTables,
    lastSteps: flags.lastSteps,
    caseSplits: flags.caseSplits,
    memoryCapMb: flags.memoryCap,
    ...(flags.priors !== undefined ? { priorsFile: flags.priors } : {}),
  });
}
