/**
 * `--shard I/N` and `--shard-count N` for commands that split their work (solve, eval, and
 * any later command over many items): which shard this process is, from the flags or the
 * scheduler's environment, announced on the first line.
 */
import { InvalidArgumentError, type Command } from 'commander';
import { parseShard, shardFromEnvironment, shardLabel, ShardError, type Shard } from '../batch/shard.ts';
import { positiveNumber } from './solve-options.ts';
import { writeError } from './output.ts';

export interface ShardFlags {
  shard?: Shard;
  shardCount?: number;
}

export function addShardFlags(command: Command): Command {
  return command
    .option(
      '--shard <I/N>',
      'solve only shard I of N (I from 0), chosen by a stable hash of each task id; without it, the shard comes from SLURM_ARRAY_TASK_ID or JOB_COMPLETION_INDEX when set',
      (text: string) => {
        try {
          return parseShard(text);
        } catch (error) {
          throw new InvalidArgumentError((error as Error).message);
        }
      },
    )
    .option('--shard-count <n>', 'the number of shards when the index comes from JOB_COMPLETION_INDEX (a Kubernetes Indexed Job)', positiveNumber('--shard-count', true));
}

/** The shard to run, or undefined for the whole set; throws ShardError on inconsistent settings. */
export function shardFrom(flags: ShardFlags, env: Readonly<Record<string, string | undefined>> = process.env): Shard | undefined {
  if (flags.shard !== undefined) {
    if (flags.shardCount !== undefined && flags.shardCount !== flags.shard.count) {
      throw new ShardError(`--shard-count ${flags.shardCount} disagrees with --shard ${shardLabel(flags.shard)}`);
    }
    return flags.shard;
  }
  return shardFromEnvironment(env, flags.shardCount);
}

/** The shard to run (undefined for all); on a bad setting, reports it with exit code 2 and returns null. */
export function resolveShard(flags: ShardFlags): Shard | undefined | null {
  try {
    return shardFrom(flags);
  } catch (error) {
    if (!(error instanceof ShardError)) throw error;
    writeError(error.message);
    process.exitCode = 2;
    return null;
  }
}

/** Says which shard this run is: the run's first line, on standard error. */
export function announceShard(shard: Shard, selected: number, total: number): void {
  const from = shard.source === '--shard' ? '' : ` (from ${shard.source})`;
  writeError(`shard ${shardLabel(shard)}${from}: ${selected} of ${total} tasks`);
}
