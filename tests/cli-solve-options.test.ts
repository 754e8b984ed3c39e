/** The flags solve and eval share, turned into solve options: switching goals and intermediate tables off. */
import { describe, expect, it } from 'vitest';
import { solveOptionsFrom, type SharedSolveFlags } from '../src/cli/solve-options.ts';

const flags: SharedSolveFlags = { timeLimit: 20, attempts: 2, jobs: 1, pruning: true, goals: true, intermediateTables: true, lastSteps: true, caseSplits: true, memoryCap: 1500, retry: true };

describe('solveOptionsFrom', () => {
  it('leaves goals and intermediate tables at the solver defaults when they are on', () => {
    const options = solveOptionsFrom(flags);
    expect(options.goalBits).toBeUndefined();
    expect(options.intermediateGrids).toBeUndefined();
  });

  it('turns --no-goals into no bits of goals and --no-intermediate-tables into no grids', () => {
    expect(solveOptionsFrom({ ...flags, goals: false })).toMatchObject({ goalBits: 0 });
    expect(solveOptionsFrom({ ...flags, goals: false }).intermediateGrids).toBeUndefined();
    expect(solveOptionsFrom({ ...flags, intermediateTables: false })).toMatchObject({ intermediateGrids: 0 });
    expect(solveOptionsFrom({ ...flags, intermediateTables: false }).goalBits).toBeUndefined();
  });
});
