/**
 * pithy's public API: grids, programs (text, checking, running), the primitive library and
 * task files. Everything else is internal and may change.
 */
export { Grid, EMPTY, getSizeCap, setSizeCap, shapeAllowed } from './grid/grid.ts';
export { GridObject } from './grid/grid-object.ts';
export { Point } from './language/point.ts';
export { Palette } from './language/palette.ts';
export { CellRule } from './grid/cell-rule-table.ts';
export { ObjectRule } from './grid/object-rule-table.ts';
export { GridRule } from './grid/grid-rule-table.ts';
export { FAILURE, isFailure, type Failure } from './language/failure.ts';
export type { BaseType, FunctionType, Type, Value } from './language/types.ts';

export type { Expression, LiteralValue, Program, Step } from './language/ast.ts';
export { parseProgram, parseExpression, ProgramSyntaxError } from './language/parser.ts';
export { printProgram, printExpression } from './language/printer.ts';
export { renameStep, inlineStep, ProgramEditError } from './language/edit-program.ts';
export { checkProgram, ProgramTypeError, type TypeProblem } from './language/checker.ts';
export { runProgram, type RunResult, type TraceEntry } from './language/interpreter.ts';

export { Library } from './library/library.ts';
export { defaultLibrary } from '../dsl/index.ts';
export { CATEGORIES, CATEGORY_TITLES, primitive, type Category, type Primitive, type WorkedExample } from './library/primitive.ts';
export { readPriorsFile, parsePriors, PriorsFileError, type LoadedPriors } from './library/priors-file.ts';

export { canonicalProgram } from './language/canonical-names.ts';
export { tokenize, detokenize } from './tokens/program-tokens.ts';
export { tokenizeGrid, detokenizeGrid } from './tokens/grid-tokens.ts';
export { TokenError } from './tokens/token-reader.ts';
export { vocabularyOf, Vocabulary, VOCABULARY_VERSION, type Token } from './tokens/vocabulary.ts';

export { parseTask, readTaskFile, readTasks, TaskFileError, type TaskOrError } from './tasks/read-task.ts';
export type { Pair, Puzzle, Task, TestCase } from './tasks/task.ts';
export { runOnTask, firstDifference, type Difference, type PairResult } from './tasks/run-on-task.ts';

export { solvePuzzle, type Solution, type SolveOptions, type SolveResult } from './search/solve.ts';
export { programBits } from './search/description-length.ts';
export { taskConstants, type Constant } from './search/constants.ts';
export type { EnumerationStatistics, StopReason } from './search/enumerator.ts';
export { traceRecord, TRACE_FORMAT, TRACE_VERSION, type TraceRecord, type PairTrace, type StepValue } from './training/trace-record.ts';
export type { ValueJson, ObjectJson } from './training/value-json.ts';
export { Generation, generatedTaskName, type GenerateOptions, type GeneratedTask, type GenerationCounts, type OwnedProgram } from './training/generate.ts';
export { makeInput, INPUT_KINDS, type InputKind, type InputSettings } from './training/input-makers.ts';
export { Random } from './training/random.ts';
export { varyTask, type VaryOptions, type Variation } from './training/vary.ts';
export { profileOf, contentKind, type TaskProfile } from './training/content-kind.ts';
export { solveFiles, type BatchOptions } from './batch/solve-files.ts';
export type { TaskReport, ReportedSolution } from './batch/task-report.ts';
