/**
 * Learned tables: cell rules and object rules read off invented harbour tasks reproduce their
 * demonstrations, fail cleanly on a key they lack, print and parse back exactly, cost what the
 * README's formula says (worked out by hand below), and are found by the solver.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { Grid } from '../src/grid/grid.ts';
import type { LiteralValue } from '../src/language/ast.ts';
import { FAILURE } from '../src/language/failure.ts';
import { checkProgram } from '../src/language/checker.ts';
import { runProgram } from '../src/language/interpreter.ts';
import { parseExpression, parseProgram } from '../src/language/parser.ts';
import { syntaxProblem } from './support/syntax-problem.ts';
import { printLiteral, printProgram } from '../src/language/printer.ts';
import { taskConstants } from '../src/search/constants.ts';
import { programBits } from '../src/search/description-length.ts';
import { applyTable, learnCellRules, learnObjectRules } from '../src/search/learned-tables.ts';
import { solvePuzzle } from '../src/search/solve.ts';
import { tableBits, writtenOutBits } from '../src/search/table-bits.ts';
import type { Puzzle } from '../src/tasks/task.ts';
import { cellRuleArbitrary, objectRuleArbitrary } from './support/random-table.ts';

const G = Grid.fromRows;

/**
 * Lanterns (5) on night water (4): water sharing an edge with a lantern glows (6). Invented.
 * The cheapest table: whether the cell is background (the water) and how many of its 4 edge
 * neighbours are lanterns; by hand, γ(2) + 1 + (5 + 4) = 13 for the header, three keys of
 * 1 + 3 bits, outputs keep 1, keep 1, #6 1 + 1 (one colour written, c = 1): 29 bits, against 33
 * for the same features after the cell's colour (below).
 */
const lanterns: Puzzle = {
  name: 'lantern-glow',
  train: [
    { input: G([[4, 4, 4, 4], [4, 5, 4, 4], [4, 4, 4, 4]]), output: G([[4, 6, 4, 4], [6, 5, 6, 4], [4, 6, 4, 4]]) },
    { input: G([[4, 4, 4, 4, 4], [4, 4, 4, 4, 4], [4, 4, 4, 5, 4]]), output: G([[4, 4, 4, 4, 4], [4, 4, 4, 6, 4], [4, 4, 6, 5, 6]]) },
  ],
  testInputs: [G([[5, 4, 4], [4, 4, 4]])],
};
const lanternRule = 'cell_rule[background, beside #5]{no 0 -> keep, yes 0 -> keep, yes 1 -> #6}';
const lanternRuleByColour = 'cell_rule[colour, beside #5]{#4 0 -> #4, #4 1 -> #6, #5 0 -> #5}';

/**
 * Water (4) right above a rock (1) foams (6) at high tide. Invented. The cheapest table: the
 * cell's colour and the colour below it.
 */
const tide: Puzzle = {
  name: 'tide-foam',
  train: [
    { input: G([[4, 4, 4], [4, 4, 4], [4, 1, 4]]), output: G([[4, 4, 4], [4, 6, 4], [4, 1, 4]]) },
    { input: G([[4, 4, 4, 4], [4, 1, 4, 4], [4, 1, 4, 1]]), output: G([[4, 6, 4, 4], [4, 1, 4, 6], [4, 1, 4, 1]]) },
  ],
  testInputs: [G([[4, 4, 1], [4, 1, 1]])],
};
const tideRule = 'cell_rule[colour, below]{#1 #1 -> #1, #1 edge -> #1, #4 #1 -> #6, #4 #4 -> #4, #4 edge -> #4}';

/**
 * At dusk the dinghies (one cell) leave, the two-cell boats light up (3) and the three-cell
 * boats stay, whatever their colour. Invented. The cheapest table: by each boat's size.
 */
