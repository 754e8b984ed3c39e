/**
 * The results file: one JSON line per finished task, appended (and flushed to disk) as each
 * finishes, so an interrupted run loses nothing and resumes where it stopped. Every line
 * records the settings that shaped it. A torn line (the run died mid-write) is dropped when
 * the run resumes, and its task solved again.
 *
 * `pithy eval` writes one (with `solved`); `pithy solve --predictions FILE` keeps one beside
 * its predictions file (without `solved`, since solve never reads test outputs).
 */
import { closeSync, existsSync, fsyncSync, openSync, readFileSync, renameSync, writeSync } from 'node:fs';
import type { RunSettings } from './run-settings.ts';
import type { TaskReport } from './task-report.ts';

export interface ResultLine extends TaskReport {
  /** The settings the task was solved with; absent only in files of older pithy versions. */
  readonly settings?: RunSettings;
  /** The shard that solved it, as "I/N" (absent for an unsharded run). */
  readonly shard?: string;
  /** Only in eval results: every test input has its exact output among the attempts. */
  readonly solved?: boolean;
  /** The hash of the priors file the task was solved with (`--priors`); absent for the records' own bits. */
  readonly priors?: string;
}

export class ResultsFileError extends Error {
  constructor(
    readonly file: string,
    readonly line: number,
    readonly problem: string,
  ) {
    super(`${file}: line ${line}: ${problem}`);
    this.name = 'ResultsFileError';
  }
}

export interface ResultsContents {
  /** Every whole line, in file order. */
  readonly lines: ResultLine[];
  /** Lines cut short by an interruption (dropped). */
  readonly torn: number;
}

/**
 * Reads a results file (an absent file has no lines). A line that starts like a results line
 * but does not parse is torn; anything else that is not a results line means the file is not
 * one, and is refused rather than added to.
 */
export function readResultsFile(path: string): ResultsContents {
  if (!existsSync(path)) return { lines: [], torn: 0 };
  const text = readFileSync(path, 'utf8');
  const lines: ResultLine[] = [];
  let torn = 0;
  text.split('\n').forEach((line, i) => {
    if (line.trim() === '') return;
    if (!line.startsWith('{')) throw new ResultsFileError(path, i + 1, 'not a results line (expected a JSON object per line); pithy will not add to this file');
    let parsed: unknown;
    try {
      parsed = JSON.parse(line);
    } catch {
      torn++; // cut short by an interruption: its task runs again
      return;
    }
    const record = parsed as Partial<ResultLine>;
    if (typeof record !== 'object' || record === null || typeof record.task !== 'string' || typeof record.file !== 'string' || typeof record.status !== 'string') {
      throw new ResultsFileError(path, i + 1, 'not a results line (expected "task", "file" and "status"); pithy will not add to this file');
    }
    lines.push(record as ResultLine);
  });
  return { lines, torn };
}

/** The lines of a results file (see readResultsFile). */
export function readResults(path: string): ResultLine[] {
  return readResultsFile(path).lines;
}

/** Appends lines, each with one write and flushed to disk before the next task is reported. */
export class ResultsWriter {
  private readonly descriptor: number;

  constructor(readonly path: string) {
    this.descriptor = openSync(path, 'a');
    const text = readFileSync(path, 'utf8');
    // A torn last line must not run into the next one.
    if (text.length > 0 && !text.endsWith('\n')) writeSync(this.descriptor, '\n');
  }

  append(line: ResultLine): void {
    this.appendText(JSON.stringify(line) + '\n');
  }

  appendText(text: string): void {
    const bytes = Buffer.from(text, 'utf8');
    // A write may take fewer bytes than given (a nearly full disk); go on until all are written
    // or the write fails with an error, which stops the run.
    for (let written = 0; written < bytes.length; ) written += writeSync(this.descriptor, bytes, written, bytes.length - written);
    fsyncSync(this.descriptor);
  }

  close(): void {
    closeSync(this.descriptor);
  }
}

/**
 * Replaces a file's text in one step: written beside it, flushed, then renamed over it, so a
 * crash leaves either the old file or the new one, never a mix.
 */
export function replaceFile(path: string, text: string): void {
  const temporary = `${path}.${process.pid}.partial`;
  const descriptor = openSync(temporary, 'w');
  try {
    writeSync(descriptor, text);
    fsyncSync(descriptor);
  } finally {
    closeSync(descriptor);
  }
  renameSync(temporary, path);
}

export function resultsText(lines: readonly ResultLine[]): string {
  return lines.map((l) => JSON.stringify(l) + '\n').join('');
}
