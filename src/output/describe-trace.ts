/**
 * Shows a traced run to a person: every step with its value (grids drawn), the calls nested in
 * it, and for a step that failed, where the failure started and why.
 */
import { describeFailure } from '../language/failure-reason.ts';
import { isFailure } from '../language/failure.ts';
import type { TraceEntry } from '../language/interpreter.ts';
import { describeValue, valueToData, type ValueData } from './describe-value.ts';
import type { ColourMode, DrawOptions } from './terminal-grid.ts';

/** Lines for one trace entry: `name : Type = value`, drawings indented below, then its inner calls. */
export function traceEntryLines(entry: TraceEntry, mode: ColourMode, options: DrawOptions & { calls?: boolean } = {}): string[] {
  const shown = describeValue(entry.type, entry.value, mode, options);
  const lines = [`${entry.name} : ${entry.type} = ${shown[0]}`, ...shown.slice(1).map((l) => `  ${l}`)];
  if (entry.failure) lines.push(`  why: ${describeFailure(entry.failure)}`);
  if (options.calls && entry.calls) {
    for (const call of entry.calls) {
      const inner = describeValue(call.type, call.value, mode, options);
      lines.push(`  inside: ${call.call} = ${inner[0]}`, ...inner.slice(1).map((l) => `    ${l}`));
    }
  }
  return lines;
}

/** JSON data of a trace entry: name, type, value, and when present why it failed and the inner calls. */
export function traceEntryData(entry: TraceEntry): { [key: string]: ValueData } {
  return {
    name: entry.name,
    type: entry.type,
    value: valueToData(entry.value),
    ...(entry.failure ? { failure: describeFailure(entry.failure) } : {}),
    ...(entry.calls ? { calls: entry.calls.map((c) => ({ call: c.call, type: c.type, value: valueToData(c.value), failed: isFailure(c.value) })) } : {}),
  };
}
