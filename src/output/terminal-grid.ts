/**
 * Draws grids in a terminal as coloured blocks, two characters per cell, in pithy's own
 * "harbour at dusk" palette (24-bit colour, or the nearest colours of the 256-colour table);
 * falls back to plain text (digits, '.' for colour 0) when the output is not a terminal or
 * NO_COLOR is set. A legend line naming the colours can follow a drawing.
 */
import { EMPTY, type Grid } from '../grid/grid.ts';

/** How a drawing is coloured: 24-bit colour, the 256-colour cube, or plain text. */
export type ColourMode = 'truecolour' | '256' | 'plain';

export interface PaletteEntry {
  readonly name: string;
  readonly red: number;
  readonly green: number;
  readonly blue: number;
}

/**
 * Colours 0–9 as pithy draws them: a harbour at dusk. The ten colours are far apart from each
 * other, and each keeps its own look in the 256-colour fallback too (tests/terminal-grid.test.ts
 * checks both).
 */
export const HARBOUR_PALETTE: readonly PaletteEntry[] = [
  { name: 'sail canvas', red: 0xf4, green: 0xe8, blue: 0xc1 },
  { name: 'rusted hull', red: 0xa8, green: 0x55, blue: 0x2f },
  { name: 'kelp bed', red: 0x48, green: 0xa4, blue: 0x50 },
  { name: 'dusk violet', red: 0xa0, green: 0x5a, blue: 0xb4 },
  { name: 'night water', red: 0x18, green: 0x24, blue: 0x6e },
  { name: 'lantern amber', red: 0xf0, green: 0xa2, blue: 0x3b },
  { name: 'sea foam', red: 0x8e, green: 0xd6, blue: 0xc9 },
  { name: 'deep channel', red: 0x3a, green: 0x80, blue: 0xd0 },
  { name: 'signal flare', red: 0xd8, green: 0x20, blue: 0x2c },
  { name: 'fog bank', red: 0x8a, green: 0x90, blue: 0x98 },
];

/** Picks the drawing mode for a stream from its TTY flag and the environment. */
export function colourModeFor(stream: { isTTY?: boolean }, env: Readonly<Record<string, string | undefined>> = process.env): ColourMode {
  if (env.NO_COLOR !== undefined && env.NO_COLOR !== '') return 'plain';
  if (!stream.isTTY) return 'plain';
  const colourTerm = (env.COLORTERM ?? '').toLowerCase();
  if (colourTerm === 'truecolor' || colourTerm === '24bit') return 'truecolour';
  return '256';
}

/** The channel levels of the 6×6×6 colour cube (indices 16–231) of the 256-colour table. */
const CUBE_LEVELS = [0, 95, 135, 175, 215, 255] as const;

/** The colour a terminal shows for an index 16–255 of the 256-colour table (the cube, then the neutral ramp). */
export function colourOfTableIndex(index: number): { red: number; green: number; blue: number } {
  if (index >= 232) {
    const level = 8 + 10 * (index - 232);
    return { red: level, green: level, blue: level };
  }
  const n = index - 16;
  return { red: CUBE_LEVELS[Math.floor(n / 36)]!, green: CUBE_LEVELS[Math.floor(n / 6) % 6]!, blue: CUBE_LEVELS[n % 6]! };
}

/** The nearest colour (by distance in RGB) among the cube and the neutral ramp of the 256-colour table. */
export function tableIndexFor(entry: PaletteEntry): number {
  let best = 16;
  let bestDistance = Infinity;
  for (let index = 16; index < 256; index++) {
    const c = colourOfTableIndex(index);
    const distance = (c.red - entry.red) ** 2 + (c.green - entry.green) ** 2 + (c.blue - entry.blue) ** 2;
    if (distance < bestDistance) {
      bestDistance = distance;
      best = index;
    }
  }
  return best;
}

/** The 256-colour fallback of each palette colour, worked out once. */
export const HARBOUR_TABLE_INDICES: readonly number[] = HARBOUR_PALETTE.map(tableIndexFor);

const RESET = '\u001b[0m';

function backgroundCode(colour: number, mode: ColourMode): string {
  const entry = HARBOUR_PALETTE[colour]!;
  if (mode === 'truecolour') return `\u001b[48;2;${entry.red};${entry.green};${entry.blue}m`;
  return `\u001b[48;5;${HARBOUR_TABLE_INDICES[colour]!}m`;
}

/** Light or dark text, whichever reads better on the colour. */
function markCode(colour: number, mode: ColourMode): string {
  const e = HARBOUR_PALETTE[colour]!;
  const light = 0.299 * e.red + 0.587 * e.green + 0.114 * e.blue > 140;
  if (mode === 'truecolour') return light ? '\u001b[38;2;0;0;0m' : '\u001b[38;2;255;255;255m';
  return light ? '\u001b[38;5;16m' : '\u001b[38;5;231m';
}

/**
 * One cell: two spaces on its colour, or a character pair in plain text. A marked cell (one
 * that differs from the grid it is compared with) shows '><' on its colour, or its digit
 * followed by '<' in plain text.
 */
function drawCell(colour: number, mode: ColourMode, marked = false): string {
  if (mode === 'plain') {
    if (colour === EMPTY) return marked ? ' <' : '  ';
    return `${colour === 0 ? '.' : colour}${marked ? '<' : ' '}`;
  }
  if (colour === EMPTY || colour > 9) return marked ? '><' : '  ';
  return `${backgroundCode(colour, mode)}${marked ? `${markCode(colour, mode)}><` : '  '}${RESET}`;
}

