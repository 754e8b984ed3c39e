/**
 * What `solve` and `eval` say when a run cannot go on: a results file made with other
 * settings or not a results file (exit 2, nothing written), or a write that failed, say on a
 * full disk (exit 1; every line written before is kept and the same command resumes).
 */
import { ResultsFileError } from '../batch/results-file.ts';
import { SettingsMismatchError } from '../batch/resume.ts';
import { writeError } from './output.ts';

/** Reports a known problem and sets the exit code; false for anything else (a bug: rethrow it). */
export function reportRunProblem(error: unknown, file: string): boolean {
  if (error instanceof SettingsMismatchError || error instanceof ResultsFileError) {
    writeError(error.message);
    process.exitCode = 2;
    return true;
  }
  const code = (error as NodeJS.ErrnoException).code;
  if (typeof code === 'string' && /^E[A-Z]+$/.test(code)) {
    writeError(
      `${file}: cannot write (${code}${code === 'ENOSPC' ? ', the disk is full' : ''}): ${(error as Error).message}\n` +
        'Every task finished before is kept; once the problem is fixed, run the same command again to resume.',
    );
    process.exitCode = 1;
    return true;
  }
  return false;
}
