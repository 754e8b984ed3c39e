// Terminal drawing: the mode follows the TTY flag and NO_COLOR; plain text uses digits and '.'
// for 0; colour modes give two-column cells in our own palette; a legend line names the colours.
// The palette checks measure colour distance as CIE 1976 ΔE in CIELAB (sRGB, D65 white), with
// the standard conversion written out below so that the check does not rest on the code it checks.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import {
  colourModeFor,
  colourOfTableIndex,
  coloursUsed,
  drawGrid,
  drawPair,
  HARBOUR_PALETTE,
  HARBOUR_TABLE_INDICES,
  legendLine,
  tableIndexFor,
  visibleWidth,
} from '../src/output/terminal-grid.ts';

interface Rgb {
  readonly red: number;
  readonly green: number;
  readonly blue: number;
}

/** sRGB (0–255 per channel) to CIELAB with the D65 white point. */
function toLab(c: Rgb): [number, number, number] {
  const linear = [c.red, c.green, c.blue].map((v) => {
    const x = v / 255;
    return x <= 0.04045 ? x / 12.92 : ((x + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  const [r, g, b] = linear;
  const x = (0.4124 * r + 0.3576 * g + 0.1805 * b) / 0.95047;
  const y = 0.2126 * r + 0.7152 * g + 0.0722 * b;
  const z = (0.0193 * r + 0.1192 * g + 0.9505 * b) / 1.08883;
  const f = (t: number): number => (t > 216 / 24389 ? Math.cbrt(t) : (24389 / 27 * t + 16) / 116);
  return [116 * f(y) - 16, 500 * (f(x) - f(y)), 200 * (f(y) - f(z))];
}

function deltaE(a: Rgb, b: Rgb): number {
  const [l1, a1, b1] = toLab(a);
  const [l2, a2, b2] = toLab(b);
  return Math.hypot(l1 - l2, a1 - a2, b1 - b2);
}

/** Hue angle (0–360, HSL/HSV hue), chroma (max − min, 0–1) and lightness (HSL, 0–1). */
function hueOf(c: Rgb): { hue: number; chroma: number; lightness: number } {
  const r = c.red / 255;
  const g = c.green / 255;
  const b = c.blue / 255;
  const max = Math.max(r, g, b);
  const min = Math.min(r, g, b);
  const chroma = max - min;
  let hue = 0;
  if (chroma > 0) {
    if (max === r) hue = 60 * (((g - b) / chroma + 6) % 6);
    else if (max === g) hue = 60 * ((b - r) / chroma + 2);
    else hue = 60 * ((r - g) / chroma + 4);
  }
  return { hue, chroma, lightness: (max + min) / 2 };
}

function hueDistance(a: number, b: number): number {
  const d = Math.abs(a - b) % 360;
  return Math.min(d, 360 - d);
}

/**
 * The hue families that the common colour scheme of this puzzle benchmark gives colours 0–9,
 * FROM MEMORY (not read from any file), described only by hue angle, darkness or lack of
 * colour so that the scheme's colour words appear nowhere here: 0 near-dark, 5 neutral, and
 * hues of about 215°, 0°, 120°, 55°, 320°, 30°, 200° and 350° for 1, 2, 3, 4, 6, 7, 8 and 9
 * (rough centres of each family).
 */
type Family = { kind: 'dark' } | { kind: 'neutral' } | { kind: 'hue'; hue: number };
const COMMON_FAMILIES_FROM_MEMORY: readonly Family[] = [
  { kind: 'dark' },
  { kind: 'hue', hue: 215 },
  { kind: 'hue', hue: 0 },
  { kind: 'hue', hue: 120 },
  { kind: 'hue', hue: 55 },
  { kind: 'neutral' },
  { kind: 'hue', hue: 320 },
  { kind: 'hue', hue: 30 },
  { kind: 'hue', hue: 200 },
  { kind: 'hue', hue: 350 },
];

/** Whether a colour belongs to (or sits close to) a family. */
function inFamily(c: Rgb, family: Family): boolean {
  const { hue, chroma, lightness } = hueOf(c);
  if (family.kind === 'dark') return lightness < 0.25 && chroma < 0.35;
  if (family.kind === 'neutral') return chroma < 0.15;
  // A colourless one has no hue family; otherwise the hue must be at least 45° away.
  return chroma >= 0.15 && hueDistance(hue, family.hue) < 45;
}

const folder = mkdtempSync(join(tmpdir(), 'pithy-legend-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('terminal grid drawing', () => {
  it('chooses plain text without a terminal or with NO_COLOR, colour otherwise', () => {
    expect(colourModeFor({ isTTY: false }, {})).toBe('plain');
    expect(colourModeFor({ isTTY: true }, { NO_COLOR: '1' })).toBe('plain');
    expect(colourModeFor({ isTTY: true }, { COLORTERM: 'truecolor' })).toBe('truecolour');
    expect(colourModeFor({ isTTY: true }, {})).toBe('256');
  });

  it('plain text shows digits and . for 0', () => {
    expect(drawGrid(Grid.fromRows([[0, 3], [9, 0]]), 'plain')).toEqual(['. 3', '9 .']);
  });

  it('24-bit colour uses the palette and two columns per cell', () => {
    const lines = drawGrid(Grid.fromRows([[2, 0, 7]]), 'truecolour');
    const entry = HARBOUR_PALETTE[2]!;
    expect(lines[0]).toContain(`48;2;${entry.red};${entry.green};${entry.blue}m`);
    expect(visibleWidth(lines[0]!)).toBe(6);
  });

  it('256-colour mode uses the fallback index of each colour', () => {
    const line = drawGrid(Grid.fromRows([[5, 8]]), '256')[0]!;
    expect(line).toMatch(/^\u001b\[48;5;\d+m {2}\u001b\[0m\u001b\[48;5;\d+m {2}\u001b\[0m$/);
    expect(line).toContain(`48;5;${HARBOUR_TABLE_INDICES[5]}m`);
    expect(line).toContain(`48;5;${HARBOUR_TABLE_INDICES[8]}m`);
  });

  it('knows the colours of the 256-colour table (worked by hand from the cube levels 0, 95, 135, 175, 215, 255 and the neutral ramp 8, 18, ..., 238)', () => {
    expect(colourOfTableIndex(16)).toEqual({ red: 0, green: 0, blue: 0 });
    expect(colourOfTableIndex(231)).toEqual({ red: 255, green: 255, blue: 255 });
    expect(colourOfTableIndex(196)).toEqual({ red: 255, green: 0, blue: 0 });
    // 16 + 36·1 + 6·2 + 3 = 67: levels 95, 135, 175.
    expect(colourOfTableIndex(67)).toEqual({ red: 95, green: 135, blue: 175 });
    expect(colourOfTableIndex(232)).toEqual({ red: 8, green: 8, blue: 8 });
    expect(colourOfTableIndex(255)).toEqual({ red: 238, green: 238, blue: 238 });
  });

  it('maps a colour to its nearest table colour, the neutral ramp included', () => {
    expect(tableIndexFor({ name: 'pure', red: 255, green: 0, blue: 0 })).toBe(196);
    expect(tableIndexFor({ name: 'cube point', red: 95, green: 135, blue: 175 })).toBe(67);
    // (100, 100, 100) is 2·2·3 = 12 from the ramp level 98 (index 241) but 75 from cube 95.
    expect(tableIndexFor({ name: 'mid grey', red: 100, green: 100, blue: 100 })).toBe(241);
  });

  it('has ten named colours, far apart from each other in 24-bit colour (ΔE at least 25)', () => {
    expect(HARBOUR_PALETTE).toHaveLength(10);
    expect(new Set(HARBOUR_PALETTE.map((c) => c.name)).size).toBe(10);
    for (let i = 0; i < 10; i++) {
      for (let j = i + 1; j < 10; j++) {
        expect(deltaE(HARBOUR_PALETTE[i]!, HARBOUR_PALETTE[j]!), `colours ${i} and ${j}`).toBeGreaterThanOrEqual(25);
      }
    }
  });

  it('falls back to ten distinct 256-colour indices that stay far apart and near their colours', () => {
    expect(new Set(HARBOUR_TABLE_INDICES).size).toBe(10);
    const shown = HARBOUR_TABLE_INDICES.map(colourOfTableIndex);
    for (let i = 0; i < 10; i++) {
      expect(HARBOUR_TABLE_INDICES[i]).toBeGreaterThanOrEqual(16);
      expect(deltaE(shown[i]!, HARBOUR_PALETTE[i]!), `colour ${i} against its fallback`).toBeLessThan(25);
      for (let j = i + 1; j < 10; j++) {
        expect(deltaE(shown[i]!, shown[j]!), `fallbacks of ${i} and ${j}`).toBeGreaterThanOrEqual(25);
      }
    }
    // No colour falls back to the cube's darkest corner (index 16).
    expect(HARBOUR_TABLE_INDICES).not.toContain(16);
  });

  it('gives no colour number the hue family the common scheme gives it (in 24-bit colour and in the fallback)', () => {
    for (let i = 0; i < 10; i++) {
      const family = COMMON_FAMILIES_FROM_MEMORY[i]!;
      expect(inFamily(HARBOUR_PALETTE[i]!, family), `colour ${i} (${HARBOUR_PALETTE[i]!.name})`).toBe(false);
      expect(inFamily(colourOfTableIndex(HARBOUR_TABLE_INDICES[i]!), family), `fallback of colour ${i}`).toBe(false);
    }
  });

  it('the family check itself recognises members of each family', () => {
    // Worked by hand: near-dark, mid neutral and plain hues fall inside their families.
    expect(inFamily({ red: 20, green: 20, blue: 30 }, { kind: 'dark' })).toBe(true);
    expect(inFamily({ red: 128, green: 128, blue: 128 }, { kind: 'neutral' })).toBe(true);
    expect(inFamily({ red: 0, green: 100, blue: 220 }, { kind: 'hue', hue: 215 })).toBe(true);
    expect(inFamily({ red: 255, green: 220, blue: 0 }, { kind: 'hue', hue: 55 })).toBe(true);
    expect(inFamily({ red: 255, green: 220, blue: 0 }, { kind: 'hue', hue: 215 })).toBe(false);
  });

  it('lists the colours a drawing uses and names them in a legend line', () => {
    expect(coloursUsed([Grid.fromRows([[3, 0], [3, 9]]), Grid.fromRows([[1]])])).toEqual([0, 1, 3, 9]);
    expect(legendLine([0, 3], 'plain')).toBe('colours: 0 sail canvas, 3 dusk violet');
    expect(legendLine([], 'plain')).toBe('colours: none');
    const coloured = legendLine([4], 'truecolour');
    expect(coloured).toContain('4 night water');
    expect(coloured).toContain(`48;2;${HARBOUR_PALETTE[4]!.red};${HARBOUR_PALETTE[4]!.green};${HARBOUR_PALETTE[4]!.blue}m`);
  });

  it('adds the legend under a grid or a pair only on request', () => {
    const grid = Grid.fromRows([[7, 0]]);
    expect(drawGrid(grid, 'plain')).toEqual(['7 .']);
    expect(drawGrid(grid, 'plain', { legend: true })).toEqual(['7 .', 'colours: 0 sail canvas, 7 deep channel']);
    const pair = drawPair(Grid.fromRows([[1]]), Grid.fromRows([[6]]), 'plain', { input: 'input', output: 'output' }, { legend: true });
    expect(pair[pair.length - 1]).toBe('colours: 1 rusted hull, 6 sea foam');
    expect(drawPair(Grid.fromRows([[1]]), Grid.fromRows([[6]]), 'plain')).toHaveLength(2);
  });

  it('draws a pair side by side with sizes in the labels', () => {
    const lines = drawPair(Grid.fromRows([[1, 0]]), Grid.fromRows([[0], [1]]), 'plain');
    expect(lines[0]).toMatch(/^input 1x2 +output 2x1$/);
    expect(lines[1]).toMatch(/^1 \. +-> +\.$/);
    expect(lines[2]).toMatch(/^ +1$/);
  });

  it('pithy show --legend prints a legend line under each pair, and none without the flag', () => {
    const task = join(folder, 'quay.json');
    writeFileSync(task, JSON.stringify({ train: [{ input: [[3, 0]], output: [[0, 3]] }, { input: [[8]], output: [[8]] }], test: [{ input: [[2]] }] }));
    const bin = new URL('../bin/pithy.js', import.meta.url).pathname;
    const show = (...args: string[]) => spawnSync(process.execPath, [bin, 'show', task, ...args], { encoding: 'utf8', env: { ...process.env, NO_COLOR: '1' } });
    const withLegend = show('--legend');
    expect(withLegend.status).toBe(0);
    expect(withLegend.stdout.split('\n').filter((l) => l.startsWith('colours: '))).toEqual([
      'colours: 0 sail canvas, 3 dusk violet',
      'colours: 8 signal flare',
      'colours: 2 kelp bed',
    ]);
    expect(show().stdout).not.toContain('colours: ');
  });
});
