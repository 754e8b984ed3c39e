/**
 * `pithy report INPUT... --out FILE.html`: one self-contained HTML page for a run. An INPUT is a
 * results file (eval's JSON lines, or the JSON of `solve --json`) or task files and folders,
 * which are solved first (test outputs hidden from the search, as in `solve`).
 */
import { existsSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import type { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { solveFiles } from '../batch/solve-files.ts';
import { renderReport, VERDICT_WORDS } from '../output/html-report.ts';
import { reportTask, type ReportTask, type SolverOutcome, type Verdict } from '../output/report-data.ts';
import { readTaskFile, TaskFileError } from '../tasks/read-task.ts';
import type { Task } from '../tasks/task.ts';
import { addSolveFlags, solveOptionsFrom, type SharedSolveFlags } from './solve-options.ts';
import { expandTaskPaths } from './task-paths.ts';
import { writeError, writeLines } from './output.ts';

interface ReportFlags extends SharedSolveFlags {
  out: string;
  force?: boolean;
  numbers?: boolean;
  title?: string;
}

function isOutcome(value: unknown): value is SolverOutcome {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Record<string, unknown>;
  return typeof v.task === 'string' && typeof v.file === 'string' && typeof v.status === 'string' && Array.isArray(v.solutions);
}

/**
 * What an INPUT file holds: solver outcomes (a JSON list, or JSON lines), or a task to solve.
 * Throws an Error with a plain message when it is neither.
 */
export function readReportInput(path: string): { kind: 'outcomes'; outcomes: SolverOutcome[] } | { kind: 'task' } {
  const text = readFileSync(path, 'utf8');
  let whole: unknown;
  try {
    whole = JSON.parse(text);
  } catch {
    whole = undefined;
  }
  if (Array.isArray(whole)) {
    const bad = whole.findIndex((entry) => !isOutcome(entry));
    if (bad >= 0) throw new Error(`${path}: entry ${bad} is not a task result (expected "task", "file", "status" and "solutions")`);
    return { kind: 'outcomes', outcomes: whole as SolverOutcome[] };
  }
  if (whole !== undefined && typeof whole === 'object' && whole !== null && 'train' in whole) return { kind: 'task' };
  if (whole !== undefined && isOutcome(whole)) return { kind: 'outcomes', outcomes: [whole] };
  const outcomes: SolverOutcome[] = [];
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!.trim();
    if (line === '') continue;
    let parsed: unknown;
    try {
      parsed = JSON.parse(line);
    } catch {
      // The last line of an interrupted eval may be torn; any other bad line is an error.
      if (i >= lines.length - 2) continue;
      throw new Error(`${path}:${i + 1}: neither a task file nor a results file (line ${i + 1} is not JSON)`);
    }
    if (!isOutcome(parsed)) throw new Error(`${path}:${i + 1}: not a task result (expected "task", "file", "status" and "solutions")`);
    outcomes.push(parsed);
  }
  if (outcomes.length === 0) throw new Error(`${path}: holds no task results and is not a task file`);
  return { kind: 'outcomes', outcomes };
}

/** The task a results line names, looked for as written and beside the results file. */
function taskFor(outcome: SolverOutcome, resultsFile: string | undefined): { task?: Task; note?: string } {
  const candidates = [outcome.file];
  if (resultsFile !== undefined) candidates.push(join(dirname(resultsFile), outcome.file));
  let problem = '';
  for (const file of candidates) {
    if (!existsSync(file)) continue;
    try {
      return { task: readTaskFile(file) };
    } catch (error) {
      if (!(error instanceof TaskFileError)) throw error;
      problem = error.message;
    }
  }
  if (outcome.status === 'error') return {};
  return { note: problem !== '' ? `cannot draw the task: ${problem}` : `cannot draw the task: ${outcome.file} was not found` };
}

export function registerReportCommand(program: Command): void {
  addSolveFlags(
    program
      .command('report')
      .description('write one self-contained HTML page showing a run: results files of eval or solve --json, or task files and folders to solve first')
      .argument('<inputs...>', 'results files (eval JSON lines, solve --json output), task JSON files or folders of them'),
  )
    .requiredOption('--out <file>', 'the HTML file to write')
    .option('--force', 'allow --out to replace an existing file')
    .option('--numbers', 'start with colour numbers printed inside the cells (for readers who tell colours apart poorly)')
    .option('--title <text>', 'the page title (default: pithy report)')
    .action(async (inputs: string[], flags: ReportFlags) => {
      if (existsSync(flags.out) && !flags.force) {
        writeError(`${flags.out}: already exists; pithy will not overwrite it (choose another name or pass --force)`);
        process.exitCode = 2;
        return;
      }
      const outcomes: { outcome: SolverOutcome; from?: string }[] = [];
      const toSolve: string[] = [];
      let bad = false;
      for (const input of inputs) {
        let isFolder = false;
        try {
          isFolder = statSync(input).isDirectory();
        } catch {
          writeError(`${input}: no such file or folder`);
          bad = true;
          continue;
        }
        if (isFolder) {
          const { files, problems } = expandTaskPaths([input]);
          for (const p of problems) writeError(p);
          if (files.length === 0) {
            writeError(`${input}: the folder holds no task files (*.json)`);
            bad = true;
          }
          toSolve.push(...files);
          continue;
        }
        try {
          const read = readReportInput(input);
          if (read.kind === 'task') toSolve.push(input);
          else outcomes.push(...read.outcomes.map((outcome) => ({ outcome, from: input })));
        } catch (error) {
          writeError((error as Error).message);
          bad = true;
        }
      }
      if (bad) {
        process.exitCode = 2;
        return;
      }
      if (toSolve.length > 0) {
        writeError(`solving ${toSolve.length} task${toSolve.length === 1 ? '' : 's'} first (at most ${flags.timeLimit} s each)`);
        const reports = await solveFiles(toSolve, { jobs: flags.jobs, solve: solveOptionsFrom(flags) });
        outcomes.push(...reports.map((outcome) => ({ outcome })));
      }
      const tasks: ReportTask[] = outcomes.map(({ outcome, from }) => {
        const { task, note } = taskFor(outcome, from);
        return reportTask(outcome, task, defaultLibrary, note);
      });
      const source = inputs.map((i) => resolve(i) === resolve('.') ? '.' : i).join(', ');
      writeFileSync(flags.out, renderReport(tasks, { title: flags.title ?? 'pithy report', source: `from ${source}`, numbers: flags.numbers === true }));
      const tally = (Object.keys(VERDICT_WORDS) as Verdict[])
        .map((v) => ({ v, n: tasks.filter((t) => t.verdict === v).length }))
        .filter((c) => c.n > 0)
        .map((c) => `${c.n} ${VERDICT_WORDS[c.v]}`)
        .join(', ');
      writeLines([`wrote ${flags.out}: ${tasks.length} task${tasks.length === 1 ? '' : 's'} (${tally})`]);
      if (tasks.some((t) => t.verdict === 'error')) process.exitCode = 1;
    });
}
