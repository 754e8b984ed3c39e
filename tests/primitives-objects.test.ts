/** Object extraction primitives: hand-worked cases and fast-check laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { FAILURE } from '../src/language/failure.ts';
import { GridObject } from '../src/grid/grid-object.ts';
import { arbitraryColour, arbitraryGrid } from './support/arbitrary-grid.ts';
import { callPrimitive } from './support/run-primitive.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;

function objectsOf(name: string, ...args: unknown[]): GridObject[] {
  const value = callPrimitive(name, ...args);
  if (!Array.isArray(value)) throw new Error(`tests/primitives-objects.test.ts: ${name} gave ${String(value)}, expected a list of objects`);
  return value as GridObject[];
}

/** The grid cells (row-major indices) an object covers, checking its cells match the grid. */
function cellsCovered(o: GridObject, g: Grid): number[] {
  const out: number[] = [];
  for (let r = 0; r < o.height; r++) {
    for (let c = 0; c < o.width; c++) {
      const v = o.shape.get(r, c);
      if (v === EMPTY) continue;
      const row = o.top + r;
      const column = o.left + c;
      expect(row >= 0 && row < g.height && column >= 0 && column < g.width).toBe(true);
      expect(v).toBe(g.get(row, column));
      out.push(row * g.width + column);
    }
  }
  return out;
}

/** How many objects cover each cell. */
function coverage(objects: readonly GridObject[], g: Grid): number[] {
  const count = new Array<number>(g.height * g.width).fill(0);
  for (const o of objects) for (const i of cellsCovered(o, g)) count[i]!++;
  return count;
}

/** Whether the cell set is connected through the given steps (checked by repeated growth). */
function connected(cells: readonly number[], width: number, diagonal: boolean): boolean {
  const set = new Set(cells);
  const reached = new Set([cells[0]!]);
  let grew = true;
  while (grew) {
    grew = false;
    for (const i of set) {
      if (reached.has(i)) continue;
      const r = Math.floor(i / width);
      const c = i % width;
      for (const j of reached) {
        const dr = Math.abs(Math.floor(j / width) - r);
        const dc = Math.abs((j % width) - c);
        if ((diagonal ? Math.max(dr, dc) === 1 : dr + dc === 1)) {
          reached.add(i);
          grew = true;
          break;
        }
      }
    }
  }
  return reached.size === set.size;
}

const EXTRACTORS = [
  { name: 'objects_by_colour', diagonal: false, multicolour: false },
  { name: 'objects_by_colour_diagonal', diagonal: true, multicolour: false },
  { name: 'objects_multicolour', diagonal: false, multicolour: true },
  { name: 'objects_multicolour_diagonal', diagonal: true, multicolour: true },
] as const;

