/** Options that `solve` and `eval` share, and their checking. */
import { InvalidArgumentError, type Command } from 'commander';
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
  priors?: string;
}

export function addSolveFlags(command: Command): Command {
  return command
    .option('--time-limit <seconds>', 'wall-time limit per task', positiveNumber('--time-limit', false), 20)
    .option('--attempts <n>', 'attempts per test input, from the cheapest programs with distinct outputs', positiveNumber('--attempts', true), 2)
    .option('--jobs <n>', 'tasks solved in parallel (worker threads)', positiveNumber('--jobs', true), 1)
    .option('--max-candidates <n>', 'cap on candidate programs evaluated per task', positiveNumber('--max-candidates', true))
    .option('--no-pruning', 'keep observationally equivalent candidates (for measuring the pruning only)')
    .option('--priors <file>', 'primitive bits from a priors file (written by pithy fit-priors)');
}

export function solveOptionsFrom(flags: SharedSolveFlags): Omit<SolveOptions, 'library'> {
  return {
    timeLimitSeconds: flags.timeLimit,
    attempts: flags.attempts,
    pruning: flags.pruning,
    ...(flags.maxCandidates !== undefined ? { maxCandidates: flags.maxCandidates } : {}),
  };
}
