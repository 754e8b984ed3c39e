/** Selection primitives. */
import type { Primitive } from '../src/library/primitive.ts';

export const selectionPrimitives: Primitive[] = [];
