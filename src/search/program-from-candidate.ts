/**
 * Turns a found candidate into a readable program: every call used as an argument becomes a
 * named step (shared when it appears twice), named after its type (never the input's name);
 * sections stay inline, since a step holds a value, not a function.
 *
 * This runs once per solution, after the search. The tree is built in one pass, so there is
 * no nested update for immer's `produce` to make; the finished program is frozen with immer,
 * like every program tree, so a solution's program cannot drift from its printed text.
 */
import { freeze } from 'immer';
import type { Expression, Program, Step } from '../language/ast.ts';
import { printExpression } from '../language/printer.ts';
import { TYPE_WORDS } from '../language/canonical-names.ts';
import type { Candidate } from './value-store.ts';

const STEP_NAMES = TYPE_WORDS;

export function programFromCandidate(candidate: Candidate, inputName: string): Program {
  const steps: Step[] = [];
  const named = new Map<string, string>();
  const used = new Map<string, number>();

  const visit = (c: Candidate, asStep: boolean): Expression => {
    if (c.leaf) return c.leaf;
    const production = c.production!;
    const args = c.arguments.map((a) => visit(a, true));
    const e: Expression = {
      kind: 'call',
      primitive: production.primitive.name,
      arguments: production.section ? [{ kind: 'hole' }, ...args] : args,
    };
    if (!asStep || production.section) return e;
    const key = printExpression(e);
    const existing = named.get(key);
    if (existing) return { kind: 'variable', name: existing };
    const base = STEP_NAMES[c.type] ?? 'value';
    let n = used.get(base) ?? 0;
    let name: string;
    do {
      n++;
      name = n === 1 ? base : `${base}_${n}`;
    } while (name === inputName);
    used.set(base, n);
    named.set(key, name);
    steps.push({ comments: [], name, expression: e });
    return { kind: 'variable', name };
  };

  const answer = visit(candidate, false);
  return freeze({ comments: [], input: inputName, steps, answerComments: [], answer }, true);
}
