// What `pithy solve` prints for a task: a program that breaks the output size the demonstrations
// settle says so, with the bits it was ranked by; a later attempt of the other way than the first
// (table or composed program) says which. The report is made up for the check.
import { describe, expect, it } from 'vitest';
import type { TaskReport } from '../src/batch/task-report.ts';
import { reportLines } from '../src/cli/solve-command.ts';
import { SIZE_BREAK_BITS } from '../src/search/output-size.ts';

const statistics = { candidates: 10, kept: 4, pruned: 3, sectionsPruned: 0, failed: 3, costReached: 9, goals: 0, goalSolutions: 0, intermediateGrids: 0, intermediateSolutions: 0, caseSplitSolutions: 0, sizeRejected: 1, bytesHeld: 0, fullAtCost: 0, lastStepsFromCost: 0 };

function report(breaksFirst: boolean, breaksSecond: boolean, secondFromTable = false): TaskReport {
  return {
    task: 'harbour-lights',
    file: 'harbour-lights.json',
    status: 'found',
    solutions: [
      { program: 'with input\nanswer input\n', bits: 5, ...(breaksFirst ? { breaksSize: true } : {}) },
      { program: 'with input\nanswer transpose(input)\n', bits: 9, ...(breaksSecond ? { breaksSize: true } : {}), ...(secondFromTable ? { fromTable: true } : {}) },
    ],
    attempts: [],
    reason: 'solved',
    seconds: 0.5,
    statistics,
  };
}

describe('pithy solve, the lines of a task', () => {
  it('names a size breaker and the bits it was ranked by, wherever it stands', () => {
    const first = reportLines(report(true, false));
    expect(first[0]).toContain(`5 bits, breaking the output size the demonstrations settle, ranked as ${5 + SIZE_BREAK_BITS} (`);
    expect(first.join('\n')).not.toContain(`9 bits, breaking`);
    const second = reportLines(report(false, true));
    expect(second[0]).not.toContain('breaking');
    expect(second).toContain(`  attempt 2, 9 bits, breaking the output size the demonstrations settle, ranked as ${9 + SIZE_BREAK_BITS}:`);
  });

  it('says when a later attempt is the cheapest of the other way', () => {
    expect(reportLines(report(false, false, true))).toContain('  attempt 2, 9 bits, the cheapest table read off the demonstrations:');
    expect(reportLines(report(false, false, false))).toContain('  attempt 2, 9 bits:');
  });
});
