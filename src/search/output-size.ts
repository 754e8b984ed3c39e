/**
 * Output size first: the rule the demonstrations show for the output's height and width, and
 * what it says about each test input. Each side is explained, separately, as a fixed number,
 * or as one side of the input times a fixed fraction (the same side, or the other one for
 * turned outputs). Every rule that fits every demonstration is kept; a test input's size is
 * predicted only when all of them agree on it, so the prediction never guesses between rules.
 * A program whose output on a test input breaks the prediction is charged {@link SIZE_BREAK_BITS}
 * more when attempts are ranked: demonstrations can agree on a size by chance, so the rule is
 * strong evidence, not a proof.
 */
import type { Grid } from '../grid/grid.ts';

export interface PredictedSize {
  /** Undefined where the demonstrations do not settle that side. */
  readonly height: number | undefined;
  readonly width: number | undefined;
}

type Side = (g: Grid) => number;
const HEIGHT: Side = (g) => g.height;
const WIDTH: Side = (g) => g.width;

/** One side of the output as a function of the input, or undefined where it gives no whole number. */
type SideRule = (input: Grid) => number | undefined;

function sideRules(pairs: readonly { input: Grid; output: Grid }[], side: Side): SideRule[] {
  const rules: SideRule[] = [];
  const first = pairs[0]!;
  const wanted = side(first.output);
  if (pairs.every((p) => side(p.output) === wanted)) rules.push(() => wanted);
  for (const from of [HEIGHT, WIDTH]) {
    // output side = input side × numerator / denominator, read off the first pair.
    const numerator = side(first.output);
    const denominator = from(first.input);
    if (pairs.every((p) => side(p.output) * denominator === from(p.input) * numerator)) {
      rules.push((input) => {
        const value = (from(input) * numerator) / denominator;
        return Number.isInteger(value) ? value : undefined;
      });
    }
  }
  return rules;
}

function agreed(rules: readonly SideRule[], input: Grid): number | undefined {
  let value: number | undefined;
  for (const rule of rules) {
    const v = rule(input);
    if (v === undefined) return undefined;
    if (value !== undefined && v !== value) return undefined;
    value = v;
  }
  return value;
}

/** For each test input, the output size the demonstrations settle (sides left undefined where they do not). */
export function predictOutputSizes(pairs: readonly { input: Grid; output: Grid }[], testInputs: readonly Grid[]): PredictedSize[] {
  if (pairs.length === 0) return testInputs.map(() => ({ height: undefined, width: undefined }));
  const heights = sideRules(pairs, HEIGHT);
  const widths = sideRules(pairs, WIDTH);
  return testInputs.map((input) => ({ height: agreed(heights, input), width: agreed(widths, input) }));
}

/**
 * The description length of an exception to the settled size: −log₂ of how often a settled side
 * was wrong. On the public training set (ARC-AGI-1, F. Chollet 2019, read from
 * ../shared/datasets/arc-agi-1-training/), the prediction settled a side for 359 of 416 test
 * inputs and the true output broke it on 4 (each a side that two or three demonstrations
 * shared by chance): −log₂(4/359) ≈ 6.5, rounded up. A program that breaks the
 * size ranks as if it were this much dearer, so a much cheaper one still becomes an attempt.
 */
export const SIZE_BREAK_BITS = 7;

/** True when the grid has the predicted size (sides the prediction leaves open always fit). */
export function fitsPrediction(g: Grid, prediction: PredictedSize): boolean {
  return (prediction.height === undefined || g.height === prediction.height) && (prediction.width === undefined || g.width === prediction.width);
}
