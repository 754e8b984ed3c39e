/** `pithy check PROGRAM`: parse and type-check a program file, printing each step's type. */
import type { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { formatProblem, loadProgramFile, ProgramFileError } from './program-file.ts';
import { writeError, writeJson, writeLines } from './output.ts';

export function registerCheckCommand(program: Command): void {
  program
    .command('check')
    .description('parse and type-check a program file; prints the type of every step')
    .argument('<program>', "file with the program text ('-' reads standard input)")
    .option('--json', 'print the result as JSON')
    .action((file: string, options: { json?: boolean }) => {
      try {
        const loaded = loadProgramFile(file, defaultLibrary);
        const steps = loaded.program.steps.map((s) => ({ name: s.name, type: loaded.types.steps.get(s.name)! }));
        if (options.json) {
          writeJson({ program: file, ok: true, input: loaded.program.input, steps, answer: loaded.types.answer });
          return;
        }
        const width = Math.max(loaded.program.input.length, 6, ...steps.map((s) => s.name.length));
        writeLines([
          `${loaded.file}: well typed`,
          `  ${loaded.program.input.padEnd(width)} : Grid (the input)`,
          ...steps.map((s) => `  ${s.name.padEnd(width)} : ${s.type}`),
          `  ${'answer'.padEnd(width)} : ${loaded.types.answer}`,
        ]);
      } catch (error) {
        if (!(error instanceof ProgramFileError)) throw error;
        if (options.json) writeJson({ program: file, ok: false, problems: error.problems });
        else writeError(error.problems.map(formatProblem).join('\n'));
        process.exitCode = 2;
      }
    });
}
