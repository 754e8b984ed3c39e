/**
 * The eval results file: one JSON line per finished task, appended as each finishes, so an
 * interrupted run resumes where it stopped. A torn last line (the run died mid-write) is
 * ignored and its task solved again.
 */
import { appendFileSync, existsSync, readFileSync } from 'node:fs';
import type { TaskReport } from './task-report.ts';

export interface ResultLine extends TaskReport {
  readonly solved: boolean;
  /** The hash of the priors file the task was solved with (`--priors`); absent for the records' own bits. */
  readonly priors?: string;
}

export function readResults(path: string): ResultLine[] {
  if (!existsSync(path)) return [];
  const lines = readFileSync(path, 'utf8').split('\n');
  const out: ResultLine[] = [];
  for (const line of lines) {
    if (line.trim() === '') continue;
    try {
      const parsed = JSON.parse(line) as ResultLine;
      if (typeof parsed.task === 'string' && typeof parsed.file === 'string') out.push(parsed);
    } catch {
      // a torn line from an interrupted run: its task runs again
    }
  }
  return out;
}

export class ResultsWriter {
  constructor(readonly path: string) {
    if (existsSync(path)) {
      const text = readFileSync(path, 'utf8');
      if (text.length > 0 && !text.endsWith('\n')) appendFileSync(path, '\n');
    }
  }

  append(line: ResultLine): void {
    appendFileSync(this.path, JSON.stringify(line) + '\n');
  }
}
