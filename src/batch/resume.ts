/**
 * Resuming a run from its results file: which tasks are done, which are solved (again), and
 * whether the file may be added to at all (its lines must carry the settings of this run).
 */
import { resolve } from 'node:path';
import type { ResultLine, ResultsContents } from './results-file.ts';
import { settingsDifferences, type RunSettings } from './run-settings.ts';
import { isRetryable } from './task-report.ts';

export class SettingsMismatchError extends Error {
  constructor(
    readonly file: string,
    readonly differences: readonly string[],
  ) {
    super(
      `${file}: written with other settings, so pithy will not add to it:\n` +
        differences.map((d) => `  ${d}\n`).join('') +
        'Run again with the settings of the file, or give another file to start afresh.',
    );
    this.name = 'SettingsMismatchError';
  }
}

export interface ResumePlan {
  /** Lines of this run's tasks that are finished and kept, in file order. */
  readonly done: ResultLine[];
  /** Files still to solve, in the order given. */
  readonly todo: string[];
  /** Tasks solved again because their worker crashed or overran. */
  readonly retried: string[];
  /**
   * What the file should hold before new lines are appended, when that differs from what it
   * holds (torn lines and the lines of retried tasks dropped); undefined when it is fine.
   */
  readonly rewrite: ResultLine[] | undefined;
}

/** Throws SettingsMismatchError when any line was made with settings other than `settings`. */
export function checkSettings(file: string, lines: readonly ResultLine[], settings: RunSettings): void {
  for (const line of lines) {
    const differences = settingsDifferences(line.settings ?? {}, settings);
    if (differences.length > 0) throw new SettingsMismatchError(file, differences);
  }
}

export function planResume(file: string, files: readonly string[], contents: ResultsContents, settings: RunSettings, retry: boolean): ResumePlan {
  checkSettings(file, contents.lines, settings);
  const wanted = new Set(files.map((f) => resolve(f)));
  // The last line of a task wins (files written before lines were made unique may repeat one).
  const latest = new Map<string, ResultLine>();
  for (const line of contents.lines) latest.set(resolve(line.file), line);
  const retried = new Set<string>();
  for (const [path, line] of latest) if (retry && wanted.has(path) && isRetryable(line)) retried.add(path);
  const kept = contents.lines.filter((line) => latest.get(resolve(line.file)) === line && !retried.has(resolve(line.file)));
  const done = kept.filter((line) => wanted.has(resolve(line.file)));
  const finished = new Set(done.map((line) => resolve(line.file)));
  const todo = files.filter((f) => !finished.has(resolve(f)));
  const changed = contents.torn > 0 || kept.length !== contents.lines.length;
  return { done, todo, retried: [...retried].map((p) => latest.get(p)!.task), rewrite: changed ? kept : undefined };
}
