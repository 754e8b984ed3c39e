/**
 * `pithy solve PATH...`: per task, the cheapest program, its cost in bits, the time, and the
 * candidates tried and kept. Never reads test outputs. With `--predictions FILE`, each task's
 * line is appended as it finishes, and running again with the same file resumes.
 */
import { existsSync } from 'node:fs';
import type { Command } from 'commander';
import { recordPathFor } from '../batch/predictions.ts';
import { replaceFile } from '../batch/results-file.ts';
import { runResumable } from '../batch/resumable-run.ts';
import { selectShard, shardLabel } from '../batch/shard.ts';
import { taskNameOf } from '../batch/solve-file.ts';
import { solveFiles } from '../batch/solve-files.ts';
import type { ReportedSolution, TaskReport } from '../batch/task-report.ts';
import { rankingBits } from '../search/rank-attempts.ts';
import { catchInterruptions } from './interrupt.ts';
import { reportRunProblem } from './run-problems.ts';
import { addShardFlags, announceShard, resolveShard, type ShardFlags } from './shard-options.ts';
import { addSolveFlags, settingsFrom, solveOptionsFrom, type SharedSolveFlags } from './solve-options.ts';
import { expandTaskPaths } from './task-paths.ts';
import { stdoutColourMode, writeError, writeJson, writeLines } from './output.ts';
import { explainLines } from './explain.ts';
import { existingProgramFiles, writeProgramFile } from './program-files.ts';
import { priorsOrStop } from './priors-option.ts';

interface SolveFlags extends SharedSolveFlags, ShardFlags {
  json?: boolean;
  predictions?: string;
  force?: boolean;
  explain?: boolean;
  programs?: string;
}

export function reportLines(report: TaskReport): string[] {
  if (report.status === 'error') return [`${report.task}: error: ${report.error}`];
  const s = report.statistics;
  if (s === undefined) return [`${report.task}: no program found (${stopWords(report.reason)}${report.error ? `: ${report.error}` : ''})`];
  const figures = `${report.seconds.toFixed(2)} s, ${s.candidates.toLocaleString('en')} candidate${s.candidates === 1 ? '' : 's'} tried, ${s.kept.toLocaleString('en')} kept`;
  if (report.status === 'not found') return [`${report.task}: no program found (${stopWords(report.reason)}; ${figures})`];
  const first = report.solutions[0]!;
  const lines = [`${report.task}: ${first.bits} bits${sizeBreak(first)} (${figures})`];
  report.solutions.forEach((solution, i) => {
    if (i > 0) lines.push(`  attempt ${i + 1}, ${solution.bits} bits${sizeBreak(solution)}${otherWay(first, solution)}:`);
    lines.push(...solution.program.trimEnd().split('\n').map((l) => `    ${l}`));
  });
  return lines;
}

/**
 * Says that a later attempt is of the other way than the first (a table read off the
 * demonstrations, or a composed program): the hedge of src/search/rank-attempts.ts, which may put
 * it before cheaper programs of the first one's way.
 */
function otherWay(first: ReportedSolution, solution: ReportedSolution): string {
  if (Boolean(first.fromTable) === Boolean(solution.fromTable)) return '';
  return solution.fromTable ? ', the cheapest table read off the demonstrations' : ', the cheapest composed program';
}

/** Says that a program breaks the output size the demonstrations settle, and the bits it was ranked by. */
function sizeBreak(solution: ReportedSolution): string {
  return solution.breaksSize ? `, breaking the output size the demonstrations settle, ranked as ${rankingBits(solution)}` : '';
}

export function stopWords(reason: TaskReport['reason']): string {
  switch (reason) {
    case 'time':
      return 'time limit reached';
    case 'candidates':
      return 'candidate cap reached';
    case 'memory':
      return 'memory cap reached';
    case 'exhausted':
      return 'every program up to the cost cap tried';
    case 'solved':
      return 'solved';
    case 'error':
      return 'error';
  }
}

