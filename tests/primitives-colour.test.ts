/** Recolouring primitives: hand-worked cases and fast-check laws. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { FAILURE } from '../src/language/failure.ts';
import type { GridObject } from '../src/grid/grid-object.ts';
import { Palette } from '../src/language/palette.ts';
import { Point } from '../src/language/point.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { callPrimitive } from './support/run-primitive.ts';
import { backgroundOf } from './support/background-oracle.ts';

const G = Grid.fromRows;
const colour = fc.integer({ min: 0, max: 9 });
const rows = (value: unknown): unknown => (value instanceof Grid ? value.toRows() : value);

function gridOf(name: string, ...args: unknown[]): Grid {
  const value = callPrimitive(name, ...args);
  if (!(value instanceof Grid)) throw new Error(`tests/primitives-colour.test.ts: ${name} gave ${String(value)}, expected a grid`);
  return value;
}
function countsOf(g: Grid): number[] {
  const counts = new Array<number>(10).fill(0);
  for (const v of g.cells) counts[v]!++;
  return counts;
}

describe('colour laws', () => {
  it('recolour keeps the shape and changes exactly the cells of the source colour', () => {
    fc.assert(
      fc.property(arbitraryGrid(), colour, colour, (g, from, to) => {
        const r = gridOf('recolour', g, from, to);
        expect([r.height, r.width]).toEqual([g.height, g.width]);
        for (let i = 0; i < g.cells.length; i++) expect(r.cells[i]).toBe(g.cells[i] === from ? to : g.cells[i]);
      }),
    );
  });

  it('swap_colours twice is the identity', () => {
    fc.assert(
      fc.property(arbitraryGrid(), colour, colour, (g, a, b) => {
        const once = gridOf('swap_colours', g, a, b);
        expect(gridOf('swap_colours', once, a, b).equals(g)).toBe(true);
        for (let i = 0; i < g.cells.length; i++) {
          const v = g.cells[i]!;
          expect(once.cells[i]).toBe(v === a ? b : v === b ? a : v);
        }
      }),
    );
  });

  it('apply_palette with the identity palette is the identity; otherwise it maps each cell once', () => {
    fc.assert(
      fc.property(arbitraryGrid(), fc.array(fc.tuple(colour, colour), { maxLength: 5 }), (g, pairs) => {
        expect(gridOf('apply_palette', g, Palette.fromPairs([])).equals(g)).toBe(true);
        const palette = Palette.fromPairs(pairs);
        const r = gridOf('apply_palette', g, palette);
        for (let i = 0; i < g.cells.length; i++) expect(r.cells[i]).toBe(palette.target[g.cells[i]!]);
      }),
    );
  });

  it('keep_colour and remove_colour split the grid: each cell kept by exactly one of them', () => {
    fc.assert(
      fc.property(arbitraryGrid(), colour, (g, c) => {
        const background = backgroundOf(g);
        const kept = gridOf('keep_colour', g, c);
        const removed = gridOf('remove_colour', g, c);
        for (let i = 0; i < g.cells.length; i++) {
          const v = g.cells[i]!;
          expect(kept.cells[i]).toBe(v === c ? c : background);
          expect(removed.cells[i]).toBe(v === c ? background : v);
        }
      }),
    );
  });

  it('recolour_all paints every non-background cell and leaves the background', () => {
    fc.assert(
      fc.property(arbitraryGrid(), colour, (g, c) => {
        const background = backgroundOf(g);
        const r = gridOf('recolour_all', g, c);
        for (let i = 0; i < g.cells.length; i++) expect(r.cells[i]).toBe(g.cells[i] === background ? background : c);
      }),
    );
  });

  it('most_common_non_background_colour has the most cells among non-background colours; least_common_colour the fewest among present ones', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const counts = countsOf(g);
        const background = backgroundOf(g);
        const most = callPrimitive('most_common_non_background_colour', g);
        const others = counts.map((n, c) => (c === background ? 0 : n));
        if (Math.max(...others) === 0) expect(most).toBe(FAILURE);
        else {
          expect(most).not.toBe(background);
          expect(counts[most as number]).toBe(Math.max(...others));
          expect(others.indexOf(Math.max(...others))).toBe(most);
        }
        const least = callPrimitive('least_common_colour', g) as number;
        const present = counts.filter((n) => n > 0);
        expect(counts[least]).toBe(Math.min(...present));
      }),
    );
  });

  it('most_common_colour_with_background is the lowest colour with the most cells, background included', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const counts = countsOf(g);
        expect(callPrimitive('most_common_colour_with_background', g)).toBe(counts.indexOf(Math.max(...counts)));
      }),
    );
    // Worked by hand: 0 (3 cells) beats 4 (2 cells) and 3 (1 cell), though 0 is the background.
    expect(callPrimitive('most_common_colour_with_background', G([[0, 3, 0], [4, 4, 0]]))).toBe(0);
    // 6 and 2 tie with two cells each: the lower, 2.
    expect(callPrimitive('most_common_colour_with_background', G([[6, 2], [2, 6], [1, 0]]))).toBe(2);
  });

  it('recolour_object keeps position and shape and uses only the new colour', () => {
    fc.assert(
      fc.property(arbitraryGrid(), colour, (g, c) => {
        for (const o of callPrimitive('objects_multicolour', g) as GridObject[]) {
          const r = callPrimitive('recolour_object', o, c) as GridObject;
          expect([r.top, r.left, r.height, r.width, r.size]).toEqual([o.top, o.left, o.height, o.width, o.size]);
          for (let i = 0; i < o.shape.cells.length; i++) expect(r.shape.cells[i]).toBe(o.shape.cells[i] === EMPTY ? EMPTY : c);
        }
      }),
    );
  });

  it('recolour_objects_by_size changes only cells of the largest and smallest objects', () => {
    fc.assert(
      fc.property(arbitraryGrid(), colour, colour, (g, large, small) => {
        const objects = callPrimitive('objects_by_colour', g) as GridObject[];
        const result = callPrimitive('recolour_objects_by_size', g, large, small);
        if (objects.length < 2) {
          expect(result).toBe(FAILURE);
          return;
        }
        const r = result as Grid;
        const sizes = objects.map((o) => o.size);
        const big = objects[sizes.indexOf(Math.max(...sizes))]!;
        const little = objects[sizes.indexOf(Math.min(...sizes))]!;
        if (big === little) return;
        const expected = g.toRows();
        for (const [o, c] of [[big, large], [little, small]] as const) {
          for (let y = 0; y < o.height; y++) for (let x = 0; x < o.width; x++) if (o.shape.get(y, x) !== EMPTY) expected[o.top + y]![o.left + x] = c;
        }
        expect(r.toRows()).toEqual(expected);
      }),
    );
  });
});

describe('colour, hand-worked cases', () => {
  const g = G([
    [0, 1, 1],
    [2, 0, 1],
    [0, 0, 3],
  ]);

  it('recolour, swap, palette', () => {
    expect(rows(callPrimitive('recolour', g, 1, 5))).toEqual([[0, 5, 5], [2, 0, 5], [0, 0, 3]]);
    expect(rows(callPrimitive('swap_colours', g, 0, 1))).toEqual([[1, 0, 0], [2, 1, 0], [1, 1, 3]]);
    expect(rows(callPrimitive('apply_palette', g, Palette.fromPairs([[1, 2], [2, 3], [3, 1]])))).toEqual([[0, 2, 2], [3, 0, 2], [0, 0, 1]]);
  });

  it('keep_colour and remove_colour on a background of 5', () => {
    const fives = G([[5, 5, 1], [2, 5, 5]]);
    expect(rows(callPrimitive('keep_colour', fives, 1))).toEqual([[5, 5, 1], [5, 5, 5]]);
    expect(rows(callPrimitive('remove_colour', fives, 1))).toEqual([[5, 5, 5], [2, 5, 5]]);
  });

  it('colour ranks', () => {
    expect(callPrimitive('most_common_non_background_colour', g)).toBe(1);
    expect(callPrimitive('least_common_colour', g)).toBe(2);
    expect(callPrimitive('most_common_non_background_colour', Grid.filled(2, 2, 4))).toBe(FAILURE);
    expect(callPrimitive('least_common_colour', Grid.filled(2, 2, 4))).toBe(4);
  });

  it('recolour_objects_by_size: the ring gets 8, the dot 9, the middle-sized bar stays', () => {
    const scene = G([
      [4, 4, 4, 0, 0, 0],
      [4, 0, 4, 0, 6, 0],
      [4, 4, 4, 0, 0, 0],
      [0, 0, 0, 0, 0, 0],
      [2, 2, 0, 0, 0, 0],
    ]);
    expect(rows(callPrimitive('recolour_objects_by_size', scene, 8, 9))).toEqual([
      [8, 8, 8, 0, 0, 0],
      [8, 0, 8, 0, 9, 0],
      [8, 8, 8, 0, 0, 0],
      [0, 0, 0, 0, 0, 0],
      [2, 2, 0, 0, 0, 0],
    ]);
    expect(callPrimitive('recolour_objects_by_size', G([[0, 7], [0, 0]]), 8, 9)).toBe(FAILURE);
  });

  it('replace_background and most_common_object_colour', () => {
    // No 0: 5 (four cells) is the background.
    expect(rows(callPrimitive('replace_background', G([[5, 1, 5], [5, 5, 2]]), 3))).toEqual([[3, 1, 3], [3, 3, 2]]);
    // One cell of 0: 0 is the background although 5 has more cells.
    expect(rows(callPrimitive('replace_background', G([[5, 1, 5], [5, 5, 0]]), 3))).toEqual([[5, 1, 5], [5, 5, 3]]);
    const objects = callPrimitive('objects_by_colour', G([[6, 0, 1, 0, 6], [0, 0, 1, 0, 0], [1, 0, 0, 0, 6]]));
    // objects: 6, the 1 pair, 6, 1, 6 -> colour 6 three times
    expect(callPrimitive('most_common_object_colour', objects)).toBe(6);
    expect(callPrimitive('most_common_object_colour', [])).toBe(FAILURE);
  });

  it('colour_of_cell reads one cell and fails outside', () => {
    expect(callPrimitive('colour_of_cell', g, new Point(1, 0))).toBe(2);
    expect(callPrimitive('colour_of_cell', g, new Point(3, 0))).toBe(FAILURE);
    expect(callPrimitive('colour_of_cell', g, new Point(0, -1))).toBe(FAILURE);
  });
});

describe('recolour_objects_by_size_rank and colours_by_frequency', () => {
  it('recolour_objects_by_size_rank: every object takes the rank of its size among the distinct sizes', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const objects = callPrimitive('objects_by_colour', g) as GridObject[];
        const result = callPrimitive('recolour_objects_by_size_rank', g);
        const sizes = [...new Set(objects.map((o) => o.size))].sort((a, b) => b - a);
        if (objects.length === 0 || sizes.length > 9) {
          expect(result).toBe(FAILURE);
          return;
        }
        const out = result as Grid;
        const background = backgroundOf(g);
        for (const o of objects) {
          for (let r = 0; r < o.height; r++) {
            for (let c = 0; c < o.width; c++) if (o.shape.get(r, c) !== EMPTY) expect(out.get(o.top + r, o.left + c)).toBe(sizes.indexOf(o.size) + 1);
          }
        }
        for (let i = 0; i < g.cells.length; i++) if (g.cells[i] === background) expect(out.cells[i]).toBe(background);
      }),
    );
  });

  it('recolour_objects_by_size_rank, worked by hand: equal sizes share a colour', () => {
    const g = G([
      [5, 5, 0, 5, 0],
      [5, 5, 0, 5, 0],
      [0, 0, 0, 0, 0],
      [5, 0, 7, 7, 7],
      [0, 0, 0, 0, 7],
    ]);
    // Sizes: the 2x2 block 4, the 7 hook 4, the 5 bar 2, the single 5 1 -> ranks 1, 1, 2, 3.
    expect(rows(callPrimitive('recolour_objects_by_size_rank', g))).toEqual([
      [1, 1, 0, 2, 0],
      [1, 1, 0, 2, 0],
      [0, 0, 0, 0, 0],
      [3, 0, 1, 1, 1],
      [0, 0, 0, 0, 1],
    ]);
    expect(callPrimitive('recolour_objects_by_size_rank', G([[0, 0]]))).toBe(FAILURE);
  });

  it('colours_by_frequency lists each non-background colour once, counts never rising down the column', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const counts = countsOf(g);
        const background = backgroundOf(g);
        const present = counts.map((n, c) => (n > 0 && c !== background ? c : -1)).filter((c) => c >= 0);
        const result = callPrimitive('colours_by_frequency', g);
        if (present.length === 0) {
          expect(result).toBe(FAILURE);
          return;
        }
        const column = (result as Grid).toRows().map((row) => row[0]!);
        expect((result as Grid).width).toBe(1);
        expect([...column].sort((a, b) => a - b)).toEqual(present);
        for (let i = 1; i < column.length; i++) {
          const [a, b] = [column[i - 1]!, column[i]!];
          expect(counts[a]! > counts[b]! || (counts[a] === counts[b] && a < b)).toBe(true);
        }
      }),
    );
  });

  it('colours_by_frequency, worked by hand', () => {
    // 0 is the background; 3 has three cells, 1 and 6 two each (1 first), 9 one.
    expect(rows(callPrimitive('colours_by_frequency', G([[3, 6, 1, 0], [3, 6, 1, 9], [3, 0, 0, 0]])))).toEqual([[3], [1], [6], [9]]);
    expect(callPrimitive('colours_by_frequency', G([[4, 4]]))).toBe(FAILURE);
  });
});

describe('colour_histogram', () => {
  it('keeps the count of every colour other than 0, in columns from the most frequent', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const out = callPrimitive('colour_histogram', g);
        const counts = countsOf(g);
        if (counts.slice(1).every((n) => n === 0)) {
          expect(out).toBe(FAILURE);
          return;
        }
        const bars = out as Grid;
        const outCounts = countsOf(bars);
        for (let c = 1; c < 10; c++) expect(outCounts[c]).toBe(counts[c]);
        for (let j = 1; j < bars.width; j++) expect(counts[bars.get(0, j)]!).toBeLessThanOrEqual(counts[bars.get(0, j - 1)]!);
      }),
    );
  });

  it('works a small case by hand: ties go to the lower colour', () => {
    // 5 has three cells, 2 and 9 one each; 0 is left out.
    expect(rows(callPrimitive('colour_histogram', G([[5, 9, 0], [5, 5, 2]])))).toEqual([
      [5, 2, 9],
      [5, 0, 0],
      [5, 0, 0],
    ]);
  });
});

describe('stripes: the most frequent colour per row or column', () => {
  it('majority_per_row and majority_per_column (worked by hand; ties go to the lowest colour)', () => {
    const g = G([[1, 1, 2], [3, 4, 4], [5, 6, 7]]);
    expect(gridOf('majority_per_row', g).toRows()).toEqual([[1, 1, 1], [4, 4, 4], [5, 5, 5]]);
    expect(gridOf('majority_per_column', g).toRows()).toEqual([[1, 1, 2], [1, 1, 2], [1, 1, 2]]);
  });

  it('restore_stripes picks the direction that keeps more cells (worked by hand)', () => {
    // Three horizontal stripes with two specks: rows keep 7 cells, columns keep 3.
    const across = G([[3, 3, 3], [7, 1, 7], [2, 2, 5]]);
    expect(gridOf('restore_stripes', across).toRows()).toEqual([[3, 3, 3], [7, 7, 7], [2, 2, 2]]);
    // Vertical stripes with one speck.
    const down = G([[4, 6, 6], [4, 6, 9], [4, 6, 6]]);
    expect(gridOf('restore_stripes', down).toRows()).toEqual([[4, 6, 6], [4, 6, 6], [4, 6, 6]]);
  });

  it('restore_stripes is the majority per row or per column, whichever agrees with more cells (rows on ties)', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const rows = gridOf('majority_per_row', g);
        const columns = gridOf('majority_per_column', g);
        const agreement = (x: Grid) => x.cells.reduce((n, v, i) => n + (v === g.cells[i] ? 1 : 0), 0);
        expect(gridOf('restore_stripes', g).equals(agreement(columns) > agreement(rows) ? columns : rows)).toBe(true);
      }),
    );
  });

  it('majority per column is majority per row seen transposed', () => {
    fc.assert(
      fc.property(arbitraryGrid(), (g) => {
        const viaRows = gridOf('transpose', gridOf('majority_per_row', gridOf('transpose', g)));
        expect(gridOf('majority_per_column', g).equals(viaRows)).toBe(true);
      }),
    );
  });
});

describe('colour_bands', () => {
  it('lists band colours across or down, whichever way they run (worked by hand)', () => {
    expect(rows(callPrimitive('colour_bands', G([[3, 3, 5, 5, 1], [3, 5, 5, 1, 1]])))).toEqual([[3, 5, 1]]);
    expect(rows(callPrimitive('colour_bands', G([[7, 7, 7], [7, 2, 7], [2, 2, 2], [9, 9, 2]])))).toEqual([[7], [2], [9]]);
    expect(callPrimitive('colour_bands', G([[0, 0], [0, 0]]))).toBe(FAILURE);
  });
});
