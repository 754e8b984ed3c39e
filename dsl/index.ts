/** The primitive library: every record, gathered from the category files, and the library built from them. */
import { Library } from '../src/library/library.ts';
import type { Primitive } from '../src/library/primitive.ts';
import { colourPrimitives } from './colour.ts';
import { compositionPrimitives } from './composition.ts';
import { countingPrimitives } from './counting.ts';
import { croppingPrimitives } from './cropping.ts';
import { fillingPrimitives } from './filling.ts';
import { geometryPrimitives } from './geometry.ts';
import { objectPrimitives } from './objects.ts';
import { objectRulePrimitives } from './object-rules.ts';
import { learnedRulePrimitives } from './learned-rules.ts';
import { selectionPrimitives } from './selection.ts';
import { symmetryPrimitives } from './symmetry.ts';

export const PRIMITIVES: readonly Primitive[] = [
  ...objectPrimitives,
  ...selectionPrimitives,
  ...croppingPrimitives,
  ...colourPrimitives,
  ...symmetryPrimitives,
  ...geometryPrimitives,
  ...compositionPrimitives,
  ...objectRulePrimitives,
  ...fillingPrimitives,
  ...countingPrimitives,
  ...learnedRulePrimitives,
];

/** The library built from every record above. */
export const defaultLibrary = new Library(PRIMITIVES);
