/** Expands the PATH arguments of `solve` and `eval` into task files, reporting bad paths. */
import { taskFiles, TaskFileError } from '../tasks/read-task.ts';

export function expandTaskPaths(paths: readonly string[]): { files: string[]; problems: string[] } {
  const files: string[] = [];
  const problems: string[] = [];
  for (const path of paths) {
    try {
      files.push(...taskFiles(path));
    } catch (error) {
      if (!(error instanceof TaskFileError)) throw error;
      problems.push(error.message);
    }
  }
  return { files, problems };
}
