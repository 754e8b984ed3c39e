/**
 * Parses pithy's program text (see printer.ts for the syntax). Every statement sits on one
 * line; errors name line:column and what was expected there.
 */
import { freeze } from 'immer';
import type { Expression, LiteralValue, Program, Step } from './ast.ts';

export class ProgramSyntaxError extends Error {
  constructor(
    readonly line: number,
    readonly column: number,
    readonly expected: string,
    readonly found: string,
    readonly source?: string,
  ) {
    super(`${source ? `${source}:` : ''}${line}:${column}: expected ${expected}, found ${found}`);
    this.name = 'ProgramSyntaxError';
  }
}

const IDENTIFIER = /^[a-z_][a-z0-9_]*/;
const KEYWORDS = new Set(['with', 'answer', 'true', 'false', '_']);

/** True when `word` can name the input or a step: lower-case letters, digits and `_`, not a keyword. */
export function isName(word: string): boolean {
  const match = IDENTIFIER.exec(word);
  return match !== null && match[0] === word && !KEYWORDS.has(word);
}

class LineReader {
  position = 0;
  constructor(
    readonly text: string,
    readonly lineNumber: number,
    readonly offset: number,
    readonly source: string | undefined,
  ) {}

  skipSpaces(): void {
    while (this.position < this.text.length && (this.text[this.position] === ' ' || this.text[this.position] === '\t')) this.position++;
  }

  peek(): string {
    this.skipSpaces();
    return this.text[this.position] ?? '';
  }

  describeHere(): string {
    this.skipSpaces();
    if (this.position >= this.text.length) return 'end of line';
    const rest = this.text.slice(this.position);
    const word = /^[A-Za-z0-9_]+/.exec(rest);
    return `'${word ? word[0] : rest[0]}'`;
  }

  fail(expected: string): never {
    this.skipSpaces();
    throw new ProgramSyntaxError(this.lineNumber, this.offset + this.position + 1, expected, this.describeHere(), this.source);
  }

  expect(symbol: string, what = `'${symbol}'`): void {
    this.skipSpaces();
    if (!this.text.startsWith(symbol, this.position)) this.fail(what);
    this.position += symbol.length;
  }

  identifier(what: string): string {
    this.skipSpaces();
    const match = IDENTIFIER.exec(this.text.slice(this.position));
    if (!match) this.fail(what);
    this.position += match[0].length;
    return match[0];
  }

  integer(what: string): number {
    this.skipSpaces();
    const match = /^-?[0-9]+/.exec(this.text.slice(this.position));
    if (!match) this.fail(what);
    const value = Number(match[0]);
    if (!Number.isSafeInteger(value)) this.fail(`${what} of a safe size`);
    this.position += match[0].length;
    return value;
  }

  colour(): number {
    this.expect('#', "a colour such as '#3'");
    const start = this.position;
    const match = /^[0-9](?![0-9])/.exec(this.text.slice(this.position));
    if (!match) {
      this.position = start;
      this.fail('a colour digit 0-9 after #');
    }
    this.position += 1;
    return Number(match[0]);
  }

  atEnd(): boolean {
    this.skipSpaces();
    return this.position >= this.text.length;
  }
}

/** Calls nest at most this deep (deeper text is refused, never a stack overflow). */
export const MAXIMUM_NESTING = 100;

/** Where each parsed expression starts in the text (1-based); kept beside the tree, not in it. */
const positions = new WeakMap<Expression, { readonly line: number; readonly column: number }>();

/** Line and column where a parsed expression starts, when it came from the parser. */
export function positionOf(e: Expression): { readonly line: number; readonly column: number } | undefined {
  return positions.get(e);
}

function parseLiteralOrExpression(r: LineReader, depth = 0): Expression {
  r.skipSpaces();
  const at = { line: r.lineNumber, column: r.offset + r.position + 1 };
  const e = parseExpressionAt(r, depth);
  positions.set(e, at);
  return e;
}

