/** Geometry primitives. */
import type { Primitive } from '../src/library/primitive.ts';

export const geometryPrimitives: Primitive[] = [];
