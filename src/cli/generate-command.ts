/**
 * `pithy generate --seed S --count N --out DIR`: synthetic tasks with their ground-truth
 * programs and traces, one task JSON file each (src/training/generate.ts says how they are
 * drawn and kept). The same seed gives byte-identical files; `--shard I/N` builds only shard I's
 * share, and the N shards together give the files of one run.
 */
import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { InvalidArgumentError, type Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { printProgram } from '../language/printer.ts';
import { ProgressBar } from '../output/progress-bar.ts';
import { buildTask, checkGenerateOptions, generatedTaskName, inShard, screenPrograms, type GenerateOptions, type GeneratedTask } from '../training/generate.ts';
import { parseShard, WHOLE_RUN, type Shard } from '../training/shard.ts';
import { formatJson, writeError, writeJson, writeLines } from './output.ts';
import { positiveNumber } from './solve-options.ts';

interface GenerateFlags {
  seed: number;
  count: number;
  out: string;
  shard?: Shard;
  force?: boolean;
  minSize: number;
  maxSize: number;
  colours: number;
  trainPairs: number;
  maxCalls: number;
  json?: boolean;
}

function wholeNumber(name: string) {
  return (text: string): number => {
    const value = Number(text);
    if (!/^[0-9]+$/.test(text.trim()) || !Number.isSafeInteger(value)) throw new InvalidArgumentError(`${name} must be a whole number 0 or above, got '${text}'`);
    return value;
  };
}

function shardOption(text: string): Shard {
  try {
    return parseShard(text);
  } catch (error) {
    throw new InvalidArgumentError((error as Error).message);
  }
}

/** The task file: the open task format, plus the ground-truth program and its trace record. */
export function generatedTaskFile(t: GeneratedTask): string {
  const pair = (input: { toRows(): number[][] }, output: { toRows(): number[][] } | undefined) => ({ input: input.toRows(), output: output?.toRows() });
  return (
    formatJson({
      train: t.task.train.map((p) => pair(p.input, p.output)),
      test: t.task.test.map((p) => pair(p.input, p.output)),
      program: printProgram(t.program),
      trace: t.trace,
    }) + '\n'
  );
}

export function registerGenerateCommand(program: Command): void {
  program
    .command('generate')
    .description('write synthetic tasks (task JSON with the ground-truth program and its trace), drawn from programs sampled by the priors')
    .requiredOption('--out <dir>', 'directory for the task files (created if missing)')
    .option('--seed <n>', 'seed of the run: the same seed gives the same files', wholeNumber('--seed'), 1)
    .option('--count <n>', 'programs to number; each gives a task unless its inputs never pass the checks', positiveNumber('--count', true), 100)
    .option('--shard <i/n>', 'build only shard i of n; the n shards give together the files of one run', shardOption)
    .option('--min-size <n>', 'smallest height and width of an input', positiveNumber('--min-size', true), 3)
    .option('--max-size <n>', 'largest height and width of an input', positiveNumber('--max-size', true), 12)
    .option('--colours <n>', 'most content colours in a task besides the background (1-9)', positiveNumber('--colours', true), 4)
    .option('--train-pairs <n>', 'demonstration pairs per task (one test pair follows)', positiveNumber('--train-pairs', true), 3)
    .option('--max-calls <n>', 'most primitive uses in a program', positiveNumber('--max-calls', true), 5)
    .option('--force', 'allow replacing task files that already exist')
    .option('--json', 'print the summary as JSON')
    .action((flags: GenerateFlags) => {
      const shard = flags.shard ?? WHOLE_RUN;
      const options: GenerateOptions = {
        seed: flags.seed,
        count: flags.count,
        shard,
        library: defaultLibrary,
        minSize: flags.minSize,
        maxSize: flags.maxSize,
        colours: flags.colours,
        trainPairs: flags.trainPairs,
        maxCalls: flags.maxCalls,
      };
      try {
        checkGenerateOptions(options);
      } catch (error) {
        writeError(`pithy generate: ${(error as Error).message}`);
        process.exitCode = 2;
        return;
      }
      const started = performance.now();
      const { programs, counts } = screenPrograms(options);
      const screenSeconds = (performance.now() - started) / 1000;
      const mine = programs.filter((p) => inShard(p.number, shard));
      const existing = mine.map((p) => join(flags.out, `${generatedTaskName(flags.seed, p.number)}.json`)).filter((f) => existsSync(f));
      if (existing.length > 0 && !flags.force) {
        writeError(`${existing[0]}${existing.length > 1 ? ` and ${existing.length - 1} more` : ''}: already exist${existing.length > 1 ? '' : 's'}; pithy will not overwrite (choose another --out or pass --force)`);
        process.exitCode = 2;
        return;
      }
      mkdirSync(flags.out, { recursive: true });
      const bar = new ProgressBar(mine.length, process.stderr, 30, 'written');
      let written = 0;
      const noInputs: string[] = [];
      for (const numbered of mine) {
        const task = buildTask(numbered, options);
        if (task) {
          writeFileSync(join(flags.out, `${task.name}.json`), generatedTaskFile(task));
          written++;
        } else noInputs.push(generatedTaskName(flags.seed, numbered.number));
        bar.tick(written);
      }
      bar.finish();
      const seconds = (performance.now() - started) / 1000;
      const summary = {
        out: flags.out,
        seed: flags.seed,
        shard: `${shard.index}/${shard.count}`,
        written,
        numbered: counts.kept,
        inShard: mine.length,
        withoutPassingInputs: noInputs,
        screening: counts,
        screenSeconds: Number(screenSeconds.toFixed(3)),
        seconds: Number(seconds.toFixed(3)),
      };
      if (flags.json) {
        writeJson(summary);
        return;
      }
      const rejected = counts.sampled - counts.kept;
      writeLines([
        `${written} task${written === 1 ? '' : 's'} written to ${flags.out} (seed ${flags.seed}, shard ${shard.index}/${shard.count}, ${seconds.toFixed(1)} s, ${(written / Math.max(seconds, 1e-9)).toFixed(1)} tasks/s)`,
        `programs drawn: ${counts.sampled}; numbered: ${counts.kept}; dropped: ${rejected} (${counts.failsEveryProbe} failed on every probe, ${counts.changesNothing} changed nothing, ${counts.sameOutput} gave one output for all, ${counts.sameBehaviour} behaved like an earlier one)`,
        ...(noInputs.length > 0 ? [`no passing inputs in the allowed draws: ${noInputs.join(', ')}`] : []),
        ...(counts.kept < flags.count ? [`only ${counts.kept} of ${flags.count} programs passed the screen within the draws allowed`] : []),
      ]);
    });
}