const dusk: Puzzle = {
  name: 'dusk-boats',
  train: [
    {
      input: G([[0, 0, 0, 0, 0], [0, 1, 1, 0, 2], [0, 0, 0, 0, 0], [2, 2, 2, 0, 0]]),
      output: G([[0, 0, 0, 0, 0], [0, 3, 3, 0, 0], [0, 0, 0, 0, 0], [2, 2, 2, 0, 0]]),
    },
    { input: G([[7, 0, 0, 0], [0, 0, 7, 0], [0, 0, 7, 0], [1, 0, 7, 0]]), output: G([[0, 0, 0, 0], [0, 0, 7, 0], [0, 0, 7, 0], [0, 0, 7, 0]]) },
    { input: G([[0, 2, 0, 0], [0, 2, 0, 1], [0, 0, 0, 1], [6, 0, 0, 0]]), output: G([[0, 3, 0, 0], [0, 3, 0, 3], [0, 0, 0, 3], [0, 0, 0, 0]]) },
  ],
  testInputs: [G([[1, 1, 1, 0], [0, 0, 0, 0], [5, 0, 0, 6], [5, 0, 0, 0]])],
};
const duskRule = 'object_rule[by_colour, size]{1 -> remove, 2 -> #3, 3 -> keep}';

function programApplying(primitive: string, table: string): string {
  return `with harbour\nanswer ${primitive}(harbour, ${table})\n`;
}

function run(text: string, input: Grid): Grid | typeof FAILURE {
  return runProgram(parseProgram(text), input, defaultLibrary).output;
}

describe('a cell rule read off the demonstrations', () => {
  it('is the cheapest feature set that explains every cell', () => {
    expect(learnCellRules(lanterns).map((t) => printLiteral(t.literal))).toEqual([lanternRule]);
    expect(printLiteral(learnCellRules(tide)[0]!.literal)).toBe(tideRule);
  });

  it('reproduces every demonstration and gives the test output worked out by hand', () => {
    const text = programApplying('apply_cell_rule', lanternRule);
    for (const pair of lanterns.train) expect((run(text, pair.input) as Grid).equals(pair.output)).toBe(true);
    expect((run(text, lanterns.testInputs[0]!) as Grid).toRows()).toEqual([[5, 6, 4], [6, 4, 4]]);
  });

  it('fails cleanly on a grid holding a key it lacks', () => {
    // The middle water cell touches two lanterns: the table has no entry for (#4, 2).
    expect(run(programApplying('apply_cell_rule', lanternRule), G([[5, 4, 5]]))).toBe(FAILURE);
    // A rock with water below it: no entry for (#1, #4).
    expect(run(programApplying('apply_cell_rule', tideRule), G([[1], [4]]))).toBe(FAILURE);
  });

  it('is not offered when a test input holds a key the demonstrations never show', () => {
    const unseen: Puzzle = { ...lanterns, testInputs: [G([[5, 4, 5], [4, 4, 4]])] };
    const learned = learnCellRules(unseen);
    expect(learned.map((t) => printLiteral(t.literal))).not.toContain(lanternRule);
    for (const t of learned) expect(applyTable(t.literal, unseen.testInputs[0]!)).not.toBeNull();
  });

  it('starting with background, still applies where a test input brings a colour no demonstration shows', () => {
    // A rock (3) at the corner: the colour-first table has no key (#3, 0); the background-first
    // one reads it as (no, 0) and keeps it. By hand: [[5, 6, 4], [6, 4, 3]].
    const rock = G([[5, 4, 4], [4, 4, 3]]);
    expect(run(programApplying('apply_cell_rule', lanternRuleByColour), rock)).toBe(FAILURE);
    expect((run(programApplying('apply_cell_rule', lanternRule), rock) as Grid).toRows()).toEqual([[5, 6, 4], [6, 4, 3]]);
    const withRock: Puzzle = { ...lanterns, testInputs: [rock] };
    expect(learnCellRules(withRock).map((t) => printLiteral(t.literal))).toEqual([lanternRule]);
  });

  it('needs same-shaped demonstrations', () => {
    const reshaped: Puzzle = { ...lanterns, train: [lanterns.train[0]!, { input: G([[4, 5]]), output: G([[6]]) }] };
    expect(learnCellRules(reshaped)).toEqual([]);
  });
});

