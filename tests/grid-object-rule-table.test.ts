/** Object rules: property values worked out by hand, applying a table, failing on a missing key, outcomes read off a pair. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { applyObjectRule, objectKeys, objectsOf, ObjectRule, paintOutcomes, possibleOutcomes, shapePattern, slideOffset } from '../src/grid/object-rule-table.ts';

const G = Grid.fromRows;
//   1 1 0 2
//   0 0 0 2
//   0 3 0 2
//   0 0 0 0
const harbour = G([[1, 1, 0, 2], [0, 0, 0, 2], [0, 3, 0, 2], [0, 0, 0, 0]]);
const boats = objectsOf(harbour, 'by_colour');

describe('objectKeys', () => {
  it('reads each property of the objects, in reading order of their first cell', () => {
    expect(boats.map((o) => o.mainColour)).toEqual([1, 2, 3]);
    expect(objectKeys(harbour, boats, 'size')).toEqual([2, 3, 1]);
    expect(objectKeys(harbour, boats, 'colour')).toEqual([1, 2, 3]);
    expect(objectKeys(harbour, boats, 'height')).toEqual([1, 3, 1]);
    expect(objectKeys(harbour, boats, 'width')).toEqual([2, 1, 1]);
    expect(objectKeys(harbour, boats, 'size_rank')).toEqual([2, 1, 3]);
    expect(objectKeys(harbour, boats, 'touches_edge')).toEqual([1, 1, 0]);
    expect(objectKeys(harbour, boats, 'holes')).toEqual([0, 0, 0]);
    expect(objectKeys(harbour, boats, 'shape')).toEqual(['xx', 'x/x/x', 'x']);
  });

  it('counts holes and writes the shape of a ring', () => {
    const ring = G([[5, 5, 5], [5, 0, 5], [5, 5, 5]]);
    const objects = objectsOf(ring, 'by_colour');
    expect(objects.length).toBe(1);
    expect(objectKeys(ring, objects, 'holes')).toEqual([1]);
    expect(shapePattern(objects[0]!)).toBe('xxx/x.x/xxx');
  });

  it('reads the new properties of the harbour by hand: hollow, wide, tall, inside, unique, largest, smallest', () => {
    expect(objectKeys(harbour, boats, 'hollow')).toEqual([0, 0, 0]);
    expect(objectKeys(harbour, boats, 'wide')).toEqual([1, 0, 0]);
    expect(objectKeys(harbour, boats, 'tall')).toEqual([0, 1, 0]);
    // the 3 is off the border but its neighbours are open water that reaches the edge
    expect(objectKeys(harbour, boats, 'inside')).toEqual([0, 0, 0]);
    expect(objectKeys(harbour, boats, 'unique_shape')).toEqual([1, 1, 1]);
    expect(objectKeys(harbour, boats, 'unique_colour')).toEqual([1, 1, 1]);
    // sizes 2, 3, 1
    expect(objectKeys(harbour, boats, 'largest')).toEqual([0, 1, 0]);
    expect(objectKeys(harbour, boats, 'smallest')).toEqual([0, 0, 1]);
  });

  it('tells a buoy inside a ring from one outside it, and repeated shapes and colours', () => {
    //   0 0 0 0 0 0 0
    //   0 5 5 5 0 4 0
    //   0 5 4 5 0 0 0
    //   0 5 5 5 0 0 7
    //   0 0 0 0 0 0 0
    const lagoon = G([
      [0, 0, 0, 0, 0, 0, 0],
      [0, 5, 5, 5, 0, 4, 0],
      [0, 5, 4, 5, 0, 0, 0],
      [0, 5, 5, 5, 0, 0, 7],
      [0, 0, 0, 0, 0, 0, 0],
    ]);
    const objects = objectsOf(lagoon, 'by_colour');
    // reading order of first cells: the ring (1,1), the buoy at (1,5), the buoy at (2,2), the 7 at (3,6)
    expect(objects.map((o) => [o.top, o.left, o.mainColour])).toEqual([[1, 1, 5], [1, 5, 4], [2, 2, 4], [3, 6, 7]]);
    expect(objectKeys(lagoon, objects, 'inside')).toEqual([0, 0, 1, 0]);
    expect(objectKeys(lagoon, objects, 'hollow')).toEqual([1, 0, 0, 0]);
    expect(objectKeys(lagoon, objects, 'unique_shape')).toEqual([1, 0, 0, 0]);
    expect(objectKeys(lagoon, objects, 'unique_colour')).toEqual([1, 0, 0, 1]);
    expect(objectKeys(lagoon, objects, 'wide')).toEqual([0, 0, 0, 0]);
    // sizes 8, 1, 1, 1: the three single cells tie for smallest
    expect(objectKeys(lagoon, objects, 'largest')).toEqual([1, 0, 0, 0]);
    expect(objectKeys(lagoon, objects, 'smallest')).toEqual([0, 1, 1, 1]);
  });

  it('tells objects above, below and beside a line drawn across the grid, and symmetric boxes', () => {
    //   0 1 0 0 3 0
    //   0 0 0 0 3 0
    //   6 6 6 6 6 6   <- a line: a whole row of one colour
    //   2 2 0 0 3 0
    //   2 0 0 0 3 4
    // (the 3s are a column but not a line: the 6 crosses them)
    const quay = G([
      [0, 1, 0, 0, 3, 0],
      [0, 0, 0, 0, 3, 0],
      [6, 6, 6, 6, 6, 6],
      [2, 2, 0, 0, 3, 0],
      [2, 0, 0, 0, 3, 4],
    ]);
    const objects = objectsOf(quay, 'by_colour');
    // reading order: 1 (0,1), upper 3 (0,4), the 6 line (2,0), the 2s (3,0), lower 3 (3,4), 4 (4,5)
    expect(objects.map((o) => [o.top, o.left, o.mainColour])).toEqual([[0, 1, 1], [0, 4, 3], [2, 0, 6], [3, 0, 2], [3, 4, 3], [4, 5, 4]]);
    expect(objectKeys(quay, objects, 'above_line')).toEqual([1, 1, 0, 0, 0, 0]);
    expect(objectKeys(quay, objects, 'below_line')).toEqual([0, 0, 0, 1, 1, 1]);
    // no column is wholly one colour
    expect(objectKeys(quay, objects, 'left_of_line')).toEqual([0, 0, 0, 0, 0, 0]);
    expect(objectKeys(quay, objects, 'right_of_line')).toEqual([0, 0, 0, 0, 0, 0]);
    // the 2s make an L (xx/x.): no mirror keeps it; a single cell, a bar and the line do
    expect(objectKeys(quay, objects, 'symmetric')).toEqual([1, 1, 1, 0, 1, 1]);
    //   5 0 8 0 0
    //   5 0 8 0 7
    //   5 0 8 0 0
    const wall = G([[5, 0, 8, 0, 0], [5, 0, 8, 0, 7], [5, 0, 8, 0, 0]]);
    const parts = objectsOf(wall, 'by_colour');
    expect(parts.map((o) => o.mainColour)).toEqual([5, 8, 7]);
    // two columns are lines (5 and 8): the 5 lies left of the 8, the 7 right of both
    expect(objectKeys(wall, parts, 'left_of_line')).toEqual([1, 0, 0]);
    expect(objectKeys(wall, parts, 'right_of_line')).toEqual([0, 1, 1]);
    expect(objectKeys(wall, parts, 'above_line')).toEqual([0, 0, 0]);
    // the quay: tops 0, 0, 2, 3, 3, 4; bottoms 0, 1, 2, 4, 4, 4; lefts 1, 4, 0, 0, 4, 5; rights 1, 4, 5, 1, 4, 5
    expect(objectKeys(quay, objects, 'topmost')).toEqual([1, 1, 0, 0, 0, 0]);
    expect(objectKeys(quay, objects, 'bottommost')).toEqual([0, 0, 0, 1, 1, 1]);
    expect(objectKeys(quay, objects, 'leftmost')).toEqual([0, 0, 1, 1, 0, 0]);
    expect(objectKeys(quay, objects, 'rightmost')).toEqual([0, 0, 1, 0, 0, 1]);
  });

  it('reads form and contact, worked out by hand on a workshop shelf', () => {
    //   1 1 0 0 0 0
    //   1 1 0 4 0 0
    //   0 0 0 4 0 6
    //   2 2 2 4 0 6
    //   0 0 0 0 6 6
    const shelf = G([[1, 1, 0, 0, 0, 0], [1, 1, 0, 4, 0, 0], [0, 0, 0, 4, 0, 6], [2, 2, 2, 4, 0, 6], [0, 0, 0, 0, 6, 6]]);
    const parts = objectsOf(shelf, 'by_colour');
    // in reading order of their first cells: the 1 block (0, 0), the 4 (1, 3), the 6 (2, 5), the 2 (3, 0)
    expect(parts.map((o) => o.mainColour)).toEqual([1, 4, 6, 2]);
    // the 6 fills 4 of its 3 × 2 box
    expect(objectKeys(shelf, parts, 'solid')).toEqual([1, 1, 0, 1]);
    expect(objectKeys(shelf, parts, 'square')).toEqual([1, 0, 0, 0]);
    expect(objectKeys(shelf, parts, 'line')).toEqual([0, 1, 0, 1]);
    // the 4 and the 2 meet at row 3, columns 2 and 3; the 1 block and the 6 touch nothing
    expect(objectKeys(shelf, parts, 'touches_other')).toEqual([0, 1, 0, 1]);
    // cut with many colours, the 4 and the 2 are one object of two colours
    const joined = objectsOf(shelf, 'multicolour');
    expect(objectKeys(shelf, joined, 'colours')).toEqual([1, 2, 1]);
    expect(objectKeys(shelf, joined, 'touches_other')).toEqual([0, 0, 0]);
  });

  it('gives equal sizes one rank', () => {
    const g = G([[1, 0, 2], [0, 0, 0], [3, 3, 0]]);
    expect(objectKeys(g, objectsOf(g, 'by_colour'), 'size_rank')).toEqual([2, 2, 1]);
  });
});

describe('applyObjectRule', () => {
  it('removes, recolours and moves objects by their size', () => {
    const rule = new ObjectRule('by_colour', 'size', [
      { key: 1, outcome: { kind: 'remove' } },
      { key: 2, outcome: { kind: 'recolour', colour: 5 } },
      { key: 3, outcome: { kind: 'move', rows: 1, columns: 0 } },
    ]);
    expect(applyObjectRule(harbour, rule)!.toRows()).toEqual([
      [5, 5, 0, 0],
      [0, 0, 0, 2],
      [0, 0, 0, 2],
      [0, 0, 0, 2],
    ]);
  });

  it('fails when an object has a value the table lacks', () => {
    const rule = new ObjectRule('by_colour', 'size', [
      { key: 1, outcome: { kind: 'remove' } },
      { key: 2, outcome: { kind: 'keep' } },
    ]);
    expect(applyObjectRule(harbour, rule)).toBeNull();
  });

  it('keeps the grid when every object keeps its place', () => {
    const rule = new ObjectRule('multicolour', 'touches_edge', [
      { key: 0, outcome: { kind: 'keep' } },
      { key: 1, outcome: { kind: 'keep' } },
    ]);
    expect(applyObjectRule(harbour, rule)!.equals(harbour)).toBe(true);
  });
});

describe('possibleOutcomes', () => {
  it('reads what became of each object from the output', () => {
    const after = G([[5, 5, 0, 0], [0, 0, 0, 2], [0, 0, 0, 2], [0, 0, 0, 2]]);
    expect(possibleOutcomes(boats[0]!, harbour, after)).toEqual([{ kind: 'recolour', colour: 5 }]);
    // The 2 went down one row, as far as it can go (a slide down, offered before the move); a slide
    // toward the nearest thing in line would take it left, against the 1, so it is not offered.
    expect(possibleOutcomes(boats[1]!, harbour, after)).toEqual([
      { kind: 'slide', way: 'down' },
      { kind: 'move', rows: 1, columns: 0 },
    ]);
    expect(possibleOutcomes(boats[2]!, harbour, after)).toEqual([{ kind: 'remove' }]);
  });

  it('offers keep first, then recolouring to its own colour, for an unchanged one-colour object', () => {
    expect(possibleOutcomes(boats[2]!, harbour, harbour).slice(0, 2)).toEqual([{ kind: 'keep' }, { kind: 'recolour', colour: 3 }]);
  });
});

// Kites on a field (invented): a hollow kite (a ring of 4 around one empty cell) and a flag-shaped
// one, by colour.
//   4 4 4 0 0 0
//   4 0 4 0 6 6
//   4 4 4 0 6 0
//   0 0 0 0 6 0
const field = G([[4, 4, 4, 0, 0, 0], [4, 0, 4, 0, 6, 6], [4, 4, 4, 0, 6, 0], [0, 0, 0, 0, 6, 0]]);
const kites = objectsOf(field, 'by_colour');

describe('mirror and fill outcomes', () => {
  it('fills a hollow object and mirrors a lopsided one in its own box, worked out by hand', () => {
    const rule = new ObjectRule('by_colour', 'hollow', [
      { key: 1, outcome: { kind: 'fill', colour: 2 } },
      { key: 0, outcome: { kind: 'mirror', across: 'left_right' } },
    ]);
    expect(applyObjectRule(field, rule)!.toRows()).toEqual([
      [4, 4, 4, 0, 0, 0],
      [4, 2, 4, 0, 6, 6],
      [4, 4, 4, 0, 0, 6],
      [0, 0, 0, 0, 0, 6],
    ]);
    const upsideDown = new ObjectRule('by_colour', 'hollow', [
      { key: 1, outcome: { kind: 'keep' } },
      { key: 0, outcome: { kind: 'mirror', across: 'top_bottom' } },
    ]);
    expect(applyObjectRule(field, upsideDown)!.toRows()).toEqual([
      [4, 4, 4, 0, 0, 0],
      [4, 0, 4, 0, 6, 0],
      [4, 4, 4, 0, 6, 0],
      [0, 0, 0, 0, 6, 6],
    ]);
  });

  it('reads a mirror and a fill off a pair; an object its mirror leaves alike is offered the mirror after keep', () => {
    const after = G([[4, 4, 4, 0, 0, 0], [4, 3, 4, 0, 6, 6], [4, 4, 4, 0, 0, 6], [0, 0, 0, 0, 0, 6]]);
    // the fill first: keeping the ring would leave its filled hole unexplained
    expect(possibleOutcomes(kites[0]!, field, after).slice(0, 3)).toEqual([{ kind: 'fill', colour: 3 }, { kind: 'keep' }, { kind: 'recolour', colour: 4 }]);
    expect(possibleOutcomes(kites[1]!, field, after)).toEqual([{ kind: 'mirror', across: 'left_right' }]);
    // the ring is its own mirror image either way: keep, its own colour, then both mirrors; the
    // flag has no mirror image the unchanged output shows
    expect(possibleOutcomes(kites[0]!, field, field)).toEqual([
      { kind: 'keep' },
      { kind: 'recolour', colour: 4 },
      { kind: 'mirror', across: 'left_right' },
      { kind: 'mirror', across: 'top_bottom' },
    ]);
    expect(possibleOutcomes(kites[1]!, field, field).map((o) => o.kind)).toEqual(['keep', 'recolour']);
  });

  it('mirroring a lone object twice the same way gives the grid back (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 4 }),
        fc.integer({ min: 1, max: 4 }),
        fc.array(fc.boolean(), { minLength: 16, maxLength: 16 }),
        fc.integer({ min: 1, max: 9 }),
        fc.boolean(),
        (h, w, filled, colour, leftRight) => {
          const rows = Array.from({ length: h + 2 }, (_, r) => Array.from({ length: w + 2 }, (_, c) => (r > 0 && c > 0 && r <= h && c <= w && filled[(r - 1) * 4 + c - 1] ? colour : 0)));
          const g = G(rows);
          const objects = objectsOf(g, 'multicolour_diagonal');
          fc.pre(objects.length === 1);
          const across = leftRight ? 'left_right' : 'top_bottom';
          const once = paintOutcomes(g, objects, [{ kind: 'mirror', across }])!;
          const twice = paintOutcomes(once, objectsOf(once, 'multicolour_diagonal'), [{ kind: 'mirror', across }])!;
          expect(twice.equals(g)).toBe(true);
        },
      ),
    );
  });
});

// Crates in a yard (invented): a crate slides one way until the yard's wall (the grid's border) or
// another crate stops it.
//   0 0 0 0 0
//   0 0 0 0 0
//   3 0 0 8 8
//   0 0 0 8 8
//   0 0 0 0 0
const yard = G([[0, 0, 0, 0, 0], [0, 0, 0, 0, 0], [3, 0, 0, 8, 8], [0, 0, 0, 8, 8], [0, 0, 0, 0, 0]]);
const crates = objectsOf(yard, 'by_colour');

describe('slide outcomes', () => {
  it('slides each way as far as the yard lets it, worked out by hand', () => {
    // the 3 (row 2, column 0): up 2 rows and down 2 to the wall, left not at all, right 2 columns
    // to the 8; the 8 block (rows 2–3, columns 3–4): up 2, down 1, right 0, left 2 to the 3
    expect(crates.map((o) => o.mainColour)).toEqual([3, 8]);
    expect(slideOffset(crates[0]!, yard, 'up', 0)).toEqual([-2, 0]);
    expect(slideOffset(crates[0]!, yard, 'down', 0)).toEqual([2, 0]);
    expect(slideOffset(crates[0]!, yard, 'left', 0)).toEqual([0, 0]);
    expect(slideOffset(crates[0]!, yard, 'right', 0)).toEqual([0, 2]);
    expect(slideOffset(crates[1]!, yard, 'down', 0)).toEqual([1, 0]);
    expect(slideOffset(crates[1]!, yard, 'left', 0)).toEqual([0, -2]);
    // toward: the only way each is stopped by the other rather than the wall
    expect(slideOffset(crates[0]!, yard, 'toward', 0)).toEqual([0, 2]);
    expect(slideOffset(crates[1]!, yard, 'toward', 0)).toEqual([0, -2]);
  });

  it('applies slides measured on the grid before anything moved', () => {
    const rule = new ObjectRule('by_colour', 'colour', [
      { key: 3, outcome: { kind: 'slide', way: 'toward' } },
      { key: 8, outcome: { kind: 'slide', way: 'up' } },
    ]);
    expect(applyObjectRule(yard, rule)!.toRows()).toEqual([
      [0, 0, 0, 8, 8],
      [0, 0, 0, 8, 8],
      [0, 0, 3, 0, 0],
      [0, 0, 0, 0, 0],
      [0, 0, 0, 0, 0],
    ]);
  });

  it('fails rather than guess when two ways are equally near', () => {
    //   5 0 1 0 5: the 1 is one step from a 5 either way
    const between = G([[5, 0, 1, 0, 5]]);
    const rule = new ObjectRule('by_colour', 'colour', [
      { key: 1, outcome: { kind: 'slide', way: 'toward' } },
      { key: 5, outcome: { kind: 'keep' } },
    ]);
    expect(slideOffset(objectsOf(between, 'by_colour')[1]!, between, 'toward', 0)).toBeUndefined();
    expect(applyObjectRule(between, rule)).toBeNull();
  });

  it('reads a slide off the output, toward first, before the move it also is and before removing', () => {
    const after = G([[0, 0, 0, 0, 0], [0, 0, 0, 0, 0], [0, 0, 3, 8, 8], [0, 0, 0, 8, 8], [0, 0, 0, 0, 0]]);
    // Where the 3 was, the output shows the background: removing it is one reading too, but the
    // 3 now stands where the input had the background, which only its going there explains.
    expect(possibleOutcomes(crates[0]!, yard, after)).toEqual([
      { kind: 'slide', way: 'toward' },
      { kind: 'slide', way: 'right' },
      { kind: 'move', rows: 0, columns: 2 },
      { kind: 'remove' },
    ]);
    // Where another 3 already stood in the input, going there explains nothing: remove first.
    const twoCrates = G([[3, 0, 3]]);
    const gone = G([[0, 0, 3]]);
    expect(possibleOutcomes(objectsOf(twoCrates, 'by_colour')[0]!, twoCrates, gone)).toEqual([
      { kind: 'remove' },
      { kind: 'move', rows: 0, columns: 2 },
    ]);
  });

  it('never overlaps what it slides against nor leaves the grid (a law)', () => {
    fc.assert(
      fc.property(fc.array(fc.array(fc.constantFrom(0, 0, 0, 2, 7), { minLength: 5, maxLength: 5 }), { minLength: 1, maxLength: 5 }), fc.constantFrom('toward', 'up', 'down', 'left', 'right' as const), (rows, way) => {
        const g = G(rows);
        for (const o of objectsOf(g, 'by_colour')) {
          const offset = slideOffset(o, g, way, 0);
          if (!offset) continue;
          for (let r = 0; r < o.height; r++) {
            for (let c = 0; c < o.width; c++) {
              if (o.cells[r * o.width + c] === 255) continue;
              const row = o.top + r + offset[0];
              const column = o.left + c + offset[1];
              expect(row >= 0 && row < g.height && column >= 0 && column < g.width).toBe(true);
              // where it lands was the background or its own cell
              const inBox = row - o.top >= 0 && row - o.top < o.height && column - o.left >= 0 && column - o.left < o.width;
              const own = inBox && o.cells[(row - o.top) * o.width + column - o.left] !== 255;
              expect(own || g.cells[row * g.width + column] === 0).toBe(true);
            }
          }
        }
      }),
    );
  });
});
