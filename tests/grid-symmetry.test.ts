/** Mirror symmetry: tests, overlaying with the mirror image, completing holes. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { mirrorCopies } from '../src/grid/mirror-copies.ts';
import { completeSymmetry, isSymmetricLeftRight, isSymmetricTopBottom, symmetrise } from '../src/grid/symmetry.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;

describe('symmetry tests', () => {
  it('worked by hand', () => {
    const g = G([[1, 2, 1], [3, 3, 3]]);
    expect(isSymmetricLeftRight(g)).toBe(true);
    expect(isSymmetricTopBottom(g)).toBe(false);
    expect(isSymmetricTopBottom(G([[1, 2], [5, 5], [1, 2]]))).toBe(true);
  });

  it('mirrored copies are symmetric', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (x) => {
        expect(isSymmetricLeftRight(mirrorCopies(x, false, true)!)).toBe(true);
        expect(isSymmetricTopBottom(mirrorCopies(x, true, false)!)).toBe(true);
      }),
    );
  });
});

describe('symmetrise', () => {
  it('background cells take their mirror cell', () => {
    expect(symmetrise(G([[1, 0, 0], [0, 2, 0], [0, 0, 0]]), true).toRows()).toEqual([[1, 0, 1], [0, 2, 0], [0, 0, 0]]);
    expect(symmetrise(G([[1, 0, 2], [0, 0, 0], [0, 0, 0]]), false).toRows()).toEqual([[1, 0, 2], [0, 0, 0], [1, 0, 2]]);
  });

  it('never changes a cell that is not the background, and leaves a symmetric grid as it is', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.boolean(), (x, leftRight) => {
        const once = symmetrise(x, leftRight);
        const background = backgroundOf(x);
        for (let i = 0; i < x.cells.length; i++) if (x.cells[i] !== background) expect(once.cells[i]).toBe(x.cells[i]);
        const symmetric = mirrorCopies(x, !leftRight, leftRight)!;
        expect(symmetrise(symmetric, leftRight).equals(symmetric)).toBe(true);
      }),
    );
  });
});

describe('completeSymmetry', () => {
  it('fills holes from the mirror images that agree with the rest', () => {
    const g = G([[1, 2, 2, 1], [3, 4, 4, 3], [3, 4, 0, 0], [1, 2, 2, 1]]);
    expect(completeSymmetry(g, 0)!.toRows()).toEqual([[1, 2, 2, 1], [3, 4, 4, 3], [3, 4, 4, 3], [1, 2, 2, 1]]);
  });

  it('gives back the grid without holes, and null when no symmetry agrees', () => {
    const full = G([[1, 2], [3, 4]]);
    expect(completeSymmetry(full, 0)).toBe(full);
    // no left-right, top-bottom, half-turn or diagonal mirror fits 1 2 / 3 4 with one hole
    expect(completeSymmetry(G([[1, 2, 3], [4, 5, 0]]), 0)).toBeNull();
  });

  it('a kaleidoscope with cells knocked out comes back whole', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 5, maxWidth: 5 }), fc.nat(), (x, pick) => {
        const whole = mirrorCopies(recolourZero(x), true, true)!;
        const cells = whole.cells.slice();
        cells[pick % cells.length] = 0;
        expect(completeSymmetry(new Grid(whole.height, whole.width, cells), 0)!.equals(whole)).toBe(true);
      }),
    );
  });
});

/** The grid with 0 replaced by 9, so 0 can mark holes. */
function recolourZero(x: Grid): Grid {
  return new Grid(x.height, x.width, x.cells.map((v) => (v === 0 ? 9 : v)));
}
