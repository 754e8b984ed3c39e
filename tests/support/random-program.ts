/**
 * Random well-typed programs built from a library's signatures, for property tests (text
 * round trip, type soundness) and for anyone who needs programs to feed the search or the
 * exporters. Steps take earlier steps, literals or nested calls as arguments; a function type
 * is filled with a section (`has_colour(_, #3)`); comments are random text without newlines.
 *
 * Two ways in:
 * - `generateProgram(library, choose, options)` with any source of choices
 *   (`choose(n)` returns a whole number from 0 to n - 1);
 * - `programArbitrary(library, options)`, a fast-check Arbitrary<Program> (shrinks through
 *   fast-check's `gen`).
 */
import fc from 'fast-check';
import type { Expression, LiteralValue, Program, Step } from '../../src/language/ast.ts';
import { isBaseType, splitFunctionType, type BaseType, type Type } from '../../src/language/types.ts';
import type { Library } from '../../src/library/library.ts';
import type { Primitive } from '../../src/library/primitive.ts';
import { randomCellRule, randomGridRule, randomObjectRule } from './random-table.ts';

/** Returns a whole number from 0 to count - 1. */
export type Chooser = (count: number) => number;

export interface RandomProgramOptions {
  /** Most steps before the answer (default 4). */
  readonly maxSteps?: number;
  /** Most nesting of calls inside an argument (default 2). */
  readonly maxDepth?: number;
  /** Whether to add random comments (default true). */
  readonly comments?: boolean;
  /** Type of the answer; the language requires Grid (the default). */
  readonly answerType?: BaseType;
}

const LITERAL_TYPES: ReadonlySet<Type> = new Set<Type>(['Colour', 'Int', 'Bool', 'Point', 'Palette', 'CellRule', 'ObjectRule', 'GridRule']);
const NAME_WORDS = ['boats', 'crane', 'tide', 'quay', 'hull', 'mast', 'cargo', 'buoy', 'pier', 'net', 'sail', 'dock'];
const INPUT_NAMES = ['grid', 'harbour', 'deck', 'chart', 'berth'];
/** Characters for comments (any text without a line break; spaces and tabs anywhere). */
const COMMENT_CHARACTERS = 'abcdefghijklmnopqrstuvwxyz ABCXYZ0123456789.,;:!?()[]{}#_-=>+*/\'"é→\t  ';

interface Scope {
  readonly names: readonly { name: string; type: Type }[];
}

class ProgramBuilder {
  private readonly producers = new Map<Type, Primitive[]>();

  constructor(
    private readonly library: Library,
    private readonly choose: Chooser,
  ) {
    for (const p of library.primitives) {
      const list = this.producers.get(p.result) ?? [];
      list.push(p);
      this.producers.set(p.result, list);
    }
  }

  pick<T>(items: readonly T[]): T {
    return items[this.choose(items.length)]!;
  }

  private readonly memo = new Map<string, boolean>();

  /** Whether an expression of the type can be built with this much nesting left (memoised). */
  canBuild(type: Type, scope: Scope, depth: number): boolean {
    const key = `${type}|${depth}|${[...new Set(scope.names.map((n) => n.type))].sort().join(',')}`;
    let known = this.memo.get(key);
    if (known === undefined) {
      known = this.canBuildUncached(type, scope, depth);
      this.memo.set(key, known);
    }
    return known;
  }

  private canBuildUncached(type: Type, scope: Scope, depth: number): boolean {
    const fn = splitFunctionType(type);
    if (fn) return this.sectionPrimitives(fn.parameter, fn.result, scope, depth).length > 0;
    if (LITERAL_TYPES.has(type)) return true;
    if (scope.names.some((n) => n.type === type)) return true;
    return depth > 0 && this.callPrimitives(type, scope, depth).length > 0;
  }

  /** Primitives returning the type whose every argument can be built one level down. */
  callPrimitives(type: Type, scope: Scope, depth: number): Primitive[] {
    if (depth <= 0) return [];
    return (this.producers.get(type) ?? []).filter((p) => p.parameters.every((t) => this.canBuild(t, scope, depth - 1)));
  }

  /** Primitives usable as a section `p(_, ...)` of type parameter -> result. */
  sectionPrimitives(parameter: BaseType, result: BaseType, scope: Scope, depth: number): Primitive[] {
    return (this.producers.get(result) ?? []).filter(
      (p) =>
        p.parameters.length > 0 &&
        p.parameters[0] === parameter &&
        p.parameters.slice(1).every((t) => isBaseType(t) && this.canBuild(t, scope, Math.max(0, depth - 1))),
    );
  }

