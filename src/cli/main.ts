/**
 * The `pithy` command line: builds the commander program and registers one command per
 * file. Each command is a thin layer over library functions.
 */
import { readFileSync, realpathSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Command } from 'commander';
import { setSizeCap } from '../grid/grid.ts';
import { SIZE_CAP_VARIABLE } from '../batch/solve-worker-settings.ts';
import { positiveNumber } from './solve-options.ts';
import { registerCheckCommand } from './check-command.ts';
import { registerEvalCommand } from './eval-command.ts';
import { registerMergeCommand } from './merge-command.ts';
import { registerFitPriorsCommand } from './fit-priors-command.ts';
import { registerSolveCommand } from './solve-command.ts';
import { registerPrimitivesCommand } from './primitives-command.ts';
import { registerReportCommand } from './report-command.ts';
import { registerRunCommand } from './run-command.ts';
import { registerShowCommand } from './show-command.ts';
import { registerTokensCommand } from './tokens-command.ts';
import { registerTraceCommand } from './trace-command.ts';
import { registerGenerateCommand } from './generate-command.ts';
import { registerVaryCommand } from './vary-command.ts';

/** The version in package.json. */
export function pithyVersion(): string {
  return (JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string }).version;
}

export function buildProgram(): Command {
  const program = new Command();
  // Exit codes (README, "Exit codes"): help and --version 0, bad usage 2. Subcommands inherit this.
  program.exitOverride((error) => {
    const ok = error.exitCode === 0 || error.code === 'commander.helpDisplayed' || error.code === 'commander.version';
    process.exit(ok ? 0 : 2);
  });
  program
    .name('pithy')
    .version(pithyVersion(), '--version', 'print the version of pithy')
    .description('finds the shortest program in a typed grid language that maps every demonstration input of a grid puzzle to its output')
    .showHelpAfterError()
    .option('--size-cap <n>', 'largest grid height and width accepted and built (default 30)', positiveNumber('--size-cap', true))
    .hook('preAction', (command) => {
      const cap = command.opts<{ sizeCap?: number }>().sizeCap;
      if (cap === undefined) return;
      try {
        setSizeCap(cap);
      } catch (error) {
        program.error(`error: option '--size-cap': ${(error as Error).message}`, { exitCode: 2 });
      }
      // Worker processes read it from the environment they inherit.
      process.env[SIZE_CAP_VARIABLE] = String(cap);
    });
  registerRunCommand(program);
  registerCheckCommand(program);
  registerShowCommand(program);
  registerPrimitivesCommand(program);
  registerSolveCommand(program);
  registerEvalCommand(program);
  registerMergeCommand(program);
  registerReportCommand(program);
  registerTokensCommand(program);
  registerTraceCommand(program);
  registerGenerateCommand(program);
  registerVaryCommand(program);
  registerFitPriorsCommand(program);
  return program;
}

export async function main(argv: readonly string[]): Promise<void> {
  // A reader that stops early (`pithy primitives | head`) is not an error.
  process.stdout.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw error;
  });
  await buildProgram().parseAsync([...argv]);
}

/** True when this file is the entry point (run by tsx directly or through bin/pithy.js). */
function isEntryPoint(): boolean {
  const invoked = process.argv[1];
  if (!invoked) return false;
  let path: string;
  try {
    path = realpathSync(invoked);
  } catch {
    return false;
  }
  const self = fileURLToPath(import.meta.url);
  return path === self || path === join(dirname(self), '..', '..', 'bin', 'pithy.js');
}

if (isEntryPoint()) await main(process.argv);
