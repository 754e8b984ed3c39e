/**
 * `pithy fit-priors RESULTS...`: re-estimates each primitive's bits from how often the solved
 * tasks of eval results files use it, and writes a priors file for `solve`/`eval --priors`.
 * `--report` instead prints how many primitives no solution uses and how many only one solved
 * task uses.
 */
import { existsSync, writeFileSync } from 'node:fs';
import { basename } from 'node:path';
import type { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { usageFromResults, usageReport, type PrimitiveUsage, type UsageReport } from '../batch/primitive-usage.ts';
import { checkPriorsParameters, DEFAULT_PRIORS_PARAMETERS, fitBits, type PriorsParameters } from '../library/fit-priors.ts';
import { priorsFile, priorsText } from '../library/priors-file.ts';
import { writeError, writeJson, writeLines } from './output.ts';
import { positiveNumber } from './solve-options.ts';

interface FitFlags {
  output: string;
  force?: boolean;
  smoothing: number;
  minimum: number;
  cap: number;
  report?: boolean;
  json?: boolean;
}

export function reportText(report: UsageReport, results: readonly string[]): string[] {
  const lines = [
    `solved tasks counted: ${report.solvedTasks} (from ${results.join(', ')})`,
    `primitives in the library: ${report.primitives}`,
    `  in no solution: ${report.unused.length}`,
    `  in exactly one solved task: ${report.singleTask.length}`,
    `  in two or more solved tasks: ${report.severalTasks}`,
  ];
  if (report.singleTask.length > 0) {
    lines.push('', 'in exactly one solved task (primitive: task):');
    for (const s of report.singleTask) lines.push(`  ${s.primitive}: ${s.task}`);
  }
  if (report.unused.length > 0) lines.push('', 'in no solution:', ...report.unused.map((name) => `  ${name}`));
  return lines;
}

function fitSummary(usage: PrimitiveUsage, bits: ReadonlyMap<string, number>, output: string): string {
  const values = [...bits.values()];
  return `fitted on ${usage.solvedTasks.length} solved tasks (${usage.totalUses} primitive uses); bits from ${Math.min(...values)} to ${Math.max(...values)}; wrote ${output}`;
}

export function registerFitPriorsCommand(program: Command): void {
  program
    .command('fit-priors')
    .description("re-estimate each primitive's bits from how often solved programs use it, from eval results files, and write a priors file for solve/eval --priors")
    .argument('<results...>', 'JSON-lines results files written by pithy eval --results')
    .option('--output <file>', 'the priors file to write', 'priors.json')
    .option('--force', 'allow --output to replace an existing file')
    .option('--smoothing <a>', 'pseudo-uses added to every primitive', positiveNumber('--smoothing', false), DEFAULT_PRIORS_PARAMETERS.smoothing)
    .option('--minimum <bits>', 'fewest bits a primitive may cost', positiveNumber('--minimum', true), DEFAULT_PRIORS_PARAMETERS.minimumBits)
    .option('--cap <bits>', 'most bits a primitive may cost (what an unused primitive costs at most)', positiveNumber('--cap', true), DEFAULT_PRIORS_PARAMETERS.capBits)
    .option('--report', 'write no file; print how many primitives no solution uses and how many only one solved task uses')
    .option('--json', 'with --report: print the report as JSON')
    .action((results: string[], flags: FitFlags) => {
      const parameters: PriorsParameters = { smoothing: flags.smoothing, minimumBits: flags.minimum, capBits: flags.cap };
      let usage: PrimitiveUsage;
      try {
        checkPriorsParameters(parameters);
        usage = usageFromResults(results, defaultLibrary);
      } catch (error) {
        writeError((error as Error).message);
        process.exitCode = 1;
        return;
      }
      if (flags.report) {
        const report = usageReport(usage, defaultLibrary);
        if (flags.json) writeJson({ results, ...report });
        else writeLines(reportText(report, results));
        return;
      }
      if (existsSync(flags.output) && !flags.force) {
        writeError(`${flags.output}: already exists; pithy will not overwrite it (choose another name or pass --force)`);
        process.exitCode = 2;
        return;
      }
      const bits = fitBits(usage.uses, defaultLibrary, parameters);
      const file = priorsFile(defaultLibrary, bits, parameters, {
        results: results.map((r) => basename(r)),
        solvedTasks: usage.solvedTasks.length,
        uses: usage.totalUses,
      });
      writeFileSync(flags.output, priorsText(file));
      writeError(fitSummary(usage, bits, flags.output));
    });
}
