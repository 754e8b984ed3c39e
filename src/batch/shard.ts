/**
 * Splitting a run into shards, for array jobs on a cluster: shard I of N takes the tasks whose
 * stable hash is I modulo N. The hash depends only on the task id (the file name without
 * `.json`, or a generation index written as a number), so shards are disjoint, their union is
 * the whole set, and every machine agrees on them whatever order it lists the files in.
 *
 * Without `--shard`, the index and count come from the scheduler's environment: Slurm job
 * arrays set SLURM_ARRAY_TASK_ID (with SLURM_ARRAY_TASK_COUNT, SLURM_ARRAY_TASK_MIN and
 * SLURM_ARRAY_TASK_STEP), Kubernetes Indexed Jobs set JOB_COMPLETION_INDEX (the count is then
 * given on the command line, as the Job's completions).
 */

export interface Shard {
  /** 0 to count - 1. */
  readonly index: number;
  readonly count: number;
  /** Where it came from: '--shard', 'SLURM_ARRAY_TASK_ID' or 'JOB_COMPLETION_INDEX'. */
  readonly source: string;
}

export class ShardError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ShardError';
  }
}

/** "I/N" as recorded on results lines. */
export function shardLabel(shard: Pick<Shard, 'index' | 'count'>): string {
  return `${shard.index}/${shard.count}`;
}

function wholeNumber(text: string | undefined, what: string): number {
  const value = text === undefined || !/^\s*\d+\s*$/.test(text) ? NaN : Number(text);
  if (!Number.isSafeInteger(value)) throw new ShardError(`${what} must be a whole number, got '${text ?? ''}'`);
  return value;
}

function checked(index: number, count: number, source: string): Shard {
  if (count < 1) throw new ShardError(`${source}: the number of shards must be at least 1, got ${count}`);
  if (index >= count) throw new ShardError(`${source}: shard index ${index} is not below the number of shards ${count} (indexes run from 0 to ${count - 1})`);
  return { index, count, source };
}

/** Parses "I/N" (0 ≤ I < N). */
export function parseShard(text: string, source = '--shard'): Shard {
  const match = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  if (!match) throw new ShardError(`${source} must be I/N, the shard index (from 0) and the number of shards, such as 0/4; got '${text}'`);
  return checked(wholeNumber(match[1], `${source} index`), wholeNumber(match[2], `${source} count`), source);
}

/**
 * The shard the scheduler's environment names, or undefined outside an array job.
 * `count` is the number of shards given on the command line (needed for Kubernetes).
 */
export function shardFromEnvironment(env: Readonly<Record<string, string | undefined>>, count?: number): Shard | undefined {
  const slurmId = env.SLURM_ARRAY_TASK_ID;
  if (slurmId !== undefined && slurmId !== '') {
    const source = 'SLURM_ARRAY_TASK_ID';
    const id = wholeNumber(slurmId, source);
    const first = env.SLURM_ARRAY_TASK_MIN ? wholeNumber(env.SLURM_ARRAY_TASK_MIN, 'SLURM_ARRAY_TASK_MIN') : 0;
    const step = env.SLURM_ARRAY_TASK_STEP ? Math.max(1, wholeNumber(env.SLURM_ARRAY_TASK_STEP, 'SLURM_ARRAY_TASK_STEP')) : 1;
    const total = env.SLURM_ARRAY_TASK_COUNT ? wholeNumber(env.SLURM_ARRAY_TASK_COUNT, 'SLURM_ARRAY_TASK_COUNT') : count;
    if (total === undefined) throw new ShardError(`${source} is set but SLURM_ARRAY_TASK_COUNT is not; give the number of shards with --shard-count N`);
    if (count !== undefined && count !== total) throw new ShardError(`--shard-count ${count} disagrees with SLURM_ARRAY_TASK_COUNT ${total}`);
    if ((id - first) % step !== 0 || id < first) throw new ShardError(`${source} ${id} is not on the array's range (from ${first} in steps of ${step})`);
    return checked((id - first) / step, total, source);
  }
  const k8sIndex = env.JOB_COMPLETION_INDEX;
  if (k8sIndex !== undefined && k8sIndex !== '') {
    const source = 'JOB_COMPLETION_INDEX';
    if (count === undefined) throw new ShardError(`${source} is set (a Kubernetes Indexed Job); give the number of shards, the Job's completions, with --shard-count N`);
    return checked(wholeNumber(k8sIndex, source), count, source);
  }
  if (count !== undefined) throw new ShardError('--shard-count is given but neither SLURM_ARRAY_TASK_ID nor JOB_COMPLETION_INDEX is set; use --shard I/N to choose a shard by hand');
  return undefined;
}

/** 32-bit FNV-1a of the id's UTF-8 bytes: stable across machines, versions and runs. */
export function stableHash(id: string): number {
  let hash = 0x811c9dc5;
  for (const byte of Buffer.from(id, 'utf8')) {
    hash ^= byte;
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash;
}

/** The shard index an id falls in, of `count`. */
export function shardOf(id: string, count: number): number {
  return stableHash(id) % count;
}

export function inShard(id: string, shard: Pick<Shard, 'index' | 'count'>): boolean {
  return shardOf(id, shard.count) === shard.index;
}

/** The items of one shard, in their order (all of them without a shard). */
export function selectShard<T>(items: readonly T[], idOf: (item: T) => string, shard: Pick<Shard, 'index' | 'count'> | undefined): T[] {
  return shard === undefined ? [...items] : items.filter((item) => inShard(idOf(item), shard));
}
