/** `pithy show TASK`: draws every pair of a task (or of every task in a directory). */
import type { Command } from 'commander';
import { drawPair } from '../output/terminal-grid.ts';
import { readTasks } from '../tasks/read-task.ts';
import { stdoutColourMode, taskErrorData, writeError, writeJson, writeLines } from './output.ts';

export function registerShowCommand(program: Command): void {
  program
    .command('show')
    .description('draw the pairs of a task file (or of every task file in a directory)')
    .argument('<task>', "task JSON file or folder of them ('-' reads one task from standard input)")
    .option('--legend', 'name the colours under every drawn pair (number and palette name)')
    .option('--json', 'print the tasks as JSON (grids as lists of rows)')
    .action((path: string, options: { legend?: boolean; json?: boolean }) => {
      const entries = readTasks([path]);
      const mode = stdoutColourMode();
      const drawing = { legend: options.legend === true };
      const data: unknown[] = [];
      for (const entry of entries) {
        if (!entry.ok) {
          writeError(entry.error.message);
          process.exitCode = 2;
          continue;
        }
        const task = entry.task;
        if (options.json) {
          data.push({
            task: task.name,
            file: task.path,
            train: task.train.map((p) => ({ input: p.input.toRows(), output: p.output.toRows() })),
            test: task.test.map((t) => (t.output ? { input: t.input.toRows(), output: t.output.toRows() } : { input: t.input.toRows() })),
          });
          continue;
        }
        const lines = [`${task.name} (${task.path}): ${task.train.length} train, ${task.test.length} test`];
        task.train.forEach((p, i) => lines.push('', ...drawPair(p.input, p.output, mode, { input: `train ${i} input`, output: 'output' }, drawing)));
        task.test.forEach((t, i) => lines.push('', ...drawPair(t.input, t.output, mode, { input: `test ${i} input`, output: 'output' }, drawing)));
        lines.push('');
        writeLines(lines);
      }
      if (options.json) writeJson({ tasks: data, errors: entries.flatMap((e) => (e.ok ? [] : [taskErrorData(e.error)])) });
    });
}
