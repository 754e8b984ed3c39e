// The README's example program must parse, type-check and reproduce the task it names, so the
// README cannot drift from the language or from tasks-demo.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { checkProgram } from '../src/language/checker.ts';
import { parseProgram } from '../src/language/parser.ts';
import { printProgram } from '../src/language/printer.ts';
import { defaultLibrary } from '../dsl/index.ts';
import { readTaskFile } from '../src/tasks/read-task.ts';
import { runOnTask } from '../src/tasks/run-on-task.ts';

const root = new URL('../', import.meta.url).pathname;
const readme = readFileSync(`${root}README.md`, 'utf8');

describe('README', () => {
  const marker = /<!-- example task: (\S+\.json)[^>]*-->\s*```pithy\n([\s\S]*?)```/.exec(readme);

  it('has an example program right after a marker naming its task', () => {
    expect(marker, 'README.md needs "<!-- example task: tasks-demo/NAME.json -->" followed by a ```pithy block').not.toBeNull();
  });

  it('its example program parses, checks and reproduces every output of its task', () => {
    const [, taskFile, text] = marker!;
    const program = parseProgram(text!, 'README.md');
    expect(checkProgram(program, defaultLibrary).answer).toBe('Grid');
    expect(printProgram(program)).toBe(text);
    const results = runOnTask(program, readTaskFile(`${root}${taskFile}`), defaultLibrary);
    expect(results.length).toBeGreaterThan(2);
    expect(results.filter((r) => !r.passed).map((r) => `${r.set} ${r.index}`)).toEqual([]);
  });

  it('opens with a paragraph stating the job and gives the two fresh-machine commands', () => {
    const firstParagraph = readme.split('\n\n')[1]!;
    expect(firstParagraph.length).toBeGreaterThanOrEqual(120);
    expect(readme).toContain('npm ci && npm run demo');
    expect(readme).toContain('npm ci && npm test');
  });
});
