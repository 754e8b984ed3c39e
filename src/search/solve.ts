/**
 * Solving one puzzle: the shortest program (in bits) consistent with every demonstration,
 * and up to N attempts per test input from the N cheapest solutions with distinct test outputs
 * (the last of the other way, table or composition, when all before it are of one: rank-attempts.ts).
 */
import type { Grid } from '../grid/grid.ts';
import type { Program } from '../language/ast.ts';
import { printProgram } from '../language/printer.ts';
import { defaultLibrary } from '../../dsl/index.ts';
import type { Library } from '../library/library.ts';
import type { Puzzle } from '../tasks/task.ts';
import { taskConstants } from './constants.ts';
import { enumerate, type EnumerationStatistics, type StopReason } from './enumerator.ts';
import { programFromCandidate } from './program-from-candidate.ts';
import { rankAttempts } from './rank-attempts.ts';
import { buildProductions, type Production } from './productions.ts';
import { tablePrograms } from './table-programs.ts';

export interface SolveOptions {
  /** Wall-time limit per task in seconds (default 20). */
  readonly timeLimitSeconds?: number;
  /** Attempts per test input (default 2). */
  readonly attempts?: number;
  /** Cap on candidates evaluated (default 50 million). */
  readonly maxCandidates?: number;
  /** Cap on the approximate bytes of values kept by the store (default 1.5 GB). */
  readonly maxStoreBytes?: number;
  /** Highest program cost in bits to try (default 60). */
  readonly maxBits?: number;
  /** Observational-equivalence pruning (default on; off only for measuring it). */
  readonly pruning?: boolean;
  /** After the first solution, how many more bits to search for further attempts (default 6). */
  readonly extraBits?: number;
  /** Most bits of calls worked back from the outputs through inverses (default 12; 0 turns goals off). */
  readonly goalBits?: number;
  /** Kept grids (cheapest first) to learn tables from on their way to the outputs (default 200; 0 turns it off). */
  readonly intermediateGrids?: number;
  /**
   * When the store reaches maxStoreBytes, go on with last steps only — grid-valued calls on the
   * values held, checked against the outputs and goals, nothing new kept — until another budget
   * ends (default on); off stops the search there.
   */
  readonly lastStepsWhenFull?: boolean;
  /** Join grids that answer some demonstrations each by a condition on the input (default on; off only for measuring it). */
  readonly caseSplits?: boolean;
  readonly library?: Library;
}

export interface Solution {
  readonly program: Program;
  readonly text: string;
  /** Description length of the program in bits (see README, "Description length"). */
  readonly bits: number;
  /** The program's output for each test input, in file order. */
  readonly testOutputs: readonly Grid[];
  /** True when the search met it by working back from the outputs (a goal, see src/search/goals.ts). */
  readonly throughGoal: boolean;
  /** True when it applies a table learned from a grid the search made, not the input (src/search/intermediate-tables.ts). */
  readonly throughIntermediateTable: boolean;
  /** True when it chooses between two grids the search kept by a condition that tells the demonstrations apart (src/search/case-splits.ts). */
  readonly throughCaseSplit: boolean;
  /** True when its output on some test input breaks the size the demonstrations settle (ranked as SIZE_BREAK_BITS dearer, src/search/output-size.ts). */
  readonly breaksSize: boolean;
  /** True when it applies a table read off the demonstrations straight to the input (src/search/table-programs.ts) rather than being composed by the search. */
  readonly fromTable: boolean;
}

export interface SolveResult {
  readonly task: string;
  /** Cheapest first; empty when nothing was found. */
  readonly solutions: readonly Solution[];
  /** Why the search stopped: 'solved', or the budget that ran out, or 'exhausted' (every cost up to maxBits tried). */
  readonly reason: StopReason;
  readonly seconds: number;
  readonly statistics: Readonly<EnumerationStatistics>;
}

const productionCache = new WeakMap<Library, Production[]>();

function productionsFor(library: Library): Production[] {
  let p = productionCache.get(library);
  if (!p) productionCache.set(library, (p = buildProductions(library)));
  return p;
}

export const INPUT_NAME = 'input';

export function solvePuzzle(puzzle: Puzzle, options: SolveOptions = {}): SolveResult {
  const started = performance.now();
  const library = options.library ?? defaultLibrary;
  const attempts = options.attempts ?? 2;
  const inputs = [...puzzle.train.map((p) => p.input), ...puzzle.testInputs];
  const outputs = puzzle.train.map((p) => p.output);
  const constants = taskConstants(puzzle);
  const maxBits = options.maxBits ?? 60;
  const extraBits = options.extraBits ?? 6;
  const trainCount = outputs.length;
  // Tables applied straight to the input (table-programs.ts), ranked with the rest by bits. As
  // with the enumeration's own first solution, nothing dearer than the cheapest of them by more
  // than extraBits can be an attempt, so the enumeration need not go further.
  const tables = tablePrograms(constants, library, inputs, outputs, INPUT_NAME, maxBits);
  const cheapestTable = Math.min(...tables.map((t) => t.bits));
  const outcome = enumerate(inputs, outputs, constants, productionsFor(library), {
    deadline: started + (options.timeLimitSeconds ?? 20) * 1000,
    maxCandidates: options.maxCandidates ?? 50_000_000,
    maxStoreBytes: options.maxStoreBytes ?? 1.5e9,
    maxCost: Math.min(maxBits, cheapestTable + extraBits),
    attempts,
    extraBits,
    pruning: options.pruning ?? true,
    goalBits: options.goalBits ?? 12,
    intermediateGrids: options.intermediateGrids ?? 200,
    lastStepsWhenFull: options.lastStepsWhenFull ?? true,
    caseSplits: options.caseSplits ?? true,
  }, INPUT_NAME);
  const found: Solution[] = outcome.solutions.map((c) => {
    const program = programFromCandidate(c, INPUT_NAME);
    return { program, text: printProgram(program), bits: c.cost, testOutputs: c.values.slice(trainCount) as Grid[], throughGoal: outcome.throughGoals.has(c), throughIntermediateTable: outcome.throughIntermediateTables.has(c), throughCaseSplit: outcome.throughCaseSplits.has(c), breaksSize: outcome.sizeFallbacks.has(c), fromTable: false };
  });
  for (const t of tables) {
    found.push({ program: t.program, text: printProgram(t.program), bits: t.bits, testOutputs: t.values.slice(trainCount), throughGoal: false, throughIntermediateTable: false, throughCaseSplit: false, breaksSize: false, fromTable: true });
  }
  const solutions = rankAttempts(found, attempts);
  const reason = solutions.length > 0 ? 'solved' : outcome.reason;
  return { task: puzzle.name, solutions, reason, seconds: (performance.now() - started) / 1000, statistics: outcome.statistics };
}
