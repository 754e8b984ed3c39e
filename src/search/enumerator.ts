/**
 * Bottom-up enumeration in order of cost. Candidates of cost c are built from kept candidates
 * of smaller cost, evaluated on every example input at once, and kept unless they fail on
 * some input or equal (on all inputs) a candidate already kept for their type. A Grid-valued
 * candidate equal to every demonstration output is a solution.
 *
 * The `Enumerator` class keeps each step in its own method (leaves, one cost level, filling
 * argument slots, evaluating, offering to the store, budgets) so that a profile names them.
 * Types are integer ids here (type-table.ts), and each production knows, per argument
 * position, the cheapest cost its remaining arguments can have.
 */
import { getHeapStatistics } from 'node:v8';
import { analysisBytesSoFar, backgroundColour } from '../grid/components.ts';
import { Grid, cellsCheckpoint, cellsRewind } from '../grid/grid.ts';
import type { Expression } from '../language/ast.ts';
import { isFailure } from '../language/failure.ts';
import { literalValue } from '../language/interpreter.ts';
import { applyOperation, sectionOf } from '../language/operation.ts';
import type { Type } from '../language/types.ts';
import { CaseSplits } from './case-splits.ts';
import { CropGoals, type CropGoal } from './crop-goals.ts';
import type { Constant } from './constants.ts';
import type { Production } from './productions.ts';
import { GoalTable, sameGrids, type Goal, type GoalStep } from './goals.ts';
import { IntermediateTables } from './intermediate-tables.ts';
import { fixedCellsLaid, freeCellsClear, layerGoals, leavesFreeCells, meetsLayerGoal, type LayerGoal } from './layer-goals.ts';
import { othersInTime } from './level-time.ts';
import { fitsPrediction, predictOutputSizes, type PredictedSize } from './output-size.ts';
import { SectionProbes } from './section-probes.ts';
import { TypeTable } from './type-table.ts';
import { ValueStore, type Candidate } from './value-store.ts';

export type StopReason = 'solved' | 'time' | 'candidates' | 'memory' | 'exhausted';

export interface EnumerationLimits {
  /** Wall-clock deadline (performance.now() value). */
  readonly deadline: number;
  readonly maxCandidates: number;
  /** Cap on the bytes of values held by the store (cells, objects, memoised analyses). */
  readonly maxStoreBytes: number;
  readonly maxCost: number;
  /** How many solutions with distinct test outputs to collect. */
  readonly attempts: number;
  /** After the first solution, how many more bits of cost to search for further attempts. */
  readonly extraBits: number;
  readonly pruning: boolean;
  /** Most bits the calls of one goal may cost (0: no goals; see goals.ts). */
  readonly goalBits: number;
  /** Kept grids to learn tables from on their way to the outputs (0: none; see intermediate-tables.ts). */
  readonly intermediateGrids: number;
  /**
   * When the store reaches maxStoreBytes: true goes on with last steps only (grid-valued calls
   * on what the store holds, checked against the outputs and goals, nothing new kept) until
   * another budget ends; false stops there.
   */
  readonly lastStepsWhenFull: boolean;
  /** Join kept grids that answer some demonstrations each by a kept condition (see case-splits.ts). */
  readonly caseSplits: boolean;
}

export interface EnumerationStatistics {
  /** Candidates built and evaluated. */
  candidates: number;
  /** Kept in the store. */
  kept: number;
  /** Dropped as observationally equivalent to a kept candidate. */
  pruned: number;
  /** Of the pruned, sections dropped for behaving like a kept section on the probes. */
  sectionsPruned: number;
  /** Dropped because they failed on some input. */
  failed: number;
  /** Highest cost level finished. */
  costReached: number;
  /** Goals: worked back from the outputs through inverses, layer goals, crop goals. */
  goals: number;
  /** Solutions found by meeting a goal (a kept candidate wrapped in the goal's calls), size breakers handed on included. */
  goalSolutions: number;
  /** Kept grids that tables were learned from on their way to the outputs. */
  intermediateGrids: number;
  /** Solutions applying a table learned from a kept grid other than the input. */
  intermediateSolutions: number;
  /** Solutions that choose between two kept grids by a kept condition (case-splits.ts). */
  caseSplitSolutions: number;
  /** Programs that fit the demonstrations but not the output size they settle on a test input (the cheapest are handed on, ranked as SIZE_BREAK_BITS dearer). */
  sizeRejected: number;
  /** Bytes the search held when it stopped (when last steps began, if they did): kept values (cells counted) and memoised analyses. */
  bytesHeld: number;
  /** The cost level being built when the store filled, after which only last steps were tried (0: it never filled). */
  fullAtCost: number;
  /**
   * The cost level from which only last steps were tried (0: never): where the store filled, or
   * the first level whose values other than grids the time left could not have made in time to
   * use them.
   */
  lastStepsFromCost: number;
  /** Seconds from the start of the search to the first solution (absent when none). */
  secondsToFirstSolution?: number;
}

export interface EnumerationOutcome {
  readonly solutions: readonly Candidate[];
  readonly reason: StopReason;
  readonly statistics: EnumerationStatistics;
  /** The solutions found by meeting a goal. */
  readonly throughGoals: ReadonlySet<Candidate>;
  /** The solutions applying a table learned from a kept grid other than the input. */
  readonly throughIntermediateTables: ReadonlySet<Candidate>;
  /** The solutions that choose between two kept grids by a kept condition. */
  readonly throughCaseSplits: ReadonlySet<Candidate>;
  /** The solutions that break the output size the demonstrations settle (ranked as SIZE_BREAK_BITS dearer). */
  readonly sizeFallbacks: ReadonlySet<Candidate>;
}

