/**
 * immer stays off the hot path (DEVELOPERS.md, "immer"): no grid algorithm, no primitive and
 * no file of the search imports it, except program-from-candidate.ts, which runs once per
 * found solution. This test reads every import of immer and fails naming the file.
 */
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { sourceFiles } from './support/source-files.ts';

const root = resolve(import.meta.dirname, '..');

/** Folders on the hot path, and the files in them that may still use immer. */
const HOT_FOLDERS = ['src/grid', 'dsl', 'src/search'];
const ALLOWED = new Set(['src/search/program-from-candidate.ts']);


function importsImmer(text: string): boolean {
  return /(?:from\s+|import\s*\(\s*|import\s+)'immer'/.test(text);
}

function immerOnTheHotPath(files: readonly string[], read: (file: string) => string): string[] {
  return files.filter((f) => HOT_FOLDERS.some((folder) => f.startsWith(`${folder}/`)) && !ALLOWED.has(f) && importsImmer(read(f)));
}

describe('immer off the hot path', () => {
  const read = (file: string) => readFileSync(join(root, file), 'utf8');
  const files = [...sourceFiles('src'), ...sourceFiles('dsl')];

  it('is used where trees are frozen or edited', () => {
    const users = files.filter((f) => importsImmer(read(f)));
    expect(users).toEqual(expect.arrayContaining(['src/tasks/task.ts', 'src/language/edit-program.ts', 'src/language/parser.ts']));
  });

  it('is imported by no grid algorithm, primitive or search file (but the one run per solution)', () => {
    expect(immerOnTheHotPath(files, read)).toEqual([]);
  });

  it('catches an import on the hot path', () => {
    const fake: Record<string, string> = {
      'src/search/enumerator.ts': "import { produce } from 'immer';",
      'dsl/colour.ts': "const { freeze } = await import('immer');",
      'src/search/program-from-candidate.ts': "import { freeze } from 'immer';",
      'src/tasks/task.ts': "import { freeze } from 'immer';",
    };
    expect(immerOnTheHotPath(Object.keys(fake), (f) => fake[f]!)).toEqual(['src/search/enumerator.ts', 'dsl/colour.ts']);
  });
});
