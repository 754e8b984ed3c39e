/**
 * `pithy tokens [PROGRAM]`: the token vocabulary (id, token, meaning, by section), or the
 * tokens and ids of one program file.
 */
import type { Command } from 'commander';
import { defaultLibrary } from '../../dsl/index.ts';
import { tokenize } from '../tokens/program-tokens.ts';
import { TokenError } from '../tokens/token-reader.ts';
import { SECTIONS, vocabularyOf } from '../tokens/vocabulary.ts';
import { formatProblem, loadProgramFile, ProgramFileError } from './program-file.ts';
import { writeError, writeJson, writeLines } from './output.ts';

const SECTION_TITLES: Record<(typeof SECTIONS)[number], string> = {
  padding: 'Padding',
  program: 'Program structure',
  literals: 'Literals',
  grids: 'Grids (cells are the colour tokens)',
  primitives: 'Primitives (library order)',
};

export function registerTokensCommand(program: Command): void {
  program
    .command('tokens')
    .description("print the token vocabulary of programs and grids (versioned, derived from the library), or a program's tokens")
    .argument('[program]', 'a program file: print its tokens and their ids instead')
    .option('--json', 'print as JSON')
    .action((programFile: string | undefined, options: { json?: boolean }) => {
      const vocabulary = vocabularyOf(defaultLibrary);
      const identity = { version: vocabulary.version, fingerprint: vocabulary.fingerprint };
      if (programFile !== undefined) {
        try {
          const tokens = tokenize(loadProgramFile(programFile, defaultLibrary).program, defaultLibrary);
          const ids = vocabulary.toIds(tokens);
          if (options.json) writeJson({ vocabulary: identity, tokens, ids });
          else writeLines([tokens.join(' '), ids.join(' ')]);
        } catch (error) {
          if (error instanceof ProgramFileError) writeError(error.problems.map(formatProblem).join('\n'));
          else if (error instanceof TokenError) writeError(`${programFile}: cannot be written as tokens: ${error.message}`);
          else throw error;
          process.exitCode = 1;
        }
        return;
      }
      if (options.json) {
        writeJson({ ...identity, size: vocabulary.size, tokens: vocabulary.tokens });
        return;
      }
      const lines = [`token vocabulary version ${vocabulary.version}, fingerprint ${vocabulary.fingerprint}, ${vocabulary.size} tokens`];
      const width = Math.max(...vocabulary.tokens.map((t) => t.token.length));
      for (const section of SECTIONS) {
        lines.push('', SECTION_TITLES[section]);
        for (const t of vocabulary.tokens.filter((x) => x.section === section)) lines.push(`  ${String(t.id).padStart(4)}  ${t.token.padEnd(width)}  ${t.meaning}`);
      }
      writeLines(lines);
    });
}
