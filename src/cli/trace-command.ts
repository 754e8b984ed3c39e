/**
 * `pithy trace`: trace records as JSON lines (one per task and program), from a program file
 * and tasks, or from the results file of `pithy eval` (every program of every solved task).
 */
import { closeSync, existsSync, openSync, writeSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import type { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { readResults } from '../batch/results-file.ts';
import { parseProgram, ProgramSyntaxError } from '../language/parser.ts';
import { ProgramTypeError } from '../language/checker.ts';
import { readTaskFile, readTasks, TaskFileError } from '../tasks/read-task.ts';
import type { Task } from '../tasks/task.ts';
import type { Program } from '../language/ast.ts';
import { traceRecord } from '../training/trace-record.ts';
import { formatProblem, loadProgramFile, ProgramFileError } from './program-file.ts';
import { writeError, writeLines } from './output.ts';

interface TraceFlags {
  results?: string;
  found?: boolean;
  out?: string;
  force?: boolean;
}

/** Where a results line's task file is: as written, or beside the results file. */
function taskFileOf(file: string, resultsPath: string): string {
  if (existsSync(file)) return file;
  const beside = resolve(dirname(resultsPath), file);
  return existsSync(beside) ? beside : file;
}

/** The (task, program) pairs a results file names, and the problems met reading them. */
function fromResults(path: string, found: boolean): { jobs: { task: Task; program: Program; source: string }[]; problems: string[] } {
  const jobs: { task: Task; program: Program; source: string }[] = [];
  const problems: string[] = [];
  if (!existsSync(path)) return { jobs, problems: [`${path}: no such results file`] };
  for (const line of readResults(path)) {
    if (!(line.solved || (found && line.status === 'found'))) continue;
    let task: Task;
    try {
      task = readTaskFile(taskFileOf(line.file, path));
    } catch (error) {
      if (!(error instanceof TaskFileError)) throw error;
      problems.push(`${path}: task ${line.task}: ${error.message}`);
      continue;
    }
    line.solutions.forEach((solution, i) => {
      const source = `${path}: task ${line.task}, program ${i + 1}`;
      try {
        jobs.push({ task, program: parseProgram(solution.program, source), source });
      } catch (error) {
        if (!(error instanceof ProgramSyntaxError)) throw error;
        problems.push(error.message);
      }
    });
  }
  return { jobs, problems };
}

export function registerTraceCommand(program: Command): void {
  program
    .command('trace')
    .description('write trace records as JSON lines: program text, tokens, syntax tree, bits, and every step on every input')
    .argument('[program]', 'a program file (with task files or directories after it)')
    .argument('[tasks...]', 'task JSON files or directories of them')
    .option('--results <file>', 'instead of a program: the results file of pithy eval; every program of every solved task')
    .option('--found', 'with --results, also tasks whose programs fit the demonstrations but missed a test output')
    .option('--out <file>', 'write the records to this file instead of standard output')
    .option('--force', 'allow --out to replace an existing file')
    .action((programFile: string | undefined, taskPaths: string[], flags: TraceFlags) => {
      const problems: string[] = [];
      let jobs: { task: Task; program: Program; source: string }[] = [];
      if (flags.results !== undefined) {
        if (programFile !== undefined) {
          writeError('pithy trace: give either --results FILE or a program file with tasks, not both');
          process.exitCode = 2;
          return;
        }
        const read = fromResults(flags.results, flags.found === true);
        jobs = read.jobs;
        problems.push(...read.problems);
      } else {
        if (programFile === undefined || taskPaths.length === 0) {
          writeError('pithy trace: give a program file and at least one task (or --results FILE)');
          process.exitCode = 2;
          return;
        }
        let loaded;
        try {
          loaded = loadProgramFile(programFile, defaultLibrary);
        } catch (error) {
          if (!(error instanceof ProgramFileError)) throw error;
          writeError(error.problems.map(formatProblem).join('\n'));
          process.exitCode = 1;
          return;
        }
        for (const entry of readTasks(taskPaths)) {
          if (entry.ok) jobs.push({ task: entry.task, program: loaded.program, source: programFile });
          else problems.push(entry.error.message);
        }
      }
      if (flags.out !== undefined && existsSync(flags.out) && !flags.force) {
        writeError(`${flags.out}: already exists; pithy will not overwrite it (choose another name or pass --force)`);
        process.exitCode = 2;
        return;
      }
      const fd = flags.out !== undefined ? openSync(flags.out, 'w') : undefined;
      let written = 0;
      try {
        for (const job of jobs) {
          let line: string;
          try {
            line = JSON.stringify(traceRecord(job.task, job.program, defaultLibrary)) + '\n';
          } catch (error) {
            if (!(error instanceof ProgramTypeError)) throw error;
            problems.push(`${job.source}: ${error.message}`);
            continue;
          }
          if (fd !== undefined) writeSync(fd, line);
          else process.stdout.write(line);
          written++;
        }
      } finally {
        if (fd !== undefined) closeSync(fd);
      }
      for (const p of problems) writeError(p);
      if (fd !== undefined) writeLines([`${written} trace record${written === 1 ? '' : 's'} written to ${flags.out}`]);
      if (problems.length > 0) process.exitCode = 1;
    });
}
