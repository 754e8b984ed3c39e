// Traced runs say why a step failed (an empty selection, a colour absent, a size over the cap, an
// argument that failed earlier, an exception), trace the calls nested in a step, and give the
// same values as plain runs. Grids and expected values are worked out by hand.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { Grid } from '../src/grid/grid.ts';
import { FAILURE } from '../src/language/failure.ts';
import { describeFailure, explainApplication } from '../src/language/failure-reason.ts';
import { runProgram } from '../src/language/interpreter.ts';
import type { Operation } from '../src/language/operation.ts';
import { parseProgram } from '../src/language/parser.ts';
import { countDifferingCells, drawComparison } from '../src/output/terminal-grid.ts';
import { programArbitrary } from './support/random-program.ts';
import { arbitraryGrid } from './support/arbitrary-grid.ts';

const chart = Grid.fromRows([
  [0, 0, 0, 0],
  [0, 3, 3, 0],
  [0, 0, 0, 5],
]);

function traced(text: string, input = chart) {
  return runProgram(parseProgram(text), input, defaultLibrary, { trace: true });
}

describe('why a step failed', () => {
  it('a colour absent from the grid: crop_to_colour with #8 on a chart of 0, 3 and 5', () => {
    const { output, trace } = traced('with chart\nanswer crop_to_colour(chart, #8)\n');
    expect(output).toBe(FAILURE);
    const answer = trace.at(-1)!;
    expect(answer.failure?.call).toBe('crop_to_colour(chart, #8)');
    expect(describeFailure(answer.failure!)).toContain('colour #8 (argument 2) does not occur in the grid');
  });

  it('an empty selection, found in a nested call, with the later step naming the failed argument', () => {
    // The chart has no enclosed regions, so the list is empty and its largest member does not exist.
    const { trace } = traced('with chart\nregions = enclosed_regions(chart)\nbiggest = largest_object(regions)\nanswer crop_to_object(chart, biggest)\n');
    const [regions, biggest, answer] = trace;
    expect(regions!.value).toEqual([]);
    expect(regions!.failure).toBeUndefined();
    expect(describeFailure(biggest!.failure!)).toBe('largest_object(regions): cannot apply: argument 1 is an empty list: no objects were selected');
    expect(describeFailure(answer!.failure!)).toBe("crop_to_object(chart, biggest): argument 2 ('biggest') had already failed");
  });

  it('a nested failure is reported at the inner call where it started', () => {
    const { trace } = traced('with chart\nanswer crop_to_object(chart, largest_object(enclosed_regions(chart)))\n');
    expect(trace.at(-1)!.failure!.call).toBe('largest_object(enclosed_regions(chart))');
  });

  it('a size over the cap names the size, the cap and --size-cap', () => {
    // 3x4 scaled by 8 is 24x32: the width is over the cap of 30.
    const { trace } = traced('with chart\nanswer scale_up(chart, 8)\n');
    const why = describeFailure(trace.at(-1)!.failure!);
    expect(why).toContain('24x32');
    expect(why).toContain('size cap of 30');
    expect(why).toContain('--size-cap');
  });

  it('an exception inside a primitive becomes a failure that carries its message', () => {
    const broken: Operation = { name: 'broken', parameters: ['Grid'], result: 'Grid', run: () => { throw new Error('the quay is flooded'); } };
    const { value, reason } = explainApplication(broken, [chart]);
    expect(value).toBe(FAILURE);
    expect(reason).toEqual({ kind: 'exception', message: 'the quay is flooded' });
  });
});

describe('nested calls are traced', () => {
  it('records each inner call with its value, innermost first', () => {
    // The 3s form the largest object (2 cells); cropping to it gives [[3, 3]].
    const { output, trace } = traced('with chart\nanswer crop_to_object(chart, largest_object(objects_by_colour(chart)))\n');
    expect((output as Grid).toRows()).toEqual([[3, 3]]);
    const calls = trace.at(-1)!.calls!;
    expect(calls.map((c) => c.call)).toEqual(['objects_by_colour(chart)', 'largest_object(objects_by_colour(chart))']);
    expect((calls[0]!.value as unknown[]).length).toBe(2);
  });
});

describe('tracing changes no value', () => {
  it('random well-typed programs give the same output traced and untraced', () => {
    fc.assert(
      fc.property(programArbitrary(defaultLibrary), arbitraryGrid(), (program, grid) => {
        const plain = runProgram(program, grid, defaultLibrary).output;
        const withTrace = runProgram(program, grid, defaultLibrary, { trace: true });
        if (plain === FAILURE) {
          expect(withTrace.output).toBe(FAILURE);
          expect(withTrace.trace.some((t) => t.failure !== undefined)).toBe(true);
        } else expect((withTrace.output as Grid).equals(plain)).toBe(true);
      }),
      { numRuns: 150 },
    );
  });
});

describe('expected and got side by side', () => {
  it('marks exactly the differing cells and counts them', () => {
    const expected = Grid.fromRows([[1, 2], [3, 4]]);
    const got = Grid.fromRows([[1, 0], [3, 0]]);
    expect(countDifferingCells(expected, got)).toBe(2);
    const lines = drawComparison(expected, got, 'plain');
    expect(lines[0]).toBe('expected 2x2   got 2x2');
    // Each drawing is padded to its label's width ('expected 2x2' is 12 columns), then 3 spaces.
    expect(lines[1]).toBe('1 2<' + ' '.repeat(8) + '   ' + '1 .<');
    expect(lines[2]).toBe('3 4<' + ' '.repeat(8) + '   ' + '3 .<');
    expect(lines[3]).toBe('2 cells differ (marked \'<\')');
  });

  it('says when the sizes differ', () => {
    expect(drawComparison(Grid.fromRows([[1]]), Grid.fromRows([[1, 1]]), 'plain').at(-1)).toBe('the sizes differ: expected 1x1, got 1x2');
  });
});
