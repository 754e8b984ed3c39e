/**
 * Ctrl-C (SIGINT) and SIGTERM during a batch run: the first stops the workers and lets the
 * command keep every finished line, print the summary so far and exit with 130 (143 for
 * SIGTERM); a second one exits at once.
 */
import { writeError } from './output.ts';

export interface Interruption {
  /** Aborted at the first signal. */
  readonly signal: AbortSignal;
  /** The exit code the signal calls for (130 for SIGINT, 143 for SIGTERM), or undefined. */
  readonly exitCode: number | undefined;
  /** Removes the handlers (the default behaviour returns), unless a signal already came. */
  dispose(): void;
}

const CODES = { SIGINT: 130, SIGTERM: 143 } as const;

export function catchInterruptions(): Interruption {
  const controller = new AbortController();
  let exitCode: number | undefined;
  const handler = (name: keyof typeof CODES) => {
    if (exitCode !== undefined) {
      writeError(`${name} again: quitting at once`);
      process.exit(exitCode);
    }
    exitCode = CODES[name];
    writeError(`\n${name}: stopping the workers; finished tasks are kept (press Ctrl-C again to quit at once)`);
    controller.abort();
  };
  const onInt = () => handler('SIGINT');
  const onTerm = () => handler('SIGTERM');
  process.on('SIGINT', onInt);
  process.on('SIGTERM', onTerm);
  return {
    signal: controller.signal,
    get exitCode() {
      return exitCode;
    },
    dispose() {
      // After a first signal the handlers stay: a second one that arrives while the command
      // finishes must still quit with the signal's exit code, not die by the default action.
      if (exitCode !== undefined) return;
      process.off('SIGINT', onInt);
      process.off('SIGTERM', onTerm);
    },
  };
}
