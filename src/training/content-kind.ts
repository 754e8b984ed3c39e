/**
 * What a task's inputs look like, read from its demonstrations, so new inputs can be drawn like
 * them: their sizes, background, colours, and kind of content (one of the input makers' kinds).
 * A grid's kind is the first that fits of: cut by separator lines (of a colour other than the
 * background, whose empty rows would qualify too); symmetric (left to right,
 * top to bottom, or turned half round); a repeating tile (exactly, or with a patch of
 * one colour over it); shapes of two or more cells on average; else scattered cells.
 */
import { backgroundColour, colourCounts, components } from '../grid/components.ts';
import type { Grid } from '../grid/grid.ts';
import { completeRepeatingPattern } from '../grid/repeating-pattern.ts';
import { findSeparatorLines } from '../grid/separator-lines.ts';
import { isSymmetricLeftRight, isSymmetricTopBottom } from '../grid/symmetry.ts';
import type { Task } from '../tasks/task.ts';
import { INPUT_KINDS, type InputKind } from './input-makers.ts';

export interface TaskProfile {
  readonly kind: InputKind;
  readonly background: number;
  /** Content colours, most used first; for grids cut by lines, the line colour first. */
  readonly colours: readonly number[];
  /** The sizes of the demonstration inputs, in order. */
  readonly sizes: readonly { readonly height: number; readonly width: number }[];
}

function isHalfTurnSymmetric(g: Grid): boolean {
  const n = g.cells.length;
  for (let i = 0; i < n; i++) if (g.cells[i] !== g.cells[n - 1 - i]) return false;
  return true;
}

/** Whether a tile of at most half the grid's area, repeated, gives every cell exactly. */
function isPeriodic(g: Grid): boolean {
  for (let ph = 1; ph <= g.height; ph++) {
    for (let pw = 1; pw <= g.width; pw++) {
      if (ph * pw * 2 > g.height * g.width) continue;
      let fits = true;
      for (let r = 0; r < g.height && fits; r++) for (let c = 0; c < g.width && fits; c++) fits = g.get(r, c) === g.get(r % ph, c % pw);
      if (fits) return true;
    }
  }
  return false;
}

/**
 * Whether the grid is a repeating tile with a patch of one colour over it: a colour covering at
 * most a quarter of the grid whose cells the smallest agreeing tile can fill in, the other
 * cells holding at least two colours (so that a plain background is no tile).
 */
function isPatchedPattern(g: Grid, counts: Uint32Array): boolean {
  const present = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9].filter((c) => counts[c]! > 0);
  if (present.length < 3) return false;
  return present.some((c) => counts[c]! * 4 <= g.cells.length && completeRepeatingPattern(g, c) !== null);
}

export function contentKind(g: Grid): InputKind {
  const background = backgroundColour(g);
  const counts = colourCounts(g);
  const marked = g.cells.length - counts[background]!;
  const lines = findSeparatorLines(g);
  if (lines && lines.colour !== background) return 'separated';
  if (marked >= 2 && (isSymmetricLeftRight(g) || isSymmetricTopBottom(g) || isHalfTurnSymmetric(g))) return 'symmetric';
  if (isPeriodic(g) || isPatchedPattern(g, counts)) return 'pattern';
  const shapes = components(g, { diagonal: false, multicolour: false, background });
  if (shapes.length > 0 && marked / shapes.length >= 2) return 'objects';
  return 'scattered';
}

/** The profile of a task's demonstration inputs (test inputs are not read). */
export function profileOf(task: Task): TaskProfile {
  const inputs = task.train.map((p) => p.input);
  const kindVotes = new Map<InputKind, number>();
  const backgroundVotes = new Array<number>(10).fill(0);
  const use = new Array<number>(10).fill(0);
  let lineColour = -1;
  for (const g of inputs) {
    const kind = contentKind(g);
    kindVotes.set(kind, (kindVotes.get(kind) ?? 0) + 1);
    backgroundVotes[backgroundColour(g)]!++;
    const counts = colourCounts(g);
    for (let c = 0; c < 10; c++) use[c]! += counts[c]!;
    if (kind === 'separated' && lineColour < 0) lineColour = findSeparatorLines(g)!.colour;
  }
  const kind = INPUT_KINDS.reduce((best, k) => ((kindVotes.get(k) ?? 0) > (kindVotes.get(best) ?? 0) ? k : best), INPUT_KINDS[0]);
  const background = backgroundVotes.indexOf(Math.max(...backgroundVotes));
  let colours = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9].filter((c) => c !== background && use[c]! > 0).sort((a, b) => use[b]! - use[a]! || a - b);
  if (kind === 'separated' && lineColour >= 0 && lineColour !== background) colours = [lineColour, ...colours.filter((c) => c !== lineColour)];
  if (colours.length === 0) colours = [background === 0 ? 1 : 0];
  return { kind, background, colours, sizes: inputs.map((g) => ({ height: g.height, width: g.width })) };
}
