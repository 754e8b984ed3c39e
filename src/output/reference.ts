/**
 * The primitive reference document (markdown), generated from the records of a library so it
 * cannot drift from the code: grouped by category, each primitive with its signature, its
 * description length in bits, its one-line doc and its worked example.
 */
import type { Library } from '../library/library.ts';
import { CATEGORIES, CATEGORY_TITLES, type Primitive, type WorkedExample } from '../library/primitive.ts';

/** `name(Type, ...) -> Type` */
export function signature(p: Primitive): string {
  return `${p.name}(${p.parameters.join(', ')}) -> ${p.result}`;
}

function rowsBlock(rows: readonly (readonly number[])[]): string[] {
  return ['```', ...rows.map((row) => row.join(' ')), '```'];
}

function exampleLines(example: WorkedExample): string[] {
  const out = ['With `grid` =', '', ...rowsBlock(example.input), ''];
  if (typeof example.output === 'number' || typeof example.output === 'boolean') {
    out.push(`\`${example.expression}\` gives \`${String(example.output)}\`.`);
  } else {
    out.push(`\`${example.expression}\` gives`, '', ...rowsBlock(example.output));
  }
  return out;
}

/** Primitives of a library grouped by category, in the catalogue's category order. */
export function primitivesByCategory(library: Library): { category: (typeof CATEGORIES)[number]; title: string; primitives: Primitive[] }[] {
  return CATEGORIES.map((category) => ({
    category,
    title: CATEGORY_TITLES[category],
    primitives: library.primitives.filter((p) => p.category === category),
  })).filter((group) => group.primitives.length > 0);
}

function anchor(title: string): string {
  return title.toLowerCase().replace(/[^a-z0-9 -]/g, '').replace(/ /g, '-');
}

/** The whole reference document; ends with a newline. */
export function referenceDocument(library: Library): string {
  const groups = primitivesByCategory(library);
  const out: string[] = [
    '# Primitive reference',
    '',
    '<!-- Generated from the primitive records in dsl/ by `npm run reference`; do not edit by hand. -->',
    '',
    `${library.primitives.length} primitives in ${groups.length} categories. Each entry gives the signature`,
    '`name(Type, ...) -> Type`, the description length in bits (what one use costs a program; the',
    'search prefers programs with fewer bits), a one-line description and a worked example, which',
    'the tests evaluate.',
    '',
    ...groups.map((g) => `- [${g.title}](#${anchor(g.title)}) (${g.primitives.length})`),
  ];
  for (const group of groups) {
    out.push('', `## ${group.title}`);
    for (const p of group.primitives) {
      out.push('', `### ${p.name}`, '', `\`${signature(p)}\` · ${p.bits} bits`, '', p.doc, '', ...exampleLines(p.example));
    }
  }
  return out.join('\n') + '\n';
}
