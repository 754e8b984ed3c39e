/**
 * The type checker: finds the type of every step before anything runs and rejects a program
 * that is ill-typed, naming the step, the expected type and the found type.
 */
import type { Expression, Program } from './ast.ts';
import type { OperationLookup } from './operation.ts';
import { nearestNames } from './nearest-names.ts';
import { positionOf } from './parser.ts';
import { functionType, isBaseType, splitFunctionType, type BaseType, type Type } from './types.ts';

export interface TypeProblem {
  /** The step's name, or 'answer'. */
  readonly step: string;
  readonly message: string;
  readonly expected?: string;
  readonly found?: string;
  /** Where the offending expression starts (1-based), when the program came from text. */
  readonly line?: number;
  readonly column?: number;
}

export class ProgramTypeError extends Error {
  constructor(readonly problems: readonly TypeProblem[]) {
    super(
      problems
        .map((p) => {
          const where = p.step === 'answer' ? 'the answer' : `step '${p.step}'`;
          const detail = p.expected !== undefined && p.found !== undefined ? ` (expected ${p.expected}, found ${p.found})` : '';
          return `in ${where}: ${p.message}${detail}`;
        })
        .join('\n'),
    );
    this.name = 'ProgramTypeError';
  }
}

/** A name whose own step failed to check: using it reports nothing more. */
const BROKEN = 'broken';

class Problem extends Error {
  constructor(
    message: string,
    readonly expected?: string,
    readonly found?: string,
    /** The offending expression, to point at its column. */
    readonly at?: Expression,
  ) {
    super(message);
  }
}

function problemOf(step: string, error: Problem): TypeProblem {
  const where = error.at ? positionOf(error.at) : undefined;
  return {
    step,
    message: error.message,
    ...(error.expected !== undefined ? { expected: error.expected } : {}),
    ...(error.found !== undefined ? { found: error.found } : {}),
    ...(where ? { line: where.line, column: where.column } : {}),
  };
}

function typeOf(e: Expression, scope: ReadonlyMap<string, Type>, library: OperationLookup): Type {
  switch (e.kind) {
    case 'variable': {
      const t = scope.get(e.name);
      if (t === (BROKEN as Type)) throw new Problem(BROKEN);
      if (!t) {
        const near = nearestNames(e.name, [...scope.keys()].filter((k) => scope.get(k) !== (BROKEN as Type)));
        throw new Problem(`unknown name '${e.name}'${near.length > 0 ? `; did you mean ${near.join(', ')}?` : ''}`, 'a step defined above or the input', `'${e.name}'`, e);
      }
      return t;
    }
    case 'literal':
      return e.literal.type;
    case 'hole':
      throw new Problem("'_' may only stand as the first argument of a call passed to another primitive");
    case 'call': {
      const p = library.get(e.primitive);
      if (!p) {
        const near = library.names ? nearestNames(e.primitive, library.names()) : [];
        throw new Problem(`unknown primitive '${e.primitive}'${near.length > 0 ? `; did you mean ${near.join(', ')}?` : ''}`, 'a primitive listed by `pithy primitives`', `'${e.primitive}'`, e);
      }
      if (e.arguments.length !== p.parameters.length) {
        throw new Problem(
          `${p.name} takes ${p.parameters.length} argument${p.parameters.length === 1 ? '' : 's'}, got ${e.arguments.length}`,
          `${p.name}(${p.parameters.join(', ')})`,
          `${e.arguments.length} argument${e.arguments.length === 1 ? '' : 's'}`,
          e,
        );
      }
      const isSection = e.arguments.length > 0 && e.arguments[0]!.kind === 'hole';
      for (let i = isSection ? 1 : 0; i < e.arguments.length; i++) {
        const want = p.parameters[i]!;
        const arg = e.arguments[i]!;
        const got = typeOfArgument(arg, want, scope, library);
        if (got !== want) {
          throw new Problem(`argument ${i + 1} of ${p.name} has the wrong type`, want, got, arg);
        }
      }
      if (isSection) {
        const open = p.parameters[0]!;
        if (!isBaseType(open) || !isBaseType(p.result)) {
          throw new Problem(`${p.name} cannot be used as a section: its open argument and result must be base types`, undefined, undefined, e);
        }
        return functionType(open, p.result as BaseType);
      }
      return p.result;
    }
  }
}

function typeOfArgument(arg: Expression, want: Type, scope: ReadonlyMap<string, Type>, library: OperationLookup): Type {
  if (arg.kind === 'call' && arg.arguments.length > 0 && arg.arguments[0]!.kind === 'hole' && splitFunctionType(want) === undefined) {
    throw new Problem('a section (a call with _) is only allowed where a function is expected', want, 'a section', arg);
  }
  return typeOf(arg, scope, library);
}

/** Returns the type of every step and of the answer, or throws ProgramTypeError. */
export function checkProgram(program: Program, library: OperationLookup): { steps: Map<string, Type>; answer: Type } {
  const scope = new Map<string, Type>([[program.input, 'Grid']]);
  const problems: TypeProblem[] = [];
  const seen = new Set<string>([program.input]);
  for (const step of program.steps) {
    if (seen.has(step.name)) problems.push({ step: step.name, message: `'${step.name}' is already defined` });
    seen.add(step.name);
    try {
      const t = typeOf(step.expression, scope, library);
      if (splitFunctionType(t)) problems.push({ step: step.name, message: 'a step cannot hold a section', expected: 'a base type', found: t });
      scope.set(step.name, t);
    } catch (error) {
      if (!(error instanceof Problem)) throw error;
      scope.set(step.name, BROKEN as Type);
      if (error.message !== BROKEN) problems.push(problemOf(step.name, error));
    }
  }
  let answer: Type = 'Grid';
  try {
    answer = typeOf(program.answer, scope, library);
    if (answer !== 'Grid') problems.push({ step: 'answer', message: 'the answer must be a grid', expected: 'Grid', found: answer });
  } catch (error) {
    if (!(error instanceof Problem)) throw error;
    if (error.message !== BROKEN) problems.push(problemOf('answer', error));
  }
  if (problems.length > 0) throw new ProgramTypeError(problems);
  return { steps: scope, answer };
}

/** The type of a lone expression over a scope (for worked examples). */
export function checkExpression(e: Expression, scope: ReadonlyMap<string, Type>, library: OperationLookup): Type {
  try {
    return typeOf(e, scope, library);
  } catch (error) {
    if (error instanceof Problem) throw new ProgramTypeError([problemOf('answer', error)]);
    throw error;
  }
}
