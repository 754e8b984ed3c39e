/**
 * A bit budget on learning tables changes nothing but what is over it: the tables returned with
 * a budget are exactly those returned without, less the ones dearer than the budget; and the
 * lower bound that lets learning stop early never exceeds a table's bits.
 */
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { learnCellRules, learnObjectRules, type LearnedTable } from '../src/search/learned-tables.ts';
import { cellRuleBitsAtLeast, tableBits } from '../src/search/table-bits.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import { puzzleOf, type Puzzle } from '../src/tasks/task.ts';
import { Grid } from '../src/grid/grid.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';
import { cellRuleArbitrary } from './support/random-table.ts';

/** Background (0) cells with a non-background edge neighbour take colour 3: a local rule, invented for this test. */
function glow(g: Grid): Grid {
  const out = Uint8Array.from(g.cells);
  for (let r = 0; r < g.height; r++) {
    for (let c = 0; c < g.width; c++) {
      if (g.get(r, c) !== 0) continue;
      const near = [[r - 1, c], [r + 1, c], [r, c - 1], [r, c + 1]].some(([y, x]) => y! >= 0 && x! >= 0 && y! < g.height && x! < g.width && g.get(y!, x!) !== 0);
      if (near) out[r * g.width + c] = 3;
    }
  }
  return new Grid(g.height, g.width, out);
}

/** Non-background cells on odd rows take colour 8: another invented local rule. */
function stripe(g: Grid): Grid {
  const out = Uint8Array.from(g.cells);
  for (let i = 0; i < out.length; i++) if (out[i] !== 0 && Math.floor(i / g.width) % 2 === 1) out[i] = 8;
  return new Grid(g.height, g.width, out);
}

const demoDirectory = join(import.meta.dirname, '..', 'tasks-demo');
const demoPuzzles: Puzzle[] = readdirSync(demoDirectory)
  .filter((f) => f.endsWith('.json'))
  .sort()
  .map((f) => puzzleOf(readTaskFile(join(demoDirectory, f))))
  .filter((p) => p.train.every((pair) => pair.input.height === pair.output.height && pair.input.width === pair.output.width));

const ALL = 10_000;
const described = (tables: readonly LearnedTable[]) => tables.map((t) => `${t.bits} ${JSON.stringify(t.literal)}`);

describe('learning tables within a bit budget', () => {
  it('has same-shaped demo tasks to check', () => {
    expect(demoPuzzles.length).toBeGreaterThan(3);
  });

  it('returns the tables found without a budget that fit in it, in the same order (cell rules)', () => {
    for (const puzzle of demoPuzzles) {
      const unbounded = learnCellRules(puzzle, ALL);
      const budgets = new Set([0, 8, 16, 24, 32, 48, 64, 96, ...unbounded.map((t) => t.bits), ...unbounded.map((t) => t.bits - 1)]);
      for (const budget of budgets) {
        expect(described(learnCellRules(puzzle, ALL, budget)), `${puzzle.name} at ${budget} bits`).toEqual(described(unbounded.filter((t) => t.bits <= budget)));
      }
    }
  });

  it('returns the cell rules found without a budget that fit in it, on random grids under invented local rules', () => {
    let withTables = 0;
    fc.assert(
      fc.property(fc.array(arbitraryGrid({ maxHeight: 6, maxWidth: 6 }), { minLength: 3, maxLength: 3 }), fc.boolean(), fc.integer({ min: 0, max: 120 }), (grids, useGlow, budget) => {
        const rule = useGlow ? glow : stripe;
        const puzzle: Puzzle = { name: 'random', train: grids.slice(0, 2).map((input) => ({ input, output: rule(input) })), testInputs: [grids[2]!] };
        const unbounded = learnCellRules(puzzle, ALL);
        if (unbounded.length > 0) withTables++;
        expect(described(learnCellRules(puzzle, ALL, budget))).toEqual(described(unbounded.filter((t) => t.bits <= budget)));
      }),
      { numRuns: 60 },
    );
    // Not vacuous: many of the random tasks have tables to compare.
    expect(withTables).toBeGreaterThan(10);
  });

  it('returns the object rules found without a budget that fit in it', () => {
    for (const puzzle of demoPuzzles) {
      const unbounded = learnObjectRules(puzzle, ALL);
      for (const budget of new Set([0, 10, 20, 40, ...unbounded.map((t) => t.bits)])) {
        expect(described(learnObjectRules(puzzle, ALL, budget)), `${puzzle.name} at ${budget} bits`).toEqual(described(unbounded.filter((t) => t.bits <= budget)));
      }
    }
  });

  it('bounds a cell rule from below by its features and its number of entries', () => {
    fc.assert(
      fc.property(cellRuleArbitrary, (literal) => {
        if (literal.type !== 'CellRule') return;
        expect(cellRuleBitsAtLeast(literal.features, literal.entries.length)).toBeLessThanOrEqual(tableBits(literal)!);
      }),
    );
  });
});
