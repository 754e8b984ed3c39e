/** Cropping primitives. */
import type { Primitive } from '../src/library/primitive.ts';

export const croppingPrimitives: Primitive[] = [];
