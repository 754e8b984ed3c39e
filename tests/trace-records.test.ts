// Trace records: `pithy trace` over every demo task's reference program (through a results file
// as `pithy eval` writes it, and from a program file) gives records that the shipped JSON Schema
// (schemas/trace-record.schema.json) accepts, checked with ajv from the npm registry; the values
// of a hand-read example; failures as null with a reason; and the schema refusing bad records.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { defaultLibrary } from '../dsl/index.ts';
import { parseProgram } from '../src/language/parser.ts';
import { parseTask, readTaskFile } from '../src/tasks/read-task.ts';
import { detokenize } from '../src/tokens/program-tokens.ts';
import { canonicalProgram } from '../src/language/canonical-names.ts';
import { traceRecord, type TraceRecord } from '../src/training/trace-record.ts';

const root = new URL('../', import.meta.url).pathname;
const demo = join(root, 'tasks-demo');
const pithy = (...args: string[]) => spawnSync(process.execPath, [join(root, 'bin', 'pithy.js'), ...args], { encoding: 'utf8', cwd: root });

const schema = JSON.parse(readFileSync(join(root, 'schemas', 'trace-record.schema.json'), 'utf8')) as object;
const ajv = new Ajv2020({ allErrors: true, strict: true });
const validate = ajv.compile(schema);
const problemsOf = (record: unknown): string => (validate(record) ? '' : ajv.errorsText(validate.errors));

const demoNames = readdirSync(demo).filter((f) => f.endsWith('.pithy')).map((f) => f.replace(/\.pithy$/, '')).sort();

describe('pithy trace over the demo tasks, validated against the shipped schema', () => {
  const dir = mkdtempSync(join(tmpdir(), 'pithy-trace-'));
  // A results file in the shape pithy eval writes, with each demo task solved by its reference program.
  const results = join(dir, 'results.jsonl');
  writeFileSync(
    results,
    demoNames
      .map((name) =>
        JSON.stringify({
          task: name,
          file: join(demo, `${name}.json`),
          status: 'found',
          solutions: [{ program: readFileSync(join(demo, `${name}.pithy`), 'utf8'), bits: 0 }],
          attempts: [],
          reason: 'solved',
          seconds: 0,
          solved: true,
        }),
      )
      .join('\n') + '\n',
  );
  const out = join(dir, 'traces.jsonl');
  const run = pithy('trace', '--results', results, '--out', out);

  it('writes one valid record per solved task and program', () => {
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    expect(demoNames.length).toBeGreaterThanOrEqual(18);
    const records = readFileSync(out, 'utf8').trimEnd().split('\n').map((l) => JSON.parse(l) as TraceRecord);
    expect(records.map((r) => r.task)).toEqual(demoNames);
    for (const record of records) {
      expect(problemsOf(record), record.task).toBe('');
      // The reference programs reproduce every pair of their tasks.
      expect(record.pairs.every((p) => p.correct === true), record.task).toBe(true);
      // The tokens spell the same program (in canonical form).
      expect(detokenize(record.tokens!, defaultLibrary)).toEqual(canonicalProgram(parseProgram(record.program), defaultLibrary));
    }
  });

  it('refuses to overwrite the output file', () => {
    const again = pithy('trace', '--results', results, '--out', out);
    expect(again.status).toBe(2);
    expect(again.stderr).toContain('already exists');
  });

  it('from a program file and a task, prints records on standard output', () => {
    const single = pithy('trace', join(demo, 'tallest-mast.pithy'), join(demo, 'tallest-mast.json'));
    expect(single.status).toBe(0);
    const lines = single.stdout.trimEnd().split('\n');
    expect(lines).toHaveLength(1);
    expect(problemsOf(JSON.parse(lines[0]!))).toBe('');
  });

  it('skips tasks not solved, and reports a missing task file and goes on', () => {
    const mixed = join(dir, 'mixed.jsonl');
    const base = { status: 'found', attempts: [], reason: 'solved', seconds: 0, solutions: [{ program: 'with g\nanswer g\n', bits: 1 }] };
    writeFileSync(
      mixed,
      [
        { ...base, task: 'marker-buoys', file: join(demo, 'marker-buoys.json'), solved: false },
        { ...base, task: 'gone', file: join(dir, 'gone.json'), solved: true },
        { ...base, task: 'cast-off', file: join(demo, 'cast-off.json'), solved: true },
      ]
        .map((l) => JSON.stringify(l))
        .join('\n') + '\n',
    );
    const r = pithy('trace', '--results', mixed);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('gone.json');
    const records = r.stdout.trimEnd().split('\n').map((l) => JSON.parse(l) as TraceRecord);
    expect(records.map((x) => x.task)).toEqual(['cast-off']);
    expect(existsSync(join(dir, 'gone.json'))).toBe(false);
  });
});

