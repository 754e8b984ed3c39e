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
import { fileProblem } from '../tasks/read-task.ts';

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
  // Line 0: a problem of the file itself (no such file, a folder), which has no place in the text.
  const place = p.line > 0 ? `${p.file}:${p.line}:${p.column}` : p.file;
  return `${place}: ${where}${p.message}${detail}`;
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
      error.problems.map((p) => ({
        file,
        ...(p.line !== undefined && p.column !== undefined ? { line: p.line, column: p.column } : locateStep(text, p.step)),
        step: p.step,
        message: p.message,
        expected: p.expected,
        found: p.found,
      })),
    );
  }
}

/** Reads, parses and checks a program file; '-' reads the program from standard input. */
export function loadProgramFile(file: string, library: Library): LoadedProgram {
  const name = file === '-' ? 'standard input' : file;
  let text: string;
  try {
    text = readFileSync(file === '-' ? 0 : file, 'utf8');
  } catch (error) {
    throw new ProgramFileError([{ file: name, line: 0, column: 0, message: fileProblem(error) }]);
  }
  return loadProgramText(text, name, library);
}