describe('an object rule read off the demonstrations', () => {
  it('matches each boat to what became of it and keys the outcome by size', () => {
    expect(learnObjectRules(dusk).map((t) => printLiteral(t.literal))).toEqual([duskRule]);
  });

  it('reproduces every demonstration and gives the test output worked out by hand', () => {
    const text = programApplying('apply_object_rule', duskRule);
    for (const pair of dusk.train) expect((run(text, pair.input) as Grid).equals(pair.output)).toBe(true);
    expect((run(text, dusk.testInputs[0]!) as Grid).toRows()).toEqual([[1, 1, 1, 0], [0, 0, 0, 0], [3, 0, 0, 0], [3, 0, 0, 0]]);
  });

  it('fails cleanly on a boat of a size it lacks', () => {
    expect(run(programApplying('apply_object_rule', duskRule), G([[0, 8, 8, 8, 8]]))).toBe(FAILURE);
  });

  it('keys the outcome by the side of the quay wall a boat lies on', () => {
    // Invented: boats moored above the quay wall (a whole row of 6) are lit (4); those below it
    // and the wall itself keep their colours. Colours, sizes, shapes and edges are mixed on both
    // sides, so only the side of the line tells them apart.
    const quay: Puzzle = {
      name: 'quay',
      train: [
        {
          input: G([[0, 1, 0, 0, 0], [0, 0, 0, 2, 0], [6, 6, 6, 6, 6], [0, 2, 0, 0, 1], [0, 0, 0, 0, 0]]),
          output: G([[0, 4, 0, 0, 0], [0, 0, 0, 4, 0], [6, 6, 6, 6, 6], [0, 2, 0, 0, 1], [0, 0, 0, 0, 0]]),
        },
        {
          input: G([[0, 0, 0, 0, 0, 0], [0, 3, 3, 0, 0, 1], [0, 0, 0, 0, 0, 0], [0, 0, 0, 0, 0, 0], [6, 6, 6, 6, 6, 6], [1, 1, 0, 0, 3, 0]]),
          output: G([[0, 0, 0, 0, 0, 0], [0, 4, 4, 0, 0, 4], [0, 0, 0, 0, 0, 0], [0, 0, 0, 0, 0, 0], [6, 6, 6, 6, 6, 6], [1, 1, 0, 0, 3, 0]]),
        },
      ],
      testInputs: [G([[0, 2, 2, 0], [6, 6, 6, 6], [0, 0, 1, 0]])],
    };
    const learned = learnObjectRules(quay).map((t) => printLiteral(t.literal));
    expect(learned.some((text) => /^object_rule\[by_colour(_diagonal)?, above_line\]/.test(text))).toBe(true);
    // Every rule learned keys on a side of the wall: no other property tells the boats apart.
    for (const text of learned) expect(text).toMatch(/(above|below)_line/);
    const rule = learned.find((text) => text.includes('above_line'))!;
    expect((run(programApplying('apply_object_rule', rule), quay.testInputs[0]!) as Grid).toRows()).toEqual([[0, 4, 4, 0], [6, 6, 6, 6], [0, 0, 1, 0]]);
  });

  it('mirrors every weather vane, the ones their mirror leaves alike included', () => {
    // Invented: on a roof, every vane (6) turns over left to right; chimneys (4) stay. The second
    // roof's straight vane is its own mirror image: it shares the rule all the same.
    const roofs: Puzzle = {
      name: 'roofs',
      train: [
        {
          input: G([[6, 6, 0, 0], [6, 0, 0, 4], [6, 0, 0, 4]]),
          output: G([[6, 6, 0, 0], [0, 6, 0, 4], [0, 6, 0, 4]]),
        },
        {
          input: G([[0, 6, 0, 0, 0], [0, 6, 0, 6, 6], [0, 6, 0, 0, 6], [4, 0, 0, 0, 0]]),
          output: G([[0, 6, 0, 0, 0], [0, 6, 0, 6, 6], [0, 6, 0, 6, 0], [4, 0, 0, 0, 0]]),
        },
      ],
      testInputs: [G([[0, 0, 0, 4], [6, 6, 6, 0], [0, 0, 6, 0]])],
    };
    // Every object touches the roof's edge, and the chimneys and the straight vane are their own
    // mirror images: one entry mirroring them all is the cheapest rule (an object its mirror leaves
    // alike is offered the mirror after keep, so it can share an entry with the vanes that turn).
    const rule = printLiteral(learnObjectRules(roofs)[0]!.literal);
    expect(rule).toBe('object_rule[by_colour, touches_edge]{yes -> mirror left_right}');
    // By hand: the vane's box is rows 1–2, columns 0–2; turned over, its lone cell goes left.
    expect((run(programApplying('apply_object_rule', rule), roofs.testInputs[0]!) as Grid).toRows()).toEqual([[0, 0, 0, 4], [6, 6, 6, 0], [6, 0, 0, 0]]);
  });

  it('keys on two properties when no one property tells the boats apart', () => {
    // Invented: the two-cell boat moored nearest the top of the harbour is lit (4). Single cells
    // lie as high, and other two-cell boats lower, so neither the height nor the size alone (nor
    // colour, edge or anything else) says which boat is lit.
    const mooring: Puzzle = {
      name: 'mooring',
      train: [
        {
          input: G([[1, 1, 0, 2, 0], [0, 0, 0, 0, 0], [0, 3, 3, 0, 0], [0, 0, 0, 0, 0], [2, 0, 0, 1, 1]]),
          output: G([[4, 4, 0, 2, 0], [0, 0, 0, 0, 0], [0, 3, 3, 0, 0], [0, 0, 0, 0, 0], [2, 0, 0, 1, 1]]),
        },
        {
          input: G([[0, 0, 0, 0, 0, 0], [0, 3, 0, 2, 2, 0], [0, 0, 0, 0, 0, 0], [1, 1, 0, 0, 0, 3]]),
          output: G([[0, 0, 0, 0, 0, 0], [0, 3, 0, 4, 4, 0], [0, 0, 0, 0, 0, 0], [1, 1, 0, 0, 0, 3]]),
        },
      ],
      testInputs: [G([[2, 2, 0, 3], [0, 0, 0, 0], [1, 0, 3, 3]])],
    };
    const learned = learnObjectRules(mooring);
    expect(learned.length).toBeGreaterThan(0);
    for (const t of learned) {
      const text = printLiteral(t.literal);
      expect(text).toMatch(/^object_rule\[\w+, \w+, \w+\]/);
      expect(text).toContain('topmost');
      for (const pair of mooring.train) expect((run(programApplying('apply_object_rule', text), pair.input) as Grid).equals(pair.output)).toBe(true);
      // By hand: the top two-cell boat (2 2) is lit; the single 3 beside it and the lower boats keep.
      expect((run(programApplying('apply_object_rule', text), mooring.testInputs[0]!) as Grid).toRows()).toEqual([[4, 4, 0, 3], [0, 0, 0, 0], [1, 0, 3, 3]]);
      // It prints and parses back, and costs what the formula says for the text it prints.
      const parsed = parseExpression(text);
      expect(parsed.kind === 'literal' && printLiteral(parsed.literal)).toBe(text);
      expect(parsed.kind === 'literal' && tableBits(parsed.literal)).toBe(t.bits);
    }
    // Asked for single properties only (as for the grids the search makes), it finds none here.
    expect(learnObjectRules(mooring, 2, Infinity, false)).toEqual([]);
  });

  it('learns moves: boats of colour 1 sail one row up, boats of colour 2 stay moored', () => {
    const sailing: Puzzle = {
      name: 'sailing',
      train: [
        { input: G([[0, 0, 0], [1, 0, 2], [1, 0, 2]]), output: G([[1, 0, 0], [1, 0, 2], [0, 0, 2]]) },
        { input: G([[0, 0, 0, 0], [0, 2, 0, 0], [0, 0, 1, 1]]), output: G([[0, 0, 0, 0], [0, 2, 1, 1], [0, 0, 0, 0]]) },
      ],
      testInputs: [G([[2, 0], [0, 1]])],
    };
    const learned = learnObjectRules(sailing).map((t) => printLiteral(t.literal));
    expect(learned[0]).toBe('object_rule[by_colour, colour]{#1 -> move (-1, 0), #2 -> keep}');
  });
});

