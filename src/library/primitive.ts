/**
 * The primitive record: everything the language, the checker, the search and the reference
 * document need to know about one primitive, in one place.
 */
import type { Failure } from '../language/failure.ts';
import type { Operation } from '../language/operation.ts';
import type { Type, ValueOf } from '../language/types.ts';

export const CATEGORIES = [
  'objects',
  'selection',
  'cropping',
  'colour',
  'symmetry',
  'geometry',
  'composition',
  'object rules',
  'filling',
  'counting',
  'learned tables',
] as const;
export type Category = (typeof CATEGORIES)[number];

export const CATEGORY_TITLES: Record<Category, string> = {
  objects: 'Object extraction',
  selection: 'Object selection',
  cropping: 'Cropping',
  colour: 'Recolouring',
  symmetry: 'Symmetry',
  geometry: 'Geometry',
  composition: 'Composition',
  'object rules': 'Object rules',
  filling: 'Filling',
  counting: 'Counting and comparison',
  'learned tables': 'Learned tables',
};

/**
 * A worked example: `expression` is an expression of the language over the variable `grid`,
 * which holds `input`; evaluating it gives `output` (a grid as rows, a number or a boolean).
 */
export interface WorkedExample {
  readonly input: readonly (readonly number[])[];
  readonly expression: string;
  readonly output: readonly (readonly number[])[] | number | boolean;
}

type ValuesOf<P extends readonly Type[]> = { [K in keyof P]: P[K] extends Type ? ValueOf<P[K]> : never };
type Rest<P extends readonly Type[]> = P extends readonly [Type, ...infer T extends readonly Type[]] ? T : never;

export interface Primitive extends Operation {
  readonly category: Category;
  /** Description-length prior in bits: what one use of the primitive costs a program. */
  readonly bits: number;
  readonly doc: string;
  readonly example: WorkedExample;
  /**
   * Running the primitive backwards, where that is possible: from the result a call should
   * give and its other arguments, the first argument that gives it (or null when none does).
   * The search uses it to work back from the demonstration outputs (goals, see
   * src/search/goals.ts). Law: when it returns x, `run(x, ...rest)` equals the wanted result.
   */
  readonly inverse?: (wanted: never, ...rest: never[]) => unknown;
  /**
   * True for a primitive called as `run(bottom, top, colour)` that lays the top grid over the
   * bottom one, the top's cells of the colour see-through. The search then works back from the
   * outputs with the input as either layer (layer goals, src/search/layer-goals.ts). Law: the
   * result holds the top's cell wherever that is not the colour, the bottom's cell elsewhere.
   */
  readonly laysOver?: boolean;
  /**
   * For a primitive that cuts out of its first argument (a grid) the rectangle its other
   * arguments name: that rectangle, from those arguments (null when they name none). The search
   * then tests kept grids for the outputs at the rectangles kept values name (crop goals,
   * src/search/crop-goals.ts). Law: when the rectangle lies inside the grid, the call's result is
   * the grid's cells under it.
   */
  readonly cropsAt?: (...rest: never[]) => Rectangle | null;
}

/** A rectangle of a grid: its first row and column, and its height and width. */
export interface Rectangle {
  readonly top: number;
  readonly left: number;
  readonly height: number;
  readonly width: number;
}

/** Declares a primitive with its implementation typed from its signature. */
export function primitive<const P extends readonly Type[], const R extends Type>(record: {
  name: string;
  category: Category;
  parameters: P;
  result: R;
  bits: number;
  doc: string;
  example: WorkedExample;
  run: (...args: ValuesOf<P>) => ValueOf<R> | Failure | null;
  inverse?: (wanted: ValueOf<R>, ...rest: ValuesOf<Rest<P>>) => ValueOf<P[0]> | null;
  laysOver?: boolean;
  cropsAt?: (...rest: ValuesOf<Rest<P>>) => Rectangle | null;
}): Primitive {
  // Every record gets the same fields in the same order, the optional ones undefined when not
  // given: the search reads `run` from a different primitive on every call, and records of
  // several shapes would make that read a generic lookup instead of one field load.
  const uniform = {
    name: record.name,
    category: record.category,
    parameters: record.parameters,
    result: record.result,
    bits: record.bits,
    doc: record.doc,
    example: record.example,
    run: record.run,
    inverse: record.inverse,
    laysOver: record.laysOver,
    cropsAt: record.cropsAt,
  };
  return uniform as unknown as Primitive;
}
