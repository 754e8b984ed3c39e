/**
 * How fitting programs become attempts: a program that breaks the output size the
 * demonstrations settle is charged SIZE_BREAK_BITS, not thrown out. The grids below are made up
 * for the check; the last block measures the charge on the public training set. The last
 * attempt is the cheapest of the other way (table or composition) when all before it are of one.
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
const program = (bits: number, breaksSize: boolean, colour: number, fromTable = false): Rankable & { name: string } => ({ bits, breaksSize, testOutputs: [grid(colour)], fromTable, name: `${bits}${breaksSize ? '!' : ''}${fromTable ? 't' : ''}` });

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

  it('orders by ranking bits, the last attempt only ever taken from the other way', () => {
    const arbitrary = fc.array(fc.record({ bits: fc.integer({ min: 1, max: 60 }), breaksSize: fc.boolean(), colour: fc.integer({ min: 0, max: 9 }), fromTable: fc.boolean() }), { maxLength: 12 });
    fc.assert(
      fc.property(arbitrary, fc.integer({ min: 1, max: 4 }), (items, attempts) => {
        const found = items.map((x) => program(x.bits, x.breaksSize, x.colour, x.fromTable));
        const taken = rankAttempts(found, attempts);
        const distinctColours = new Set(items.map((x) => x.colour)).size;
        expect(taken.length).toBe(Math.min(attempts, distinctColours));
        const outputsDiffer = (s: Rankable, among: readonly Rankable[]): boolean => !among.some((t) => t.testOutputs[0]!.equals(s.testOutputs[0]!));
        for (let k = 0; k < taken.length; k++) {
          const before = taken.slice(0, k);
          expect(outputsDiffer(taken[k]!, before)).toBe(true);
          // All but the last: nothing left out is strictly better and of an output not yet taken.
          // The last as well, unless every attempt before it is of one way and it is of the other:
          // then nothing of its own way is strictly better.
          const hedged = k === attempts - 1 && k > 0 && before.every((t) => t.fromTable !== taken[k]!.fromTable);
          for (const s of found) {
            if (taken.includes(s) || !outputsDiffer(s, before)) continue;
            if (!hedged || s.fromTable === taken[k]!.fromTable) expect(rankingBits(s)).toBeGreaterThanOrEqual(rankingBits(taken[k]!));
          }
        }
        // The hedge: when some program of each way fits, with outputs that can stand beside the
        // cheapest, the attempts hold both ways.
        if (attempts >= 2 && taken.length === attempts) {
          const first = taken[0]!;
          const otherWay = found.some((s) => s.fromTable !== first.fromTable && outputsDiffer(s, taken.slice(0, attempts - 1)));
          if (otherWay) expect(taken.some((s) => s.fromTable !== first.fromTable)).toBe(true);
        }
      }),
    );
  });

  it('gives the second attempt to the cheapest table when the two cheapest are compositions, and the other way round', () => {
    const composed = program(20, false, 1);
    const nearCopy = program(21, false, 2);
    const table = program(50, false, 3, true);
    const dearerTable = program(60, false, 4, true);
    expect(rankAttempts([nearCopy, table, composed, dearerTable], 2)).toEqual([composed, table]);
    // A table with the first attempt's outputs adds nothing: the next distinct one is taken.
    const sameAsFirst = program(40, false, 1, true);
    expect(rankAttempts([composed, nearCopy, sameAsFirst, table], 2)).toEqual([composed, table]);
    // Tables first: the second attempt is the cheapest composition.
    const cheapTable = program(12, false, 5, true);
    expect(rankAttempts([cheapTable, dearerTable, nearCopy], 2)).toEqual([cheapTable, nearCopy]);
    // One way only: plain order.
    expect(rankAttempts([nearCopy, composed], 2)).toEqual([composed, nearCopy]);
    // One attempt: always the shortest program.
    expect(rankAttempts([table, composed], 1)).toEqual([composed]);
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