describe('table text', () => {
  it('prints and parses back exactly, hand-written tables', () => {
    for (const text of [
      lanternRule,
      tideRule,
      duskRule,
      'cell_rule[colour, around #2, row_holds #7, row_parity, column_parity, above_left]{#0 8 no even odd edge -> #1, #9 0 yes odd even #3 -> #9}',
      'cell_rule[colour]{}',
      "object_rule[multicolour_diagonal, shape]{x.x/xxx -> move (-2, 3), xx -> #4, x -> remove}",
      'object_rule[by_colour_diagonal, touches_edge]{no -> keep, yes -> #0}',
      'object_rule[multicolour, size_rank]{1 -> #2, 2 -> keep}',
      'object_rule[by_colour, topmost, shape]{no xx -> keep, yes x/x -> move (0, -1), yes xx -> #4}',
    ]) {
      const e = parseExpression(text);
      expect(e.kind).toBe('literal');
      if (e.kind === 'literal') expect(printLiteral(e.literal)).toBe(text);
    }
  });

  const roundTrip = (literal: LiteralValue) => {
    const text = printLiteral(literal);
    expect(parseExpression(text)).toEqual({ kind: 'literal', literal });
  };

  it('prints and parses back exactly, random cell rules', () => {
    fc.assert(fc.property(cellRuleArbitrary, roundTrip), { numRuns: 300 });
  });

  it('prints and parses back exactly, random object rules', () => {
    fc.assert(fc.property(objectRuleArbitrary, roundTrip), { numRuns: 300 });
  });

  it('round-trips a whole program holding a table', () => {
    const text = `-- The lanterns light the water around them.\nwith harbour\nglow = apply_cell_rule(harbour, ${lanternRule})\nanswer apply_object_rule(glow, ${duskRule})\n`;
    expect(printProgram(parseProgram(text))).toBe(text);
  });

  it('names the place and what was expected when a table is malformed', () => {
    // Columns count from 1: in 'cell_rule[colour]{#1 -> #2, #1 -> #3}' the second '#1' is the 29th character.
    const problem = syntaxProblem;
    expect(problem('cell_rule[colour]{#1 -> #2, #1 -> #3}')).toBe('29: a key not already in the table');
    expect(problem('cell_rule[above]{}')).toBe("11: 'colour' or 'background', the first feature of every cell rule");
    expect(problem('cell_rule[colour, around #1]{#0 9 -> #1}')).toBe("33: a count from 0 to 8, or 'any'");
    expect(problem('cell_rule[colour, left]{#0 #1 -> #1, #0 wall -> #1}')).toBe("41: a colour such as '#3', 'edge' or 'any'");
    expect(problem('cell_rule[colour, around]{}')).toBe("25: a colour such as '#3'");
    expect(problem('object_rule[by_colour, weight]{}')).toMatch(/^24: an object property/);
    expect(problem('object_rule[by_colour, size, size]{}')).toMatch(/^30: a second property other than the first/);
    expect(problem('object_rule[by_colour, size, hollow]{1 -> keep}')).toMatch(/^40: 'yes' or 'no'/);
    expect(problem('object_rule[by_colour, shape]{xx/x -> keep}')).toMatch(/^31: a shape/);
    expect(problem('object_rule[by_colour, size]{1 -> sink}')).toMatch(/^35: 'keep', 'remove'/);
  });
});

