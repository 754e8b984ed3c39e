/**
 * The grammar the search enumerates: one production per primitive, plus one section
 * production (first argument left open) for each primitive whose open argument and result
 * make a function type that some primitive takes.
 */
import type { Library } from '../library/library.ts';
import type { Primitive } from '../library/primitive.ts';
import { functionType, isBaseType, splitFunctionType, type Type } from '../language/types.ts';

export interface Production {
  readonly primitive: Primitive;
  /** True: the first parameter is left open and the result is a function. */
  readonly section: boolean;
  /** The argument types the search must supply. */
  readonly argumentTypes: readonly Type[];
  readonly result: Type;
  readonly bits: number;
}

export function buildProductions(library: Library): Production[] {
  const wanted = new Set<Type>();
  for (const p of library.primitives) for (const t of p.parameters) if (splitFunctionType(t)) wanted.add(t);
  const out: Production[] = [];
  for (const p of library.primitives) {
    out.push({ primitive: p, section: false, argumentTypes: p.parameters, result: p.result, bits: p.bits });
  }
  for (const p of library.primitives) {
    const open = p.parameters[0];
    if (open === undefined || !isBaseType(open) || !isBaseType(p.result)) continue;
    const type = functionType(open, p.result);
    if (!wanted.has(type)) continue;
    // A section's bound arguments may not themselves be functions.
    const rest = p.parameters.slice(1);
    if (rest.some((t) => splitFunctionType(t))) continue;
    out.push({ primitive: p, section: true, argumentTypes: rest, result: type, bits: p.bits });
  }
  return out;
}
