/**
 * Programs as token sequences and back. A program is written
 *
 *   <program> <step> EXPRESSION … <answer> EXPRESSION </program>
 *
 * and an expression in prefix order with no brackets, since every primitive has a fixed number
 * of arguments: a call is its primitive's token followed by its arguments; `<hole>` is the open
 * argument of a section; `<input>` is the input grid and `<ref:k>` the value of step k; literals
 * are written as literal-tokens.ts says. For example
 *
 *   with harbour
 *   boats = objects_by_colour(harbour)
 *   answer erase_object(harbour, object_with_most(boats, object_height(_)))
 *
 * is
 *
 *   <program> <step> objects_by_colour <input>
 *   <answer> erase_object <input> object_with_most <ref:1> object_height <hole> </program>
 *
 * Names and comments are not tokens: detokenizing gives the program in its canonical form
 * (src/language/canonical-names.ts), which for a program already in that form is the program
 * itself.
 */
import type { Expression, Program, Step } from '../language/ast.ts';
import { canonicalProgram } from '../language/canonical-names.ts';
import type { Library } from '../library/library.ts';
import { encodeLiteral, literalKindStartingWith } from './literal-tokens.ts';
import { TokenError, TokenReader } from './token-reader.ts';
import { MOST_STEPS, referenceToken, vocabularyOf } from './vocabulary.ts';

/** The token sequence of a program over `library`. Throws TokenError for what has no tokens (an unknown primitive or name, a number out of range, too many steps). */
export function tokenize(program: Program, library: Library): string[] {
  if (program.steps.length > MOST_STEPS) throw new TokenError(-1, `at most ${MOST_STEPS} steps`, `${program.steps.length} steps`);
  const vocabulary = vocabularyOf(library);
  const references = new Map<string, string>([[program.input, '<input>']]);
  const out: string[] = ['<program>'];
  const expression = (e: Expression): void => {
    switch (e.kind) {
      case 'hole':
        out.push('<hole>');
        return;
      case 'variable': {
        const r = references.get(e.name);
        if (r === undefined) throw new TokenError(-1, 'the input or an earlier step', `the name '${e.name}'`);
        out.push(r);
        return;
      }
      case 'literal':
        out.push(...encodeLiteral(e.literal));
        return;
      case 'call':
        if (!library.get(e.primitive) || !vocabulary.has(e.primitive)) throw new TokenError(-1, 'a primitive of the library', `'${e.primitive}'`);
        out.push(e.primitive);
        for (const a of e.arguments) expression(a);
    }
  };
  program.steps.forEach((step, i) => {
    out.push('<step>');
    expression(step.expression);
    references.set(step.name, referenceToken(i + 1));
  });
  out.push('<answer>');
  expression(program.answer);
  out.push('</program>');
  return out;
}

function readExpression(r: TokenReader, library: Library, steps: number): Expression {
  const t = r.peek();
  const what = 'a primitive, <input>, a step reference, <hole> or a literal';
  if (t === undefined) r.fail(what);
  if (t === '<input>' || t === '<hole>') {
    r.position++;
    return t === '<input>' ? { kind: 'variable', name: '<input>' } : { kind: 'hole' };
  }
  const reference = /^<ref:([0-9]+)>$/.exec(t);
  if (reference) {
    const k = Number(reference[1]);
    if (k < 1 || k > steps) r.fail(`a reference to one of the ${steps} steps before this one`);
    r.position++;
    return { kind: 'variable', name: `step ${k}` };
  }
  const p = library.get(t);
  if (p) {
    r.position++;
    const args: Expression[] = [];
    for (let i = 0; i < p.parameters.length; i++) args.push(readExpression(r, library, steps));
    return { kind: 'call', primitive: p.name, arguments: args };
  }
  const kind = literalKindStartingWith(t);
  if (kind) return { kind: 'literal', literal: kind.decode(r) };
  return r.fail(what);
}

/**
 * The program a token sequence spells, in canonical form (input `input`, steps named after
 * their types, no comments). `<pad>` tokens after `</program>` are allowed. Throws TokenError
 * naming the position for a sequence that does not spell a program, and ProgramTypeError for
 * one that spells an ill-typed program.
 */
export function detokenize(tokens: readonly string[], library: Library): Program {
  const r = new TokenReader(tokens);
  r.expect('<program>');
  const steps: Step[] = [];
  while (r.peek() === '<step>') {
    r.position++;
    if (steps.length === MOST_STEPS) r.fail(`at most ${MOST_STEPS} steps`);
    steps.push({ comments: [], name: `step ${steps.length + 1}`, expression: readExpression(r, library, steps.length) });
  }
  if (r.peek() !== '<answer>') r.fail("'<step>' or '<answer>'");
  r.position++;
  const answer = readExpression(r, library, steps.length);
  r.expect('</program>');
  while (!r.atEnd()) {
    if (r.peek() !== '<pad>') r.fail("nothing but '<pad>' after '</program>'");
    r.position++;
  }
  // Provisional names ("step 1", "<input>") cannot clash with names of the text syntax; the
  // canonical form replaces them.
  return canonicalProgram({ comments: [], input: '<input>', steps, answerComments: [], answer }, library);
}
