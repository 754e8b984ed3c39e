/** Properties of one object: hand-worked cases and laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { components } from '../src/grid/components.ts';
import { GridObject } from '../src/grid/grid-object.ts';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import {
  colourCount,
  countColourInObject,
  hasColour,
  isLine,
  isSolidRectangle,
  sameShape,
  touchesColour,
  touchesEdge,
} from '../src/grid/object-properties.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const G = Grid.fromRows;
const E = EMPTY;
// 1 2
// 1 .
const hook = new GridObject(1, 1, G([[1, 2], [1, E]]));

describe('colours of an object', () => {
  it('hasColour, countColourInObject and colourCount', () => {
    expect(hasColour(hook, 2)).toBe(true);
    expect(hasColour(hook, 3)).toBe(false);
    expect(countColourInObject(hook, 1)).toBe(2);
    expect(countColourInObject(hook, 0)).toBe(0);
    expect(colourCount(hook)).toBe(2);
  });

  it('the counts of each colour add up to the size, and colourCount is how many are not 0', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (shape) => {
        const o = new GridObject(0, 0, shape);
        let total = 0;
        let present = 0;
        for (let c = 0; c < 10; c++) {
          const n = countColourInObject(o, c);
          total += n;
          if (n > 0) present++;
          expect(hasColour(o, c)).toBe(n > 0);
        }
        expect(total).toBe(o.size);
        expect(colourCount(o)).toBe(present);
      }),
    );
  });
});

describe('shape', () => {
  it('isSolidRectangle and isLine', () => {
    expect(isSolidRectangle(hook)).toBe(false);
    expect(isSolidRectangle(new GridObject(0, 0, Grid.filled(2, 3, 4)))).toBe(true);
    expect(isLine(new GridObject(0, 0, Grid.filled(1, 3, 4)))).toBe(true);
    expect(isLine(new GridObject(0, 0, G([[4, E, 4]])))).toBe(false);
    expect(isLine(hook)).toBe(false);
  });

  it('sameShape ignores colours and places', () => {
    expect(sameShape(hook, new GridObject(5, 0, G([[7, 7], [7, E]])))).toBe(true);
    expect(sameShape(hook, new GridObject(1, 1, G([[1, 2], [E, 1]])))).toBe(false);
  });
});

describe('touching', () => {
  // . . . .
  // . 1 2 .
  // . 1 . 5
  const g = G([[0, 0, 0, 0], [0, 1, 2, 0], [0, 1, 0, 5]]);

  it('touchesEdge: a cell on the outer border', () => {
    expect(touchesEdge(hook, g)).toBe(true);
    expect(touchesEdge(new GridObject(1, 1, G([[1, 2]])), g)).toBe(false);
  });

  it('touchesColour: a neighbour of the colour outside the object, corners included', () => {
    expect(touchesColour(hook, g, 5)).toBe(true);
    // the 2 belongs to the hook itself, so it does not count
    expect(touchesColour(hook, g, 2)).toBe(false);
    expect(touchesColour(new GridObject(1, 1, G([[1], [1]])), g, 2)).toBe(true);
  });

  it('touching is mutual between two one-colour objects', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (x) => {
        const objects = components(x, { diagonal: false, multicolour: false, background: 0 });
        for (const a of objects) {
          for (const b of objects) {
            if (a === b) continue;
            const near = touchesColour(a, new Grid(x.height, x.width, paintedOnly(x, b)), 10);
            const back = touchesColour(b, new Grid(x.height, x.width, paintedOnly(x, a)), 10);
            expect(near).toBe(back);
          }
        }
      }),
    );
  });
});

/** The grid's cells with the object's cells marked 10 (a value no other cell has). */
function paintedOnly(x: Grid, o: GridObject): Uint8Array {
  const cells = x.cells.slice();
  for (let r = 0; r < o.height; r++) for (let c = 0; c < o.width; c++) if (o.shape.cells[r * o.width + c] !== EMPTY) cells[(o.top + r) * x.width + o.left + c] = 10;
  return cells;
}