describe('the bits of a table', () => {
  it('follows the README formula, worked out by hand', () => {
    const bitsOf = (text: string) => {
      const e = parseExpression(text);
      return e.kind === 'literal' ? tableBits(e.literal) : undefined;
    };
    // palette: colours 1, 2 (k = 2, c = 1): 1 + 2 entries × 2c = 5
    expect(bitsOf('{#1 -> #2, #2 -> #1}')).toBe(5);
    // palette: colours 0, 2, 3, 4, 6 (k = 5, c = 3): 1 + 4 × 6 = 25
    expect(bitsOf('{#2 -> #4, #3 -> #6, #4 -> #0, #6 -> #0}')).toBe(25);
    // lanterns by colour: γ(2) = 3, + 1 (colour first), + beside #5 (5 + 4) = 13; colours 4, 5, 6
    // (c = 2); each key 2 + 3; values: keep 1, change 1 + 2, keep 1: 13 + 6 + 8 + 6 = 33
    expect(bitsOf(lanternRuleByColour)).toBe(33);
    // lanterns by background: worked out beside the task above
    expect(bitsOf(lanternRule)).toBe(29);
    // tide: γ(2) = 3, + 1, + below 5 = 9; colours 1, 4, 6 (c = 2); neighbour ⌈log₂ 4⌉ = 2; five
    // keys of 4 bits; four keeps of 1 bit, one change of 3: 9 + 20 + 4 + 3 = 36
    expect(bitsOf(tideRule)).toBe(36);
    // background first: γ(2) = 3, + 1, + sees_left 5 = 9; it writes colour 2 only (k = 1, c = 1);
    // neighbour values ⌈log₂ 2⌉ = 1; keys yes #2 (1 + 1), yes edge (1 + 1), no edge (1 + 1);
    // outputs #2 (1 + 1), keep 1, keep 1: 9 + 6 + 4 = 19
    expect(bitsOf('cell_rule[background, sees_left]{yes #2 -> #2, yes edge -> keep, no edge -> keep}')).toBe(19);
    // dusk: 2 + 1 (one property) + 5 (30 properties: ⌈log₂ 30⌉); size 1: γ(2) + 2 = 5; size 2:
    // γ(3) + 2 + c (one colour, c = 1) = 6; size 3: γ(4) + 2 = 7: 8 + 18 = 26
    expect(bitsOf(duskRule)).toBe(26);
    // a move: 4 for the kind; zigzag(-1) = 1, γ(2) = 3; zigzag(0) = 0, γ(1) = 1: 2 + 1 + 5 + (1 + 4 + 3 + 1) = 17
    expect(bitsOf('object_rule[by_colour, touches_edge]{yes -> move (-1, 0)}')).toBe(2 + 1 + 5 + 1 + 4 + 3 + 1);
    // slides: 4 for the kind, then toward 1 bit, a way of the four 3: 8 + (1 + 4 + 1) + (1 + 4 + 3) = 22
    expect(bitsOf('object_rule[by_colour, touches_edge]{no -> slide up, yes -> slide toward}')).toBe(2 + 1 + 5 + (1 + 4 + 1) + (1 + 4 + 3));
    // a mirror: 4 for the kind and 1 for the way; a fill: 4 and c for its colour (the only one
    // written, k = 1, so c = 1): 8 + (1 + 4 + 1) + (1 + 4 + 1) = 20
    expect(bitsOf('object_rule[by_colour, hollow]{no -> mirror left_right, yes -> fill #2}')).toBe(2 + 1 + 5 + (1 + 4 + 1) + (1 + 4 + 1));
    // two properties: 2 + 1 + 5 + 5; keys yes 1 and γ(3) = 3, then no 1 and γ(2) = 3; outcomes
    // #4 (2 + c, one colour: c = 1) and keep 2: 13 + (1 + 3 + 3) + (1 + 3 + 2) = 26
    expect(bitsOf('object_rule[by_colour, topmost, size]{no 1 -> keep, yes 2 -> #4}')).toBe(26);
  });

  it('grows with every entry, so a large table never beats a short program', () => {
    fc.assert(
      fc.property(fc.oneof(cellRuleArbitrary, objectRuleArbitrary), (literal) => {
        if (literal.type !== 'CellRule' && literal.type !== 'ObjectRule') return;
        if (literal.entries.length === 0) return;
        const fewer = { ...literal, entries: literal.entries.slice(0, -1) } as LiteralValue;
        expect(tableBits(literal)!).toBeGreaterThan(tableBits(fewer)!);
      }),
    );
    // forty entries of colour and parity: at least 40 × (1 + 1 + 1) bits, beyond the search's 60
    const entries = Array.from({ length: 40 }, (_, i) => ({ key: [i % 10, Math.floor(i / 10) % 2], colour: i % 10 }));
    expect(tableBits({ type: 'CellRule', features: [{ name: 'colour' }, { name: 'row_parity' }], entries })!).toBeGreaterThan(120);
  });

  it('is what programBits charges for a table program read from text, as the solver charged it', () => {
    const text = programApplying('apply_cell_rule', lanternRule);
    // apply_cell_rule 4 + the input 1 + the table 29
    expect(programBits(parseProgram(text), defaultLibrary, taskConstants(lanterns))).toBe(34);
    expect(programBits(parseProgram(text), defaultLibrary, [])).toBe(34);
  });
});

