/** `--priors FILE` of `solve` and `eval`: reads the file against the default library and says what it changes. */
import { defaultLibrary } from '../../dsl/index.ts';
import type { PriorBits } from '../batch/solve-worker-settings.ts';
import { readPriorsFile } from '../library/priors-file.ts';
import { writeError } from './output.ts';

export interface PriorsOption {
  readonly file: string;
  /** `sha256:` and the digest of the file, recorded in eval results. */
  readonly hash: string;
  readonly bits: PriorBits;
}

/** Undefined without the flag; throws `PriorsFileError` for a bad file. Warnings go to standard error. */
export function loadPriorsOption(file: string | undefined): PriorsOption | undefined {
  if (file === undefined) return undefined;
  const loaded = readPriorsFile(file, defaultLibrary);
  if (!loaded.sameLibrary) {
    const unnamed = loaded.unnamed.length > 0 ? `; ${loaded.unnamed.length} primitives it does not name keep their own bits (${loaded.unnamed.slice(0, 5).join(', ')}${loaded.unnamed.length > 5 ? ', …' : ''})` : '';
    writeError(`${file}: warning: fitted on another version of the library (its hash differs)${unnamed}`);
  }
  return { file, hash: loaded.hash, bits: Object.fromEntries(loaded.bits) };
}

/**
 * For a command's action: the priors of `--priors`, undefined without the flag, or null after
 * reporting a bad file (exit code 2), when the command should stop.
 */
export function priorsOrStop(file: string | undefined): PriorsOption | undefined | null {
  try {
    return loadPriorsOption(file);
  } catch (error) {
    writeError((error as Error).message);
    process.exitCode = 2;
    return null;
  }
}
