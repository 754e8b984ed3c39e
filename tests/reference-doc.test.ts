// dsl/REFERENCE.md must be exactly what the generator gives for the current primitive records.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { referenceDocument, signature } from '../src/output/reference.ts';

describe('the primitive reference document', () => {
  it('dsl/REFERENCE.md is up to date with the primitive records', () => {
    const onDisk = readFileSync(new URL('../dsl/REFERENCE.md', import.meta.url), 'utf8');
    const fresh = referenceDocument(defaultLibrary);
    if (onDisk !== fresh) {
      expect.fail('dsl/REFERENCE.md differs from the primitive records in dsl/: run `npm run reference` and commit the result');
    }
  });

  it('lists every primitive once under a heading, with its signature and bits', () => {
    const doc = referenceDocument(defaultLibrary);
    for (const p of defaultLibrary.primitives) {
      expect(doc.split('\n').filter((line) => line === `### ${p.name}`)).toHaveLength(1);
      expect(doc).toContain(`\`${signature(p)}\` · ${p.bits} bits`);
    }
  });

  it('writes signatures as name(Type, ...) -> Type', () => {
    const p = defaultLibrary.get('count_objects')!;
    expect(signature(p)).toBe('count_objects(Objects) -> Int');
  });
});
