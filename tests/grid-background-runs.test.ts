/** The walk over runs of background cells: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { forEachBackgroundRun } from '../src/grid/background-runs.ts';
import { Grid } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

/** Every visit as [cells of the run, before, after]. */
function runsOf(g: Grid, background: number, alongRows: boolean): [number[], number, number][] {
  const runs: [number[], number, number][] = [];
  forEachBackgroundRun(g, background, alongRows, (first, step, length, before, after) => {
    runs.push([Array.from({ length }, (_, k) => first + k * step), before, after]);
  });
  return runs;
}

describe('forEachBackgroundRun', () => {
  // cell indices:  0 1 2 3 4
  //                5 6 7 8 9
  const g = Grid.fromRows([
    [0, 2, 0, 0, 2],
    [3, 3, 0, 0, 0],
  ]);

  it('along rows: each run with the colours either side, -1 at an edge', () => {
    expect(runsOf(g, 0, true)).toEqual([
      [[0], -1, 2],
      [[2, 3], 2, 2],
      [[7, 8, 9], 3, -1],
    ]);
  });

  it('along columns', () => {
    expect(runsOf(g, 0, false)).toEqual([
      [[0], -1, 3],
      [[2, 7], -1, -1],
      [[3, 8], -1, -1],
      [[9], 2, -1],
    ]);
  });

  it('with another background colour', () => {
    // with 3 as background, the row of 3s and 0s has one run: the two 3s, before a 0
    expect(runsOf(g, 3, true)).toEqual([[[5, 6], -1, 0]]);
    expect(runsOf(Grid.fromRows([[3, 1, 3]]), 3, true)).toEqual([
      [[0], -1, 1],
      [[2], 1, -1],
    ]);
  });

  it('the runs cover every background cell exactly once, and are bounded by drawn cells or edges', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.boolean(), (x, alongRows) => {
        const seen = new Array<number>(x.cells.length).fill(0);
        for (const [cells, before, after] of runsOf(x, 0, alongRows)) {
          for (const i of cells) seen[i]!++;
          expect(before).not.toBe(0);
          expect(after).not.toBe(0);
        }
        for (let i = 0; i < x.cells.length; i++) expect(seen[i]).toBe(x.cells[i] === 0 ? 1 : 0);
      }),
    );
  });
});
