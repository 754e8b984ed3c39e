/**
 * A program's canonical form: the input grid is called `input`, each step is named after the
 * type of its value (`objects`, `number`, a second grid `grid_2`, ...) counted in step order,
 * and comments are dropped. Two programs that differ only in their names and comments have
 * the same canonical form. The token sequences of src/tokens carry no names, so detokenizing
 * gives this form; the search names its steps by the same rule.
 */
import type { Expression, Program, Step } from './ast.ts';
import { checkProgram, type ProgramTypeError } from './checker.ts';
import type { OperationLookup } from './operation.ts';
import type { Type } from './types.ts';

export const CANONICAL_INPUT_NAME = 'input';

/** The word a step holding a value of each type is named after (the search names steps so too). */
export const TYPE_WORDS: Readonly<Record<string, string>> = {
  Grid: 'grid',
  Colour: 'colour',
  Int: 'number',
  Bool: 'flag',
  Object: 'object',
  Objects: 'objects',
  Point: 'point',
  Grids: 'parts',
  Palette: 'palette',
  CellRule: 'cell_table',
  ObjectRule: 'object_table',
  GridRule: 'grid_table',
};

/** The canonical step names for steps of these types, in order. */
export function canonicalStepNames(types: readonly Type[]): string[] {
  const used = new Map<string, number>();
  return types.map((type) => {
    const base = TYPE_WORDS[type] ?? 'value';
    const n = (used.get(base) ?? 0) + 1;
    used.set(base, n);
    return n === 1 ? base : `${base}_${n}`;
  });
}

function rename(e: Expression, names: ReadonlyMap<string, string>): Expression {
  switch (e.kind) {
    case 'variable':
      return { kind: 'variable', name: names.get(e.name) ?? e.name };
    case 'call':
      return { kind: 'call', primitive: e.primitive, arguments: e.arguments.map((a) => rename(a, names)) };
    default:
      return e;
  }
}

/**
 * The canonical form of a well-typed program (see the file comment). Throws
 * {@link ProgramTypeError} for an ill-typed one, since step names come from step types.
 */
export function canonicalProgram(program: Program, library: OperationLookup): Program {
  const types = checkProgram(program, library);
  const stepNames = canonicalStepNames(program.steps.map((s) => types.steps.get(s.name)!));
  const names = new Map<string, string>([[program.input, CANONICAL_INPUT_NAME]]);
  program.steps.forEach((s, i) => names.set(s.name, stepNames[i]!));
  const steps: Step[] = program.steps.map((s, i) => ({ comments: [], name: stepNames[i]!, expression: rename(s.expression, names) }));
  return { comments: [], input: CANONICAL_INPUT_NAME, steps, answerComments: [], answer: rename(program.answer, names) };
}
