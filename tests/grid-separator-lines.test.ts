/** Separator lines, the panes between them and the colour of each pane. */
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { findSeparatorLines, gaps, paneColours, splitAtSeparatorLines } from '../src/grid/separator-lines.ts';

const G = Grid.fromRows;
// a 5 cross divides four panes
const window = G([
  [1, 1, 5, 2],
  [1, 0, 5, 2],
  [5, 5, 5, 5],
  [3, 3, 5, 0],
]);

describe('separator lines', () => {
  it('gaps are the runs of unflagged indices', () => {
    expect(gaps(Uint8Array.from([0, 0, 1, 0, 1, 1, 0]))).toEqual([[0, 2], [3, 4], [6, 7]]);
  });

  it('finds the full row and column of one colour', () => {
    const lines = findSeparatorLines(window)!;
    expect(lines.colour).toBe(5);
    expect([...lines.rows]).toEqual([0, 0, 1, 0]);
    expect([...lines.columns]).toEqual([0, 0, 1, 0]);
    expect(findSeparatorLines(G([[1, 2], [3, 4]]))).toBeUndefined();
  });

  it('splits into the panes in reading order', () => {
    expect(splitAtSeparatorLines(window)!.map((p) => p.toRows())).toEqual([[[1, 1], [1, 0]], [[2], [2]], [[3, 3]], [[0]]]);
    expect(splitAtSeparatorLines(G([[1, 2]]))).toBeNull();
  });

  it('paneColours: the most frequent colour of each pane, laid out as the panes', () => {
    expect(paneColours(window)!.toRows()).toEqual([[1, 2], [3, 0]]);
    expect(paneColours(G([[1, 2]]))).toBeNull();
  });
});