describe('the solver with learned tables', () => {
  it('finds the object rule program for the dusk boats within a candidate cap', () => {
    const result = solvePuzzle(dusk, { maxCandidates: 30_000, timeLimitSeconds: 600 });
    const best = result.solutions[0]!;
    expect(best.text).toBe(programApplying('apply_object_rule', duskRule).replace(/harbour/g, 'input'));
    // apply_object_rule 4 + input 1 + table 26
    expect(best.bits).toBe(31);
    expect(programBits(best.program, defaultLibrary, taskConstants(dusk))).toBe(best.bits);
    expect(best.testOutputs[0]!.toRows()).toEqual([[1, 1, 1, 0], [0, 0, 0, 0], [3, 0, 0, 0], [3, 0, 0, 0]]);
  });

  // Intermediate tables off: these two are about tables applied straight to the input. (With them
  // on, surround(input, #6) followed by a 22-bit table keyed on column parity fits the two
  // demonstrations in 34 bits, 7 fewer than the rule below, and misses the test: the honest
  // price of a cheap table on a task with only two small demonstrations.) Goals are off too: a
  // layer goal meets overlay(recolour_all(translate(input, (-1, 0)), #6), input, #4) within the
  // cap, a searched program that also fits, not a table.
  it('finds the cell rule program for the tide within a candidate cap', () => {
    const result = solvePuzzle(tide, { maxCandidates: 30_000, timeLimitSeconds: 600, intermediateGrids: 0, goalBits: 0 });
    const best = result.solutions[0]!;
    expect(best.text).toBe(`with input\nanswer apply_cell_rule(input, ${tideRule})\n`);
    expect(best.bits).toBe(4 + 1 + 36);
    expect(best.testOutputs[0]!.toRows()).toEqual([[4, 6, 1], [4, 1, 1]]);
  });

  it('offers a table program dearer than the bit limit only because it compresses the outputs', () => {
    // The tide's outputs written out: (γ(3) + γ(3) + 9 × 2) + (γ(3) + γ(4) + 12 × 2) = 24 + 32 = 56
    // bits (three colours, c = 2), more than the 41 of the table program.
    expect(writtenOutBits(tide.train.map((p) => p.output))).toBe(56);
    const result = solvePuzzle(tide, { maxCandidates: 30_000, timeLimitSeconds: 600, maxBits: 38, intermediateGrids: 0 });
    expect(result.solutions.filter((s) => !s.text.includes('cell_rule')).every((s) => s.bits <= 38)).toBe(true);
    expect(result.solutions.some((s) => s.text.includes(tideRule) && s.bits === 41)).toBe(true);
    // (A table that does not compress the outputs stays out above the limit: tests/grid-rule-table.test.ts.)
  });
});

