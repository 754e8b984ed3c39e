/** `pithy primitives`: the primitive library, grouped by category, as text, markdown or JSON. */
import type { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { primitivesByCategory, referenceDocument, signature } from '../output/reference.ts';
import { writeJson, writeLines } from './output.ts';

export function registerPrimitivesCommand(program: Command): void {
  program
    .command('primitives')
    .description('list the primitives grouped by category, with signatures, bits and docs')
    .option('--markdown', 'print the reference document (what dsl/REFERENCE.md holds)')
    .option('--json', 'print every primitive record (without its implementation) as JSON')
    .action((options: { markdown?: boolean; json?: boolean }) => {
      if (options.markdown) {
        process.stdout.write(referenceDocument(defaultLibrary));
        return;
      }
      const groups = primitivesByCategory(defaultLibrary);
      if (options.json) {
        writeJson(
          groups.flatMap((g) =>
            g.primitives.map((p) => ({
              name: p.name,
              category: p.category,
              parameters: p.parameters,
              result: p.result,
              bits: p.bits,
              doc: p.doc,
              example: p.example,
            })),
          ),
        );
        return;
      }
      const lines: string[] = [];
      const width = Math.max(...defaultLibrary.primitives.map((p) => signature(p).length));
      for (const g of groups) {
        if (lines.length > 0) lines.push('');
        lines.push(`${g.title} (${g.primitives.length})`);
        for (const p of g.primitives) lines.push(`  ${signature(p).padEnd(width)}  ${String(p.bits).padStart(2)} bits  ${p.doc}`);
      }
      lines.push('', `${defaultLibrary.primitives.length} primitives`);
      writeLines(lines);
    });
}
