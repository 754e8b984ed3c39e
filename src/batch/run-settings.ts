/**
 * The settings that shape a task's result, recorded on every results line so that a resumed
 * or merged run never mixes results made under different settings. Settings that only change
 * how fast a run goes (the number of jobs, the shard) are not among them.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { getSizeCap } from '../grid/grid.ts';
import { defaultLibrary } from '../../dsl/index.ts';
import type { Library } from '../library/library.ts';

export interface RunSettings {
  readonly timeLimitSeconds: number;
  readonly attempts: number;
  readonly pruning: boolean;
  /** Candidate cap per task, or null for none. */
  readonly maxCandidates: number | null;
  /** Working back from the outputs through inverses (src/search/goals.ts); off with --no-goals. */
  readonly goals: boolean;
  /** Tables learned from the grids the search makes (src/search/intermediate-tables.ts); off with --no-intermediate-tables. */
  readonly intermediateTables: boolean;
  /** At the memory cap, going on with last steps on the values held (src/search/enumerator.ts); off with --no-last-steps. */
  readonly lastSteps: boolean;
  /** Choosing between two grids by a condition that tells the demonstrations apart (src/search/case-splits.ts); off with --no-case-splits. */
  readonly caseSplits: boolean;
  /** Memory cap per worker in megabytes (see memory-cap.ts). */
  readonly memoryCapMb: number;
  /** Largest grid height and width accepted (`pithy --size-cap`). */
  readonly sizeCap: number;
  /** A hash of the priors file's contents, or null for the built-in priors. */
  readonly priors: string | null;
  /** pithy's version (package.json). */
  readonly version: string;
  /** A hash of the primitive library: every primitive's name, signature and bits, in order. */
  readonly library: string;
}

/** How each setting is named in messages, in the order they are listed. */
export const SETTING_NAMES: Readonly<Record<keyof RunSettings, string>> = {
  timeLimitSeconds: 'time limit (s)',
  attempts: 'attempts',
  pruning: 'pruning',
  maxCandidates: 'candidate cap',
  goals: 'goals',
  intermediateTables: 'intermediate tables',
  lastSteps: 'last steps at the memory cap',
  caseSplits: 'case splits',
  memoryCapMb: 'memory cap (MB)',
  sizeCap: 'size cap',
  priors: 'priors',
  version: 'pithy version',
  library: 'primitive library',
};

function shortHash(text: string | Buffer): string {
  return 'sha256:' + createHash('sha256').update(text).digest('hex').slice(0, 16);
}

const libraryHashes = new WeakMap<Library, string>();

/** A hash of what the search knows of each primitive, in the library's order. */
export function libraryHash(library: Library = defaultLibrary): string {
  let hash = libraryHashes.get(library);
  if (hash === undefined) {
    const text = library.primitives.map((p) => `${p.name}(${p.parameters.join(', ')}) -> ${p.result} : ${p.bits}`).join('\n');
    libraryHashes.set(library, (hash = shortHash(text)));
  }
  return hash;
}

let version: string | undefined;

export function pithyVersion(): string {
  if (version === undefined) {
    const text = readFileSync(new URL('../../package.json', import.meta.url), 'utf8');
    version = String((JSON.parse(text) as { version?: unknown }).version ?? 'unknown');
  }
  return version;
}

/** A hash of a priors file's contents (null without one); an unreadable file is named as such. */
export function priorsHash(file: string | undefined): string | null {
  if (file === undefined) return null;
  try {
    return shortHash(readFileSync(file));
  } catch {
    return `unreadable ${file}`;
  }
}

export interface SettingsInput {
  readonly timeLimitSeconds: number;
  readonly attempts: number;
  readonly pruning: boolean;
  readonly maxCandidates?: number;
  readonly goals?: boolean;
  readonly intermediateTables?: boolean;
  readonly lastSteps?: boolean;
  readonly caseSplits?: boolean;
  readonly memoryCapMb: number;
  readonly priorsFile?: string;
}

export function runSettings(input: SettingsInput): RunSettings {
  return {
    timeLimitSeconds: input.timeLimitSeconds,
    attempts: input.attempts,
    pruning: input.pruning,
    maxCandidates: input.maxCandidates ?? null,
    goals: input.goals ?? true,
    intermediateTables: input.intermediateTables ?? true,
    lastSteps: input.lastSteps ?? true,
    caseSplits: input.caseSplits ?? true,
    memoryCapMb: input.memoryCapMb,
    sizeCap: getSizeCap(),
    priors: priorsHash(input.priorsFile),
    version: pithyVersion(),
    library: libraryHash(),
  };
}

function shown(value: unknown): string {
  return value === null ? 'none' : value === undefined ? 'not recorded' : String(value);
}

/**
 * Settings added after results files were first written, with the value a line that does not
 * record them was made under: goals and intermediate tables were on with no way to turn them
 * off; a full store stopped the search (no last steps); no case splits were made.
 */
const WHEN_NOT_RECORDED: Partial<RunSettings> = { goals: true, intermediateTables: true, lastSteps: false, caseSplits: false };

/** The settings that differ, each as "name: A there, B here" (empty when they agree). */
export function settingsDifferences(there: Partial<RunSettings>, here: RunSettings, thereName = 'in the file', hereName = 'now'): string[] {
  const out: string[] = [];
  for (const key of Object.keys(SETTING_NAMES) as (keyof RunSettings)[]) {
    const theirs = key in there ? there[key] : WHEN_NOT_RECORDED[key];
    if (theirs !== here[key]) out.push(`${SETTING_NAMES[key]}: ${shown(theirs)} ${thereName}, ${shown(here[key])} ${hereName}`);
  }
  return out;
}
