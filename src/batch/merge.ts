/**
 * Merging what the shards of a run wrote: their results files (eval), or their predictions files
 * with the records pithy keeps beside them (solve). The merge checks that every task appears
 * exactly once, that every line was made with the same settings, and which shards are missing;
 * it writes nothing when lines conflict.
 */
import { existsSync, readFileSync } from 'node:fs';
import { recordPathFor } from './predictions.ts';
import { readResultsFile, type ResultLine } from './results-file.ts';
import { settingsDifferences, type RunSettings } from './run-settings.ts';
import { shardOf } from './shard.ts';
import { isRetryable } from './task-report.ts';

export type MergeKind = 'results' | 'predictions';

export interface MergeInput {
  /** The file named on the command line. */
  readonly file: string;
  /** Where its lines were read from (the record beside a predictions file). */
  readonly record: string;
  readonly lines: readonly ResultLine[];
  /** Lines cut short by an interruption. */
  readonly torn: number;
}

export interface MergeOutcome {
  readonly kind: MergeKind;
  /** Every task once, sorted by task id. */
  readonly lines: ResultLine[];
  /** Number of shards the lines name (1 for unsharded runs). */
  readonly shardCount: number;
  /** Shard indexes with no line (and, given the task list, tasks of their own). */
  readonly missingShards: number[];
  /** Task ids of the task list that no file has (empty without a task list). */
  readonly missingTasks: string[];
  /** Problems that make the merge wrong (duplicates, mixed settings, mixed shard counts): nothing is written. */
  readonly conflicts: string[];
  /** Worth knowing, but the merge stands: torn lines, crashed tasks, tasks outside the list. */
  readonly warnings: string[];
}

export class MergeInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'MergeInputError';
  }
}

/** The first whole line of a file as an object, or undefined for an empty file. */
function firstRecord(file: string): Record<string, unknown> | undefined {
  for (const line of readFileSync(file, 'utf8').split('\n')) {
    if (line.trim() === '') continue;
    try {
      const parsed: unknown = JSON.parse(line);
      return typeof parsed === 'object' && parsed !== null ? (parsed as Record<string, unknown>) : {};
    } catch {
      return {};
    }
  }
  return undefined;
}

/** Reads one shard's file: a results file, or a predictions file through the record beside it. */
export function readMergeInput(file: string): { kind: MergeKind | undefined; input: MergeInput } {
  if (!existsSync(file)) throw new MergeInputError(`${file}: no such file`);
  const first = firstRecord(file);
  const looksLikePredictions = first !== undefined && 'test' in first && !('status' in first);
  const record = recordPathFor(file);
  if (looksLikePredictions || (first === undefined && existsSync(record) && record !== file)) {
    if (!existsSync(record)) throw new MergeInputError(`${file}: a predictions file without the record pithy keeps beside it (${record}); merge needs the record to check settings and shards`);
    const { lines, torn } = readResultsFile(record);
    return { kind: 'predictions', input: { file, record, lines, torn } };
  }
  const { lines, torn } = readResultsFile(file);
  return { kind: first === undefined ? undefined : 'results', input: { file, record: file, lines, torn } };
}

function shardParts(label: string | undefined): { index: number; count: number } {
  if (label === undefined) return { index: 0, count: 1 };
  const [index, count] = label.split('/').map(Number);
  return { index: index ?? 0, count: count ?? 1 };
}

/**
 * Merges the inputs. `expectedTasks`, when given (the ids of the task folder), lets the merge
 * name missing tasks and tell an empty shard from a missing one.
 */
export function mergeInputs(kind: MergeKind, inputs: readonly MergeInput[], expectedTasks?: readonly string[]): MergeOutcome {
  const conflicts: string[] = [];
  const warnings: string[] = [];
  const byTask = new Map<string, { line: ResultLine; file: string }>();
  let reference: { settings: Partial<RunSettings>; file: string } | undefined;
  const counts = new Map<number, string>();
  const present = new Set<number>();
  /** Grouped by file (and, for repeats, the earlier file), so a message names each pair once. */
  const repeated = new Map<string, string[]>();
  const otherSettings = new Map<string, { tasks: string[]; differences: string[] }>();
  for (const input of inputs) {
    if (input.torn > 0) warnings.push(`${input.record}: ${input.torn} line(s) cut short by an interruption; resume that shard to solve its task(s) again`);
    for (const line of input.lines) {
      const earlier = byTask.get(line.task);
      if (earlier) {
        const key = `${earlier.file}\u0000${input.file}`;
        repeated.set(key, [...(repeated.get(key) ?? []), line.task]);
      } else byTask.set(line.task, { line, file: input.file });
      if (reference === undefined) reference = { settings: line.settings ?? {}, file: input.file };
      else {
        const differences = settingsDifferences(line.settings ?? {}, reference.settings as RunSettings, `in ${input.file}`, `in ${reference.file}`);
        if (differences.length > 0) {
          const entry = otherSettings.get(input.file) ?? { tasks: [], differences };
          entry.tasks.push(line.task);
          otherSettings.set(input.file, entry);
        }
      }
      const { index, count } = shardParts(line.shard);
      if (!counts.has(count)) counts.set(count, input.file);
      present.add(index);
      if (isRetryable(line)) warnings.push(`${input.file}: task ${line.task} ended with its worker ${line.failure === 'overran' ? 'overrunning' : 'crashing'}; resume that shard to solve it again`);
    }
  }
  const listed = (tasks: readonly string[]) => (tasks.length <= 5 ? tasks.join(', ') : `${tasks.slice(0, 5).join(', ')} and ${tasks.length - 5} more`);
  for (const [key, tasks] of repeated) {
    const [first, second] = key.split('\u0000');
    conflicts.push(`${tasks.length} task(s) appear more than once, in ${first} and in ${second}: ${listed(tasks)}`);
  }
  for (const [file, { tasks, differences }] of otherSettings) {
    conflicts.push(`${file}: ${tasks.length} task(s) made with other settings (${listed(tasks)}):\n${differences.map((d) => `  ${d}`).join('\n')}`);
  }
  if (counts.size > 1) conflicts.push(`the files come from runs split into different numbers of shards: ${[...counts].map(([n, f]) => `${n} (${f})`).join(', ')}`);
  const shardCount = counts.size > 0 ? Math.max(...counts.keys()) : 1;
  let missingShards: number[] = [];
  let missingTasks: string[] = [];
  if (expectedTasks !== undefined) {
    const expected = new Set(expectedTasks);
    missingTasks = expectedTasks.filter((t) => !byTask.has(t)).sort();
    missingShards = [...new Set(missingTasks.map((t) => shardOf(t, shardCount)))].sort((a, b) => a - b);
    const outside = [...byTask.keys()].filter((t) => !expected.has(t)).sort();
    if (outside.length > 0) warnings.push(`not in the task folder: ${outside.join(', ')}`);
  } else {
    for (let i = 0; i < shardCount; i++) if (!present.has(i)) missingShards.push(i);
  }
  const lines = [...byTask.values()].map((e) => e.line).sort((a, b) => (a.task < b.task ? -1 : a.task > b.task ? 1 : 0));
  return { kind, lines, shardCount, missingShards, missingTasks, conflicts, warnings };
}