describe('what a record holds', () => {
  const task = readTaskFile(join(demo, 'tallest-mast.json'));
  const program = parseProgram(readFileSync(join(demo, 'tallest-mast.pithy'), 'utf8'));
  const record = traceRecord(task, program, defaultLibrary);

  it('names the steps and types, and counts the bits by the README formula', () => {
    expect(record.steps).toEqual([
      { name: 'boats', type: 'Objects' },
      { name: 'answer', type: 'Grid' },
    ]);
    const bits = (name: string) => defaultLibrary.get(name)!.bits;
    // Four primitive uses and two uses of the input grid, no constants.
    expect(record.bits).toBe(bits('objects_by_colour') + bits('erase_object') + bits('object_with_most') + bits('object_height') + 2);
    expect(record.pairs.map((p) => `${p.set} ${p.index}`)).toEqual([
      ...task.train.map((_, i) => `train ${i}`),
      ...task.test.map((_, i) => `test ${i}`),
    ]);
  });

  it('writes objects as their cells with colours and grid positions (read by hand from the first input)', () => {
    // First demonstration input, rows 1-3: a colour-3 boat in column 1 with a cell to its right at the foot.
    const boats = record.pairs[0]!.values[0]!.value as { top: number; left: number; height: number; width: number; colour: number; cells: number[][] }[];
    const mast = boats.find((b) => b.colour === 3)!;
    expect(mast).toEqual({ top: 1, left: 1, height: 3, width: 2, colour: 3, cells: [[1, 1, 3], [2, 1, 3], [3, 1, 3], [3, 2, 3]] });
    expect(record.pairs[0]!.values[1]!.value).toEqual(record.pairs[0]!.expected);
  });

  it('writes a grid rule as plain data (its grids as rows) that the schema accepts and the tokens spell back', () => {
    // An invented harbour flag task (tests/grid-rule-table.test.ts): one boat, a red corner; two, a red top row.
    const flags = parseTask(
      JSON.stringify({
        train: [
          { input: [[4, 4, 4], [4, 1, 4]], output: [[2, 4], [4, 4]] },
          { input: [[1, 4, 1], [4, 4, 4]], output: [[2, 2], [4, 4]] },
        ],
        test: [{ input: [[4, 4, 4], [1, 4, 4]], output: [[2, 4], [4, 4]] }],
      }),
      'flags.json',
    );
    const rule = parseProgram('with harbour\nanswer apply_grid_rule(harbour, grid_rule[cells]{1 -> 24/44, 2 -> 22/44})\n');
    const traced = traceRecord(flags, rule, defaultLibrary);
    expect(problemsOf(JSON.parse(JSON.stringify(traced)))).toBe('');
    expect(traced.pairs.every((p) => p.correct === true)).toBe(true);
    expect(JSON.stringify(traced.ast)).toContain('"entries":[{"key":1,"rows":[[2,4],[4,4]]},{"key":2,"rows":[[2,2],[4,4]]}]');
    expect(detokenize(traced.tokens!, defaultLibrary)).toEqual(canonicalProgram(rule, defaultLibrary));
  });

  it('writes a failed step as null with the reason, and the record is still valid', () => {
    const odd = parseProgram('with deck\ncrates = objects_multicolour(deck)\nanswer erase_object(deck, odd_one_out(crates))\n');
    const failed = traceRecord(task, odd, defaultLibrary);
    expect(problemsOf(failed)).toBe('');
    const answer = failed.pairs[0]!.values[1]!;
    expect(answer).toEqual({ value: null, failure: 'odd_one_out could not apply to its arguments' });
    expect(failed.pairs[0]!.correct).toBe(false);
  });

  it('the schema refuses a cell outside 0-9, a failure without its reason, and an unknown field', () => {
    const copy = () => JSON.parse(JSON.stringify(record)) as { pairs: { input: number[][]; values: unknown[] }[]; extra?: number };
    const badCell = copy();
    badCell.pairs[0]!.input[0]![0] = 12;
    expect(problemsOf(badCell)).toContain('pairs/0/input/0/0 must be <= 9');
    const noReason = copy();
    noReason.pairs[0]!.values[1] = { value: null };
    expect(problemsOf(noReason)).not.toBe('');
    const extra = copy();
    extra.extra = 1;
    expect(problemsOf(extra)).toContain('must NOT have additional properties');
  });
});
