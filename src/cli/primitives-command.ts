/**
 * `pithy primitives [NAME...]`: the primitive library grouped by category, as text, markdown or
 * JSON; with names, those primitives in full (signature, bits, doc, worked example); with
 * `--category`, one category.
 */
import type { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { nearestNames } from '../language/nearest-names.ts';
import { CATEGORIES, type Primitive } from '../library/primitive.ts';
import { primitivesByCategory, referenceDocument, signature } from '../output/reference.ts';
import { writeError, writeJson, writeLines } from './output.ts';

function record(p: Primitive) {
  return { name: p.name, category: p.category, parameters: p.parameters, result: p.result, bits: p.bits, doc: p.doc, example: p.example };
}

function rowsText(rows: readonly (readonly number[])[]): string[] {
  return rows.map((row) => `      ${row.join(' ')}`);
}

/** One primitive in full: signature and bits, category, doc and worked example. */
export function primitiveLines(p: Primitive): string[] {
  const e = p.example;
  const output = typeof e.output === 'number' || typeof e.output === 'boolean' ? [`    gives ${String(e.output)}`] : ['    gives', ...rowsText(e.output)];
  return [`${signature(p)}  (${p.bits} bits, ${p.category})`, `  ${p.doc}`, '  example: with grid =', ...rowsText(e.input), `    ${e.expression}`, ...output];
}

export function registerPrimitivesCommand(program: Command): void {
  program
    .command('primitives')
    .description('list the primitives grouped by category, with signatures, bits and docs; with names, show those primitives in full')
    .argument('[names...]', 'primitives to show in full, with their worked examples')
    .option('--category <category>', `only one category: ${CATEGORIES.join(', ')}`)
    .option('--markdown', 'print the reference document (what dsl/REFERENCE.md holds)')
    .option('--json', 'print the primitive records (without their implementation) as JSON')
    .action((names: string[], options: { category?: string; markdown?: boolean; json?: boolean }) => {
      if (options.markdown) {
        process.stdout.write(referenceDocument(defaultLibrary));
        return;
      }
      if (options.category !== undefined && !(CATEGORIES as readonly string[]).includes(options.category)) {
        writeError(`error: no category '${options.category}'; the categories are ${CATEGORIES.join(', ')}`);
        process.exitCode = 2;
        return;
      }
      if (names.length > 0) {
        const unknown = names.filter((n) => !defaultLibrary.get(n));
        for (const n of unknown) {
          const near = nearestNames(n, defaultLibrary.names());
          writeError(`error: no primitive '${n}'${near.length > 0 ? `; did you mean ${near.join(', ')}?` : ''}`);
        }
        if (unknown.length > 0) {
          process.exitCode = 2;
          return;
        }
        const chosen = names.map((n) => defaultLibrary.get(n)!);
        if (options.json) writeJson(chosen.map(record));
        else writeLines(chosen.flatMap((p, i) => (i > 0 ? ['', ...primitiveLines(p)] : primitiveLines(p))));
        return;
      }
      const groups = primitivesByCategory(defaultLibrary).filter((g) => options.category === undefined || g.category === options.category);
      if (options.json) {
        writeJson(groups.flatMap((g) => g.primitives.map(record)));
        return;
      }
      const lines: string[] = [];
      const shown = groups.flatMap((g) => g.primitives);
      const width = Math.max(...shown.map((p) => signature(p).length));
      for (const g of groups) {
        if (lines.length > 0) lines.push('');
        lines.push(`${g.title} (${g.primitives.length})`);
        for (const p of g.primitives) lines.push(`  ${signature(p).padEnd(width)}  ${String(p.bits).padStart(2)} bits  ${p.doc}`);
      }
      lines.push('', `${shown.length} primitive${shown.length === 1 ? '' : 's'}`);
      writeLines(lines);
    });
}