/** Costliest kept grid (bits) that tables are learned from: a dear one plus a table seldom beats the rest. */
const INTERMEDIATE_MAXIMUM_COST = 22;
/** Cells learned from per task (over all values of all kept grids tried): a second or two of work at most. */
const INTERMEDIATE_MAXIMUM_CELLS = 100_000;

/** At most this many crop goals (crop-goals.ts): each is tested on every grid kept after it, and it on every grid kept before. */
const CROP_GOALS = 48;

/** With only last steps tried, the share of the JavaScript heap limit at which the search stops all the same. */
const HEAP_SHARE_WHEN_FULL = 0.8;

/** Made layers (addMadeLayers): grids of at most this many bits, taken once that level is done. */
const MADE_LAYER_MAXIMUM_COST = 10;

/** At most this many layer goals with a made layer: each is tested on every grid kept after. */
const MADE_LAYER_GOALS = 24;

/**
 * Partial layers (addPartialLayers): kept grids that lay part of a layer goal, taken once each of
 * these levels is done (the second round also builds on the first round's goals: three drawings).
 */
const PARTIAL_LAYER_LEVELS: readonly number[] = [12, 15];

/** At most this many layer goals with a partial layer per round, as for made layers. */
const PARTIAL_LAYER_GOALS = 24;

/** Grids that lay part of a goal, laid and tried as fixed layers, at most (most cells first): each is a few calls on every input. */
const PARTIAL_LAYERS_TRIED = 200;

class Stop extends Error {
  constructor(readonly reason: StopReason) {
    super(reason);
  }
}

/** A production as the loop sees it: argument and result types as ids. */
interface Rule {
  readonly production: Production;
  readonly argumentTypes: Int32Array;
  readonly resultType: number;
  readonly bits: number;
  /** [position] → cheapest total cost of the arguments after it; refreshed each level. */
  readonly restMinimum: Float64Array;
}

export class Enumerator {
  readonly statistics: EnumerationStatistics = { candidates: 0, kept: 0, pruned: 0, sectionsPruned: 0, failed: 0, costReached: 0, goals: 0, goalSolutions: 0, intermediateGrids: 0, intermediateSolutions: 0, caseSplitSolutions: 0, sizeRejected: 0, bytesHeld: 0, fullAtCost: 0, lastStepsFromCost: 0 };
  private readonly types = new TypeTable();
  private readonly rules: Rule[];
  private readonly leaves: Candidate[] = [];
  private readonly store: ValueStore;
  private readonly probes: SectionProbes;
  private readonly solutions: Candidate[] = [];
  /** Solutions met through goals, held until every cheaper cost level is done (or the budget ends). */
  private readonly pending: Candidate[] = [];
  private readonly throughGoals = new Set<Candidate>();
  private readonly throughIntermediateTables = new Set<Candidate>();
  private readonly throughCaseSplits = new Set<Candidate>();
  /** Grids answering some demonstrations, to be joined by a condition; undefined when off or when the library has no choice. */
  private readonly splits: CaseSplits | undefined;
  /** The choice between two grids by a condition, and the condition type's id. */
  private readonly choice: Rule | undefined;
  private readonly boolType: number;
  private readonly intermediate: IntermediateTables | undefined;
  /** Programs that fit the demonstrations but break the settled output size: attempts only when nothing better comes. */
  private readonly sizeFallbacks: Candidate[] = [];
  private readonly goals: GoalTable | undefined;
  /** Goals through a layering call with the input, or a cheap made grid, as one layer (layer-goals.ts); empty with goals off. */
  private readonly layers: LayerGoal[];
  /** Crop goals (crop-goals.ts), and the productions that cut at a rectangle another argument names. */
  private readonly crops: CropGoals | undefined;
  private readonly cropRules: Rule[];
  /** Each layering call and see-through colour the layer goals use (also for made layers). */
  private readonly layerCalls: { production: Production; transparent: Candidate }[] = [];
  private readonly inputs: readonly Grid[];
  /** The leaf that stands for the input. */
  private readonly inputLeaf: Candidate;
  /** Per test input, the output size the demonstrations settle. */
  private readonly predictedSizes: readonly PredictedSize[];
  private readonly examples: number;
  private readonly trainCount: number;
  private readonly gridType: number;
  private readonly started = performance.now();
  private readonly analysisBytesAtStart = analysisBytesSoFar();
  private deadline: number;
  private firstSolutionCost = Infinity;
  /** The cost level being built. */
  private level = 0;
  /** Only last steps are tried from now on, and nothing more is kept: the store is full (see lastStepsWhenFull) or the time left is short. */
  private lastStepsOnly = false;
  /** Index of the first rule that does not make a grid (rules making grids come first). */
  private readonly firstOtherRule: number;
  /** Milliseconds each finished level spent on its grids and on its other values, by cost. */
  private readonly gridMilliseconds: Float64Array;
  private readonly otherMilliseconds: Float64Array;
  /** The level and goal count of the last round of partial layers (addPartialLayers), and the layers it laid. */
  private partialRoundDone = { cost: 0, goals: 0 };
  private readonly partialLayers: Candidate[] = [];
  /** Argument slots being filled. */
  private readonly args: Candidate[] = [];
  /** Values of the candidate being evaluated (copied when kept). */
  private readonly scratch: unknown[];
  /** One reused argument array per arity. */
  private readonly callScratch: unknown[][] = [];