/** Choices for a drawing. */
export interface DrawOptions {
  /** Add a line under the drawing naming each colour it uses (number and palette name). */
  readonly legend?: boolean;
  /** Mark the cells that differ from this grid (when both have the same size). */
  readonly compareWith?: Grid;
}

/** How many cells differ between two grids of the same size (undefined when the sizes differ). */
export function countDifferingCells(a: Grid, b: Grid): number | undefined {
  if (a.height !== b.height || a.width !== b.width) return undefined;
  let n = 0;
  const x = a.cells;
  const y = b.cells;
  for (let i = 0; i < x.length; i++) if (x[i] !== y[i]) n++;
  return n;
}

/** The colours 0–9 that occur in the grids, in increasing order. */
export function coloursUsed(grids: readonly Grid[]): number[] {
  const seen = new Array<boolean>(10).fill(false);
  for (const grid of grids) for (const v of grid.cells) if (v <= 9) seen[v] = true;
  return seen.flatMap((present, colour) => (present ? [colour] : []));
}

/**
 * The legend line: each colour's number and palette name, separated by commas; in a colour mode
 * each entry starts with a swatch of its colour.
 */
export function legendLine(colours: readonly number[], mode: ColourMode): string {
  const entries = colours.map((colour) => {
    const text = `${colour} ${HARBOUR_PALETTE[colour]!.name}`;
    return mode === 'plain' ? text : `${drawCell(colour, mode)} ${text}`;
  });
  return `colours: ${entries.length > 0 ? entries.join(', ') : 'none'}`;
}

/**
 * The lines of a drawing of the grid; every line is `2 × width` columns wide on screen. With
 * `legend`, a last line names the colours the grid uses.
 */
export function drawGrid(grid: Grid, mode: ColourMode, options: DrawOptions = {}): string[] {
  const lines: string[] = [];
  const other = options.compareWith;
  const compare = other !== undefined && other.height === grid.height && other.width === grid.width;
  for (let r = 0; r < grid.height; r++) {
    let line = '';
    for (let c = 0; c < grid.width; c++) line += drawCell(grid.get(r, c), mode, compare && other.get(r, c) !== grid.get(r, c));
    lines.push(mode === 'plain' ? line.trimEnd() : line);
  }
  if (options.legend) lines.push(legendLine(coloursUsed([grid]), mode));
  return lines;
}

/** How many columns a line takes on screen, ignoring colour codes. */
export function visibleWidth(line: string): number {
  // eslint-disable-next-line no-control-regex
  return line.replace(/\u001b\[[0-9;]*m/g, '').length;
}

function padVisible(line: string, width: number): string {
  return line + ' '.repeat(Math.max(0, width - visibleWidth(line)));
}

/**
 * Lays drawings side by side with a label above each, separated by `gap`. Shorter drawings
 * are padded with blank lines below.
 */
export function sideBySide(blocks: readonly { label: string; lines: readonly string[]; width: number }[], gap: string): string[] {
  const widths = blocks.map((b) => Math.max(b.width, b.label.length));
  const height = Math.max(0, ...blocks.map((b) => b.lines.length));
  const out: string[] = [blocks.map((b, i) => b.label.padEnd(widths[i]!)).join(' '.repeat(visibleWidth(gap))).trimEnd()];
  for (let r = 0; r < height; r++) {
    const parts = blocks.map((b, i) => padVisible(b.lines[r] ?? '', widths[i]!));
    out.push(parts.join(r === 0 ? gap : ' '.repeat(visibleWidth(gap))).trimEnd());
  }
  return out;
}

/**
 * Input and output of a pair side by side, with their sizes in the labels. With `legend`, a
 * last line names the colours either grid uses.
 */
export function drawPair(
  input: Grid,
  output: Grid | undefined,
  mode: ColourMode,
  labels: { input: string; output: string } = { input: 'input', output: 'output' },
  options: DrawOptions = {},
): string[] {
  const blocks = [{ label: `${labels.input} ${input.height}x${input.width}`, lines: drawGrid(input, mode), width: input.width * 2 }];
  if (output) blocks.push({ label: `${labels.output} ${output.height}x${output.width}`, lines: drawGrid(output, mode), width: output.width * 2 });
  else blocks.push({ label: `${labels.output} (not given)`, lines: ['?'], width: 1 });
  const lines = sideBySide(blocks, '  ->  ');
  if (options.legend) lines.push(legendLine(coloursUsed(output ? [input, output] : [input]), mode));
  return lines;
}

/**
 * The expected grid beside the one a program gave, each with the cells that differ marked, and
 * a line saying how many differ (or that the sizes differ).
 */
export function drawComparison(expected: Grid, got: Grid, mode: ColourMode, labels: { expected: string; got: string } = { expected: 'expected', got: 'got' }): string[] {
  const blocks = [
    { label: `${labels.expected} ${expected.height}x${expected.width}`, lines: drawGrid(expected, mode, { compareWith: got }), width: expected.width * 2 },
    { label: `${labels.got} ${got.height}x${got.width}`, lines: drawGrid(got, mode, { compareWith: expected }), width: got.width * 2 },
  ];
  const lines = sideBySide(blocks, '   ');
  const n = countDifferingCells(expected, got);
  const marker = mode === 'plain' ? "'<'" : "'><'";
  lines.push(
    n === undefined
      ? `the sizes differ: expected ${expected.height}x${expected.width}, got ${got.height}x${got.width}`
      : `${n} cell${n === 1 ? '' : 's'} differ${n === 1 ? 's' : ''} (marked ${marker})`,
  );
  return lines;
}
