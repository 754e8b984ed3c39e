/**
 * Splitting one run's work between machines: `--shard I/N` (1-based) takes the items whose
 * stable hash falls to shard I of N. Every item belongs to exactly one shard, the same on every
 * machine. Generation hashes a program's behaviour on its first probe, not its index, so that
 * programs alike meet in one shard (generate.ts). (A shard helper of the batch layer may replace
 * this one when it exists.)
 */
import { mix32 } from './random.ts';

export interface Shard {
  /** 1-based. */
  readonly index: number;
  readonly count: number;
}

export const WHOLE_RUN: Shard = { index: 1, count: 1 };

/** The shard (1-based, of `count`) a whole number (an index or a hash) belongs to: a stable hash, the same on every machine. */
export function shardOf(key: number, count: number): number {
  return (mix32(key ^ 0x2545f491) % count) + 1;
}

/** Reads `I/N` (1 ≤ I ≤ N); throws a RangeError that says what was expected. */
export function parseShard(text: string): Shard {
  const match = /^([0-9]+)\/([0-9]+)$/.exec(text.trim());
  const index = match ? Number(match[1]) : NaN;
  const count = match ? Number(match[2]) : NaN;
  if (!match || count < 1 || index < 1 || index > count) throw new RangeError(`--shard must be I/N with 1 <= I <= N, such as 2/4, got '${text}'`);
  return { index, count };
}