describe("the README's table examples", () => {
  const readme = readFileSync(new URL('../README.md', import.meta.url), 'utf8');
  const blocks = [...readme.matchAll(/```pithy\n([\s\S]*?)```/g)].map((m) => m[1]!).filter((b) => /apply_(cell|object)_rule\(harbour,/.test(b));

  it('are the lantern and dusk-boat programs, and reproduce those tasks', () => {
    expect(blocks.length).toBe(2);
    const cases: [string, Puzzle][] = [
      [lanternRule, lanterns],
      [duskRule, dusk],
    ];
    cases.forEach(([rule, puzzle], i) => {
      const program = parseProgram(blocks[i]!, 'README.md');
      checkProgram(program, defaultLibrary);
      expect(printProgram(program)).toBe(blocks[i]);
      expect(blocks[i]).toContain(rule);
      for (const pair of puzzle.train) expect((runProgram(program, pair.input, defaultLibrary).output as Grid).equals(pair.output)).toBe(true);
    });
  });

  it('state the bits the formula gives', () => {
    const bitsOf = (text: string) => {
      const e = parseExpression(text);
      return e.kind === 'literal' ? tableBits(e.literal) : undefined;
    };
    expect(readme).toContain(`the lantern rule above costs ${bitsOf(lanternRule)} bits, the dusk-boat\n  rule ${bitsOf(duskRule)}`);
  });
});