  constructor(
    inputs: readonly Grid[],
    private readonly outputs: readonly Grid[],
    constants: readonly Constant[],
    productions: readonly Production[],
    private readonly limits: EnumerationLimits,
    inputName = 'grid',
  ) {
    this.examples = inputs.length;
    this.trainCount = outputs.length;
    this.scratch = new Array<unknown>(this.examples);
    this.deadline = limits.deadline;
    this.gridType = this.types.id('Grid');
    this.rules = productions.map((production) => ({
      production,
      argumentTypes: Int32Array.from(production.argumentTypes, (t) => this.types.id(t)),
      resultType: this.types.id(production.result),
      bits: production.bits,
      restMinimum: new Float64Array(production.argumentTypes.length + 1),
    }));
    // Within a level, calls that make a grid come first: only a grid can be an answer or meet a
    // goal, and a level cut short by the time limit has then checked all of its grids it could.
    // Each type's candidates keep their order, so the same values are kept under the same
    // programs once a level is done (the sort is stable).
    const last = (rule: Rule): number => (rule.resultType === this.gridType && !rule.production.section ? 0 : 1);
    this.rules.sort((a, b) => last(a) - last(b));
    this.firstOtherRule = this.rules.findIndex((rule) => last(rule) === 1);
    if (this.firstOtherRule < 0) this.firstOtherRule = this.rules.length;
    this.gridMilliseconds = new Float64Array(limits.maxCost + 2);
    this.otherMilliseconds = new Float64Array(limits.maxCost + 2);
    this.inputLeaf = this.leaf('Grid', 1, inputs, { kind: 'variable', name: inputName });
    this.leaves.push(this.inputLeaf);
    for (const c of constants) {
      const value = literalValue(c.literal);
      this.leaves.push(this.leaf(c.literal.type, c.bits, new Array(this.examples).fill(value), { kind: 'literal', literal: c.literal }));
    }
    this.leaves.sort((a, b) => a.cost - b.cost);
    const names: Type[] = [];
    for (let t = 0; t < this.types.size; t++) names.push(this.types.type(t));
    this.store = new ValueStore(limits.pruning, names, this.types.isFunction);
    this.probes = new SectionProbes(inputs);
    const pairs = outputs.map((output, i) => ({ input: inputs[i]!, output }));
    this.predictedSizes = predictOutputSizes(pairs, inputs.slice(this.trainCount));
    this.goals = limits.goalBits > 0 ? this.buildGoals(limits.goalBits) : undefined;
    this.inputs = inputs;
    this.layers = limits.goalBits > 0 ? this.buildLayerGoals(limits.goalBits) : [];
    this.statistics.goals = (this.goals?.count ?? 0) + this.layers.length;
    // A cut gives a grid smaller than the one it cuts: where no output is smaller than its input,
    // the goals would test every kept grid for nothing.
    const someOutputSmaller = outputs.some((output, i) => output.height < inputs[i]!.height || output.width < inputs[i]!.width);
    this.cropRules =
      limits.goalBits > 0 && someOutputSmaller
        ? this.rules.filter((r) => !r.production.section && r.production.primitive.cropsAt && r.resultType === this.gridType && r.argumentTypes.length === 2 && r.argumentTypes[0] === this.gridType)
        : [];
    this.crops = this.cropRules.length > 0 ? new CropGoals(outputs, this.examples, CROP_GOALS) : undefined;
    this.boolType = this.types.id('Bool');
    this.choice = this.rules.find((r) => !r.production.section && r.resultType === this.gridType && r.argumentTypes.length === 3 && r.argumentTypes[0] === this.boolType && r.argumentTypes[1] === this.gridType && r.argumentTypes[2] === this.gridType && r.production.primitive.name === 'choose');
    const splits = limits.caseSplits && this.choice ? new CaseSplits(outputs, this.choice.bits, limits.maxCost) : undefined;
    this.splits = splits?.open ? splits : undefined;
    this.intermediate = limits.intermediateGrids > 0 ? new IntermediateTables(outputs, productions, { maxGrids: limits.intermediateGrids, maxCost: INTERMEDIATE_MAXIMUM_COST, maxCells: INTERMEDIATE_MAXIMUM_CELLS }) : undefined;
  }

  /** Goals from the outputs through every invertible production, with constant other arguments. */
  private buildGoals(maxCost: number): GoalTable {
    const leavesByType = new Map<number, Candidate[]>();
    for (const leaf of this.leaves) {
      if (!leaf.leaf || leaf.leaf.kind !== 'literal') continue;
      const list = leavesByType.get(leaf.typeId);
      if (list) list.push(leaf);
      else leavesByType.set(leaf.typeId, [leaf]);
    }
    const invertible = this.rules
      .filter((r) => !r.production.section && r.production.primitive.inverse && r.resultType === this.gridType && r.argumentTypes[0] === this.gridType)
      .map((r) => ({ production: r.production, restTypes: Array.from(r.argumentTypes.subarray(1)) }));
    return new GoalTable(this.outputs, invertible, leavesByType, { maxCost, maxGoals: 2000 });
  }

  /**
   * Layer goals for every layering production, see-through colour the background that every
   * demonstration input shares (a constant of the task): each goal is tested on every kept grid,
   * so they are kept few.
   */
  private buildLayerGoals(maxCost: number): LayerGoal[] {
    const input = this.inputLeaf;
    const background = backgroundColour(this.inputs[0]!);
    for (let i = 1; i < this.trainCount; i++) if (backgroundColour(this.inputs[i]!) !== background) return [];
    const colours = this.leaves.filter((leaf) => leaf.type === 'Colour' && leaf.leaf?.kind === 'literal' && leaf.values[0] === background);
    const goals: LayerGoal[] = [];
    for (const rule of this.rules) {
      if (rule.production.section || !rule.production.primitive.laysOver) continue;
      for (const colour of colours) this.layerCalls.push({ production: rule.production, transparent: colour });
      for (const goal of layerGoals(this.inputs, this.outputs, rule.production, input, colours)) if (goal.cost <= maxCost) goals.push(goal);
    }
    return goals;
  }

