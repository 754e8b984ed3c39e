/** The repository's source files, for tests that read imports (layers, immer off the hot path). */
import { readdirSync } from 'node:fs';
import { join, resolve } from 'node:path';

export const repositoryRoot = resolve(import.meta.dirname, '..', '..');

/** Every .ts and .js file below a folder of the repository, as paths relative to its root. */
export function sourceFiles(folder: string): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(join(repositoryRoot, folder), { withFileTypes: true })) {
    const path = join(folder, entry.name);
    if (entry.isDirectory()) out.push(...sourceFiles(path));
    else if (/\.(ts|js)$/.test(entry.name)) out.push(path);
  }
  return out;
}

