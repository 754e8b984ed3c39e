/**
 * Random well-typed programs drawn by the library's priors: wherever a value of some type is
 * needed, each way of making it (a primitive returning that type, the input grid, a literal) is
 * drawn with probability proportional to 2^-bits, its description length. Programs the search
 * finds cheap are therefore drawn often and dear ones rarely, the same preference the solver has.
 *
 * Literals are drawn from what a task's constant table offers cheaply (src/search/constants.ts):
 * colours, whole numbers 0 to 3, unit offsets, truth values and short colour maps. The tree is
 * then written with every nested call as a named step (sections stay inline), in canonical form.
 */
import type { Expression, LiteralValue, Program, Step } from '../language/ast.ts';
import { canonicalProgram } from '../language/canonical-names.ts';
import { printExpression } from '../language/printer.ts';
import { isBaseType, splitFunctionType, type BaseType, type Type } from '../language/types.ts';
import type { Library } from '../library/library.ts';
import type { Primitive } from '../library/primitive.ts';
import type { Random } from './random.ts';

export interface SamplerOptions {
  /** Deepest nesting of calls (default 4). */
  readonly maxDepth?: number;
  /** Most primitive uses in a program (default 5). */
  readonly maxCalls?: number;
}

/** Bits of one literal of each type, as a task's constant table typically prices them. */
const LITERAL_BITS: Readonly<Record<string, number>> = { Colour: 3, Int: 3, Bool: 2, Point: 4, Palette: 8 };
const UNIT_OFFSETS: readonly (readonly [number, number])[] = [[0, 1], [1, 0], [0, -1], [-1, 0], [1, 1]];
const INPUT_BITS = 1;
const PLACEHOLDER = '\u0000input';

/** Thrown (a plain value: an Error would capture a stack each time) when a draw exceeds its limits. */
const TOO_BIG = Symbol('too big');

/** Draws programs over one library; keeps the per-type tables between draws. */
export class ProgramSampler {
  private readonly producers = new Map<Type, Primitive[]>();
  private readonly buildable = new Map<string, boolean>();
  private readonly maxDepth: number;
  private readonly maxCalls: number;

  constructor(
    private readonly library: Library,
    options: SamplerOptions = {},
  ) {
    this.maxDepth = options.maxDepth ?? 4;
    this.maxCalls = options.maxCalls ?? 5;
    for (const p of library.primitives) {
      const list = this.producers.get(p.result) ?? [];
      list.push(p);
      this.producers.set(p.result, list);
    }
  }

  /** Whether a value of the type can be made with this much nesting left. */
  private canBuild(type: Type, depth: number): boolean {
    const key = `${type}|${depth}`;
    let known = this.buildable.get(key);
    if (known === undefined) {
      this.buildable.set(key, false); // guards against cycles while computing
      const fn = splitFunctionType(type);
      if (fn) known = this.sections(fn.parameter, fn.result, depth).primitives.length > 0;
      else known = type in LITERAL_BITS || type === 'Grid' || this.calls(type, depth).primitives.length > 0;
      this.buildable.set(key, known);
    }
    return known;
  }

  private readonly choices = new Map<string, { primitives: Primitive[]; weights: number[] }>();

  /** Primitives that can make the type (memoised), with their prior weights 2^-bits. */
  private calls(type: Type, depth: number): { primitives: Primitive[]; weights: number[] } {
    const key = `call|${type}|${depth}`;
    let found = this.choices.get(key);
    if (!found) {
      const primitives = depth <= 0 ? [] : (this.producers.get(type) ?? []).filter((p) => p.parameters.every((t) => this.canBuild(t, depth - 1)));
      this.choices.set(key, (found = { primitives, weights: primitives.map((p) => 2 ** -p.bits) }));
    }
    return found;
  }

  /** Primitives usable as a section `p(_, ...)` of type parameter -> result (memoised), with their weights. */
  private sections(parameter: BaseType, result: BaseType, depth: number): { primitives: Primitive[]; weights: number[] } {
    const key = `section|${parameter}|${result}|${depth}`;
    let found = this.choices.get(key);
    if (!found) {
      const primitives = (this.producers.get(result) ?? []).filter(
        (p) => p.parameters.length > 0 && p.parameters[0] === parameter && p.parameters.slice(1).every((t) => isBaseType(t) && this.canBuild(t, Math.max(0, depth - 1))),
      );
      this.choices.set(key, (found = { primitives, weights: primitives.map((p) => 2 ** -p.bits) }));
    }
    return found;
  }

  private readonly totals = new WeakMap<number[], number>();

  private total(weights: number[]): number {
    let t = this.totals.get(weights);
    if (t === undefined) this.totals.set(weights, (t = weights.reduce((a, b) => a + b, 0)));
    return t;
  }

