/**
 * Editing program trees: renaming a step and inlining a step into the places that use it.
 * Programs are immutable values, so every edit returns a new program built with immer's
 * `produce`: only the nodes on the way to a change are copied, the rest is shared with the
 * original, and the result comes back deeply frozen (so do the parts it shares).
 */
import { produce, type Draft } from 'immer';
import type { Expression, Program } from './ast.ts';
import { isName } from './parser.ts';

export class ProgramEditError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ProgramEditError';
  }
}

function stepIndex(program: Program, name: string): number {
  const index = program.steps.findIndex((s) => s.name === name);
  if (index >= 0) return index;
  if (name === program.input) throw new ProgramEditError(`'${name}' is the program's input, not a step`);
  const known = program.steps.map((s) => `'${s.name}'`).join(', ');
  throw new ProgramEditError(`no step named '${name}' (the steps are: ${known === '' ? 'none' : known})`);
}

/** Renames every use of the variable `from` inside the draft expression to `to`. */
function renameVariable(e: Draft<Expression>, from: string, to: string): void {
  if (e.kind === 'variable') {
    if (e.name === from) e.name = to;
  } else if (e.kind === 'call') {
    for (const argument of e.arguments) renameVariable(argument, from, to);
  }
}

/**
 * The draft expression with every use of the variable `name` replaced by `replacement`; the
 * node itself when it is that variable, so the caller stores what comes back.
 */
function substitute(e: Draft<Expression>, name: string, replacement: Expression): Draft<Expression> {
  if (e.kind === 'variable') return e.name === name ? (replacement as Draft<Expression>) : e;
  if (e.kind === 'call') {
    for (let i = 0; i < e.arguments.length; i++) {
      const argument = e.arguments[i]!;
      const replaced = substitute(argument, name, replacement);
      if (replaced !== argument) e.arguments[i] = replaced;
    }
  }
  return e;
}

/**
 * The program with step `from` named `to`, and every use of it (in later steps and the
 * answer) renamed too. `to` must be a valid name that neither the input nor another step has.
 */
export function renameStep(program: Program, from: string, to: string): Program {
  const index = stepIndex(program, from);
  if (to === from) return program;
  if (!isName(to)) throw new ProgramEditError(`'${to}' cannot name a step: use lower-case letters, digits and _, and no keyword`);
  if (to === program.input) throw new ProgramEditError(`'${to}' already names the program's input`);
  if (program.steps.some((s) => s.name === to)) throw new ProgramEditError(`'${to}' already names a step`);
  return produce(program, (draft) => {
    draft.steps[index]!.name = to;
    for (let i = index + 1; i < draft.steps.length; i++) renameVariable(draft.steps[i]!.expression, from, to);
    renameVariable(draft.answer, from, to);
  });
}

/**
 * The program without step `name`: every use of it (in later steps and the answer) is
 * replaced by the step's expression. A step used twice is computed twice; a step used nowhere
 * simply goes. The step's comments are kept: they move to the statement that followed it.
 * Outputs do not change, since every primitive is pure and an unused step never reaches the
 * answer.
 */
export function inlineStep(program: Program, name: string): Program {
  const index = stepIndex(program, name);
  const { expression, comments } = program.steps[index]!;
  return produce(program, (draft) => {
    draft.steps.splice(index, 1);
    const next = draft.steps[index];
    if (next) next.comments.unshift(...comments);
    else draft.answerComments.unshift(...comments);
    for (let i = index; i < draft.steps.length; i++) {
      const step = draft.steps[i]!;
      const replaced = substitute(step.expression, name, expression);
      if (replaced !== step.expression) step.expression = replaced;
    }
    const answer = substitute(draft.answer, name, expression);
    if (answer !== draft.answer) draft.answer = answer;
  });
}