  /**
   * Once every grid of up to `cost` bits is kept: layer goals whose fixed layer is one of those
   * grids instead of the input (the input with something erased or moved, say), those with the
   * fewest cells left to draw first, then the cheapest, at most MADE_LAYER_GOALS of them, each
   * with free cells left (a pattern with none wants one grid and is not worth a test on every kept
   * grid). The grids kept so far are tested against them at once; later ones as they are kept.
   */
  private addMadeLayers(cost: number): void {
    const made: LayerGoal[] = [];
    const trainInputs = this.inputs.slice(0, this.trainCount);
    for (let c = 1; c <= cost; c++) {
      for (const grid of this.store.at(this.gridType, c)) {
        // The input's own goals are there already.
        if (this.answers(grid.values) || sameGrids(grid.values, trainInputs)) continue;
        for (const call of this.layerCalls) {
          for (const goal of layerGoals(grid.values as readonly Grid[], this.outputs, call.production, grid, [call.transparent])) if (leavesFreeCells(goal)) made.push(goal);
        }
      }
    }
    // The layers nearest the outputs (fewest cells left to draw) first, then the cheapest; stable.
    made.sort((a, b) => a.changes - b.changes || a.cost - b.cost);
    made.length = Math.min(made.length, MADE_LAYER_GOALS);
    this.addLayerGoals(made, cost);
  }

  /**
   * Once every grid of up to `cost` bits is kept: those that lay part of a layer goal right and
   * nothing wrong (laysPartOfGoal), laid as the goal says, become fixed layers for a second grid
   * to finish (a task that draws two things by two rules, say). Fewest cells left to add first,
   * then cheapest; at most PARTIAL_LAYER_GOALS goals, each leaving free cells.
   */
  private addPartialLayers(cost: number): void {
    const parts: { goal: LayerGoal; found: Candidate; covered: number }[] = [];
    const goals = this.layers.slice();
    // A later round pairs only what an earlier one has not: its goals with the grids kept since.
    const { cost: doneCost, goals: doneGoals } = this.partialRoundDone;
    this.partialRoundDone = { cost, goals: goals.length };
    for (let c = 1; c <= cost; c++) {
      for (const found of this.store.at(this.gridType, c)) {
        if (this.answers(found.values)) continue;
        for (let g = c <= doneCost ? doneGoals : 0; g < goals.length; g++) {
          const goal = goals[g]!;
          const covered = this.laidPartEverywhere(goal, found.values);
          if (covered > 0 && covered < goal.changes) parts.push({ goal, found, covered });
        }
      }
    }
    // Fewest cells left to add first, then cheapest; stable, so equal parts keep the order they were found in.
    parts.sort((a, b) => a.goal.changes - a.covered - (b.goal.changes - b.covered) || a.found.cost + a.goal.cost - (b.found.cost + b.goal.cost));
    const made: LayerGoal[] = [];
    const laid = this.partialLayers;
    for (let k = 0; k < parts.length && k < PARTIAL_LAYERS_TRIED && made.length < PARTIAL_LAYER_GOALS; k++) {
      const { goal, found } = parts[k]!;
      const args = goal.side === 'over' ? [goal.layer, found, goal.transparent] : [found, goal.layer, goal.transparent];
      const both = this.callOnEveryInput(goal.production, args, found.cost + goal.cost);
      if (!both) continue;
      // A grid that already holds the fixed layer (the input and something drawn on it) needs no laying.
      const layer = sameGrids(found.values, both.values as readonly Grid[]) ? found : both;
      if (laid.some((other) => sameGrids(other.values, layer.values as readonly Grid[]))) continue;
      laid.push(layer);
      // What is left to draw may be a table's work: learned as from any kept grid.
      if (layer !== found && this.intermediate?.open) this.learnTables(layer);
      for (const next of layerGoals(layer.values as readonly Grid[], this.outputs, goal.production, layer, [goal.transparent])) if (leavesFreeCells(next)) made.push(next);
    }
    made.length = Math.min(made.length, PARTIAL_LAYER_GOALS);
    this.addLayerGoals(made, cost);
  }

  /** Takes more layer goals: grids kept so far (of up to `cost` bits) are tested against them at once, later ones as they are kept. */
  private addLayerGoals(added: LayerGoal[], cost: number): void {
    if (added.length === 0) return;
    this.statistics.goals += added.length;
    for (let c = 1; c <= cost; c++) {
      for (const found of this.store.at(this.gridType, c)) {
        if (this.answers(found.values)) continue;
        for (const goal of added) if (this.meetsEverywhere(goal, found.values)) this.meetLayerGoal(found, goal);
      }
    }
    this.layers.push(...added);
  }

  /**
   * laysPartOfGoal summed over the demonstrations (-1 when some cell is laid wrong), its fixed
   * cells on every demonstration first: most grids lay nothing there, and then nothing else is read.
   */
  private laidPartEverywhere(goal: LayerGoal, values: readonly unknown[]): number {
    let covered = 0;
    for (let i = 0; i < this.trainCount; i++) {
      const part = fixedCellsLaid(goal, i, values[i] as Grid, goal.layer.values[i] as Grid);
      if (part < 0) return -1;
      covered += part;
    }
    if (covered === 0) return 0;
    for (let i = 0; i < this.trainCount; i++) if (!freeCellsClear(goal, i, values[i] as Grid, goal.layer.values[i] as Grid)) return -1;
    return covered;
  }

  private meetsEverywhere(goal: LayerGoal, values: readonly unknown[]): boolean {
    for (let i = 0; i < this.trainCount; i++) if (!meetsLayerGoal(goal, i, values[i] as Grid, goal.layer.values[i] as Grid)) return false;
    return true;
  }

