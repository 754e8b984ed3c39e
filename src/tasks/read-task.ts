/**
 * Reads task JSON files, checking every grid, and reports bad input with the file and the
 * JSON path of the problem.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { basename, join } from 'node:path';
import { Grid, getSizeCap } from '../grid/grid.ts';
import { jsonErrorIndex, linePlace } from './json-error-place.ts';
import { freezeTask, type Pair, type Task, type TestCase } from './task.ts';

/**
 * A task file that cannot be used. `jsonPath` names the place in the JSON ('$.train[0].input');
 * it is empty for problems of the file itself (no such file, a folder) and for JSON syntax
 * errors, which carry the line and column instead.
 */
export class TaskFileError extends Error {
  constructor(
    readonly file: string,
    readonly jsonPath: string,
    readonly problem: string,
    readonly position?: { readonly line: number; readonly column: number },
  ) {
    super(position ? `${file}:${position.line}:${position.column}: ${problem}` : jsonPath === '' ? `${file}: ${problem}` : `${file}: at ${jsonPath}: ${problem}`);
    this.name = 'TaskFileError';
  }
}

/** Plain words for a file-system error code. */
export function fileProblem(error: unknown): string {
  const code = (error as NodeJS.ErrnoException).code;
  switch (code) {
    case 'ENOENT':
      return 'no such file';
    case 'EISDIR':
      return 'is a folder, not a file';
    case 'EACCES':
    case 'EPERM':
      return 'permission denied';
    default:
      return `cannot be read (${code ?? (error as Error).message})`;
  }
}

/** Line and column (1-based) of a character offset in a text. */
function lineAndColumn(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, offset).split('\n');
  return { line: before.length, column: before[before.length - 1]!.length + 1 };
}

/** Where JSON.parse stopped: from 'position N' in its message, or the end of the text. */
function syntaxErrorPosition(text: string, message: string): { line: number; column: number } {
  const match = /position (\d+)/.exec(message);
  return lineAndColumn(text, match ? Number(match[1]) : text.length);
}

const SIZE_CAP_HINT = 'raise it with pithy --size-cap N';

function describe(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return `a list of ${value.length}`;
  if (typeof value === 'object') return 'an object';
  if (typeof value === 'string') return `the string ${JSON.stringify(value.length > 20 ? value.slice(0, 20) + '…' : value)}`;
  return `${typeof value} ${String(value)}`;
}

function readGrid(value: unknown, file: string, path: string): Grid {
  const cap = getSizeCap();
  if (!Array.isArray(value)) throw new TaskFileError(file, path, `expected a grid (a list of rows), found ${describe(value)}`);
  if (value.length === 0) throw new TaskFileError(file, path, 'expected a grid with at least one row, found an empty list');
  if (value.length > cap) throw new TaskFileError(file, path, `grid has ${value.length} rows, over the size cap of ${cap} (${SIZE_CAP_HINT})`);
  let width = -1;
  const rows: number[][] = [];
  for (let r = 0; r < value.length; r++) {
    const row: unknown = value[r];
    const rowPath = `${path}[${r}]`;
    if (!Array.isArray(row)) throw new TaskFileError(file, rowPath, `expected a row (a list of colours), found ${describe(row)}`);
    if (row.length === 0) throw new TaskFileError(file, rowPath, 'expected a row with at least one cell, found an empty row');
    if (row.length > cap) throw new TaskFileError(file, rowPath, `row has ${row.length} cells, over the size cap of ${cap} (${SIZE_CAP_HINT})`);
    if (width < 0) width = row.length;
    else if (row.length !== width) throw new TaskFileError(file, rowPath, `row has ${row.length} cells but row 0 has ${width}: rows must be equally long`);
    for (let c = 0; c < row.length; c++) {
      const cell: unknown = row[c];
      if (typeof cell !== 'number' || !Number.isInteger(cell) || cell < 0 || cell > 9) {
        throw new TaskFileError(file, `${rowPath}[${c}]`, `expected a colour, a whole number from 0 to 9, found ${describe(cell)}`);
      }
    }
    rows.push(row as number[]);
  }
  return Grid.fromRows(rows);
}

function readList(root: Record<string, unknown>, key: 'train' | 'test', file: string): unknown[] {
  const list = root[key];
  if (!Array.isArray(list)) throw new TaskFileError(file, `$.${key}`, `expected a list of pairs, found ${list === undefined ? 'nothing' : describe(list)}`);
  return list;
}

