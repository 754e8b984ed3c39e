/**
 * `pithy merge FILE... --output FILE`: combines the results files (eval) or predictions files
 * (solve) that the shards of a run wrote, checks that every task appears exactly once, that the
 * settings recorded on every line agree and which shards are missing, and prints the summary a
 * single run would.
 */
import { existsSync } from 'node:fs';
import type { Command } from 'commander';
import { mergeInputs, MergeInputError, readMergeInput, type MergeInput, type MergeKind } from '../batch/merge.ts';
import { predictionsText, recordPathFor } from '../batch/predictions.ts';
import { replaceFile, ResultsFileError, resultsText } from '../batch/results-file.ts';
import { taskNameOf } from '../batch/solve-file.ts';
import { summarise, summaryLines } from '../batch/summary.ts';
import { expandTaskPaths } from './task-paths.ts';
import { writeError, writeJson, writeLines } from './output.ts';

interface MergeFlags {
  output: string;
  tasks?: string;
  allowMissing?: boolean;
  force?: boolean;
  json?: boolean;
}

export function registerMergeCommand(program: Command): void {
  program
    .command('merge')
    .description("combine the results or predictions files of a run's shards into one, checking that every task appears once, the settings agree, and no shard is missing")
    .argument('<files...>', 'the shards\' results files (eval --results) or predictions files (solve --predictions, with the record beside each)')
    .requiredOption('--output <file>', 'the merged file (for predictions, its record is written beside it)')
    .option('--tasks <dir>', 'the task folder the run covered: names missing tasks, and tells a shard with no tasks from a missing one')
    .option('--allow-missing', 'write the merge even when shards or tasks are missing (it still names them)')
    .option('--force', 'replace an existing output file')
    .option('--json', 'print the summary as JSON')
    .action((files: string[], flags: MergeFlags) => {
      const inputs: MergeInput[] = [];
      const kinds = new Set<MergeKind>();
      try {
        for (const file of files) {
          const { kind, input } = readMergeInput(file);
          if (kind !== undefined) kinds.add(kind);
          inputs.push(input);
        }
      } catch (error) {
        if (!(error instanceof MergeInputError || error instanceof ResultsFileError)) throw error;
        writeError(error.message);
        process.exitCode = 2;
        return;
      }
      if (kinds.size > 1) {
        writeError('the files mix results files (eval) and predictions files (solve); merge one kind at a time');
        process.exitCode = 2;
        return;
      }
      const kind: MergeKind = kinds.has('predictions') ? 'predictions' : 'results';
      let expected: string[] | undefined;
      if (flags.tasks !== undefined) {
        const { files: taskFiles, problems } = expandTaskPaths([flags.tasks]);
        for (const p of problems) writeError(p);
        if (problems.length > 0) {
          process.exitCode = 2;
          return;
        }
        expected = taskFiles.map(taskNameOf);
      }
      const outcome = mergeInputs(kind, inputs, expected);
      for (const w of outcome.warnings) writeError(`warning: ${w}`);
      if (outcome.conflicts.length > 0) {
        for (const c of outcome.conflicts) writeError(c);
        writeError(`nothing written: the files disagree (${outcome.conflicts.length} problem${outcome.conflicts.length === 1 ? '' : 's'} above)`);
        process.exitCode = 1;
        return;
      }
      const missing = outcome.missingShards.length > 0 || outcome.missingTasks.length > 0;
      if (outcome.missingShards.length > 0) {
        writeError(`missing shards: ${outcome.missingShards.map((i) => `${i}/${outcome.shardCount}`).join(', ')}${expected === undefined ? ' (no line from them; give --tasks DIR to tell a shard with no tasks from a missing one)' : ''}`);
      }
      if (outcome.missingTasks.length > 0) writeError(`missing tasks (${outcome.missingTasks.length}): ${outcome.missingTasks.join(', ')}`);
      if (missing && !flags.allowMissing) {
        writeError('nothing written: run the missing shards (the same command resumes them), or pass --allow-missing');
        process.exitCode = 1;
        return;
      }
      const targets = kind === 'predictions' ? [flags.output, recordPathFor(flags.output)] : [flags.output];
      const taken = targets.filter((t) => existsSync(t));
      if (taken.length > 0 && !flags.force) {
        writeError(`${taken.join(' and ')}: already exists; pithy will not overwrite it (choose another name or pass --force)`);
        process.exitCode = 2;
        return;
      }
      if (kind === 'predictions') {
        replaceFile(flags.output, predictionsText(outcome.lines));
        replaceFile(recordPathFor(flags.output), resultsText(outcome.lines));
      } else {
        replaceFile(flags.output, resultsText(outcome.lines));
      }
      const shards = outcome.shardCount - outcome.missingShards.length;
      const header = `merged ${shards} of ${outcome.shardCount} shard${outcome.shardCount === 1 ? '' : 's'} (${outcome.lines.length} tasks) into ${flags.output}`;
      const summary = summarise(outcome.lines);
      if (flags.json) {
        writeJson({ output: flags.output, kind, shards: outcome.shardCount, missingShards: outcome.missingShards, missingTasks: outcome.missingTasks, ...summary });
      } else if (kind === 'results') {
        writeLines([header, ...summaryLines(summary)]);
      } else {
        writeLines([
          header,
          `programs found for ${outcome.lines.filter((l) => l.status === 'found').length} of ${outcome.lines.length} tasks`,
          `  no program found: ${summary.notFound} (time limit reached: ${summary.timeOuts})`,
          `  failures (bad files, solver errors): ${summary.failures}`,
        ]);
      }
      if (missing) process.exitCode = 1;
    });
}