export function registerSolveCommand(program: Command): void {
  addShardFlags(
    addSolveFlags(
      program
        .command('solve')
        .description('find the shortest program for each task (files or directories); test outputs are never read')
        .argument('<paths...>', 'task JSON files or directories of them'),
    ),
  )
    .option('--predictions <file>', 'append one JSON line per task, as each finishes, with the attempts for each test input; an existing file made with the same settings is resumed')
    .option('--programs <dir>', 'write each program found as DIR/<task>.pithy, ready for pithy run and pithy check')
    .option('--explain', "draw every step's value on the first demonstration and the predicted test outputs")
    .option('--force', 'let --predictions replace an existing file instead of resuming it, and --programs replace existing programs')
    .option('--json', 'print the reports as JSON')
    .action(async (paths: string[], flags: SolveFlags) => {
      const priors = priorsOrStop(flags.priors);
      if (priors === null) return;
      const shard = resolveShard(flags);
      if (shard === null) return;
      const { files: allFiles, problems } = expandTaskPaths(paths);
      for (const p of problems) writeError(p);
      const files = selectShard(allFiles, taskNameOf, shard);
      if (shard !== undefined) announceShard(shard, files.length, allFiles.length);
      const predictions = flags.predictions;
      const record = predictions !== undefined ? recordPathFor(predictions) : undefined;
      if (predictions !== undefined && record !== undefined) {
        if (flags.force) {
          for (const f of [predictions, record]) if (existsSync(f)) replaceFile(f, '');
        } else if (existsSync(predictions) && !existsSync(record)) {
          writeError(`${predictions}: already exists without the record pithy keeps beside its predictions (${record}), so it cannot be resumed; pithy will not overwrite it (choose another name or pass --force)`);
          process.exitCode = 2;
          return;
        }
      }
      const clashes = flags.programs && !flags.force ? existingProgramFiles(flags.programs, files) : [];
      if (clashes.length > 0) {
        writeError(`${clashes.join(', ')}: already exist${clashes.length === 1 ? 's' : ''}; pithy will not overwrite ${clashes.length === 1 ? 'it' : 'them'} (choose another folder or pass --force)`);
        process.exitCode = 2;
        return;
      }
      const interruption = catchInterruptions();
      const batch = { jobs: flags.jobs, solve: solveOptionsFrom(flags), memoryCapMb: flags.memoryCap, signal: interruption.signal, ...(priors ? { priors: priors.bits } : {}) };
      const show = (report: TaskReport) => {
        if (!flags.json) writeLines(reportLines(report));
        if (flags.explain && !flags.json) writeLines(explainLines(report, stdoutColourMode()));
        if (flags.programs) writeProgramFile(flags.programs, report);
      };
      let reports: TaskReport[];
      let interrupted: boolean;
      try {
        if (predictions !== undefined && record !== undefined) {
          const outcome = await runResumable({
            files,
            resultsFile: record,
            predictionsFile: predictions,
            settings: settingsFrom(flags),
            ...(shard !== undefined ? { shard: shardLabel(shard) } : {}),
            ...(priors ? { priors: priors.hash } : {}),
            retry: flags.retry,
            batch,
            onPlan: (plan) => {
              if (plan.done.length > 0) writeError(`resuming ${predictions}: ${plan.done.length} of ${files.length} tasks already done`);
              if (plan.retried.length > 0) writeError(`solving again (worker crashed or overran): ${plan.retried.join(', ')}`);
              for (const line of plan.done) show(line);
            },
            onLine: show,
          });
          reports = outcome.lines;
          interrupted = outcome.interrupted;
        } else {
          reports = await solveFiles(files, { ...batch, onReport: show });
          interrupted = reports.length < files.length;
        }
      } catch (error) {
        if (reportRunProblem(error, record ?? '')) return;
        throw error;
      } finally {
        interruption.dispose();
      }
      if (flags.json) writeJson(reports);
      if (interrupted) {
        writeError(
          `interrupted: ${reports.length} of ${files.length} tasks finished` +
            (predictions !== undefined ? `, every one kept in ${predictions}; run the same command again to resume` : ''),
        );
        process.exitCode = interruption.exitCode ?? 130;
      } else if (problems.length > 0) process.exitCode = 2;
      else if (reports.some((r) => r.status === 'error')) process.exitCode = 1;
    });
}
