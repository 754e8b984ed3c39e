/**
 * Cell-wise masks of two same-sized grids: a cell is "filled" when it is not 0, and a rule
 * says which pairs of filled and empty cells give the colour.
 */
import { Grid, newCells } from './grid.ts';

/** Which pairs (first filled, second filled) give the colour, as bits: both, first only, second only, neither. */
export const MASK_RULES = {
  both: 0b1000,
  either: 0b1110,
  exactlyOne: 0b0110,
  neither: 0b0001,
} as const;

/** The colour where the rule holds and 0 elsewhere; null unless the sizes match. */
export function mask(a: Grid, b: Grid, colour: number, rule: number): Grid | null {
  if (a.height !== b.height || a.width !== b.width) return null;
  const out = newCells(a.height * a.width);
  const x = a.data;
  const y = b.data;
  const xFrom = a.offset;
  const yFrom = b.offset;
  for (let i = 0; i < out.length; i++) {
    const first = x[xFrom + i] !== 0;
    const second = y[yFrom + i] !== 0;
    const bit = first ? (second ? 0b1000 : 0b0100) : second ? 0b0010 : 0b0001;
    if (rule & bit) out[i] = colour;
  }
  return new Grid(a.height, a.width, out);
}