  /** The layer goals these grid values meet on every demonstration. */
  private layersMet(values: readonly unknown[]): LayerGoal[] | undefined {
    let met: LayerGoal[] | undefined;
    for (const goal of this.layers) if (this.meetsEverywhere(goal, values)) (met ??= []).push(goal);
    return met;
  }

  /** The crop goals these grid values meet (undefined when none). */
  private cropsMet(values: readonly unknown[]): CropGoal[] | undefined {
    let met: CropGoal[] | undefined;
    for (const goal of this.crops!.goals) if (this.crops!.meets(goal, values)) (met ??= []).push(goal);
    return met;
  }

  /** Keeps a kept grid that meets a layer goal, laid as the goal says, as a pending solution. */
  private meetLayerGoal(found: Candidate, goal: LayerGoal): void {
    const input = goal.layer;
    const args = goal.side === 'over' ? [input, found, goal.transparent] : [found, input, goal.transparent];
    const laid = this.callOnEveryInput(goal.production, args, found.cost + goal.cost);
    if (laid && this.answers(laid.values)) this.pending.push(laid);
  }

  private leaf(type: Type, cost: number, values: readonly unknown[], expression: Expression): Candidate {
    return { type, typeId: this.types.id(type), cost, values, production: undefined, arguments: [], leaf: expression, signature: undefined };
  }

  /** Runs cost level after cost level until a budget runs out or enough solutions are found. */
  run(): EnumerationOutcome {
    let reason: StopReason = 'exhausted';
    try {
      let nextLeaf = 0;
      for (let cost = 1; cost <= this.limits.maxCost; cost++) {
        if (this.solutions.length > 0 && cost > this.firstSolutionCost + this.limits.extraBits) break;
        this.level = cost;
        while (nextLeaf < this.leaves.length && this.leaves[nextLeaf]!.cost === cost) {
          const leaf = this.leaves[nextLeaf++]!;
          this.offer(leaf.typeId, leaf.cost, leaf.values, undefined, leaf.leaf, undefined);
        }
        this.expandLevel(cost);
        if (this.splits) this.joinCaseSplits(cost);
        if (cost === MADE_LAYER_MAXIMUM_COST && this.layerCalls.length > 0 && !this.lastStepsOnly) this.addMadeLayers(cost);
        if (PARTIAL_LAYER_LEVELS.includes(cost) && this.layers.length > 0 && !this.lastStepsOnly) this.addPartialLayers(cost);
        this.acceptPending(cost);
        this.statistics.costReached = cost;
        this.checkBudget();
      }
    } catch (error) {
      if (!(error instanceof Stop)) throw error;
      reason = error.reason;
    }
    if (reason !== 'solved') {
      // The budget ended (or every cost was tried): what goals and intermediate tables met is
      // the best found within the cost limit (also as later attempts beyond a first solution's
      // extra bits: found already, they cost nothing more).
      try {
        // The level the budget cut short kept or met grids that no join has seen yet.
        if (this.splits) this.joinCaseSplits(this.level);
        this.acceptPending(this.limits.maxCost);
      } catch (error) {
        if (!(error instanceof Stop)) throw error;
      }
    }
    this.addSizeFallbacks();
    if (this.solutions.length > 0) reason = 'solved';
    // A search that went on past a full store was not complete at the levels it reached.
    else if (this.statistics.fullAtCost > 0) reason = 'memory';
    // Nor was one that turned to last steps for want of time, even if it then ran out of levels.
    else if (this.lastStepsOnly && reason === 'exhausted') reason = 'time';
    if (!this.lastStepsOnly) this.statistics.bytesHeld = this.bytesHeld;
    this.statistics.intermediateGrids = this.intermediate?.tried ?? 0;
    return {
      solutions: this.solutions,
      reason,
      statistics: this.statistics,
      throughGoals: this.throughGoals,
      throughIntermediateTables: this.throughIntermediateTables,
      throughCaseSplits: this.throughCaseSplits,
      sizeFallbacks: new Set(this.sizeFallbacks),
    };
  }

  /** Every production whose bits and cheapest arguments fit in this cost. */
  private expandLevel(cost: number): void {
    this.refreshMinimums();
    const args = this.args;
    const started = performance.now();
    let gridsDone = started;
    for (let r = 0; r < this.rules.length; r++) {
      if (r === this.firstOtherRule) {
        // Last steps only: a grid can still be an answer or meet a goal; nothing else can matter.
        if (this.lastStepsOnly) return;
        gridsDone = performance.now();
        this.gridMilliseconds[cost] = gridsDone - started;
        const last = { grids: this.gridMilliseconds[cost - 1]!, others: this.otherMilliseconds[cost - 1]! };
        if (!othersInTime(last, this.gridMilliseconds[cost]!, this.started, gridsDone, this.deadline)) {
          this.beginLastSteps(cost);
          return;
        }
      }
      const rule = this.rules[r]!;
      const remaining = cost - rule.bits;
      if (remaining < 0 || rule.restMinimum[0]! > remaining) continue;
      // The store filled part-way through this level's other values.
      if (this.lastStepsOnly && r > this.firstOtherRule) return;
      args.length = 0;
      if (rule.argumentTypes.length === 0) {
        if (remaining === 0) this.evaluate(rule, cost);
        continue;
      }
      this.fill(rule, 0, remaining, cost);
    }
    this.otherMilliseconds[cost] = performance.now() - gridsDone;
  }

  /** From this level on, only last steps: calls that make a grid from the values held, checked and dropped. */
  private beginLastSteps(cost: number): void {
    this.lastStepsOnly = true;
    this.statistics.lastStepsFromCost = cost;
    this.statistics.bytesHeld = this.bytesHeld;
  }

