// Found candidates become readable programs: calls used as arguments become steps named after
// their type, a call used twice becomes one step, sections stay inline, and no step takes the
// input's name. The candidates are built by hand; the expected texts are worked out by hand
// from the naming rule (program-from-candidate.ts) and the program syntax (README).
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import type { Expression } from '../src/language/ast.ts';
import { checkProgram } from '../src/language/checker.ts';
import { parseProgram } from '../src/language/parser.ts';
import { printProgram } from '../src/language/printer.ts';
import { functionType, isBaseType, type Type } from '../src/language/types.ts';
import { programFromCandidate } from '../src/search/program-from-candidate.ts';
import type { Candidate } from '../src/search/value-store.ts';

function leaf(type: Type, expression: Expression): Candidate {
  return { type, cost: 1, values: [], production: undefined, arguments: [], leaf: expression, typeId: 0, signature: undefined };
}

const input = (name: string): Candidate => leaf('Grid', { kind: 'variable', name });

function call(name: string, args: Candidate[]): Candidate {
  const primitive = defaultLibrary.get(name)!;
  const production = { primitive, section: false, argumentTypes: primitive.parameters, result: primitive.result, bits: primitive.bits };
  return { type: primitive.result, cost: 1, values: [], production, arguments: args, leaf: undefined, typeId: 0, signature: undefined };
}

/** The section `name(_, args...)`. */
function section(name: string, args: Candidate[]): Candidate {
  const primitive = defaultLibrary.get(name)!;
  const open = primitive.parameters[0]!;
  if (!isBaseType(open) || !isBaseType(primitive.result)) throw new Error(`${name} cannot be a section`);
  const result = functionType(open, primitive.result);
  const production = { primitive, section: true, argumentTypes: primitive.parameters.slice(1), result, bits: primitive.bits };
  return { type: result, cost: 1, values: [], production, arguments: args, leaf: undefined, typeId: 0, signature: undefined };
}

/** The program's text, after checking that it parses back and type-checks. */
function text(candidate: Candidate, inputName: string): string {
  const printed = printProgram(programFromCandidate(candidate, inputName));
  checkProgram(parseProgram(printed), defaultLibrary);
  return printed;
}

describe('a found candidate as a program', () => {
  it('nested calls become steps named after their types', () => {
    const harbour = input('input');
    const candidate = call('crop_to_object', [harbour, call('largest_object', [call('objects_by_colour', [harbour])])]);
    expect(text(candidate, 'input')).toBe(`with input
objects = objects_by_colour(input)
object  = largest_object(objects)
answer crop_to_object(input, object)
`);
  });

  it('a call used twice becomes one step', () => {
    const deck = input('input');
    const sea = call('background', [deck]);
    expect(text(call('recolour', [deck, sea, call('background', [deck])]), 'input')).toBe(`with input
colour = background(input)
answer recolour(input, colour, colour)
`);
  });

  it('a section stays inline', () => {
    const harbour = input('input');
    const candidate = call('map_objects', [harbour, call('objects_by_colour', [harbour]), section('reflect_object_horizontally', [])]);
    expect(text(candidate, 'input')).toBe(`with input
objects = objects_by_colour(input)
answer map_objects(input, objects, reflect_object_horizontally(_))
`);
  });

  it("no step takes the input's name", () => {
    const chart = input('grid');
    const three = leaf('Int', { kind: 'literal', literal: { type: 'Int', value: 3 } });
    const candidate = call('crop_to_content', [call('scale_up', [chart, three])]);
    expect(text(candidate, 'grid')).toBe(`with grid
grid_2 = scale_up(grid, 3)
answer crop_to_content(grid_2)
`);
  });

  it('the program comes back frozen', () => {
    const harbour = input('input');
    const program = programFromCandidate(call('crop_to_content', [call('scale_up', [harbour, leaf('Int', { kind: 'literal', literal: { type: 'Int', value: 2 } })])]), 'input');
    expect(program.steps.map((s) => s.name)).toEqual(['grid']);
    expect(() => {
      (program.steps[0] as { name: string }).name = 'chart';
    }).toThrow(TypeError);
  });
});