describe('object extraction laws', () => {
  for (const name of [...EXTRACTORS.map((e) => e.name), 'colour_groups']) {
    it(`${name} partitions the non-background cells`, () => {
      fc.assert(
        fc.property(arbitraryGrid(), (g) => {
          const background = backgroundOf(g);
          const count = coverage(objectsOf(name, g), g);
          for (let i = 0; i < count.length; i++) expect(count[i]).toBe(g.cells[i] === background ? 0 : 1);
        }),
      );
    });
  }

  for (const e of EXTRACTORS) {
    it(`${e.name} gives connected, maximal regions${e.multicolour ? '' : ' of one colour'} in reading order`, () => {
      fc.assert(
        fc.property(arbitraryGrid(), (g) => {
          const background = backgroundOf(g);
          const objects = objectsOf(e.name, g);
          const owner = new Array<number>(g.cells.length).fill(-1);
          let previousFirst = -1;
          objects.forEach((o, k) => {
            const cells = cellsCovered(o, g);
            expect(cells.length).toBe(o.size);
            expect(connected(cells, g.width, e.diagonal)).toBe(true);
            if (!e.multicolour) expect(new Set(cells.map((i) => g.cells[i])).size).toBe(1);
            const first = Math.min(...cells);
            expect(first).toBeGreaterThan(previousFirst);
            previousFirst = first;
            for (const i of cells) owner[i] = k;
          });
          // maximal: no two neighbouring cells that could join sit in different objects
          for (let i = 0; i < g.cells.length; i++) {
            if (owner[i] < 0) continue;
            const r = Math.floor(i / g.width);
            const c = i % g.width;
            for (let dr = -1; dr <= 1; dr++) {
              for (let dc = -1; dc <= 1; dc++) {
                if ((dr === 0 && dc === 0) || (!e.diagonal && dr !== 0 && dc !== 0)) continue;
                const nr = r + dr;
                const nc = c + dc;
                if (nr < 0 || nc < 0 || nr >= g.height || nc >= g.width) continue;
                const j = nr * g.width + nc;
                if (g.cells[j] === background) continue;
                if (!e.multicolour && g.cells[j] !== g.cells[i]) continue;
                expect(owner[j]).toBe(owner[i]);
              }
            }
          }
        }),
      );
    });
  }

  it('colour_groups gives one object per non-background colour, in colour order', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const background = backgroundOf(g);
        const present = [...new Set(g.cells)].filter((c) => c !== background).sort((a, b) => a - b);
        const colours = objectsOf('colour_groups', g).map((o) => o.mainColour);
        expect(colours).toEqual(present);
      }),
    );
  });

  it('objects_apart_from partitions the cells not of the colour into edge-connected regions', () => {
    fc.assert(
      fc.property(arbitraryGrid(), arbitraryColour, (g, separator) => {
        const objects = objectsOf('objects_apart_from', g, separator);
        const count = coverage(objects, g);
        for (let i = 0; i < count.length; i++) expect(count[i]).toBe(g.cells[i] === separator ? 0 : 1);
        for (const o of objects) expect(connected(cellsCovered(o, g), g.width, false)).toBe(true);
      }),
    );
  });

  it('cells_of_colour holds exactly the cells of the colour, or fails when there are none', () => {
    fc.assert(
      fc.property(arbitraryGrid(), arbitraryColour, (g, colour) => {
        const expected = g.cells.reduce((n, v) => n + (v === colour ? 1 : 0), 0);
        const o = callPrimitive('cells_of_colour', g, colour);
        if (expected === 0) {
          expect(o).toBe(FAILURE);
          return;
        }
        expect(o).toBeInstanceOf(GridObject);
        const cells = cellsCovered(o as GridObject, g);
        expect(cells.length).toBe(expected);
        for (const i of cells) expect(g.cells[i]).toBe(colour);
      }),
    );
  });

  it('enclosed_regions covers exactly the background cells that cannot reach the border', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const background = backgroundOf(g);
        // independent reachability: grow from the border until nothing changes
        const reach = new Array<boolean>(g.cells.length).fill(false);
        let grew = true;
        while (grew) {
          grew = false;
          for (let r = 0; r < g.height; r++) {
            for (let c = 0; c < g.width; c++) {
              const i = r * g.width + c;
              if (reach[i] || g.cells[i] !== background) continue;
              const onBorder = r === 0 || c === 0 || r === g.height - 1 || c === g.width - 1;
              const nextToReached =
                (r > 0 && reach[i - g.width]) || (r < g.height - 1 && reach[i + g.width]) || (c > 0 && reach[i - 1]) || (c < g.width - 1 && reach[i + 1]);
              if (onBorder || nextToReached) {
                reach[i] = true;
                grew = true;
              }
            }
          }
        }
        const objects = objectsOf('enclosed_regions', g);
        const count = coverage(objects, g);
        for (let i = 0; i < count.length; i++) expect(count[i]).toBe(g.cells[i] === background && !reach[i] ? 1 : 0);
        for (const o of objects) expect(connected(cellsCovered(o, g), g.width, false)).toBe(true);
      }),
    );
  });

  it('background is 0 when the grid holds a 0, else a colour with the most cells', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        expect(callPrimitive('background', g)).toBe(backgroundOf(g));
      }),
    );
  });
});

