/**
 * fast-check generators for grids: small shapes (1..8 × 1..8 by default), colours 0–9 with
 * colour 0 drawn about half the time so that objects sit on a background.
 */
import fc from 'fast-check';
import { Grid } from '../../src/grid/grid.ts';

export interface GridShapeOptions {
  readonly minHeight?: number;
  readonly maxHeight?: number;
  readonly minWidth?: number;
  readonly maxWidth?: number;
}

/** A colour 0–9, 0 about half the time. */
export const arbitraryColour: fc.Arbitrary<number> = fc.oneof(
  { weight: 1, arbitrary: fc.constant(0) },
  { weight: 1, arbitrary: fc.integer({ min: 0, max: 9 }) },
);

/** A grid of exactly this shape. */
export function arbitraryGridOfShape(height: number, width: number): fc.Arbitrary<Grid> {
  return fc
    .array(arbitraryColour, { minLength: height * width, maxLength: height * width })
    .map((values) => new Grid(height, width, Uint8Array.from(values)));
}

/** A grid of any shape within the bounds. */
export function arbitraryGrid(options: GridShapeOptions = {}): fc.Arbitrary<Grid> {
  const { minHeight = 1, maxHeight = 8, minWidth = 1, maxWidth = 8 } = options;
  return fc
    .tuple(fc.integer({ min: minHeight, max: maxHeight }), fc.integer({ min: minWidth, max: maxWidth }))
    .chain(([h, w]) => arbitraryGridOfShape(h, w));
}

/** Two grids of the same shape. */
export function arbitraryGridPair(options: GridShapeOptions = {}): fc.Arbitrary<[Grid, Grid]> {
  const { minHeight = 1, maxHeight = 8, minWidth = 1, maxWidth = 8 } = options;
  return fc
    .tuple(fc.integer({ min: minHeight, max: maxHeight }), fc.integer({ min: minWidth, max: maxWidth }))
    .chain(([h, w]) => fc.tuple(arbitraryGridOfShape(h, w), arbitraryGridOfShape(h, w)));
}
