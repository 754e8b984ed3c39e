/** The primitive library: every record, gathered from the category files. */
import type { Primitive } from '../src/library/primitive.ts';
import { objectPrimitives } from './objects.ts';
import { symmetryPrimitives } from './symmetry.ts';

export const PRIMITIVES: readonly Primitive[] = [...objectPrimitives, ...symmetryPrimitives];
