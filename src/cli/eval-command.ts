/**
 * `pithy eval DIR`: solves every task with the test outputs hidden, then scores against them.
 * Results are appended to a JSON-lines file as each task finishes; running again with the same
 * file (and the same settings) resumes where the last run stopped.
 */
import { basename, resolve } from 'node:path';
import type { Command } from 'commander';
import { runResumable, type ResumableRunOutcome } from '../batch/resumable-run.ts';
import { selectShard, shardLabel } from '../batch/shard.ts';
import { taskNameOf } from '../batch/solve-file.ts';
import { summarise, summaryLines } from '../batch/summary.ts';
import { ProgressBar } from '../output/progress-bar.ts';
import { catchInterruptions } from './interrupt.ts';
import { reportRunProblem } from './run-problems.ts';
import { addShardFlags, announceShard, resolveShard, type ShardFlags } from './shard-options.ts';
import { addSolveFlags, settingsFrom, solveOptionsFrom, type SharedSolveFlags } from './solve-options.ts';
import { expandTaskPaths } from './task-paths.ts';
import { priorsOrStop } from './priors-option.ts';
import { writeError, writeJson, writeLines } from './output.ts';

interface EvalFlags extends SharedSolveFlags, ShardFlags {
  results?: string;
  json?: boolean;
  verbose?: boolean;
}

export function registerEvalCommand(program: Command): void {
  addShardFlags(
    addSolveFlags(
      program
        .command('eval')
        .description('solve every task in a directory with test outputs hidden, then score the attempts against them')
        .argument('<dir>', 'directory of task JSON files'),
    ),
  )
    .option('--results <file>', 'JSON-lines file of per-task results; an existing one made with the same settings is resumed (default: eval-<dir>.jsonl, or eval-<dir>-shard-I-of-N.jsonl for a shard)')
    .option('--verbose', 'print a line per task as it finishes')
    .option('--json', 'print the summary as JSON')
    .action(async (dir: string, flags: EvalFlags) => {
      const priors = priorsOrStop(flags.priors);
      if (priors === null) return;
      const shard = resolveShard(flags);
      if (shard === null) return;
      const { files: allFiles, problems } = expandTaskPaths([dir]);
      for (const p of problems) writeError(p);
      if (problems.length > 0) {
        process.exitCode = 2;
        return;
      }
      const files = selectShard(allFiles, taskNameOf, shard);
      if (shard !== undefined) announceShard(shard, files.length, allFiles.length);
      const resultsPath = flags.results ?? `eval-${basename(resolve(dir))}${shard ? `-shard-${shard.index}-of-${shard.count}` : ''}.jsonl`;
      const interruption = catchInterruptions();
      let bar: ProgressBar | undefined;
      let solvedNow = 0;
      let outcome: ResumableRunOutcome;
      try {
        outcome = await runResumable({
          files,
          resultsFile: resultsPath,
          settings: settingsFrom(flags),
          ...(shard !== undefined ? { shard: shardLabel(shard) } : {}),
          ...(priors ? { priors: priors.hash } : {}),
          retry: flags.retry,
          score: true,
          batch: { jobs: flags.jobs, solve: solveOptionsFrom(flags), memoryCapMb: flags.memoryCap, signal: interruption.signal, ...(priors ? { priors: priors.bits } : {}) },
          onPlan: (plan) => {
            if (plan.done.length > 0) writeError(`resuming from ${resultsPath}: ${plan.done.length} of ${files.length} tasks already done`);
            if (plan.retried.length > 0) writeError(`solving again (worker crashed or overran): ${plan.retried.join(', ')}`);
            bar = new ProgressBar(plan.todo.length, process.stderr);
          },
          onScoreProblem: (report, problem) => writeError(`${report.file}: cannot score: ${problem}`),
          onLine: (line) => {
            if (line.solved) solvedNow++;
            if (flags.verbose && !flags.json) {
              if (bar?.enabled) process.stderr.write('\r');
              writeLines([`${line.solved ? 'solved ' : line.status === 'error' ? 'error  ' : 'missed '} ${line.task} ${line.seconds.toFixed(1)} s${line.solutions[0] ? `, ${line.solutions[0].bits} bits` : ''}`]);
            }
            bar?.tick(solvedNow);
          },
        });
      } catch (error) {
        bar?.finish();
        if (reportRunProblem(error, resultsPath)) return;
        throw error;
      } finally {
        interruption.dispose();
      }
      bar?.finish();
      const summary = summarise(outcome.lines);
      if (outcome.interrupted) {
        writeError(`interrupted: ${outcome.lines.length} of ${files.length} tasks finished, every one kept in ${resultsPath}; run the same command again to resume`);
      }
      if (flags.json) writeJson({ results: resultsPath, ...(outcome.interrupted ? { interrupted: true } : {}), ...(priors ? { priors: priors.hash } : {}), ...summary });
      else writeLines([...summaryLines(summary), ...(priors ? [`priors: ${priors.file} (${priors.hash})`] : []), `per-task results: ${resultsPath}`]);
      if (outcome.interrupted) process.exitCode = interruption.exitCode ?? 130;
    });
}
