/**
 * Constants a task makes plausible, each with its cost in bits. The search starts from these
 * and the input grid; a constant's cost is what writing it into a program costs.
 */
import type { LiteralValue } from '../language/ast.ts';
import { colourCounts } from '../grid/components.ts';
import type { Grid } from '../grid/grid.ts';
import type { Puzzle } from '../tasks/task.ts';
import { learnedTables } from './learned-tables.ts';
import { tableBits } from './table-bits.ts';

export interface Constant {
  readonly literal: LiteralValue;
  readonly bits: number;
}

const log2Ceil = (n: number): number => Math.max(1, Math.ceil(Math.log2(Math.max(2, n))));

function coloursOf(grids: readonly Grid[]): Set<number> {
  const seen = new Set<number>();
  for (const g of grids) {
    const counts = colourCounts(g);
    for (let c = 0; c < 10; c++) if (counts[c]! > 0) seen.add(c);
  }
  return seen;
}

/**
 * The colour map seen in the demonstrations, when every same-shaped pair recolours cell by cell
 * consistently (each input colour always becomes one output colour) and at least one colour
 * changes.
 */
export function demonstratedPalette(puzzle: Puzzle): [number, number][] | undefined {
  const target = new Int8Array(10).fill(-1);
  let sameShape = 0;
  for (const { input, output } of puzzle.train) {
    if (input.height !== output.height || input.width !== output.width) continue;
    sameShape++;
    const inputCells = input.cells;
    const outputCells = output.cells;
    for (let i = 0; i < inputCells.length; i++) {
      const from = inputCells[i]!;
      const to = outputCells[i]!;
      if (target[from] === -1) target[from] = to;
      else if (target[from] !== to) return undefined;
    }
  }
  if (sameShape === 0) return undefined;
  const pairs: [number, number][] = [];
  for (let c = 0; c < 10; c++) if (target[c]! >= 0 && target[c] !== c) pairs.push([c, target[c]!]);
  return pairs.length > 0 ? pairs : undefined;
}

/** Every constant the search may use for this puzzle, cheapest first, no duplicates. */
export function taskConstants(puzzle: Puzzle): Constant[] {
  const out: Constant[] = [];
  const inputs = [...puzzle.train.map((p) => p.input), ...puzzle.testInputs];
  const outputs = puzzle.train.map((p) => p.output);

  // Colours: those the task uses; colours new in the outputs are the likeliest to be written.
  const inInputs = coloursOf(inputs);
  const inOutputs = coloursOf(outputs);
  const pool = new Set([...inInputs, ...inOutputs]);
  const colourBits = log2Ceil(pool.size);
  for (const c of [...pool].sort((a, b) => a - b)) {
    const fresh = inOutputs.has(c) && !inInputs.has(c);
    out.push({ literal: { type: 'Colour', value: c }, bits: fresh ? Math.max(1, colourBits - 1) : colourBits });
  }

  // Whole numbers: small ones, and the size ratios the demonstrations show.
  const ints = new Map<number, number>();
  const addInt = (n: number, bits: number) => {
    if (!Number.isInteger(n) || n < 0 || n > 30) return;
    ints.set(n, Math.min(ints.get(n) ?? Infinity, bits));
  };
  for (let n = 0; n <= 3; n++) addInt(n, 3);
  const ratios = (f: (p: { input: Grid; output: Grid }) => number) => {
    const values = puzzle.train.map(f);
    return values.every((v) => v === values[0]) ? values[0] : undefined;
  };
  const heightRatio = ratios((p) => p.output.height / p.input.height);
  const widthRatio = ratios((p) => p.output.width / p.input.width);
  const downHeight = ratios((p) => p.input.height / p.output.height);
  const downWidth = ratios((p) => p.input.width / p.output.width);
  for (const r of [heightRatio, widthRatio, downHeight, downWidth]) if (r !== undefined && r > 1) addInt(r, 3);
  const outHeight = ratios((p) => p.output.height);
  const outWidth = ratios((p) => p.output.width);
  if (outHeight !== undefined) addInt(outHeight, 4);
  if (outWidth !== undefined) addInt(outWidth, 4);
  for (const [value, bits] of [...ints].sort((a, b) => a[0] - b[0])) out.push({ literal: { type: 'Int', value }, bits });

  // Points: unit offsets, and a fixed output size for cropping a region.
  const points: [number, number, number][] = [
    [0, 1, 4], [1, 0, 4], [0, -1, 4], [-1, 0, 4], [1, 1, 5], [0, 0, 5],
  ];
  if (outHeight !== undefined && outWidth !== undefined) points.push([outHeight, outWidth, 4]);
  const seenPoints = new Set<string>();
  for (const [row, column, bits] of points) {
    const key = `${row},${column}`;
    if (seenPoints.has(key)) continue;
    seenPoints.add(key);
    out.push({ literal: { type: 'Point', row, column }, bits });
  }

  out.push({ literal: { type: 'Bool', value: true }, bits: 2 }, { literal: { type: 'Bool', value: false }, bits: 2 });

  // Tables read off the demonstrations, each paid for entry by entry (table-bits.ts): the colour
  // map (the simplest table), cell rules and object rules.
  const palette = demonstratedPalette(puzzle);
  if (palette) {
    const literal: LiteralValue = { type: 'Palette', pairs: palette };
    out.push({ literal, bits: tableBits(literal)! });
  }
  for (const table of learnedTables(puzzle)) out.push(table);

  return out.sort((a, b) => a.bits - b.bits);
}
