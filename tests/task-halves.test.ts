// The two fixed halves of a task set used by `npm run bench:priors`: the rule on the task id,
// worked by hand, and its split of the public training set.
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { halfOfTask } from '../src/batch/task-halves.ts';

describe('halfOfTask', () => {
  it('puts an id ending in an even hexadecimal digit in A and an odd one in B', () => {
    expect(halfOfTask('3c9b0450')).toBe('A');
    expect(halfOfTask('3c9b045e')).toBe('A');
    expect(halfOfTask('3C9B045A')).toBe('A');
    expect(halfOfTask('3c9b0457')).toBe('B');
    expect(halfOfTask('3c9b045b')).toBe('B');
    expect(halfOfTask('3c9b045f')).toBe('B');
  });

  it('goes by the character code for an id that does not end in a hexadecimal digit', () => {
    // 'z' is 122 (even), 'y' is 121 (odd)
    expect(halfOfTask('harbour-z')).toBe('A');
    expect(halfOfTask('harbour-y')).toBe('B');
  });
});

// Outside source: the public training set of ARC-AGI-1 (F. Chollet 2019, Apache-2.0), read from
// ../shared/datasets/arc-agi-1-training/ (see its SOURCE.md).
const dataset = join(import.meta.dirname, '..', '..', 'shared', 'datasets', 'arc-agi-1-training');
const present = existsSync(dataset);
if (!present) console.log(`tests/task-halves.test.ts: ${dataset} is absent; skipping the split of the public training set`);

describe.skipIf(!present)('the split of the public training set', () => {
  it('puts 203 of its 400 tasks in half A and 197 in half B', () => {
    const ids = readdirSync(dataset).filter((f) => f.endsWith('.json')).map((f) => f.slice(0, -5));
    expect(ids.length).toBe(400);
    expect(ids.filter((id) => halfOfTask(id) === 'A').length).toBe(203);
    expect(ids.filter((id) => halfOfTask(id) === 'B').length).toBe(197);
  });
});
