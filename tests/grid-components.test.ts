/**
 * Connected components against a plain reference: labels found by a stack flood written here
 * from the definition (cells joined through edges, or edges and corners; of one colour or of any
 * colour but the background), then each label's box. The fast flood in src/grid/components.ts
 * must cut every grid the same way, list the objects in reading order of their first cell, and
 * give each object the size and hash an object made from its box grid has.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { components, type ComponentOptions } from '../src/grid/components.ts';
import { EMPTY, Grid } from '../src/grid/grid.ts';
import { GridObject } from '../src/grid/grid-object.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

interface ReferenceObject {
  top: number;
  left: number;
  height: number;
  width: number;
  cells: number[];
  size: number;
}

function referenceComponents(g: Grid, options: ComponentOptions): ReferenceObject[] {
  const label = new Array<number>(g.cells.length).fill(-1);
  const steps = options.diagonal ? [[-1, 0], [1, 0], [0, -1], [0, 1], [-1, -1], [-1, 1], [1, -1], [1, 1]] : [[-1, 0], [1, 0], [0, -1], [0, 1]];
  const found: ReferenceObject[] = [];
  for (let start = 0; start < g.cells.length; start++) {
    if (label[start] !== -1 || g.cells[start] === options.background) continue;
    const id = found.length;
    const members: number[] = [];
    const stack = [start];
    label[start] = id;
    while (stack.length > 0) {
      const i = stack.pop()!;
      members.push(i);
      const r = Math.floor(i / g.width);
      const c = i % g.width;
      for (const [dr, dc] of steps) {
        const nr = r + dr!;
        const nc = c + dc!;
        if (nr < 0 || nc < 0 || nr >= g.height || nc >= g.width) continue;
        const n = nr * g.width + nc;
        const v = g.cells[n]!;
        if (label[n] !== -1 || v === options.background) continue;
        if (!options.multicolour && v !== g.cells[start]) continue;
        label[n] = id;
        stack.push(n);
      }
    }
    const rows = members.map((i) => Math.floor(i / g.width));
    const columns = members.map((i) => i % g.width);
    const top = Math.min(...rows);
    const left = Math.min(...columns);
    const height = Math.max(...rows) - top + 1;
    const width = Math.max(...columns) - left + 1;
    const cells = new Array<number>(height * width).fill(EMPTY);
    for (const i of members) cells[(Math.floor(i / g.width) - top) * width + ((i % g.width) - left)] = g.cells[i]!;
    found.push({ top, left, height, width, cells, size: members.length });
  }
  return found;
}

describe('components', () => {
  it('cuts every grid as the reference does, whatever the options', () => {
    fc.assert(
      fc.property(arbitraryGrid({ maxHeight: 12, maxWidth: 12 }), fc.boolean(), fc.boolean(), fc.integer({ min: -1, max: 9 }), (g, diagonal, multicolour, background) => {
        const options = { diagonal, multicolour, background };
        const objects = components(g, options);
        const expected = referenceComponents(g, options);
        expect(objects.length).toBe(expected.length);
        objects.forEach((o, k) => {
          const e = expected[k]!;
          expect([o.top, o.left, o.height, o.width, o.size]).toEqual([e.top, e.left, e.height, e.width, e.size]);
          expect(Array.from(o.cells)).toEqual(e.cells);
          expect(o.hash).toBe(new GridObject(o.top, o.left, o.shape).hash);
        });
      }),
      { numRuns: 300 },
    );
  });

  // Each way a grid is cut is memoised on the grid: whatever order the ways are asked in, each
  // must still be the reference's cut. Sparse grids (mostly background, a few colours) and dense ones.
  const sparseGrid = fc
    .tuple(fc.integer({ min: 1, max: 10 }), fc.integer({ min: 1, max: 10 }))
    .chain(([h, w]) =>
      fc
        .array(fc.oneof({ weight: 6, arbitrary: fc.constant(0) }, { weight: 1, arbitrary: fc.integer({ min: 1, max: 3 }) }), { minLength: h * w, maxLength: h * w })
        .map((values) => new Grid(h, w, Uint8Array.from(values))),
    );
  const request = fc.record({ diagonal: fc.boolean(), multicolour: fc.boolean(), background: fc.integer({ min: -1, max: 3 }) });
  it('cuts a grid asked several ways in any order as the reference does each way', () => {
    fc.assert(
      fc.property(fc.oneof(sparseGrid, arbitraryGrid({ maxHeight: 10, maxWidth: 10 })), fc.array(request, { minLength: 1, maxLength: 8 }), (g, requests) => {
        for (const options of requests) {
          const objects = components(g, options);
          const expected = referenceComponents(g, options);
          expect(objects.map((o) => [o.top, o.left, o.height, o.width, o.size, ...o.cells])).toEqual(expected.map((e) => [e.top, e.left, e.height, e.width, e.size, ...e.cells]));
        }
      }),
      { numRuns: 400 },
    );
  });
});

describe('a cut the same as a simpler one', () => {
  const background = 0;
  const edges = { diagonal: false, multicolour: false, background };
  it('is the simpler cut itself when corners or mixed colours change nothing', () => {
    // two one-colour shapes apart, a corner step bridged through an edge
    const g = Grid.fromRows([
      [1, 1, 0, 0],
      [0, 1, 1, 0],
      [0, 0, 0, 2],
    ]);
    const simple = components(g, edges);
    expect(components(g, { ...edges, diagonal: true })).toBe(simple);
    expect(components(g, { ...edges, multicolour: true })).toBe(simple);
  });

  it('is cut afresh when two cells touch only at a corner, or two colours meet', () => {
    const corner = Grid.fromRows([
      [1, 0],
      [0, 1],
    ]);
    const simple = components(corner, edges);
    const diagonal = components(corner, { ...edges, diagonal: true });
    expect(diagonal).not.toBe(simple);
    expect([simple.length, diagonal.length]).toEqual([2, 1]);
    const meeting = Grid.fromRows([[1, 2, 0]]);
    const single = components(meeting, edges);
    const mixed = components(meeting, { ...edges, multicolour: true });
    expect(mixed).not.toBe(single);
    expect([single.length, mixed.length]).toEqual([2, 1]);
  });
});
