/**
 * How fitting programs become attempts: a program that breaks the output size the
 * demonstrations settle is charged SIZE_BREAK_BITS, not thrown out. The grids below are made up
 * for the check; the last block measures the charge on the public training set.
 */
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { fitsPrediction, predictOutputSizes, SIZE_BREAK_BITS } from '../src/search/output-size.ts';
import { rankAttempts, rankingBits, type Rankable } from '../src/search/rank-attempts.ts';
import { readTaskFile, taskFiles } from '../src/tasks/read-task.ts';

const grid = (colour: number): Grid => Grid.fromRows([[colour, colour]]);
const program = (bits: number, breaksSize: boolean, colour: number): Rankable & { name: string } => ({ bits, breaksSize, testOutputs: [grid(colour)], name: `${bits}${breaksSize ? '!' : ''}` });

describe('ranking attempts', () => {
  it('puts a size breaker first only when it is cheaper by more than the charge', () => {
    const keeps = program(22, false, 1);
    const muchCheaper = program(22 - SIZE_BREAK_BITS - 1, true, 2);
    const littleCheaper = program(22 - SIZE_BREAK_BITS + 1, true, 3);
    expect(rankAttempts([keeps, muchCheaper], 2).map((s) => s.name)).toEqual([muchCheaper.name, keeps.name]);
    expect(rankAttempts([keeps, littleCheaper], 2).map((s) => s.name)).toEqual([keeps.name, littleCheaper.name]);
    // On equal terms the one that keeps the size wins, wherever it was found.
    const even = program(22 - SIZE_BREAK_BITS, true, 4);
    expect(rankAttempts([even, keeps], 1)).toEqual([keeps]);
  });

  it('takes a size breaker when nothing else fits, and never two attempts with the same outputs', () => {
    const a = program(30, true, 5);
    const b = program(31, true, 5);
    const c = program(40, true, 6);
    expect(rankAttempts([a, b, c], 2)).toEqual([a, c]);
  });

  it('orders by ranking bits, never by anything else', () => {
    const arbitrary = fc.array(fc.record({ bits: fc.integer({ min: 1, max: 60 }), breaksSize: fc.boolean(), colour: fc.integer({ min: 0, max: 9 }) }), { maxLength: 12 });
    fc.assert(
      fc.property(arbitrary, fc.integer({ min: 1, max: 4 }), (items, attempts) => {
        const found = items.map((x) => program(x.bits, x.breaksSize, x.colour));
        const taken = rankAttempts(found, attempts);
        const distinctColours = new Set(items.map((x) => x.colour)).size;
        expect(taken.length).toBe(Math.min(attempts, distinctColours));
        for (let k = 1; k < taken.length; k++) expect(rankingBits(taken[k - 1]!)).toBeLessThanOrEqual(rankingBits(taken[k]!));
        // Nothing left out is strictly better than the last taken and of an output not yet taken.
        const last = taken[taken.length - 1];
        if (last) for (const s of found) if (!taken.includes(s) && !taken.some((t) => t.testOutputs[0]!.equals(s.testOutputs[0]!))) expect(rankingBits(s)).toBeGreaterThanOrEqual(rankingBits(last));
      }),
    );
  });
});

/** ARC-AGI-1 public training set, F. Chollet 2019, Apache-2.0, read from ../shared/datasets/arc-agi-1-training/ */
const datasetFolder = resolve(fileURLToPath(new URL('.', import.meta.url)), '../../shared/datasets/arc-agi-1-training');
const datasetPresent = existsSync(datasetFolder);
if (!datasetPresent) console.log(`rank-attempts: the charge's measurement skipped, the public training set is not at ${datasetFolder}`);

describe.runIf(datasetPresent)('the charge for breaking the settled size, measured on the public training set', () => {
  it('is −log₂ of how often the settled size was wrong on the test inputs, rounded up', () => {
    let settled = 0;
    let broken = 0;
    for (const file of taskFiles(datasetFolder)) {
      const task = readTaskFile(file);
      const predictions = predictOutputSizes(task.train, task.test.map((t) => t.input));
      task.test.forEach((t, i) => {
        const p = predictions[i]!;
        if (!t.output || (p.height === undefined && p.width === undefined)) return;
        settled++;
        if (!fitsPrediction(t.output, p)) broken++;
      });
    }
    // The figures the charge's comment gives (src/search/output-size.ts).
    expect([settled, broken]).toEqual([359, 4]);
    expect(SIZE_BREAK_BITS).toBe(Math.ceil(-Math.log2(broken / settled)));
  });
});
