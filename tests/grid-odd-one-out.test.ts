/** The common one and the odd one out, among objects and among parts. */
import { describe, expect, it } from 'vitest';
import { GridObject } from '../src/grid/grid-object.ts';
import { Grid } from '../src/grid/grid.ts';
import { mostCommonObject, mostCommonPart, oddOneOut, oddOneOutPart, uniqueColourObject } from '../src/grid/odd-one-out.ts';

const G = Grid.fromRows;
const at = (left: number, rows: number[][]) => new GridObject(0, left, G(rows));

describe('objects', () => {
  const dotA = at(0, [[5]]);
  const dotB = at(4, [[5]]);
  const pair = at(2, [[4, 4]]);

  it('mostCommonObject: the pattern that repeats most, the first of it; null when none repeats', () => {
    expect(mostCommonObject([pair, dotA, dotB])).toBe(dotA);
    expect(mostCommonObject([pair, dotA])).toBeNull();
    expect(mostCommonObject([])).toBeNull();
  });

  it('oddOneOut: the only pattern that occurs once among three or more', () => {
    expect(oddOneOut([dotA, pair, dotB])).toBe(pair);
    expect(oddOneOut([dotA, pair])).toBeNull();
    // two patterns occur once: no single odd one
    expect(oddOneOut([dotA, dotB, pair, at(6, [[7]])])).toBeNull();
  });

  it('uniqueColourObject: the only object whose main colour no other has', () => {
    const three = at(0, [[3]]);
    const threePair = at(2, [[3, 3]]);
    const lone = at(5, [[4, 4]]);
    expect(uniqueColourObject([three, lone, threePair])).toBe(lone);
    expect(uniqueColourObject([three, lone])).toBeNull();
    expect(uniqueColourObject([lone])).toBeNull();
  });
});

describe('parts', () => {
  it('oddOneOutPart by cells', () => {
    expect(oddOneOutPart([G([[1]]), G([[2]]), G([[1]])])!.toRows()).toEqual([[2]]);
  });

  it('oddOneOutPart by filled pattern when every part differs in colour', () => {
    // patterns: filled-empty, filled-empty, empty-filled
    const parts = [G([[1, 0]]), G([[2, 0]]), G([[0, 3]])];
    expect(oddOneOutPart(parts)).toBe(parts[2]);
  });

  it('oddOneOutPart is null with fewer than three parts or without a single odd one', () => {
    expect(oddOneOutPart([G([[1]]), G([[2]])])).toBeNull();
    expect(oddOneOutPart([G([[1]]), G([[1]]), G([[2]]), G([[3]])])).toBeNull();
  });

  it('mostCommonPart: the most frequent part, the first on ties', () => {
    const parts = [G([[1]]), G([[2]]), G([[2]])];
    expect(mostCommonPart(parts)).toBe(parts[1]);
    expect(mostCommonPart([G([[4]]), G([[5]])])!.toRows()).toEqual([[4]]);
    expect(mostCommonPart([])).toBeNull();
  });
});
