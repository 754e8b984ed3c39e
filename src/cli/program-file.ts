/**
 * Reads a program file for the commands: parses and type-checks it, and turns syntax and type
 * errors into messages that name file:line:column and what was expected.
 */
import { readFileSync } from 'node:fs';
import type { Program } from '../language/ast.ts';
import { checkProgram, ProgramTypeError } from '../language/checker.ts';
import { parseProgram, ProgramSyntaxError } from '../language/parser.ts';
import type { Type } from '../language/types.ts';
import type { Library } from '../library/library.ts';

export interface ProgramProblem {
  readonly file: string;
  readonly line: number;
  readonly column: number;
  /** The step's name or 'answer', for type problems. */
  readonly step?: string;
  readonly message: string;
  readonly expected?: string;
  readonly found?: string;
}

/** A program file that cannot be read, parsed or type-checked. */
export class ProgramFileError extends Error {
  constructor(readonly problems: readonly ProgramProblem[]) {
    super(problems.map(formatProblem).join('\n'));
    this.name = 'ProgramFileError';
  }
}

export function formatProblem(p: ProgramProblem): string {
  const where = p.step === undefined ? '' : p.step === 'answer' ? 'in the answer: ' : `in step '${p.step}': `;
  const detail = p.expected !== undefined ? ` (expected ${p.expected}${p.found !== undefined ? `, found ${p.found}` : ''})` : '';
  return `${p.file}:${p.line}:${p.column}: ${where}${p.message}${detail}`;
}

/** Line and column (1-based) where a step (or `answer`) starts in the text. */
export function locateStep(text: string, step: string): { line: number; column: number } {
  const lines = text.split(/\r?\n/);
  const pattern = step === 'answer' ? /^(\s*)answer\b/ : new RegExp(`^(\\s*)${step}\\s*=`);
  for (let i = 0; i < lines.length; i++) {
    const match = pattern.exec(lines[i]!);
    if (match) return { line: i + 1, column: match[1]!.length + 1 };
  }
  return { line: 1, column: 1 };
}

export interface LoadedProgram {
  readonly file: string;
  readonly text: string;
  readonly program: Program;
  readonly types: { readonly steps: ReadonlyMap<string, Type>; readonly answer: Type };
}

/** Parses and checks program text; `file` names it in errors. */
export function loadProgramText(text: string, file: string, library: Library): LoadedProgram {
  let program: Program;
  try {
    program = parseProgram(text, file);
  } catch (error) {
    if (!(error instanceof ProgramSyntaxError)) throw error;
    throw new ProgramFileError([{ file, line: error.line, column: error.column, message: `syntax error`, expected: error.expected, found: error.found }]);
  }
  try {
    return { file, text, program, types: checkProgram(program, library) };
  } catch (error) {
    if (!(error instanceof ProgramTypeError)) throw error;
    throw new ProgramFileError(
      error.problems.map((p) => ({ file, ...locateStep(text, p.step), step: p.step, message: p.message, expected: p.expected, found: p.found })),
    );
  }
}

export function loadProgramFile(file: string, library: Library): LoadedProgram {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? (error as Error).message;
    throw new ProgramFileError([{ file, line: 1, column: 1, message: `cannot read the program file (${code})` }]);
  }
  return loadProgramText(text, file, library);
}
