/**
 * What the HTML report shows of one task, as plain JSON-ready data: the task's grids, what the
 * solver found, how the predictions compare with the expected test outputs, and the value of
 * every step of the cheapest program on every demonstration (from a traced run).
 */
import { EMPTY, Grid } from '../grid/grid.ts';
import { GridObject } from '../grid/grid-object.ts';
import { describeFailure } from '../language/failure-reason.ts';
import { isFailure } from '../language/failure.ts';
import { runProgram } from '../language/interpreter.ts';
import type { OperationLookup } from '../language/operation.ts';
import { Palette } from '../language/palette.ts';
import { parseProgram } from '../language/parser.ts';
import { Point } from '../language/point.ts';
import type { Task } from '../tasks/task.ts';

/** Grid rows; null marks a cell outside an object's shape. */
export type Rows = readonly (readonly (number | null)[])[];

/** What the solver said about one task: the shape of `solve --json` and eval results lines. */
export interface SolverOutcome {
  readonly task: string;
  readonly file: string;
  readonly status: 'found' | 'not found' | 'error';
  readonly error?: string;
  readonly solutions: readonly { readonly program: string; readonly bits: number }[];
  readonly attempts: readonly (readonly (readonly number[])[])[][];
  readonly reason: string;
  readonly seconds: number;
  /** Eval results lines carry the score; used only when the task file cannot be read. */
  readonly solved?: boolean;
}

/**
 * solved: every test output is among the attempts; wrong: a program fit every demonstration
 * but missed a test output; fitted: a program fit but the task has no test outputs to score;
 * not found; error: unreadable task or solver error.
 */
export type Verdict = 'solved' | 'wrong' | 'fitted' | 'not found' | 'error';

/** One step's value on one demonstration, ready to draw. */
export type ShownValue =
  | { readonly kind: 'grid'; readonly rows: Rows }
  | { readonly kind: 'text'; readonly text: string }
  | { readonly kind: 'pictures'; readonly text: string; readonly items: readonly { readonly label: string; readonly rows: Rows }[] }
  | { readonly kind: 'failure'; readonly why: string };

export interface ReportTask {
  readonly name: string;
  readonly file: string;
  readonly verdict: Verdict;
  readonly seconds: number;
  /** Bits of the cheapest program; null when none was found. */
  readonly bits: number | null;
  /** Why the search stopped, in words. */
  readonly stop: string;
  readonly error?: string;
  /** Said when the task file could not be read for drawing. */
  readonly note?: string;
  readonly train: readonly { readonly input: Rows; readonly output: Rows }[];
  readonly test: readonly { readonly input: Rows; readonly expected?: Rows; readonly attempts: readonly Rows[] }[];
  readonly programs: readonly { readonly text: string; readonly bits: number }[];
  /** The cheapest program's steps; `values[i]` is the value on demonstration i. */
  readonly steps: readonly { readonly name: string; readonly type: string; readonly values: readonly ShownValue[] }[];
}

export function stopInWords(reason: string): string {
  switch (reason) {
    case 'solved':
      return 'found';
    case 'time':
      return 'time limit reached';
    case 'candidates':
      return 'candidate cap reached';
    case 'memory':
      return 'value store full';
    case 'exhausted':
      return 'every program up to the cost cap tried';
    case 'error':
      return 'error';
    default:
      return reason;
  }
}

function rows(grid: Grid): Rows {
  return grid.toRows().map((row) => row.map((v) => (v === EMPTY ? null : v)));
}

function objectLabel(o: GridObject): string {
  return `at (${o.top}, ${o.left}), ${o.size} cell${o.size === 1 ? '' : 's'}, #${o.mainColour}`;
}

/** A value as the report draws it. */
export function shownValue(type: string, value: unknown): ShownValue {
  if (value instanceof Grid) return { kind: 'grid', rows: rows(value) };
  if (value instanceof GridObject) return { kind: 'pictures', text: `object ${objectLabel(value)}`, items: [{ label: `${value.height}x${value.width}`, rows: rows(value.shape) }] };
  if (Array.isArray(value)) {
    const noun = type === 'Objects' ? 'object' : 'grid';
    return {
      kind: 'pictures',
      text: `${value.length} ${noun}${value.length === 1 ? '' : 's'}`,
      items: value.map((item: unknown, i) =>
        item instanceof GridObject ? { label: `[${i}] ${objectLabel(item)}`, rows: rows(item.shape) } : { label: `[${i}]`, rows: item instanceof Grid ? rows(item) : [] },
      ),
    };
  }
  if (value instanceof Point) return { kind: 'text', text: `(${value.row}, ${value.column})` };
  if (value instanceof Palette) return { kind: 'text', text: `{${value.pairs().map(([a, b]) => `#${a} -> #${b}`).join(', ')}}` };
  if (type === 'Colour' && typeof value === 'number') return { kind: 'text', text: `#${value}` };
  return { kind: 'text', text: String(value) };
}

function verdictOf(outcome: SolverOutcome, task: Task | undefined): Verdict {
  if (outcome.status === 'error') return 'error';
  if (outcome.status === 'not found') return 'not found';
  if (!task) return outcome.solved === true ? 'solved' : outcome.solved === false ? 'wrong' : 'fitted';
  if (task.test.some((t) => t.output === undefined)) return 'fitted';
  const solved = task.test.every((t, i) => (outcome.attempts[i] ?? []).some((attempt) => Grid.fromRows(attempt.map((r) => [...r])).equals(t.output!)));
  return solved ? 'solved' : 'wrong';
}

/** The steps of the cheapest program with their values on every demonstration (empty if it does not parse or check). */
function traceSteps(programText: string, task: Task, library: OperationLookup): ReportTask['steps'] {
  let runs;
  try {
    const program = parseProgram(programText);
    runs = task.train.map((pair) => runProgram(program, pair.input, library, { trace: true }).trace);
  } catch {
    return [];
  }
  return runs[0]!.map((entry, s) => ({
    name: entry.name,
    type: entry.type,
    values: runs.map((trace) => {
      const e = trace[s]!;
      return isFailure(e.value) ? { kind: 'failure' as const, why: e.failure ? describeFailure(e.failure) : 'failed' } : shownValue(e.type, e.value);
    }),
  }));
}

/** The report's data for one task; `task` is undefined when its file could not be read. */
export function reportTask(outcome: SolverOutcome, task: Task | undefined, library: OperationLookup, note?: string): ReportTask {
  const programs = outcome.solutions.map((s) => ({ text: s.program, bits: s.bits }));
  return {
    name: outcome.task,
    file: outcome.file,
    verdict: verdictOf(outcome, task),
    seconds: outcome.seconds,
    bits: programs[0]?.bits ?? null,
    stop: stopInWords(outcome.reason),
    ...(outcome.error !== undefined ? { error: outcome.error } : {}),
    ...(note !== undefined ? { note } : {}),
    train: task ? task.train.map((p) => ({ input: rows(p.input), output: rows(p.output) })) : [],
    test: task
      ? task.test.map((t, i) => ({
          input: rows(t.input),
          ...(t.output ? { expected: rows(t.output) } : {}),
          attempts: (outcome.attempts[i] ?? []).map((a) => a.map((r) => [...r])),
        }))
      : [],
    programs,
    steps: task && programs[0] ? traceSteps(programs[0].text, task, library) : [],
  };
}
