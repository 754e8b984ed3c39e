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
import { checkGenerateOptions, Generation, generatedTaskName, type GenerateOptions, type GeneratedTask } from '../training/generate.ts';
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
    .option('--count <n>', 'programs to draw; each gives at most one task (those that fail the checks give none)', positiveNumber('--count', true), 100)
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
      const generation = new Generation(options);
      const owned = generation.own();
      const existing = owned.map((p) => join(flags.out, `${generatedTaskName(flags.seed, p.index)}.json`)).filter((f) => existsSync(f));
      if (existing.length > 0 && !flags.force) {
        writeError(`${existing[0]}${existing.length > 1 ? ` and ${existing.length - 1} more` : ''}: already exist${existing.length > 1 ? '' : 's'}; pithy will not overwrite (choose another --out or pass --force)`);
        process.exitCode = 2;
        return;
      }
      mkdirSync(flags.out, { recursive: true });
      const bar = new ProgressBar(owned.length, process.stderr, 30, 'written');
      for (const o of owned) {
        const task = generation.build(o);
        if (task) writeFileSync(join(flags.out, `${task.name}.json`), generatedTaskFile(task));
        bar.tick(generation.counts.written);
      }
      bar.finish();
      const seconds = (performance.now() - started) / 1000;
      const c = generation.counts;
      if (flags.json) {
        writeJson({ out: flags.out, seed: flags.seed, shard: `${shard.index}/${shard.count}`, count: flags.count, ...c, seconds: Number(seconds.toFixed(3)) });
        return;
      }
      writeLines([
        `${c.written} task${c.written === 1 ? '' : 's'} written to ${flags.out} from ${flags.count} programs drawn (seed ${flags.seed}, shard ${shard.index}/${shard.count}, ${seconds.toFixed(1)} s, ${(c.written / Math.max(seconds, 1e-9)).toFixed(1)} tasks/s)`,
        `dropped: ${c.notDrawn} too big to draw, ${c.failsEveryProbe} failed on every probe` +
          (shard.count > 1 ? `; of the ${c.owned} this shard owns: ` : ', ') +
          `${c.changesNothing} changed nothing, ${c.sameOutput} gave one output for all, ${c.sameBehaviour} behaved like an earlier one, ${c.noPassingInputs} found no passing inputs`,
      ]);
    });
}
