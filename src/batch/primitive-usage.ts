/**
 * Which primitives the solved tasks of eval results files use: the counts `pithy fit-priors`
 * fits bits to, and the report of primitives no solution uses or only one solved task uses.
 *
 * From each solved task (scored against its test outputs) the cheapest program is counted, with
 * its steps written out where used, as the description length counts them. A task found in more
 * than one file is counted once, from the first file that has it solved.
 */
import { existsSync } from 'node:fs';
import { basename } from 'node:path';
import { parseProgram } from '../language/parser.ts';
import { primitiveUses } from '../language/program-walk.ts';
import type { Library } from '../library/library.ts';
import { readResults } from './results-file.ts';

export interface PrimitiveUsage {
  /** Solved task ids counted, sorted. */
  readonly solvedTasks: readonly string[];
  /** Uses of each primitive over the counted programs (only primitives used at least once). */
  readonly uses: ReadonlyMap<string, number>;
  /** The solved tasks whose program uses each primitive, sorted (only primitives used at least once). */
  readonly tasks: ReadonlyMap<string, readonly string[]>;
  /** All uses together. */
  readonly totalUses: number;
}

export class ResultsUsageError extends Error {}

export function usageFromResults(paths: readonly string[], library: Library): PrimitiveUsage {
  const programs = new Map<string, Map<string, number>>();
  for (const path of paths) {
    if (!existsSync(path)) throw new ResultsUsageError(`${path}: no such results file`);
    for (const line of readResults(path)) {
      if (line.solved !== true || programs.has(line.task)) continue;
      const text = line.solutions[0]?.program;
      if (typeof text !== 'string') throw new ResultsUsageError(`${path}: task ${line.task}: solved but without a program`);
      let uses: Map<string, number>;
      try {
        uses = primitiveUses(parseProgram(text, `${basename(path)} task ${line.task}`));
      } catch (error) {
        throw new ResultsUsageError(`${path}: task ${line.task}: the program does not parse: ${(error as Error).message}`);
      }
      for (const name of uses.keys()) {
        if (!library.get(name)) throw new ResultsUsageError(`${path}: task ${line.task}: the program calls '${name}', which this library does not hold (results of another library?)`);
      }
      programs.set(line.task, uses);
    }
  }
  const solvedTasks = [...programs.keys()].sort();
  const uses = new Map<string, number>();
  const tasks = new Map<string, string[]>();
  let totalUses = 0;
  for (const task of solvedTasks) {
    for (const [name, n] of programs.get(task)!) {
      uses.set(name, (uses.get(name) ?? 0) + n);
      const list = tasks.get(name) ?? [];
      list.push(task);
      tasks.set(name, list);
      totalUses += n;
    }
  }
  return { solvedTasks, uses, tasks, totalUses };
}

export interface UsageReport {
  readonly solvedTasks: number;
  readonly primitives: number;
  /** Primitives in no counted solution, in library order. */
  readonly unused: readonly string[];
  /** Primitives in exactly one solved task's program, in library order, with that task. */
  readonly singleTask: readonly { readonly primitive: string; readonly task: string }[];
  /** Primitives in two or more solved tasks. */
  readonly severalTasks: number;
}

export function usageReport(usage: PrimitiveUsage, library: Library): UsageReport {
  const unused: string[] = [];
  const singleTask: { primitive: string; task: string }[] = [];
  for (const p of library.primitives) {
    const tasks = usage.tasks.get(p.name) ?? [];
    if (tasks.length === 0) unused.push(p.name);
    else if (tasks.length === 1) singleTask.push({ primitive: p.name, task: tasks[0]! });
  }
  return {
    solvedTasks: usage.solvedTasks.length,
    primitives: library.primitives.length,
    unused,
    singleTask,
    severalTasks: library.primitives.length - unused.length - singleTask.length,
  };
}
