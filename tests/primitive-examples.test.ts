// Every primitive's worked example (worked out by hand by its author) is evaluated here.
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { checkExpression } from '../src/language/checker.ts';
import { isFailure } from '../src/language/failure.ts';
import { evaluateExpression } from '../src/language/interpreter.ts';
import { parseExpression } from '../src/language/parser.ts';
import type { Expression } from '../src/language/ast.ts';
import { defaultLibrary } from '../dsl/index.ts';
import type { Type } from '../src/language/types.ts';

function callsOf(e: Expression): string[] {
  return e.kind === 'call' ? [e.primitive, ...e.arguments.flatMap(callsOf)] : [];
}

describe.each(defaultLibrary.primitives.map((p) => [p.name, p] as const))('primitive %s', (name, p) => {
  it('its worked example evaluates to the stated output', () => {
    const expression = parseExpression(p.example.expression, `example of ${name}`);
    const type = checkExpression(expression, new Map<string, Type>([['grid', 'Grid']]), defaultLibrary);
    const value = evaluateExpression(expression, new Map([['grid', Grid.fromRows(p.example.input)]]), defaultLibrary);
    expect(isFailure(value), `${name}: the example failed`).toBe(false);
    const output = p.example.output;
    if (typeof output === 'number') {
      expect(['Int', 'Colour']).toContain(type);
      expect(value).toBe(output);
    } else if (typeof output === 'boolean') {
      expect(type).toBe('Bool');
      expect(value).toBe(output);
    } else {
      expect(type).toBe('Grid');
      expect(value).toBeInstanceOf(Grid);
      expect((value as Grid).toRows()).toEqual(Grid.fromRows(output).toRows());
    }
  });

  it("its example uses the primitive itself", () => {
    expect(callsOf(parseExpression(p.example.expression))).toContain(name);
  });

  it('has a positive description length and a one-line doc', () => {
    expect(p.bits).toBeGreaterThan(0);
    expect(p.doc.trim().length).toBeGreaterThan(0);
    expect(p.doc).not.toMatch(/\n/);
  });
});
