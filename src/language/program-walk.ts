/**
 * The one walk over a program as its description length counts it: the answer expression with
 * every named step written out where it is used (the search builds trees, so a step used twice
 * is visited, and paid for, twice). `programBits` sums over this walk and `primitiveUses`
 * counts the calls in it.
 */
import type { Expression, Program } from './ast.ts';

/**
 * Calls `visit` on every node of the written-out answer, parents before children. A variable
 * that names a step is not visited itself: the step's expression is visited in its place, so
 * the only variables visited are uses of the input grid.
 */
export function visitWrittenOut(program: Program, visit: (node: Expression) => void): void {
  const steps = new Map(program.steps.map((s) => [s.name, s.expression]));
  const walk = (e: Expression): void => {
    if (e.kind === 'variable') {
      const step = steps.get(e.name);
      if (step) return walk(step);
    }
    visit(e);
    if (e.kind === 'call') for (const a of e.arguments) walk(a);
  };
  walk(program.answer);
}

/** How many times each primitive is called in the written-out program, by name. */
export function primitiveUses(program: Program): Map<string, number> {
  const uses = new Map<string, number>();
  visitWrittenOut(program, (node) => {
    if (node.kind === 'call') uses.set(node.primitive, (uses.get(node.primitive) ?? 0) + 1);
  });
  return uses;
}
