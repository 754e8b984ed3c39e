/**
 * Prints programs in pithy's text syntax:
 *
 *   -- comment
 *   with shelf
 *   crates = objects_by_colour(shelf)
 *   answer crop_to_object(shelf, largest_object(crates))
 *
 * Literals: colours `#3`, whole numbers `-2`, `true`/`false`, points `(row, column)`,
 * palettes `{#1 -> #2, #3 -> #4}`; `_` is the open argument of a section. Learned tables:
 *
 *   cell_rule[colour, row_holds #2]{#0 no -> #0, #0 yes -> #2, #2 yes -> #2}
 *   object_rule[by_colour, size]{1 -> remove, 2 -> #5, 4 -> keep, 6 -> move (1, 0)}
 *   grid_rule[colour_count]{2 -> 505/050, 3 -> 555/000}
 *
 * A cell rule lists its features in brackets, then its entries: a key (one value per feature,
 * separated by spaces) and the output colour. Feature values are colours `#3`, `edge` (a
 * neighbour outside the grid), counts `2`, `yes`/`no`, `even`/`odd`, or `any` (every value; a
 * rule holding it is read in order, entries printed as they stand). An object rule names how
 * the grid is cut into objects and the property it reads, then its entries: a property value
 * (a number, a colour, `yes`/`no`, or a shape such as `xx/x.`) and what becomes of such
 * objects: `keep`, `remove`, a colour, or `move (rows, columns)`. A grid rule names a property
 * of the whole input, then its entries: a value (a number, `yes`/`no`, a shape, or the colours
 * present such as `#0 #2`) and the output grid, its rows of colour digits joined by `/`.
 */
import { featureTakesColour, featureValues, ANY, EDGE, KEEP, type CellFeature, type CellFeatureValues } from '../grid/cell-rule-table.ts';
import { gridDigits, gridPropertyValues, type GridKey, type GridProperty } from '../grid/grid-rule-table.ts';
import { propertyValues, type ObjectKey, type ObjectOutcome, type ObjectProperty, type ObjectRuleEntry } from '../grid/object-rule-table.ts';
import type { Expression, LiteralValue, Program } from './ast.ts';

function printFeature(f: CellFeature): string {
  return featureTakesColour(f.name) ? `${f.name} #${f.colour ?? 0}` : f.name;
}

function printFeatureValue(values: CellFeatureValues, v: number): string {
  if (v === ANY) return 'any';
  switch (values) {
    case 'colour':
      return `#${v}`;
    case 'neighbour':
      return v === EDGE ? 'edge' : `#${v}`;
    case 'count of 8':
    case 'count of 4':
      return String(v);
    case 'yes or no':
      return v ? 'yes' : 'no';
    case 'parity':
      return v ? 'odd' : 'even';
  }
}

function printObjectKey(property: ObjectProperty, key: ObjectKey): string {
  switch (propertyValues(property)) {
    case 'colour':
      return `#${key}`;
    case 'yes or no':
      return key ? 'yes' : 'no';
    default:
      return String(key);
  }
}

function printGridKey(property: GridProperty, key: GridKey): string {
  switch (gridPropertyValues(property)) {
    case 'colours':
      return [...String(key)].map((d) => `#${d}`).join(' ');
    case 'yes or no':
      return key ? 'yes' : 'no';
    default:
      return String(key);
  }
}

function printOutcome(o: ObjectOutcome): string {
  switch (o.kind) {
    case 'keep':
      return 'keep';
    case 'remove':
      return 'remove';
    case 'recolour':
      return `#${o.colour}`;
    case 'move':
      return `move (${o.rows}, ${o.columns})`;
    case 'fill':
      return `fill #${o.colour}`;
    case 'mirror':
      return `mirror ${o.across}`;
    case 'slide':
      return `slide ${o.way}`;
  }
}

export function printLiteral(l: LiteralValue): string {
  switch (l.type) {
    case 'Colour':
      return `#${l.value}`;
    case 'Int':
      return String(l.value);
    case 'Bool':
      return l.value ? 'true' : 'false';
    case 'Point':
      return `(${l.row}, ${l.column})`;
    case 'Palette':
      return `{${l.pairs.map(([a, b]) => `#${a} -> #${b}`).join(', ')}}`;
    case 'CellRule': {
      const kinds = l.features.map((f) => featureValues(f.name));
      const entries = l.entries.map((e) => `${e.key.map((v, i) => printFeatureValue(kinds[i]!, v)).join(' ')} -> ${e.colour === KEEP ? 'keep' : `#${e.colour}`}`);
      return `cell_rule[${l.features.map(printFeature).join(', ')}]{${entries.join(', ')}}`;
    }
    case 'ObjectRule': {
      const second = l.second;
      const key = (e: ObjectRuleEntry): string => (second === undefined ? printObjectKey(l.property, e.key) : `${printObjectKey(l.property, e.key)} ${printObjectKey(second, e.secondKey!)}`);
      const entries = l.entries.map((e) => `${key(e)} -> ${printOutcome(e.outcome)}`);
      return `object_rule[${l.grouping}, ${l.property}${second === undefined ? '' : `, ${second}`}]{${entries.join(', ')}}`;
    }
    case 'GridRule': {
      const entries = l.entries.map((e) => `${printGridKey(l.property, e.key)} -> ${gridDigits(e.rows)}`);
      return `grid_rule[${l.property}]{${entries.join(', ')}}`;
    }
  }
}

export function printExpression(e: Expression): string {
  switch (e.kind) {
    case 'variable':
      return e.name;
    case 'literal':
      return printLiteral(e.literal);
    case 'hole':
      return '_';
    case 'call':
      return `${e.primitive}(${e.arguments.map(printExpression).join(', ')})`;
  }
}

function printComments(lines: readonly string[]): string[] {
  return lines.map((line) => (line === '' ? '--' : `-- ${line}`));
}

export function printProgram(p: Program): string {
  const out: string[] = [...printComments(p.comments), `with ${p.input}`];
  const width = Math.max(0, ...p.steps.map((s) => s.name.length));
  for (const step of p.steps) {
    out.push(...printComments(step.comments));
    out.push(`${step.name.padEnd(width)} = ${printExpression(step.expression)}`);
  }
  out.push(...printComments(p.answerComments));
  out.push(`answer ${printExpression(p.answer)}`);
  return out.join('\n') + '\n';
}
