/** Small helpers the commands share for writing to the terminal. */
import { colourModeFor, type ColourMode } from '../output/terminal-grid.ts';
import type { TaskFileError } from '../tasks/read-task.ts';

export function writeLines(lines: readonly string[]): void {
  if (lines.length > 0) process.stdout.write(lines.join('\n') + '\n');
}

/** JSON with two-space indents, but lists of plain values (grid rows) kept on one line. */
export function formatJson(data: unknown, indent = ''): string {
  if (Array.isArray(data)) {
    if (data.length === 0) return '[]';
    if (data.every((v) => v === null || typeof v !== 'object')) return JSON.stringify(data);
    const inner = indent + '  ';
    return `[\n${data.map((v) => inner + formatJson(v, inner)).join(',\n')}\n${indent}]`;
  }
  if (data !== null && typeof data === 'object') {
    const entries = Object.entries(data as Record<string, unknown>).filter(([, v]) => v !== undefined);
    if (entries.length === 0) return '{}';
    const inner = indent + '  ';
    return `{\n${entries.map(([k, v]) => `${inner}${JSON.stringify(k)}: ${formatJson(v, inner)}`).join(',\n')}\n${indent}}`;
  }
  return JSON.stringify(data) ?? 'null';
}

export function writeJson(data: unknown): void {
  process.stdout.write(formatJson(data) + '\n');
}

export function writeError(message: string): void {
  process.stderr.write(message.endsWith('\n') ? message : message + '\n');
}

/** How grids are drawn on standard output. */
export function stdoutColourMode(): ColourMode {
  return colourModeFor(process.stdout);
}

export function taskErrorData(error: TaskFileError): { file: string; path: string; problem: string } {
  return { file: error.file, path: error.jsonPath, problem: error.problem };
}