  private literal(type: BaseType, random: Random): LiteralValue {
    switch (type) {
      case 'Colour':
        return { type: 'Colour', value: random.below(10) };
      case 'Int':
        return { type: 'Int', value: random.below(4) };
      case 'Bool':
        return { type: 'Bool', value: random.chance(0.5) };
      case 'Point': {
        const [row, column] = random.pick(UNIT_OFFSETS);
        return { type: 'Point', row, column };
      }
      default: {
        const from = random.sample([0, 1, 2, 3, 4, 5, 6, 7, 8, 9], 1 + random.below(2));
        return { type: 'Palette', pairs: from.map((c) => [c, (c + 1 + random.below(9)) % 10] as [number, number]).sort((a, b) => a[0] - b[0]) };
      }
    }
  }

  private expression(type: Type, depth: number, random: Random, budget: { calls: number }, mustCall: boolean): Expression {
    const fn = splitFunctionType(type);
    const spend = () => {
      if (++budget.calls > this.maxCalls) throw TOO_BIG;
    };
    if (fn) {
      const options = this.sections(fn.parameter, fn.result, depth);
      const p = options.primitives[random.weighted(options.weights)]!;
      spend();
      const rest = p.parameters.slice(1).map((t) => this.expression(t, Math.max(0, depth - 1), random, budget, false));
      return { kind: 'call', primitive: p.name, arguments: [{ kind: 'hole' }, ...rest] };
    }
    const { primitives: calls, weights } = this.calls(type, depth);
    const leaf = mustCall ? 0 : type === 'Grid' ? 2 ** -INPUT_BITS : type in LITERAL_BITS ? 2 ** -LITERAL_BITS[type]! : 0;
    if (calls.length === 0 && leaf === 0) throw TOO_BIG;
    const choice = leaf > 0 && random.fraction() * (leaf + this.total(weights)) < leaf ? 0 : 1 + random.weighted(weights);
    if (choice === 0) return type === 'Grid' ? { kind: 'variable', name: PLACEHOLDER } : { kind: 'literal', literal: this.literal(type as BaseType, random) };
    const p = calls[choice - 1]!;
    spend();
    return { kind: 'call', primitive: p.name, arguments: p.parameters.map((t) => this.expression(t, depth - 1, random, budget, false)) };
  }

  /**
   * A program whose answer is a call (never the bare input), with at most `maxCalls`
   * primitive uses; draws again (up to `tries` times) when one comes out too big. Undefined when
   * every try did.
   */
  sample(random: Random, tries = 50): Program | undefined {
    for (let i = 0; i < tries; i++) {
      try {
        const tree = this.expression('Grid', this.maxDepth, random, { calls: 0 }, true);
        return canonicalProgram(withSteps(tree), this.library);
      } catch (error) {
        if (error !== TOO_BIG) throw error;
      }
    }
    return undefined;
  }
}

/** Every call used as an argument becomes a step (a repeated one is computed once); sections stay inline. */
function withSteps(tree: Expression): Program {
  const steps: Step[] = [];
  const named = new Map<string, string>();
  const visit = (e: Expression, asStep: boolean): Expression => {
    if (e.kind !== 'call') return e;
    const section = e.arguments.length > 0 && e.arguments[0]!.kind === 'hole';
    const call: Expression = { kind: 'call', primitive: e.primitive, arguments: e.arguments.map((a) => visit(a, true)) };
    if (!asStep || section) return call;
    const key = printExpression(call);
    let name = named.get(key);
    if (name === undefined) {
      name = `step_${steps.length + 1}`;
      named.set(key, name);
      steps.push({ comments: [], name, expression: call });
    }
    return { kind: 'variable', name };
  };
  const answer = visit(tree, false);
  return { comments: [], input: PLACEHOLDER, steps, answerComments: [], answer };
}

/** Primitive uses in a program, counting every step once. */
export function callCount(program: Program): number {
  const count = (e: Expression): number => (e.kind === 'call' ? 1 + e.arguments.reduce((s, a) => s + count(a), 0) : 0);
  return program.steps.reduce((s, step) => s + count(step.expression), count(program.answer));
}

/** The colours a program writes as literals. */
export function literalColours(program: Program): number[] {
  const found = new Set<number>();
  const visit = (e: Expression): void => {
    if (e.kind === 'literal' && e.literal.type === 'Colour') found.add(e.literal.value);
    if (e.kind === 'literal' && e.literal.type === 'Palette') for (const [from] of e.literal.pairs) found.add(from);
    if (e.kind === 'call') e.arguments.forEach(visit);
  };
  program.steps.forEach((s) => visit(s.expression));
  visit(program.answer);
  return [...found].sort((a, b) => a - b);
}
