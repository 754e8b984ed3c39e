/**
 * Where program text is refused and what was expected there, as `column: expected`, or `parsed`
 * when it is not refused: for tests of the parser's messages.
 */
import { parseExpression, ProgramSyntaxError } from '../../src/language/parser.ts';

export function syntaxProblem(text: string): string {
  try {
    parseExpression(text);
  } catch (error) {
    if (error instanceof ProgramSyntaxError) return `${error.column}: ${error.expected}`;
    throw error;
  }
  return 'parsed';
}
