// Shards: parsing I/N, the scheduler's environment (Slurm job arrays, Kubernetes Indexed Jobs),
// the stable hash, and the partition law: for any ids and any N, the shards are disjoint and
// together hold every id once.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseShard, selectShard, shardFromEnvironment, ShardError, shardOf, stableHash } from '../src/batch/shard.ts';

describe('the stable hash', () => {
  it('is 32-bit FNV-1a: the reference test vectors', () => {
    // FNV-1a 32-bit test vectors from the FNV reference (values recalled from memory, and
    // checked here against a separate Python implementation of the published algorithm):
    // "" → 0x811c9dc5 (the offset basis), "a" → 0xe40c292c, "foobar" → 0xbf9cf968.
    expect(stableHash('')).toBe(0x811c9dc5);
    expect(stableHash('a')).toBe(0xe40c292c);
    expect(stableHash('foobar')).toBe(0xbf9cf968);
  });
});

describe('shards partition any set of ids', () => {
  it('disjoint, every id in exactly one shard, the one shardOf names', () => {
    fc.assert(
      fc.property(fc.uniqueArray(fc.string({ minLength: 1, maxLength: 12 }), { maxLength: 60 }), fc.integer({ min: 1, max: 9 }), (ids, count) => {
        const shards = Array.from({ length: count }, (_, index) => selectShard(ids, (id) => id, { index, count }));
        expect(shards.flat().sort()).toEqual([...ids].sort());
        shards.forEach((members, index) => {
          for (const id of members) expect(shardOf(id, count)).toBe(index);
        });
      }),
    );
  });

  it('keeps the order of the items, and everything without a shard', () => {
    const ids = ['quay', 'pier', 'dock', 'buoy', 'mast', 'hull'];
    expect(selectShard(ids, (id) => id, undefined)).toEqual(ids);
    const first = selectShard(ids, (id) => id, { index: 0, count: 2 });
    expect(first).toEqual(ids.filter((id) => first.includes(id)));
  });
});

describe('which shard a run is', () => {
  it('parses I/N and refuses what is not one', () => {
    expect(parseShard('2/4')).toEqual({ index: 2, count: 4, source: '--shard' });
    expect(parseShard(' 0 / 1 ')).toMatchObject({ index: 0, count: 1 });
    for (const bad of ['4/4', '1/0', '-1/4', 'a/4', '2', '2/4/8', '1.5/4']) expect(() => parseShard(bad), bad).toThrow(ShardError);
    expect(() => parseShard('4/4')).toThrow(/not below the number of shards 4/);
  });

  it('reads a Slurm job array: the id less the first id, over the step, of the count', () => {
    expect(shardFromEnvironment({ SLURM_ARRAY_TASK_ID: '3', SLURM_ARRAY_TASK_COUNT: '4', SLURM_ARRAY_TASK_MIN: '0' })).toEqual({ index: 3, count: 4, source: 'SLURM_ARRAY_TASK_ID' });
    // --array=1-4: ids 1 to 4 are shards 0 to 3.
    expect(shardFromEnvironment({ SLURM_ARRAY_TASK_ID: '1', SLURM_ARRAY_TASK_COUNT: '4', SLURM_ARRAY_TASK_MIN: '1' })).toMatchObject({ index: 0, count: 4 });
    // --array=10-16:2: ids 10, 12, 14, 16 are shards 0 to 3.
    expect(shardFromEnvironment({ SLURM_ARRAY_TASK_ID: '14', SLURM_ARRAY_TASK_COUNT: '4', SLURM_ARRAY_TASK_MIN: '10', SLURM_ARRAY_TASK_STEP: '2' })).toMatchObject({ index: 2, count: 4 });
    expect(() => shardFromEnvironment({ SLURM_ARRAY_TASK_ID: '13', SLURM_ARRAY_TASK_COUNT: '4', SLURM_ARRAY_TASK_MIN: '10', SLURM_ARRAY_TASK_STEP: '2' })).toThrow(ShardError);
  });

  it('reads a Kubernetes Indexed Job, whose count comes from the command line', () => {
    expect(shardFromEnvironment({ JOB_COMPLETION_INDEX: '1' }, 4)).toEqual({ index: 1, count: 4, source: 'JOB_COMPLETION_INDEX' });
    expect(() => shardFromEnvironment({ JOB_COMPLETION_INDEX: '1' })).toThrow(/--shard-count/);
    expect(() => shardFromEnvironment({ JOB_COMPLETION_INDEX: '4' }, 4)).toThrow(ShardError);
  });

  it('is the whole set outside an array job, and refuses a count with no index', () => {
    expect(shardFromEnvironment({})).toBeUndefined();
    expect(() => shardFromEnvironment({}, 3)).toThrow(/--shard I\/N/);
  });
});
