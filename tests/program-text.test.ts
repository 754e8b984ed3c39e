// Program text: exact round trip on random well-typed programs; parse errors name line:column
// and what was expected; type errors name the step, the expected and the found type.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkProgram, ProgramTypeError } from '../src/language/checker.ts';
import { parseProgram, ProgramSyntaxError } from '../src/language/parser.ts';
import { printProgram } from '../src/language/printer.ts';
import { defaultLibrary } from '../dsl/index.ts';
import { programArbitrary } from './support/random-program.ts';

describe('printing and parsing programs', () => {
  it('random well-typed programs round-trip exactly: parse(print(p)) equals p', () => {
    fc.assert(
      fc.property(programArbitrary(defaultLibrary), (program) => {
        expect(parseProgram(printProgram(program))).toEqual(program);
      }),
      { numRuns: 300 },
    );
  });

  it('the random programs are well typed with a Grid answer', () => {
    fc.assert(
      fc.property(programArbitrary(defaultLibrary), (program) => {
        expect(checkProgram(program, defaultLibrary).answer).toBe('Grid');
      }),
      { numRuns: 200 },
    );
  });

  it('printing is a fixed point: print(parse(print(p))) equals print(p)', () => {
    fc.assert(
      fc.property(programArbitrary(defaultLibrary), (program) => {
        const text = printProgram(program);
        expect(printProgram(parseProgram(text))).toBe(text);
      }),
      { numRuns: 100 },
    );
  });

  it('keeps comments, steps and literals of a hand-written program', () => {
    const text = [
      '-- the crane lifts the tallest stack',
      'with quay',
      '-- stacks of containers',
      'stacks = objects_by_colour(quay)',
      'count  = count_objects(stacks)',
      '--',
      'answer reflect_vertically(quay)',
      '',
    ].join('\n');
    const program = parseProgram(text);
    expect(program.comments).toEqual(['the crane lifts the tallest stack']);
    expect(program.steps.map((s) => s.name)).toEqual(['stacks', 'count']);
    expect(program.steps[0]!.comments).toEqual(['stacks of containers']);
    expect(program.answerComments).toEqual(['']);
    expect(printProgram(program)).toBe(text);
  });
});

function syntaxError(text: string): ProgramSyntaxError {
  try {
    parseProgram(text, 'bad.pithy');
  } catch (error) {
    expect(error).toBeInstanceOf(ProgramSyntaxError);
    return error as ProgramSyntaxError;
  }
  throw new Error('expected a syntax error');
}

describe('parse errors', () => {
  it('a missing closing parenthesis: line 2, at the end of the line', () => {
    const e = syntaxError('with deck\nboats = objects_by_colour(deck\nanswer deck\n');
    expect([e.line, e.column]).toEqual([2, 31]);
    expect(e.expected).toBe("',' or ')' in the argument list");
    expect(e.message).toBe("bad.pithy:2:31: expected ',' or ')' in the argument list, found end of line");
  });

  it('a program that does not start with `with`', () => {
    const e = syntaxError('answer deck\n');
    expect([e.line, e.column]).toEqual([1, 1]);
    expect(e.expected).toContain("'with'");
  });

  it('a colour with two digits', () => {
    const e = syntaxError('with deck\nanswer recolour(deck, #12, #3)\n');
    expect(e.line).toBe(2);
    // `answer recolour(deck, #` is 23 characters, so the digits start at column 24.
    expect(e.column).toBe(24);
    expect(e.expected).toContain('colour digit');
  });

  it('a step without `=`', () => {
    const e = syntaxError('with deck\n  boats objects_by_colour(deck)\nanswer deck\n');
    expect([e.line, e.column]).toEqual([2, 9]);
    expect(e.expected).toBe("'=' after the step name");
    expect(e.found).toBe("'objects_by_colour'");
  });

  it('a program without an answer', () => {
    const e = syntaxError('with deck\nboats = objects_by_colour(deck)\n');
    expect(e.expected).toContain("'answer");
  });

  it('text after the answer', () => {
    const e = syntaxError('with deck\nanswer deck\nmore = deck\n');
    expect([e.line, e.column]).toEqual([3, 1]);
    expect(e.expected).toContain('end of program');
  });
});

function typeProblems(text: string): ProgramTypeError {
  try {
    checkProgram(parseProgram(text), defaultLibrary);
  } catch (error) {
    expect(error).toBeInstanceOf(ProgramTypeError);
    return error as ProgramTypeError;
  }
  throw new Error('expected a type error');
}

describe('type errors', () => {
  it('an argument of the wrong type names the step, expected and found', () => {
    const e = typeProblems('with deck\nboats = objects_by_colour(deck)\nturned = rotate_clockwise(boats)\nanswer turned\n');
    expect(e.problems).toHaveLength(1);
    expect(e.problems[0]).toMatchObject({ step: 'turned', expected: 'Grid', found: 'Objects' });
    expect(e.message).toContain("step 'turned'");
  });

  it('an answer that is not a grid', () => {
    const e = typeProblems('with deck\nboats = objects_by_colour(deck)\nanswer count_objects(boats)\n');
    expect(e.problems[0]).toMatchObject({ step: 'answer', expected: 'Grid', found: 'Int' });
  });

  it('an unknown name', () => {
    const e = typeProblems('with deck\nanswer rotate_clockwise(ship)\n');
    expect(e.problems[0]!.step).toBe('answer');
    expect(e.problems[0]!.message).toContain("'ship'");
  });

  it('too many arguments', () => {
    const e = typeProblems('with deck\nturned = rotate_clockwise(deck, deck)\nanswer turned\n');
    expect(e.problems[0]).toMatchObject({ step: 'turned', expected: 'rotate_clockwise(Grid)', found: '2 arguments' });
  });
});