function parseExpressionAt(r: LineReader, depth: number): Expression {
  const c = r.peek();
  if (c === '#') return { kind: 'literal', literal: { type: 'Colour', value: r.colour() } };
  if (c === '-' || (c >= '0' && c <= '9')) return { kind: 'literal', literal: { type: 'Int', value: r.integer('a whole number') } };
  if (c === '(') {
    r.expect('(');
    const row = r.integer('a row offset');
    r.expect(',', "',' between row and column");
    const column = r.integer('a column offset');
    r.expect(')', "')' closing the point");
    const literal: LiteralValue = { type: 'Point', row, column };
    return { kind: 'literal', literal };
  }
  if (c === '{') {
    r.expect('{');
    const pairs: [number, number][] = [];
    if (r.peek() !== '}') {
      for (;;) {
        const from = r.colour();
        r.expect('->', "'->' in a palette entry");
        const to = r.colour();
        pairs.push([from, to]);
        if (r.peek() === ',') {
          r.expect(',');
          continue;
        }
        break;
      }
    }
    r.expect('}', "',' or '}' in a palette");
    return { kind: 'literal', literal: { type: 'Palette', pairs } };
  }
  if (c === '_' && !/^_[a-z0-9_]/.test(r.text.slice(r.position))) {
    r.expect('_');
    return { kind: 'hole' };
  }
  const name = r.identifier("an expression (a name, a call, or a literal such as #3, 2, true, (0, 1), {#1 -> #2})");
  if (name === 'true' || name === 'false') return { kind: 'literal', literal: { type: 'Bool', value: name === 'true' } };
  if (r.peek() !== '(') return { kind: 'variable', name };
  if (depth >= MAXIMUM_NESTING) r.fail(`at most ${MAXIMUM_NESTING} nested calls (name some of them as steps)`);
  r.expect('(');
  const args: Expression[] = [];
  if (r.peek() !== ')') {
    for (;;) {
      args.push(parseLiteralOrExpression(r, depth + 1));
      if (r.peek() === ',') {
        r.expect(',');
        continue;
      }
      break;
    }
  }
  r.expect(')', "',' or ')' in the argument list");
  return { kind: 'call', primitive: name, arguments: args };
}

/** Parses one expression (for worked examples and the REPL-like commands). */
export function parseExpression(text: string, source?: string): Expression {
  const r = new LineReader(text, 1, 0, source);
  const e = parseLiteralOrExpression(r);
  if (!r.atEnd()) r.fail('end of expression');
  return e;
}

/** Parses a program; the tree comes back deeply frozen (edit it with edit-program.ts). */
export function parseProgram(text: string, source?: string): Program {
  const lines = text.split(/\r?\n/);
  const programComments: string[] = [];
  let pending: string[] = [];
  let input: string | undefined;
  const steps: Step[] = [];
  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i]!;
    const indent = raw.length - raw.trimStart().length;
    const body = raw.trim();
    const r = new LineReader(body, i + 1, indent, source);
    if (body === '') continue;
    if (body.startsWith('--')) {
      // Keep a comment's trailing spaces so printing and parsing give back the same text.
      const rest = raw.trimStart().replace(/\r$/, '').slice(2);
      pending.push(rest.startsWith(' ') ? rest.slice(1) : rest);
      continue;
    }
    const word = r.identifier(input === undefined ? "'with' naming the input grid" : "a step 'name = ...' or 'answer ...'");
    if (input === undefined) {
      if (word !== 'with') {
        r.position = 0;
        r.fail("'with' naming the input grid");
      }
      input = r.identifier('a name for the input grid');
      if (KEYWORDS.has(input)) {
        r.position -= input.length;
        r.fail('a name that is not a keyword');
      }
      if (!r.atEnd()) r.fail('end of line after the input name');
      programComments.push(...pending);
      pending = [];
      continue;
    }
    if (word === 'answer') {
      const answer = parseLiteralOrExpression(r);
      if (!r.atEnd()) r.fail('end of line after the answer');
      for (let j = i + 1; j < lines.length; j++) {
        const after = lines[j]!.trim();
        if (after !== '') {
          const tail = new LineReader(after, j + 1, lines[j]!.length - lines[j]!.trimStart().length, source);
          tail.fail("end of program after 'answer'");
        }
      }
      return freeze({ comments: programComments, input, steps, answerComments: pending, answer }, true);
    }
    if (KEYWORDS.has(word)) {
      r.position = 0;
      r.fail('a step name that is not a keyword');
    }
    r.expect('=', "'=' after the step name");
    const expression = parseLiteralOrExpression(r);
    if (!r.atEnd()) r.fail('end of line after the step');
    steps.push({ comments: pending, name: word, expression });
    pending = [];
  }
  const last = lines.length;
  throw new ProgramSyntaxError(last, 1, input === undefined ? "'with' naming the input grid" : "'answer ...' ending the program", 'end of text', source);
}