  private refreshMinimums(): void {
    for (let r = 0; r < this.rules.length; r++) {
      const rule = this.rules[r]!;
      const types = rule.argumentTypes;
      let sum = 0;
      rule.restMinimum[types.length] = 0;
      for (let j = types.length - 1; j >= 0; j--) {
        sum += this.store.cheapest(types[j]!);
        rule.restMinimum[j] = sum;
      }
    }
  }

  /** Chooses the argument at `position` from each cost that leaves room for the rest. */
  private fill(rule: Rule, position: number, remaining: number, cost: number): void {
    const types = rule.argumentTypes;
    const type = types[position]!;
    const last = position === types.length - 1;
    const low = last ? remaining : this.store.cheapest(type);
    const high = last ? remaining : remaining - rule.restMinimum[position + 1]!;
    const args = this.args;
    for (let c = low; c <= high; c++) {
      const bucket = this.store.at(type, c);
      for (let k = 0; k < bucket.length; k++) {
        args[position] = bucket[k]!;
        if (last) this.evaluate(rule, cost);
        else this.fill(rule, position + 1, remaining - c, cost);
      }
    }
    args.length = position;
  }

  /** Applies the rule's primitive to the chosen arguments on every example input. */
  private evaluate(rule: Rule, cost: number): void {
    const stats = this.statistics;
    stats.candidates++;
    if ((stats.candidates & 1023) === 0) this.checkBudget();
    // Last steps only: what is not a grid cannot matter any more (a rule begun before the switch).
    if (this.lastStepsOnly && rule.resultType !== this.gridType) return;
    const operation = rule.production.primitive;
    const values = this.scratch;
    const args = this.args;
    const arity = rule.argumentTypes.length;
    if (rule.production.section) {
      for (let i = 0; i < this.examples; i++) {
        const bound = new Array<unknown>(arity);
        for (let j = 0; j < arity; j++) bound[j] = args[j]!.values[i];
        values[i] = sectionOf(operation, bound);
      }
      const signature = this.limits.pruning ? this.probes.signature(rule.production.result, values) : undefined;
      this.offer(rule.resultType, cost, values, rule.production, undefined, signature);
      return;
    }
    const call = (this.callScratch[arity] ??= new Array<unknown>(arity));
    const gridResult = rule.resultType === this.gridType;
    // The cells of values dropped below are handed back (cellsRewind in src/grid/grid.ts).
    cellsCheckpoint();
    let from = 0;
    if (this.lastStepsOnly && this.trainCount > 0) {
      // Nothing is kept now, so a grid matters only as an answer or a goal's argument: one that
      // is neither on the first demonstration is dropped before the other inputs are run.
      for (let j = 0; j < arity; j++) call[j] = args[j]!.values[0];
      const first = applyOperation(operation, call);
      if (isFailure(first)) {
        stats.failed++;
        cellsRewind();
        return;
      }
      if (!(first as Grid).equals(this.outputs[0]!) && !this.goals?.mayWantFirst(first as Grid) && !this.layerMayMeetFirst(first as Grid) && !this.crops?.mayMeetFirst(first as Grid)) {
        cellsRewind();
        return;
      }
      values[0] = first;
      from = 1;
    }
    for (let i = from; i < this.examples; i++) {
      for (let j = 0; j < arity; j++) call[j] = args[j]!.values[i];
      const v = applyOperation(operation, call);
      if (isFailure(v)) {
        stats.failed++;
        cellsRewind();
        return;
      }
      // A grid equal to the grid it was made from is that grid: kept values then hold fewer objects,
      // and comparing them with kept ones ends at the first check.
      const source = call[0];
      values[i] = gridResult && source instanceof Grid && source !== v && source.equals(v as Grid) ? source : v;
    }
    // The first argument itself on every input (a turn of a symmetric grid, a fill with nothing to
    // fill): the store holds it already, as that argument.
    if (gridResult && this.sameAsFirstArgument(values)) {
      stats.pruned++;
      cellsRewind();
      return;
    }
    if (!this.offer(rule.resultType, cost, values, rule.production, undefined, undefined)) cellsRewind();
  }

  /** True when every value is the first argument's value on that input (the very object). */
  private sameAsFirstArgument(values: readonly unknown[]): boolean {
    const first = this.args[0];
    if (!first) return false;
    const theirs = first.values;
    for (let i = 0; i < this.examples; i++) if (values[i] !== theirs[i]) return false;
    return true;
  }

  /**
   * Keeps a candidate unless an equal one is kept; `values` may be scratch (copied when kept).
   * Returns whether anything made from the values is still held (false: they were all dropped).
   */
  private offer(typeId: number, cost: number, values: readonly unknown[], production: Production | undefined, leaf: Expression | undefined, signature: unknown[] | undefined): boolean {
    const store = this.store;
    if (this.lastStepsOnly && typeId !== this.gridType) return false;
    const hash = store.hashOf(typeId, values, signature);
    if (store.has(typeId, hash, values, signature)) {
      this.statistics.pruned++;
      if (signature) this.statistics.sectionsPruned++;
      return false;
    }
    if (this.lastStepsOnly) return production ? this.offerLastStep(cost, values, production) : false;
    const candidate: Candidate = {
      type: production ? production.result : this.types.type(typeId),
      typeId,
      cost,
      values: values.slice(),
      production,
      arguments: production ? this.args.slice() : [],
      leaf,
      signature,
    };
    store.add(candidate, hash);
    this.statistics.kept++;
    if (typeId === this.gridType) {
      this.checkSolution(candidate);
      this.splits?.noteGrid(candidate);
      if (this.goals) for (const goal of this.goals.matching(candidate.values, this.trainCount)) this.meetGoal(candidate, goal);
      // An answer itself needs no laying (laid over the input it would only be a dearer copy).
      if (this.layers.length > 0 && !this.answers(candidate.values)) for (const goal of this.layersMet(candidate.values) ?? []) this.meetLayerGoal(candidate, goal);
      if (this.crops) for (const goal of this.crops.goals) if (this.crops.meets(goal, candidate.values)) this.meetCropGoal(candidate, goal);
      // The input's own tables are constants of the search already.
      if (production && this.intermediate?.open) this.learnTables(candidate);
    } else if (this.crops?.open) {
      for (const rule of this.cropRules) if (rule.argumentTypes[1] === typeId) this.addCropGoal(rule.production, candidate);
    }
    return true;
  }

