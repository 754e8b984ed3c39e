/** Expands the PATH arguments of `solve` and `eval` into task files, reporting bad paths. */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { taskFiles, TaskFileError } from '../tasks/read-task.ts';

/**
 * `-` (standard input) becomes a file the worker processes can read by path: the text is copied
 * to `stdin.json` in a fresh temporary folder, removed when the process exits.
 */
function standardInputFile(): string {
  const folder = mkdtempSync(join(tmpdir(), 'pithy-stdin-'));
  const file = join(folder, 'stdin.json');
  writeFileSync(file, readFileSync(0));
  process.once('exit', () => rmSync(folder, { recursive: true, force: true }));
  return file;
}

export function expandTaskPaths(paths: readonly string[]): { files: string[]; problems: string[] } {
  const files: string[] = [];
  const problems: string[] = [];
  for (const path of paths) {
    try {
      files.push(...(path === '-' ? [standardInputFile()] : taskFiles(path)));
    } catch (error) {
      if (!(error instanceof TaskFileError)) throw error;
      problems.push(error.message);
    }
  }
  return { files, problems };
}
