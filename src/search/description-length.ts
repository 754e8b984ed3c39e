/**
 * The description length of a program in bits, as the search measures it:
 *
 *   bits(program) = Σ over primitive uses of the primitive's prior bits
 *                 + Σ over constants of the constant's bits in this task's constant table
 *                 + Σ over tables (palettes, cell rules, object rules) of the table's bits
 *                 + 1 bit per use of the input grid
 *
 * counted over the program with every step written out where it is used (the search builds
 * trees, so a step used twice is paid for twice). A constant the task's table does not offer
 * costs what a plain encoding of it would (see `fallbackBits`), which is never cheaper. A
 * table's bits come from the literal alone, entry by entry (table-bits.ts), so a table read
 * from program text costs what the search charged for it.
 */
import type { Expression, LiteralValue, Program } from '../language/ast.ts';
import type { Library } from '../library/library.ts';
import { printLiteral } from '../language/printer.ts';
import { visitWrittenOut } from '../language/program-walk.ts';
import type { Constant } from './constants.ts';
import { tableBits } from './table-bits.ts';

/** Bits for a constant the task's table does not list. */
export function fallbackBits(l: LiteralValue): number {
  switch (l.type) {
    case 'Colour':
      return 4;
    case 'Bool':
      return 2;
    case 'Int':
      return 4 + 2 * Math.ceil(Math.log2(Math.abs(l.value) + 2));
    case 'Point':
      return 6 + 2 * Math.ceil(Math.log2(Math.abs(l.row) + 2)) + 2 * Math.ceil(Math.log2(Math.abs(l.column) + 2));
    case 'Palette':
    case 'CellRule':
    case 'ObjectRule':
    case 'GridRule':
      return tableBits(l)!;
  }
}

export function programBits(program: Program, library: Library, constants: readonly Constant[]): number {
  const table = new Map<string, number>();
  for (const c of constants) {
    const key = printLiteral(c.literal);
    table.set(key, Math.min(table.get(key) ?? Infinity, c.bits));
  }
  let bits = 0;
  visitWrittenOut(program, (e: Expression) => {
    switch (e.kind) {
      case 'hole':
        return;
      case 'literal':
        bits += tableBits(e.literal) ?? table.get(printLiteral(e.literal)) ?? fallbackBits(e.literal);
        return;
      case 'variable':
        bits += 1;
        return;
      case 'call': {
        const p = library.get(e.primitive);
        if (!p) throw new Error(`unknown primitive '${e.primitive}'`);
        bits += p.bits;
        return;
      }
    }
  });
  return bits;
}