  /** A crop goal from a kept value that names a rectangle, when it makes one: every grid kept so far is tested against it at once. */
  private addCropGoal(production: Production, argument: Candidate): void {
    const goal = this.crops!.consider(production, argument);
    if (!goal) return;
    this.statistics.goals++;
    for (let c = 1; c <= this.level; c++) {
      for (const found of this.store.at(this.gridType, c)) if (this.crops!.meets(goal, found.values)) this.meetCropGoal(found, goal);
    }
  }

  /** Keeps a kept grid that holds the outputs at a crop goal's rectangles, cut there, as a pending solution. */
  private meetCropGoal(found: Candidate, goal: CropGoal): void {
    const cut = this.callOnEveryInput(goal.production, [found, goal.argument], found.cost + goal.cost);
    if (cut && this.answers(cut.values)) this.pending.push(cut);
  }

  /**
   * Last steps only: a new grid is kept as a candidate only when it is an answer or meets a
   * goal (it could not be an argument of anything now); everything else is dropped at once.
   */
  private offerLastStep(cost: number, values: readonly unknown[], production: Production): boolean {
    const answers = this.answers(values);
    const goals = this.goals ? this.goals.matching(values, this.trainCount) : undefined;
    const layers = this.layers.length > 0 && !answers ? this.layersMet(values) : undefined;
    const crops = this.crops && this.crops.goals.length > 0 ? this.cropsMet(values) : undefined;
    // A grid that answers the first demonstration (all a last step has checked before running the
    // others) and not every one can be one side of a case split.
    const part = !answers && this.splits !== undefined && (values[0] as Grid).equals(this.outputs[0]!);
    if (!answers && (!goals || goals.length === 0) && !layers && !part && !crops) return false;
    const candidate: Candidate = { type: production.result, typeId: this.gridType, cost, values: values.slice(), production, arguments: this.args.slice(), leaf: undefined, signature: undefined };
    if (part) this.splits!.noteGrid(candidate);
    this.checkSolution(candidate);
    if (goals) for (const goal of goals) this.meetGoal(candidate, goal);
    if (layers) for (const goal of layers) this.meetLayerGoal(candidate, goal);
    if (crops) for (const goal of crops) this.meetCropGoal(candidate, goal);
    return true;
  }

  /** True when the grid meets some layer goal on the first demonstration. */
  private layerMayMeetFirst(grid: Grid): boolean {
    for (const goal of this.layers) if (meetsLayerGoal(goal, 0, grid, goal.layer.values[0] as Grid)) return true;
    return false;
  }

  /** True when the values equal every demonstration output. */
  private answers(values: readonly unknown[]): boolean {
    return sameGrids(values, this.outputs);
  }

  /** Wraps a kept grid in each table learned from its values to the outputs; keeps those that reproduce them as pending solutions. */
  private learnTables(found: Candidate): void {
    // Only tables within the cost limit come back (learn checks it, sparing the dear ones' work).
    for (const table of this.intermediate!.learn(found.values, found.cost, this.limits.maxCost)) {
      const value = literalValue(table.literal);
      const leaf = this.leaf(table.literal.type, table.bits, new Array<unknown>(this.examples).fill(value), { kind: 'literal', literal: table.literal });
      const candidate = this.wrap(found, [{ production: table.production, rest: [leaf], bits: table.production.bits }]);
      if (!candidate) continue;
      this.throughIntermediateTables.add(candidate);
      this.pending.push(candidate);
    }
  }

  /**
   * Once every value of up to `cost` bits is kept: each new way to choose, by a kept condition,
   * between two kept grids that together answer every demonstration, as a pending solution.
   */
  private joinCaseSplits(cost: number): void {
    const conditions: Candidate[] = [];
    for (let c = 1; c <= cost; c++) for (const condition of this.store.at(this.boolType, c)) conditions.push(condition);
    for (const split of this.splits!.join(conditions)) {
      const joined = this.callOnEveryInput(this.choice!.production, [split.condition, split.whenTrue, split.whenFalse], split.cost);
      if (!joined || !this.answers(joined.values)) continue;
      this.throughCaseSplits.add(joined);
      this.pending.push(joined);
    }
  }

  /** Keeps a candidate that meets a goal, wrapped in the goal's calls, as a pending solution. */
  private meetGoal(found: Candidate, goal: Goal): void {
    const candidate = this.wrap(found, goal.steps);
    if (candidate) this.pending.push(candidate);
  }

  /**
   * A kept candidate wrapped in calls (innermost first; each call's other arguments are constant
   * leaves), when every call runs on every input and the result equals every demonstration
   * output; otherwise undefined.
   */
  private wrap(found: Candidate, steps: readonly GoalStep[]): Candidate | undefined {
    let current = found;
    for (const step of steps) {
      let cost = current.cost + step.bits;
      for (const leaf of step.rest) cost += leaf.cost;
      const call = this.callOnEveryInput(step.production, [current, ...step.rest], cost);
      if (!call) return undefined;
      current = call;
    }
    return this.answers(current.values) ? current : undefined;
  }