function readEntry(value: unknown, file: string, path: string): Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new TaskFileError(file, path, `expected an object with "input"${path.includes('train') ? ' and "output"' : ''}, found ${describe(value)}`);
  }
  return value as Record<string, unknown>;
}

/** Where JSON text first breaks the grammar ("line L, column C"), or the root when it cannot tell. */
function syntaxErrorPlace(text: string): string {
  const index = jsonErrorIndex(text);
  return index < 0 ? '$' : linePlace(text, index);
}

/**
 * Parses task JSON text; `file` names the source in error messages. The task comes back
 * deeply frozen (see {@link freezeTask}), so nothing can change a demonstration once read.
 */
export function parseTask(text: string, file: string, name = basename(file).replace(/\.json$/i, '')): Task {
  let root: unknown;
  // A byte-order mark, which some editors write, is not part of the JSON.
  const json = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  try {
    root = JSON.parse(json);
  } catch (error) {
    const message = (error as Error).message;
    const reason = message.replace(/\s*\(line \d+ column \d+\)/, '').replace(/ in JSON at position \d+/, '');
    const index = jsonErrorIndex(json);
    const position = index >= 0 ? lineAndColumn(json, index) : syntaxErrorPosition(json, message);
    throw new TaskFileError(file, syntaxErrorPlace(json), `not valid JSON: ${reason}`, position);
  }
  if (typeof root !== 'object' || root === null || Array.isArray(root)) {
    throw new TaskFileError(file, '$', `expected an object with "train" and "test", found ${describe(root)}`);
  }
  const object = root as Record<string, unknown>;
  const trainList = readList(object, 'train', file);
  if (trainList.length === 0) throw new TaskFileError(file, '$.train', 'expected at least one train pair, found none');
  const train: Pair[] = trainList.map((entry, i) => {
    const e = readEntry(entry, file, `$.train[${i}]`);
    return { input: readGrid(e.input, file, `$.train[${i}].input`), output: readGrid(e.output, file, `$.train[${i}].output`) };
  });
  const testList = readList(object, 'test', file);
  if (testList.length === 0) throw new TaskFileError(file, '$.test', 'expected at least one test input, found none');
  const test: TestCase[] = testList.map((entry, i) => {
    const e = readEntry(entry, file, `$.test[${i}]`);
    const input = readGrid(e.input, file, `$.test[${i}].input`);
    return e.output === undefined ? { input } : { input, output: readGrid(e.output, file, `$.test[${i}].output`) };
  });
  return freezeTask({ name, path: file, train, test });
}

export function readTaskFile(file: string): Task {
  let text: string;
  try {
    text = file === '-' ? readFileSync(0, 'utf8') : readFileSync(file, 'utf8');
  } catch (error) {
    throw new TaskFileError(file === '-' ? 'standard input' : file, '', fileProblem(error));
  }
  return file === '-' ? parseTask(text, 'standard input', 'stdin') : parseTask(text, file);
}

/**
 * The task files a path names: the file itself, or every *.json in a folder, sorted; '-' is
 * standard input. A folder without task files is an error, not an empty run.
 */
export function taskFiles(path: string): string[] {
  if (path === '-') return [path];
  let stats;
  try {
    stats = statSync(path);
  } catch (error) {
    throw new TaskFileError(path, '', (error as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file or folder' : fileProblem(error));
  }
  if (!stats.isDirectory()) return [path];
  const files = readdirSync(path)
    .filter((f) => f.toLowerCase().endsWith('.json'))
    .sort()
    .map((f) => join(path, f));
  if (files.length === 0) throw new TaskFileError(path, '', 'the folder holds no task files (*.json)');
  return files;
}

export type TaskOrError = { readonly ok: true; readonly task: Task } | { readonly ok: false; readonly file: string; readonly error: TaskFileError };

/** Reads every task under the given paths; a bad file becomes an error entry, the rest go on. */
export function readTasks(paths: readonly string[]): TaskOrError[] {
  const out: TaskOrError[] = [];
  for (const path of paths) {
    let files: string[];
    try {
      files = taskFiles(path);
    } catch (error) {
      out.push({ ok: false, file: path, error: error as TaskFileError });
      continue;
    }
    for (const file of files) {
      try {
        out.push({ ok: true, task: readTaskFile(file) });
      } catch (error) {
        if (!(error instanceof TaskFileError)) throw error;
        out.push({ ok: false, file, error });
      }
    }
  }
  return out;
}