describe('object extraction, hand-worked cases', () => {
  // 0 0 0 0 0
  // 0 1 1 0 2
  // 0 0 1 2 0
  // 3 0 0 0 0
  const g = G([
    [0, 0, 0, 0, 0],
    [0, 1, 1, 0, 2],
    [0, 0, 1, 2, 0],
    [3, 0, 0, 0, 0],
  ]);
  const summary = (objects: GridObject[]) => objects.map((o) => [o.top, o.left, o.size, o.mainColour]);

  it('objects_by_colour: the 1s, the two lone 2s, the 3', () => {
    expect(summary(objectsOf('objects_by_colour', g))).toEqual([
      [1, 1, 3, 1],
      [1, 4, 1, 2],
      [2, 3, 1, 2],
      [3, 0, 1, 3],
    ]);
  });

  it('objects_by_colour_diagonal joins the two 2s through their corner', () => {
    const objects = objectsOf('objects_by_colour_diagonal', g);
    expect(summary(objects)).toEqual([
      [1, 1, 3, 1],
      [1, 3, 2, 2],
      [3, 0, 1, 3],
    ]);
    expect(objects[1]!.shape.toString()).toBe('.2\n2.');
  });

  it('objects_multicolour joins the 1s with the lower 2; the diagonal variant also takes the upper 2', () => {
    expect(summary(objectsOf('objects_multicolour', g))).toEqual([
      [1, 1, 4, 1],
      [1, 4, 1, 2],
      [3, 0, 1, 3],
    ]);
    expect(summary(objectsOf('objects_multicolour_diagonal', g))).toEqual([
      [1, 1, 5, 1],
      [3, 0, 1, 3],
    ]);
  });

  it('colour_groups: colour 1, colour 2 (both cells), colour 3', () => {
    expect(summary(objectsOf('colour_groups', g))).toEqual([
      [1, 1, 3, 1],
      [1, 3, 2, 2],
      [3, 0, 1, 3],
    ]);
  });

  it('objects_apart_from splits the areas between separator lines, background included', () => {
    const ruled = G([
      [0, 1, 5, 0, 0],
      [5, 5, 5, 5, 5],
      [0, 0, 5, 2, 0],
    ]);
    expect(summary(objectsOf('objects_apart_from', ruled, 5))).toEqual([
      [0, 0, 2, 0],
      [0, 3, 2, 0],
      [2, 0, 2, 0],
      [2, 3, 2, 0],
    ]);
  });

  it('enclosed_regions finds the two separate holes of a figure eight', () => {
    const eight = G([
      [0, 0, 0, 0, 0],
      [0, 4, 4, 4, 0],
      [0, 4, 0, 4, 0],
      [0, 4, 4, 4, 0],
      [0, 4, 0, 4, 0],
      [0, 4, 4, 4, 0],
    ]);
    expect(summary(objectsOf('enclosed_regions', eight))).toEqual([
      [2, 2, 1, 0],
      [4, 2, 1, 0],
    ]);
  });

  it('background is 0 whenever 0 is present, otherwise the most frequent colour (lowest on ties)', () => {
    // Three 3s and one 0: 0 is present, so 0 is the background.
    expect(callPrimitive('background', G([[3, 3], [0, 3]]))).toBe(0);
    // No 0: three 3s beat one 5.
    expect(callPrimitive('background', G([[3, 3], [5, 3]]))).toBe(3);
    // No 0, two 7s and two 4s tie: the lower colour, 4.
    expect(callPrimitive('background', G([[7, 4], [4, 7]]))).toBe(4);
  });

  it('extraction from a grid of only background gives no objects', () => {
    expect(objectsOf('objects_by_colour', Grid.filled(3, 3, 6))).toEqual([]);
    expect(objectsOf('colour_groups', Grid.filled(3, 3, 6))).toEqual([]);
    expect(objectsOf('enclosed_regions', Grid.filled(3, 3, 6))).toEqual([]);
  });
});