  /** The grid-valued call of a production on these candidates, run on every input (undefined when it fails on one). Off the hot path: goals only. */
  private callOnEveryInput(production: Production, args: Candidate[], cost: number): Candidate | undefined {
    const values = new Array<unknown>(this.examples);
    const call = new Array<unknown>(args.length);
    for (let i = 0; i < this.examples; i++) {
      for (let j = 0; j < args.length; j++) call[j] = args[j]!.values[i];
      const v = applyOperation(production.primitive, call);
      if (isFailure(v)) return undefined;
      values[i] = v;
    }
    return { type: 'Grid', typeId: this.gridType, cost, values, production, arguments: args, leaf: undefined, signature: undefined };
  }

  /** Takes pending solutions (met through goals or intermediate tables) of at most this cost, cheapest first. */
  private acceptPending(upTo: number): void {
    if (this.pending.length === 0) return;
    this.pending.sort((a, b) => a.cost - b.cost);
    while (this.pending.length > 0 && this.pending[0]!.cost <= upTo) this.accept(this.pending.shift()!, true);
  }

  /** A kept grid candidate equal to every demonstration output is a solution. */
  private checkSolution(candidate: Candidate): void {
    if (!this.answers(candidate.values)) return;
    this.acceptPending(candidate.cost - 1);
    this.accept(candidate, false);
  }

  /** Takes a program that fits the demonstrations as an attempt, unless it breaks the settled output size or repeats an attempt. */
  private accept(candidate: Candidate, pending: boolean): void {
    const values = candidate.values;
    // Pending solutions were met through a goal, a table learned from a kept grid or a case split.
    if (pending && !this.throughIntermediateTables.has(candidate) && !this.throughCaseSplits.has(candidate)) this.throughGoals.add(candidate);
    for (let i = this.trainCount; i < this.examples; i++) {
      if (!fitsPrediction(values[i] as Grid, this.predictedSizes[i - this.trainCount]!)) {
        // The demonstrations can agree on a size by chance: kept aside, ranked later among the
        // attempts as SIZE_BREAK_BITS dearer (solve.ts).
        this.statistics.sizeRejected++;
        if (!this.sizeFallbacks.some((s) => sameTestOutputs(s.values, values, this.trainCount))) this.sizeFallbacks.push(candidate);
        if (this.solutions.length === 0 && this.sizeFallbacks.length === 1) this.firstFound(candidate);
        return;
      }
    }
    // Attempts must differ on the test inputs.
    if (this.solutions.some((s) => sameTestOutputs(s.values, values, this.trainCount))) return;
    this.solutions.push(candidate);
    if (this.throughGoals.has(candidate)) this.statistics.goalSolutions++;
    if (this.throughIntermediateTables.has(candidate)) this.statistics.intermediateSolutions++;
    if (this.throughCaseSplits.has(candidate)) this.statistics.caseSplitSolutions++;
    if (this.solutions.length === 1 && this.sizeFallbacks.length === 0) this.firstFound(candidate);
    if (this.solutions.length >= this.limits.attempts) throw new Stop('solved');
  }

  /** The first program that fits: further attempts get a bounded extra search. */
  private firstFound(candidate: Candidate): void {
    this.firstSolutionCost = candidate.cost;
    const now = performance.now();
    this.statistics.secondsToFirstSolution = (now - this.started) / 1000;
    // Further attempts get as long again as the first took (at least a second), within the limit.
    this.deadline = Math.min(this.deadline, now + Math.max(1000, now - this.started));
  }

  /**
   * Adds the cheapest programs that broke the settled size (as many as there are attempts, with
   * test outputs unlike every solution's): solve.ts ranks them with the rest, charged for the break.
   */
  private addSizeFallbacks(): void {
    let added = 0;
    for (const candidate of this.sizeFallbacks.slice().sort((a, b) => a.cost - b.cost)) {
      if (added >= this.limits.attempts) break;
      if (this.solutions.some((s) => sameTestOutputs(s.values, candidate.values, this.trainCount))) continue;
      added++;
      this.solutions.push(candidate);
      if (this.throughGoals.has(candidate)) this.statistics.goalSolutions++;
      if (this.throughIntermediateTables.has(candidate)) this.statistics.intermediateSolutions++;
      if (this.throughCaseSplits.has(candidate)) this.statistics.caseSplitSolutions++;
    }
  }

  /** Bytes held: the store's values plus what grids memoised since the search began. */
  get bytesHeld(): number {
    return this.store.bytes + (analysisBytesSoFar() - this.analysisBytesAtStart);
  }

  private checkBudget(): void {
    if (performance.now() > this.deadline) throw new Stop('time');
    if (this.statistics.candidates >= this.limits.maxCandidates) throw new Stop('candidates');
    if (this.lastStepsOnly) {
      // Nothing is kept now, but grids still memoise analyses: the real heap is the bound.
      const heap = getHeapStatistics();
      if (heap.used_heap_size > HEAP_SHARE_WHEN_FULL * heap.heap_size_limit) throw new Stop('memory');
    } else if (this.bytesHeld >= this.limits.maxStoreBytes) {
      if (!this.limits.lastStepsWhenFull) throw new Stop('memory');
      this.statistics.fullAtCost = this.level;
      this.beginLastSteps(this.level);
    }
  }
}

/** Enumerates programs for the examples; see {@link Enumerator}. */
export function enumerate(
  inputs: readonly Grid[],
  outputs: readonly Grid[],
  constants: readonly Constant[],
  productions: readonly Production[],
  limits: EnumerationLimits,
  inputName = 'grid',
): EnumerationOutcome {
  return new Enumerator(inputs, outputs, constants, productions, limits, inputName).run();
}

function sameTestOutputs(a: readonly unknown[], b: readonly unknown[], from: number): boolean {
  for (let i = from; i < a.length; i++) if (!(a[i] as Grid).equals(b[i] as Grid)) return false;
  return true;
}
