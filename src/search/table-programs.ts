/**
 * Programs that apply a learned table straight to the input grid, such as
 * `answer apply_cell_rule(input, cell_rule[...]{...})`. A table costs its entries, so these
 * programs are often dearer than the cost levels the enumeration reaches in its time; since a
 * table read off the demonstrations reproduces them by construction, the solver checks each such
 * program directly and ranks it with the enumeration's solutions by bits, so the shortest total
 * still wins.
 */
import type { Grid } from '../grid/grid.ts';
import type { Program } from '../language/ast.ts';
import { FAILURE } from '../language/failure.ts';
import { literalValue } from '../language/interpreter.ts';
import { applyOperation } from '../language/operation.ts';
import type { Library } from '../library/library.ts';
import type { Constant } from './constants.ts';
import { writtenOutBits } from './table-bits.ts';

export interface TableProgram {
  readonly program: Program;
  readonly bits: number;
  /** The program's output on every input: demonstrations first, then test inputs. */
  readonly values: readonly Grid[];
}

const TABLE_TYPES = new Set(['Palette', 'CellRule', 'ObjectRule', 'GridRule']);

/**
 * For every table constant and every primitive `(Grid, table) -> Grid`, the program applying the
 * table to the input, when it reproduces every demonstration, runs on every test input and costs
 * (primitive bits + 1 for the input + the table's bits) at most `maxBits` or less than the
 * demonstration outputs written out cell by cell. The second bound lets a long table in when it
 * still compresses the outputs: `maxBits` bounds how far the enumeration searches, and a table
 * costs bits but no search. In the fixed order of the constants and the library.
 */
export function tablePrograms(
  constants: readonly Constant[],
  library: Library,
  inputs: readonly Grid[],
  outputs: readonly Grid[],
  inputName: string,
  maxBits: number,
): TableProgram[] {
  const found: TableProgram[] = [];
  const bound = Math.max(maxBits, writtenOutBits(outputs) - 1);
  for (const constant of constants) {
    const type = constant.literal.type;
    if (!TABLE_TYPES.has(type)) continue;
    const table = literalValue(constant.literal);
    for (const p of library.primitives) {
      if (p.result !== 'Grid' || p.parameters.length !== 2 || p.parameters[0] !== 'Grid' || p.parameters[1] !== type) continue;
      const bits = p.bits + 1 + constant.bits;
      if (bits > bound) continue;
      const values: Grid[] = [];
      for (const input of inputs) {
        const v = applyOperation(p, [input, table]);
        if (v === FAILURE) break;
        values.push(v as Grid);
      }
      if (values.length !== inputs.length || outputs.some((o, i) => !o.equals(values[i]!))) continue;
      const program: Program = {
        comments: [],
        input: inputName,
        steps: [],
        answerComments: [],
        answer: { kind: 'call', primitive: p.name, arguments: [{ kind: 'variable', name: inputName }, { kind: 'literal', literal: constant.literal }] },
      };
      found.push({ program, bits, values });
    }
  }
  return found;
}