  literal(type: Type): LiteralValue {
    switch (type) {
      case 'Colour':
        return { type: 'Colour', value: this.choose(10) };
      case 'Int':
        return { type: 'Int', value: this.choose(14) - 3 };
      case 'Bool':
        return { type: 'Bool', value: this.choose(2) === 1 };
      case 'Point':
        return { type: 'Point', row: this.choose(9) - 3, column: this.choose(9) - 3 };
      case 'CellRule':
        return randomCellRule(this.choose, true);
      case 'ObjectRule':
        return randomObjectRule(this.choose);
      case 'GridRule':
        return randomGridRule(this.choose);
      default: {
        const pairs: [number, number][] = [];
        const count = this.choose(4);
        for (let i = 0; i < count; i++) pairs.push([this.choose(10), this.choose(10)]);
        return { type: 'Palette', pairs };
      }
    }
  }

  call(p: Primitive, scope: Scope, depth: number): Expression {
    return { kind: 'call', primitive: p.name, arguments: p.parameters.map((t) => this.expression(t, scope, depth - 1)) };
  }

  /** An expression of the type; callers make sure canBuild(type, scope, depth) holds. */
  expression(type: Type, scope: Scope, depth: number): Expression {
    const fn = splitFunctionType(type);
    if (fn) {
      const p = this.pick(this.sectionPrimitives(fn.parameter, fn.result, scope, depth));
      const rest = p.parameters.slice(1).map((t) => this.expression(t, scope, Math.max(0, depth - 1)));
      return { kind: 'call', primitive: p.name, arguments: [{ kind: 'hole' }, ...rest] };
    }
    const options: (() => Expression)[] = [];
    const variables = scope.names.filter((n) => n.type === type);
    if (variables.length > 0) options.push(() => ({ kind: 'variable', name: this.pick(variables).name }));
    if (LITERAL_TYPES.has(type)) options.push(() => ({ kind: 'literal', literal: this.literal(type) }));
    const calls = this.callPrimitives(type, scope, depth);
    if (calls.length > 0) options.push(() => this.call(this.pick(calls), scope, depth));
    if (options.length === 0) throw new Error(`cannot build an expression of type ${type}`);
    return this.pick(options)();
  }

  comment(): string {
    const length = this.choose(24);
    let text = '';
    for (let i = 0; i < length; i++) text += COMMENT_CHARACTERS[this.choose(COMMENT_CHARACTERS.length)];
    return text;
  }

  comments(enabled: boolean): string[] {
    if (!enabled || this.choose(3) !== 0) return [];
    return Array.from({ length: 1 + this.choose(2) }, () => this.comment());
  }
}

/** A random well-typed program over `library`, driven by `choose`. */
export function generateProgram(library: Library, choose: Chooser, options: RandomProgramOptions = {}): Program {
  const maxSteps = options.maxSteps ?? 4;
  const maxDepth = options.maxDepth ?? 2;
  const answerType = options.answerType ?? 'Grid';
  const withComments = options.comments ?? true;
  const b = new ProgramBuilder(library, choose);
  const input = b.pick(INPUT_NAMES);
  const names: { name: string; type: Type }[] = [{ name: input, type: 'Grid' }];
  const programComments = b.comments(withComments);
  const steps: Step[] = [];
  const stepCount = choose(maxSteps + 1);
  for (let i = 0; i < stepCount; i++) {
    const scope: Scope = { names };
    const candidates = library.primitives.filter((p) => isBaseType(p.result) && b.callPrimitives(p.result, scope, maxDepth).includes(p));
    if (candidates.length === 0) break;
    const p = b.pick(candidates);
    const expression = b.call(p, scope, maxDepth);
    const name = `${b.pick(NAME_WORDS)}_${i}`;
    steps.push({ comments: b.comments(withComments), name, expression });
    names.push({ name, type: p.result });
  }
  const answerComments = b.comments(withComments);
  const answer = b.expression(answerType, { names }, maxDepth);
  return { comments: programComments, input, steps, answerComments, answer };
}

/** fast-check arbitrary of random well-typed programs over `library`. */
export function programArbitrary(library: Library, options: RandomProgramOptions = {}): fc.Arbitrary<Program> {
  return fc.gen().map((g) => generateProgram(library, (count) => (count <= 1 ? 0 : g(fc.nat, { max: count - 1 })), options));
}
