/** Reading the JSON-lines results files of `eval` in tests, and comparing runs. */
import { readFileSync } from 'node:fs';

export type Line = Record<string, unknown> & { task: string; statistics?: Record<string, unknown> };

/** The lines of a results file, parsed. */
export const linesOf = (path: string): Line[] =>
  readFileSync(path, 'utf8')
    .trimEnd()
    .split('\n')
    .map((l) => JSON.parse(l) as Line);

/** Lines keyed by task, without what depends on timing (seconds) or on the shard. */
export function comparable(lines: readonly Line[]): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const line of lines) {
    const { seconds: _s, shard: _shard, statistics, ...rest } = line;
    const { secondsToFirstSolution: _f, ...counts } = statistics ?? {};
    out[line.task] = { ...rest, statistics: counts };
  }
  return out;
}
