/**
 * `npm run bench:tables`: what the tables read off the demonstrations do on their own, with no
 * search. For every task of a directory (by default the public training set, ARC-AGI-1,
 * F. Chollet 2019, Apache-2.0, read from ../shared/datasets/arc-agi-1-training/), the programs
 * that apply a table straight to the input (src/search/table-programs.ts: the palette, the cell
 * rules, the object rules, the grid rules, exactly as the solver offers them) are ranked by bits; the task counts
 * as solved when the two cheapest with distinct test outputs hold every test output. Test outputs
 * are read only for that scoring, after the tables were learned.
 *
 * It takes seconds for the whole set, so a change to the features, properties or bits of tables
 * can be measured before a full evaluation.
 *
 *   npm run bench:tables -- [--dataset DIR] [--programs FILE]
 */
import { existsSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { isOrderedRule } from '../grid/cell-rule-table.ts';
import { printProgram } from '../language/printer.ts';
import { taskConstants } from '../search/constants.ts';
import { distinctAttempts } from '../search/distinct-attempts.ts';
import { INPUT_NAME } from '../search/solve.ts';
import { tablePrograms, type TableProgram } from '../search/table-programs.ts';
import { readTasks } from '../tasks/read-task.ts';
import { puzzleOf } from '../tasks/task.ts';

const repoRoot = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const defaultDataset = resolve(repoRoot, '..', 'shared', 'datasets', 'arc-agi-1-training');

/** The kind of table a program applies, for the report: `cell rule (background first)`, `object rule (size)`, ... */
function tableKind(t: TableProgram): string {
  const answer = t.program.answer;
  const table = answer.kind === 'call' ? answer.arguments[1] : undefined;
  if (!table || table.kind !== 'literal') return 'other';
  const l = table.literal;
  if (l.type === 'CellRule') return isOrderedRule(l.entries) ? 'cell list' : `cell rule (${l.features[0]?.name ?? '?'} first)`;
  if (l.type === 'ObjectRule') return `object rule (${l.second === undefined ? l.property : `${l.property}, ${l.second}`})`;
  if (l.type === 'GridRule') return `grid rule (${l.property})`;
  return l.type === 'Palette' ? 'palette' : 'other';
}

/** The two cheapest programs (by bits, ties in the order offered) with distinct test outputs, as the solver takes attempts. */
function attempts(found: readonly TableProgram[], trainCount: number): TableProgram[] {
  const ordered = found.map((t, i) => ({ t, i })).sort((a, b) => a.t.bits - b.t.bits || a.i - b.i).map(({ t }) => t);
  return distinctAttempts(ordered, (t) => t.values.slice(trainCount), 2);
}

function main(): void {
  const options = new Command()
    .name('bench:tables')
    .description('tables read off the demonstrations, applied straight to the input with no search: how many tasks they solve')
    .option('--dataset <dir>', 'task directory', defaultDataset)
    .option('--programs <file>', "write each task's table programs as JSON lines")
    .parse(process.argv)
    .opts<{ dataset: string; programs?: string }>();
  if (!existsSync(options.dataset)) {
    process.stderr.write(`${options.dataset}: not found; give a task directory with --dataset (the default is the public training set beside the repository)\n`);
    process.exitCode = 2;
    return;
  }
  const started = process.cpuUsage();
  let tasks = 0;
  let fitting = 0;
  const solved: string[] = [];
  const wrong: string[] = [];
  const kinds = new Map<string, number>();
  const lines: string[] = [];
  for (const entry of readTasks([options.dataset])) {
    if (!entry.ok) {
      process.stderr.write(`${entry.error.message}\n`);
      continue;
    }
    tasks++;
    const task = entry.task;
    const puzzle = puzzleOf(task);
    const inputs = [...puzzle.train.map((p) => p.input), ...puzzle.testInputs];
    const outputs = puzzle.train.map((p) => p.output);
    const found = tablePrograms(taskConstants(puzzle), defaultLibrary, inputs, outputs, INPUT_NAME, 60);
    if (found.length === 0) continue;
    fitting++;
    const tried = attempts(found, outputs.length);
    // Scoring only, after the tables were learned: the test outputs were never shown to them.
    const right = tried.find((t) => task.test.every((c, i) => c.output !== undefined && t.values[outputs.length + i]!.equals(c.output)));
    if (right) {
      solved.push(task.name);
      kinds.set(tableKind(right), (kinds.get(tableKind(right)) ?? 0) + 1);
    } else wrong.push(task.name);
    lines.push(JSON.stringify({ task: task.name, solved: right !== undefined, programs: tried.map((t) => ({ text: printProgram(t.program), bits: t.bits })) }));
  }
  const used = process.cpuUsage(started);
  if (options.programs) writeFileSync(options.programs, lines.join('\n') + '\n');
  process.stdout.write(
    [
      `tasks: ${tasks} in ${options.dataset}`,
      `with a table program that fits every demonstration: ${fitting}`,
      `solved by those programs (every test output among the two cheapest): ${solved.length}`,
      ...[...kinds].sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1)).map(([kind, n]) => `  ${kind}: ${n}`),
      `fit but missed a test output: ${wrong.length}`,
      `CPU seconds: ${((used.user + used.system) / 1e6).toFixed(2)}`,
      `solved: ${solved.join(' ')}`,
    ].join('\n') + '\n',
  );
}

main();
