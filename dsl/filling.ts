/** Filling primitives. */
import type { Primitive } from '../src/library/primitive.ts';

export const fillingPrimitives: Primitive[] = [];
