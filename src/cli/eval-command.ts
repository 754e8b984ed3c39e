/**
 * `pithy eval DIR`: solves every task with the test outputs hidden, then scores against them.
 * Results are appended to a JSON-lines file as each task finishes; running again with the same
 * file resumes where the last run stopped.
 */
import { basename, resolve } from 'node:path';
import type { Command } from 'commander';
import { readResults, ResultsWriter, type ResultLine } from '../batch/results-file.ts';
import { scoreReport } from '../batch/score.ts';
import { solveFiles } from '../batch/solve-files.ts';
import { summarise, summaryLines } from '../batch/summary.ts';
import { ProgressBar } from '../output/progress-bar.ts';
import { addSolveFlags, solveOptionsFrom, type SharedSolveFlags } from './solve-options.ts';
import { expandTaskPaths } from './task-paths.ts';
import { loadPriorsOption, type PriorsOption } from './priors-option.ts';
import { writeError, writeJson, writeLines } from './output.ts';

interface EvalFlags extends SharedSolveFlags {
  results?: string;
  json?: boolean;
  verbose?: boolean;
}

export function registerEvalCommand(program: Command): void {
  addSolveFlags(
    program
      .command('eval')
      .description('solve every task in a directory with test outputs hidden, then score the attempts against them')
      .argument('<dir>', 'directory of task JSON files'),
  )
    .option('--results <file>', 'JSON-lines file of per-task results; an existing one is resumed (default: eval-<dir>.jsonl)')
    .option('--verbose', 'print a line per task as it finishes')
    .option('--json', 'print the summary as JSON')
    .action(async (dir: string, flags: EvalFlags) => {
      let priors: PriorsOption | undefined;
      try {
        priors = loadPriorsOption(flags.priors);
      } catch (error) {
        writeError((error as Error).message);
        process.exitCode = 2;
        return;
      }
      const { files, problems } = expandTaskPaths([dir]);
      for (const p of problems) writeError(p);
      if (problems.length > 0) {
        process.exitCode = 1;
        return;
      }
      const resultsPath = flags.results ?? `eval-${basename(resolve(dir))}.jsonl`;
      const previous = readResults(resultsPath);
      const otherPriors = previous.find((l) => l.priors !== priors?.hash);
      if (otherPriors) {
        const named = (hash: string | undefined) => (hash === undefined ? "the primitives' own bits" : `priors ${hash}`);
        writeError(`${resultsPath}: holds results solved with ${named(otherPriors.priors)}, but this run uses ${named(priors?.hash)}; choose another --results file so the runs are not mixed`);
        process.exitCode = 2;
        return;
      }
      const known = new Map(previous.map((l) => [resolve(l.file), l]));
      const lines: ResultLine[] = files.flatMap((f) => (known.has(resolve(f)) ? [known.get(resolve(f))!] : []));
      const todo = files.filter((f) => !known.has(resolve(f)));
      if (lines.length > 0) writeError(`resuming from ${resultsPath}: ${lines.length} of ${files.length} tasks already done`);
      const writer = new ResultsWriter(resultsPath);
      const bar = new ProgressBar(todo.length, process.stderr);
      let solvedNow = 0;
      await solveFiles(todo, {
        jobs: flags.jobs,
        solve: solveOptionsFrom(flags),
        ...(priors ? { priors: priors.bits } : {}),
        onReport: (report) => {
          let solved = false;
          try {
            solved = scoreReport(report).solved;
          } catch (error) {
            writeError(`${report.file}: cannot score: ${(error as Error).message}`);
          }
          const line: ResultLine = { ...report, solved, ...(priors ? { priors: priors.hash } : {}) };
          writer.append(line);
          lines.push(line);
          if (solved) solvedNow++;
          if (flags.verbose && !flags.json) {
            if (bar.enabled) process.stderr.write('\r');
            writeLines([`${solved ? 'solved ' : report.status === 'error' ? 'error  ' : 'missed '} ${report.task} ${report.seconds.toFixed(1)} s${report.solutions[0] ? `, ${report.solutions[0].bits} bits` : ''}`]);
          }
          bar.tick(solvedNow);
        },
      });
      bar.finish();
      const summary = summarise(lines);
      if (flags.json) writeJson({ results: resultsPath, ...(priors ? { priors: priors.hash } : {}), ...summary });
      else writeLines([...summaryLines(summary), ...(priors ? [`priors: ${priors.file} (${priors.hash})`] : []), `per-task results: ${resultsPath}`]);
    });
}
