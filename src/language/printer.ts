/**
 * Prints programs in pithy's text syntax:
 *
 *   -- comment
 *   with shelf
 *   crates = objects_by_colour(shelf)
 *   answer crop_to_object(shelf, largest_object(crates))
 *
 * Literals: colours `#3`, whole numbers `-2`, `true`/`false`, points `(row, column)`,
 * palettes `{#1 -> #2, #3 -> #4}`; `_` is the open argument of a section.
 */
import type { Expression, LiteralValue, Program } from './ast.ts';

export function printLiteral(l: LiteralValue): string {
  switch (l.type) {
    case 'Colour':
      return `#${l.value}`;
    case 'Int':
      return String(l.value);
    case 'Bool':
      return l.value ? 'true' : 'false';
    case 'Point':
      return `(${l.row}, ${l.column})`;
    case 'Palette':
      return `{${l.pairs.map(([a, b]) => `#${a} -> #${b}`).join(', ')}}`;
  }
}

export function printExpression(e: Expression): string {
  switch (e.kind) {
    case 'variable':
      return e.name;
    case 'literal':
      return printLiteral(e.literal);
    case 'hole':
      return '_';
    case 'call':
      return `${e.primitive}(${e.arguments.map(printExpression).join(', ')})`;
  }
}

function printComments(lines: readonly string[]): string[] {
  return lines.map((line) => (line === '' ? '--' : `-- ${line}`));
}

export function printProgram(p: Program): string {
  const out: string[] = [...printComments(p.comments), `with ${p.input}`];
  const width = Math.max(0, ...p.steps.map((s) => s.name.length));
  for (const step of p.steps) {
    out.push(...printComments(step.comments));
    out.push(`${step.name.padEnd(width)} = ${printExpression(step.expression)}`);
  }
  out.push(...printComments(p.answerComments));
  out.push(`answer ${printExpression(p.answer)}`);
  return out.join('\n') + '\n';
}
