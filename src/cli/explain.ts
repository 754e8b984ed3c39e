/**
 * `pithy solve --explain`: for each program found, the value of every step on the first
 * demonstration drawn as coloured blocks, and the predicted test outputs drawn beside their
 * inputs. The task file is read again only after the search has finished.
 */
import { Grid } from '../grid/grid.ts';
import { defaultLibrary } from '../../dsl/index.ts';
import type { TaskReport } from '../batch/task-report.ts';
import { runProgram } from '../language/interpreter.ts';
import { parseProgram } from '../language/parser.ts';
import { traceEntryLines } from '../output/describe-trace.ts';
import { drawPair, type ColourMode } from '../output/terminal-grid.ts';
import { readTaskFile, TaskFileError } from '../tasks/read-task.ts';
import type { Task } from '../tasks/task.ts';

export function explainLines(report: TaskReport, mode: ColourMode): string[] {
  if (report.status !== 'found') return [];
  let task: Task;
  try {
    task = readTaskFile(report.file);
  } catch (error) {
    if (!(error instanceof TaskFileError)) throw error;
    return [`  (cannot explain: ${error.message})`];
  }
  const lines: string[] = [];
  report.solutions.forEach((solution, k) => {
    const heading = report.solutions.length > 1 ? `attempt ${k + 1} (${solution.bits} bits)` : `the program (${solution.bits} bits)`;
    lines.push('', `  ${heading}, step by step on demonstration 1:`);
    const { trace } = runProgram(parseProgram(solution.program), task.train[0]!.input, defaultLibrary, { trace: true });
    for (const entry of trace) lines.push(...traceEntryLines(entry, mode).map((l) => `    ${l}`));
    lines.push('', `  its predictions:`);
    task.test.forEach((t, i) => {
      const rows = report.attempts[i]?.[k];
      const predicted = rows ? Grid.fromRows(rows) : undefined;
      lines.push(...drawPair(t.input, predicted, mode, { input: `test ${i + 1} input`, output: `attempt ${k + 1}` }).map((l) => `    ${l}`));
    });
  });
  lines.push('');
  return lines;
}
