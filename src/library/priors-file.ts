/**
 * The priors file: a JSON object that sets the bits of primitives, written by
 * `pithy fit-priors` and read by `solve` and `eval` with `--priors FILE`.
 *
 *   {
 *     "version": 1,
 *     "library": { "primitives": 190, "hash": "sha256:…" },      (optional when written by hand)
 *     "formula": "…", "parameters": { … }, "fittedOn": { … },    (informational; not read)
 *     "bits": { "crop_to_content": 3, … }
 *   }
 *
 * Only `version` and `bits` are required: a primitive the file does not name keeps its record's
 * bits. A name the library does not hold, or bits that are not a whole number from 1 to
 * `MAX_PRIOR_BITS`, is an error naming the file and the JSON path.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { PRIORS_FORMULA, type PriorsParameters } from './fit-priors.ts';
import type { Library } from './library.ts';

export const PRIORS_FILE_VERSION = 1;
/** The search tries programs of up to 60 bits by default; a dearer primitive could never be used. */
export const MAX_PRIOR_BITS = 60;

export class PriorsFileError extends Error {
  constructor(
    readonly file: string,
    readonly jsonPath: string,
    readonly problem: string,
  ) {
    super(`${file}: at ${jsonPath}: ${problem}`);
    this.name = 'PriorsFileError';
  }
}

export interface PriorsFile {
  readonly version: number;
  readonly library: { readonly primitives: number; readonly hash: string };
  readonly formula: string;
  readonly parameters: PriorsParameters;
  readonly fittedOn: { readonly results: readonly string[]; readonly solvedTasks: number; readonly uses: number };
  readonly bits: Readonly<Record<string, number>>;
}

/** What `--priors FILE` loads. */
export interface LoadedPriors {
  readonly file: string;
  /** `sha256:` and the hex digest of the file's bytes: recorded with results to tell runs apart. */
  readonly hash: string;
  readonly bits: ReadonlyMap<string, number>;
  /** False when the file names a library hash other than this library's (it was fitted on another library). */
  readonly sameLibrary: boolean;
  /** Primitives of this library the file does not name (they keep their record's bits). */
  readonly unnamed: readonly string[];
}

/**
 * A fingerprint of the library's primitives: names and signatures, sorted (not the bits, which
 * are what a priors file changes, nor the order).
 */
export function libraryHash(library: Library): string {
  const lines = library.primitives.map((p) => `${p.name}(${p.parameters.join(', ')}) -> ${p.result}`).sort();
  return 'sha256:' + createHash('sha256').update(lines.join('\n')).digest('hex').slice(0, 16);
}

export function priorsFile(
  library: Library,
  bits: ReadonlyMap<string, number>,
  parameters: PriorsParameters,
  fittedOn: PriorsFile['fittedOn'],
): PriorsFile {
  const ordered: Record<string, number> = {};
  for (const p of library.primitives) {
    const b = bits.get(p.name);
    if (b !== undefined) ordered[p.name] = b;
  }
  return {
    version: PRIORS_FILE_VERSION,
    library: { primitives: library.primitives.length, hash: libraryHash(library) },
    formula: PRIORS_FORMULA,
    parameters: { smoothing: parameters.smoothing, minimumBits: parameters.minimumBits, capBits: parameters.capBits },
    fittedOn: { results: [...fittedOn.results], solvedTasks: fittedOn.solvedTasks, uses: fittedOn.uses },
    bits: ordered,
  };
}

/** The file's text: the same priors always give the same bytes. */
export function priorsText(priors: PriorsFile): string {
  return JSON.stringify(priors, null, 2) + '\n';
}

function describe(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'an object';
  if (typeof value === 'string') return `the string ${JSON.stringify(value.length > 20 ? value.slice(0, 20) + '…' : value)}`;
  return `${typeof value} ${String(value)}`;
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const keyPath = (parent: string, key: string): string => (/^[A-Za-z_][A-Za-z0-9_]*$/.test(key) ? `${parent}.${key}` : `${parent}[${JSON.stringify(key)}]`);

/** Reads priors from text; `file` names the source in errors. */
export function parsePriors(text: string, file: string, library: Library): LoadedPriors {
  let root: unknown;
  try {
    root = JSON.parse(text);
  } catch (error) {
    throw new PriorsFileError(file, '$', `not valid JSON (${(error as Error).message})`);
  }
  if (!isRecord(root)) throw new PriorsFileError(file, '$', `expected a priors object with "version" and "bits", found ${describe(root)}`);
  if (root.version !== PRIORS_FILE_VERSION) throw new PriorsFileError(file, '$.version', `expected ${PRIORS_FILE_VERSION}, found ${'version' in root ? describe(root.version) : 'nothing'}`);
  let sameLibrary = true;
  if ('library' in root) {
    const l = root.library;
    if (!isRecord(l)) throw new PriorsFileError(file, '$.library', `expected an object with "primitives" and "hash", found ${describe(l)}`);
    if (typeof l.hash !== 'string') throw new PriorsFileError(file, '$.library.hash', `expected a string, found ${'hash' in l ? describe(l.hash) : 'nothing'}`);
    sameLibrary = l.hash === libraryHash(library);
  }
  const entries = root.bits;
  if (!isRecord(entries)) throw new PriorsFileError(file, '$.bits', `expected an object from primitive names to whole numbers of bits, found ${'bits' in root ? describe(entries) : 'nothing'}`);
  const bits = new Map<string, number>();
  for (const [name, value] of Object.entries(entries)) {
    const path = keyPath('$.bits', name);
    if (!library.get(name)) throw new PriorsFileError(file, path, `no primitive named '${name}' in the library`);
    if (typeof value !== 'number' || !Number.isInteger(value) || value < 1 || value > MAX_PRIOR_BITS) {
      throw new PriorsFileError(file, path, `expected a whole number of bits from 1 to ${MAX_PRIOR_BITS}, found ${describe(value)}`);
    }
    bits.set(name, value);
  }
  return {
    file,
    hash: 'sha256:' + createHash('sha256').update(text).digest('hex'),
    bits,
    sameLibrary,
    unnamed: library.primitives.filter((p) => !bits.has(p.name)).map((p) => p.name),
  };
}

export function readPriorsFile(file: string, library: Library): LoadedPriors {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (error) {
    throw new PriorsFileError(file, '$', `cannot read the file (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`);
  }
  return parsePriors(text, file, library);
}
