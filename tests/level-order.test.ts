/**
 * Within a cost level the search makes grids first: only a grid can be an answer or meet a goal,
 * so a level cut short by a budget has checked as many of its grids as it could. Watched here
 * from outside, through a library whose primitives log each call the search makes (calls made
 * inside another primitive, through a function argument, are not the search's own and are not
 * logged): the calls that return a grid and those that return anything else then alternate at
 * most once per level. The demo task is invented (tasks-demo/).
 */
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { Library } from '../src/library/library.ts';
import type { Primitive } from '../src/library/primitive.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import { puzzleOf } from '../src/tasks/task.ts';

const demo = new URL('../tasks-demo/', import.meta.url).pathname;

/** The default library, each primitive logging whether it makes a grid when the search calls it. */
function loggingLibrary(log: boolean[]): Library {
  let depth = 0;
  return new Library(
    defaultLibrary.primitives.map((p): Primitive => ({
      ...p,
      run: (...args: never[]) => {
        if (depth === 0) log.push(p.result === 'Grid');
        depth++;
        try {
          return (p.run as (...a: never[]) => unknown)(...args);
        } finally {
          depth--;
        }
      },
    })),
  );
}

describe('the order of calls within a level', () => {
  it('makes every grid of a level before any other value of it', () => {
    const log: boolean[] = [];
    const result = solvePuzzle(puzzleOf(readTaskFile(join(demo, 'lagoon-view.json'))), {
      library: loggingLibrary(log),
      maxCandidates: 60_000,
      timeLimitSeconds: 3600,
      goalBits: 0,
      intermediateGrids: 0,
    });
    const gridCalls = log.filter((g) => g).length;
    expect(gridCalls).toBeGreaterThan(1000);
    expect(log.length - gridCalls).toBeGreaterThan(1000);
    let returnsToGrids = 0;
    for (let i = 1; i < log.length; i++) if (log[i] && !log[i - 1]) returnsToGrids++;
    // Each level turns to grids at most once, the level cut short by the cap included.
    expect(returnsToGrids).toBeLessThanOrEqual(result.statistics.costReached + 1);
  });
});
