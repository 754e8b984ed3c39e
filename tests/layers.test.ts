/**
 * The layer rule of the contributor guide: each floor imports only from the floors below it
 * (or from its own folder). grid <- language <- library (with task I/O) <- dsl (with the
 * outputs) <- search <- batch <- cli <- bench, and the public index on top. This test reads
 * every import of src/ and dsl/ and fails naming the file and the import that breaks the rule.
 */
import { readFileSync } from 'node:fs';
import { join, relative, resolve, dirname } from 'node:path';
import { describe, expect, it } from 'vitest';
import { sourceFiles } from './support/source-files.ts';

const root = resolve(import.meta.dirname, '..');

/** Floors from the ground up; folders on one floor may not import each other. */
const FLOORS: Readonly<Record<string, number>> = {
  'src/grid': 0,
  'src/language': 1,
  'src/library': 2,
  'src/tasks': 2,
  dsl: 3,
  'src/output': 3,
  'src/tokens': 3,
  'src/search': 4,
  'src/batch': 5,
  'src/training': 5,
  'src/cli': 6,
  'src/bench': 7,
  src: 8,
};


function floorFolder(file: string): string {
  const folder = dirname(file);
  if (!(folder in FLOORS)) throw new Error(`tests/layers.test.ts: ${file} lies in ${folder}, which has no floor in FLOORS; add it there and to DEVELOPERS.md`);
  return folder;
}

/** Relative imports of a file (import and export ... from, static and dynamic). */
function importsOf(text: string): string[] {
  const found: string[] = [];
  const pattern = /(?:from\s+|import\s*\(\s*|import\s+)'(\.{1,2}\/[^']+)'/g;
  for (const match of text.matchAll(pattern)) found.push(match[1]!);
  return found;
}

/** Each offending import as "file -> imported (floor a imports floor b)". */
function layerViolations(files: readonly string[], read: (file: string) => string): string[] {
  const problems: string[] = [];
  for (const file of files) {
    const from = floorFolder(file);
    for (const target of importsOf(read(file))) {
      const imported = relative(root, resolve(root, dirname(file), target));
      const to = floorFolder(imported);
      if (to === from) continue;
      if (FLOORS[to]! >= FLOORS[from]!) problems.push(`${file} imports ${imported} (${from} may not import ${to})`);
    }
  }
  return problems;
}

describe('the layer rule', () => {
  const files = [...sourceFiles('src'), ...sourceFiles('dsl')];
  const read = (file: string) => readFileSync(join(root, file), 'utf8');

  it('reads a good number of files, so the check has something to check', () => {
    expect(files.length).toBeGreaterThan(60);
    expect(files.filter((f) => importsOf(read(f)).length > 0).length).toBeGreaterThan(50);
  });

  it('no file imports a floor above its own or a neighbour on the same floor', () => {
    expect(layerViolations(files, read)).toEqual([]);
  });

  it('catches an import against the rule (a grid file importing the language, a library file importing dsl)', () => {
    const fake: Record<string, string> = {
      'src/grid/bad.ts': "import { FAILURE } from '../language/failure.ts';",
      'src/library/bad.ts': "export { PRIMITIVES } from '../../dsl/index.ts';",
      'src/tasks/bad.ts': "const m = await import('../output/terminal-grid.ts');",
      'src/search/fine.ts': "import { Grid } from '../grid/grid.ts';",
    };
    const problems = layerViolations(Object.keys(fake), (f) => fake[f]!);
    expect(problems).toHaveLength(3);
    expect(problems[0]).toContain('src/grid may not import src/language');
    expect(problems[1]).toContain('src/library may not import dsl');
    expect(problems[2]).toContain('src/tasks may not import src/output');
  });
});
