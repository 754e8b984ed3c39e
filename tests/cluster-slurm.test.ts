// A real scheduler: starts a single-node Slurm cluster (Debian's slurm-wlm and munge packages;
// tests/cluster/start-slurm.sh), submits examples/cluster/slurm-eval.sh over the demo tasks as a
// 4-way array with `sbatch --wait`, then examples/cluster/slurm-merge.sh as a job that depends
// on the array, and checks that the merged results equal a single-machine eval of the same
// tasks at the same settings (a candidate cap and one attempt, so no timing enters).
//
// It runs when PITHY_SLURM=1, as .ci/run sets after installing the packages (it needs root);
// elsewhere it is skipped with a message. The daemons are stopped by their process ids.
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { comparable, linesOf } from './support/results-lines.ts';

const root = new URL('../', import.meta.url).pathname;
const demo = join(root, 'tasks-demo');
const enabled = process.env.PITHY_SLURM === '1';
if (!enabled) {
  console.log('cluster-slurm: skipped; set PITHY_SLURM=1 (as .ci/run does once slurm-wlm and munge are installed; needs root) to start a one-node Slurm cluster and run it');
}

const flags = '--attempts 1 --max-candidates 3000 --time-limit 1000';



describe.runIf(enabled)('a 4-way Slurm array over the demo tasks, then the merge job', () => {
  // .ci/run passes the folder so that its own trap can stop the daemons too.
  const cluster = process.env.PITHY_SLURM_DIR ?? mkdtempSync(join(tmpdir(), 'pithy-slurm-'));
  const work = mkdtempSync(join(tmpdir(), 'pithy-slurm-work-'));
  const env = {
    ...process.env,
    SLURM_CONF: join(cluster, 'slurm.conf'),
    TASKS: demo,
    RESULTS_DIR: join(work, 'results'),
    PITHY: `${process.execPath} ${join(root, 'bin', 'pithy.js')}`,
    PITHY_FLAGS: flags,
  };

  beforeAll(() => {
    execFileSync(join(root, 'tests', 'cluster', 'start-slurm.sh'), [cluster], { stdio: 'inherit' });
  });
  afterAll(() => {
    spawnSync(join(root, 'tests', 'cluster', 'stop-slurm.sh'), [cluster], { stdio: 'inherit' });
    rmSync(work, { recursive: true, force: true });
    if (process.env.PITHY_SLURM_DIR === undefined) rmSync(cluster, { recursive: true, force: true });
  });

  it('merges to exactly the results of one eval on one machine', () => {
    const sbatch = (args: string[]) => spawnSync('sbatch', args, { cwd: work, env, encoding: 'utf8' });
    const array = sbatch(['--parsable', '--wait', '--array=0-3', '--cpus-per-task=1', `--output=${join(work, 'eval-%A_%a.out')}`, join(root, 'examples', 'cluster', 'slurm-eval.sh')]);
    const shardLogs = readdirSync(work)
      .filter((f) => f.startsWith('eval-'))
      .sort()
      .map((f) => readFileSync(join(work, f), 'utf8'));
    expect(array.status, `${array.stderr}\n${shardLogs.join('\n')}`).toBe(0);
    // Each array task said first which shard it was, from Slurm's variables.
    expect(shardLogs.length).toBe(4);
    shardLogs.forEach((log, i) => expect(log.split('\n')[0]).toMatch(new RegExp(`^shard ${i}/4 \\(from SLURM_ARRAY_TASK_ID\\): \\d+ of \\d+ tasks$`)));
    const arrayId = array.stdout.trim().split(';')[0]!;
    const merge = sbatch(['--parsable', '--wait', `--dependency=afterok:${arrayId}`, `--output=${join(work, 'merge.out')}`, join(root, 'examples', 'cluster', 'slurm-merge.sh')]);
    const mergeLog = readFileSync(join(work, 'merge.out'), 'utf8');
    expect(merge.status, `${merge.stderr}\n${mergeLog}`).toBe(0);
    expect(mergeLog).toMatch(/^merged 4 of 4 shards \(\d+ tasks\)/);

    const single = join(work, 'single.jsonl');
    const run = spawnSync(process.execPath, [join(root, 'bin', 'pithy.js'), 'eval', demo, '--results', single, ...flags.split(' ')], { cwd: work, encoding: 'utf8' });
    expect(run.status, run.stderr).toBe(0);
    const merged = linesOf(join(work, 'results', 'merged.jsonl'));
    expect(merged.length).toBe(readdirSync(demo).filter((f) => f.endsWith('.json')).length);
    expect(comparable(merged)).toEqual(comparable(linesOf(single)));
    // The merge printed the summary a single eval prints (its counts; the times differ).
    expect(mergeLog).toContain(run.stdout.split('\n').slice(0, 4).join('\n'));
  });
});
