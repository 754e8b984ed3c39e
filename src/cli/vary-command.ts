/**
 * `pithy vary PROGRAM TASK`: new demonstration pairs for a task the program solves, from new
 * inputs drawn like the task's own. Writes a task file whose train list holds the new pairs and
 * whose test list is the task's own, with the program beside them.
 */
import { existsSync, writeFileSync } from 'node:fs';
import { InvalidArgumentError, type Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { printProgram } from '../language/printer.ts';
import { readTaskFile, TaskFileError } from '../tasks/read-task.ts';
import type { Task } from '../tasks/task.ts';
import { unreproducedPairs, varyTask } from '../training/vary.ts';
import { formatJson, writeError } from './output.ts';
import { formatProblem, loadProgramFile, ProgramFileError, type LoadedProgram } from './program-file.ts';
import { positiveNumber } from './solve-options.ts';

interface VaryFlags {
  count: number;
  seed: number;
  out?: string;
  force?: boolean;
}

function seedOption(text: string): number {
  const value = Number(text);
  if (!/^[0-9]+$/.test(text.trim()) || !Number.isSafeInteger(value)) throw new InvalidArgumentError(`--seed must be a whole number 0 or above, got '${text}'`);
  return value;
}

export function registerVaryCommand(program: Command): void {
  program
    .command('vary')
    .description("draw new inputs like a solved task's own, run the program, and write the pairs it succeeds on as a new task file")
    .argument('<program>', 'a program file that reproduces every pair of the task')
    .argument('<task>', 'the task JSON file')
    .option('--count <n>', 'new pairs wanted', positiveNumber('--count', true), 100)
    .option('--seed <n>', 'seed of the draws: the same seed gives the same pairs', seedOption, 1)
    .option('--out <file>', 'write the task file here instead of standard output')
    .option('--force', 'allow --out to replace an existing file')
    .action((programFile: string, taskFile: string, flags: VaryFlags) => {
      let loaded: LoadedProgram;
      let task: Task;
      try {
        loaded = loadProgramFile(programFile, defaultLibrary);
        task = readTaskFile(taskFile);
      } catch (error) {
        if (error instanceof ProgramFileError) writeError(error.problems.map(formatProblem).join('\n'));
        else if (error instanceof TaskFileError) writeError(error.message);
        else throw error;
        process.exitCode = 1;
        return;
      }
      const missed = unreproducedPairs(loaded.program, task, defaultLibrary);
      if (missed.length > 0) {
        writeError(`${programFile} does not reproduce ${missed.join(', ')} of ${taskFile}; vary needs a program that solves the task`);
        process.exitCode = 1;
        return;
      }
      if (flags.out !== undefined && existsSync(flags.out) && !flags.force) {
        writeError(`${flags.out}: already exists; pithy will not overwrite it (choose another name or pass --force)`);
        process.exitCode = 2;
        return;
      }
      const v = varyTask(task, loaded.program, defaultLibrary, { seed: flags.seed, count: flags.count });
      const text =
        formatJson({
          train: v.pairs.map((p) => ({ input: p.input.toRows(), output: p.output.toRows() })),
          test: task.test.map((t) => ({ input: t.input.toRows(), output: t.output?.toRows() })),
          program: printProgram(loaded.program),
          variedFrom: task.name,
        }) + '\n';
      if (flags.out !== undefined) writeFileSync(flags.out, text);
      else process.stdout.write(text);
      const p = v.profile;
      writeError(
        `${v.pairs.length} new pair${v.pairs.length === 1 ? '' : 's'} for ${task.name}${flags.out !== undefined ? ` written to ${flags.out}` : ''} ` +
          `(inputs like its own: ${p.kind}, colours ${p.colours.join(' ')} on ${p.background}, sizes ${[...new Set(p.sizes.map((s) => `${s.height}x${s.width}`))].join(' ')}; ` +
          `${v.draws} draws, ${v.failed} on which the program failed)`,
      );
      if (v.pairs.length === 0) process.exitCode = 1;
    });
}
