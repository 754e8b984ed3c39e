/**
 * Draws grids in a terminal as coloured blocks, two characters per cell, in pithy's own
 * "harbour at dusk" palette; falls back to plain text (digits, '.' for colour 0) when the
 * output is not a terminal or NO_COLOR is set.
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

/** Colours 0–9 as pithy draws them: a harbour at dusk. */
export const HARBOUR_PALETTE: readonly PaletteEntry[] = [
  { name: 'night water', red: 0x14, green: 0x1c, blue: 0x2e },
  { name: 'lantern amber', red: 0xf0, green: 0xa2, blue: 0x3b },
  { name: 'buoy red', red: 0xc8, green: 0x3e, blue: 0x4d },
  { name: 'kelp green', red: 0x4f, green: 0x8a, blue: 0x52 },
  { name: 'dusk violet', red: 0x7d, green: 0x5b, blue: 0xa6 },
  { name: 'fog grey', red: 0x98, green: 0xa2, blue: 0xad },
  { name: 'rusted hull', red: 0xa8, green: 0x55, blue: 0x2f },
  { name: 'sea foam', red: 0x8e, green: 0xd6, blue: 0xc9 },
  { name: 'sail canvas', red: 0xee, green: 0xe4, blue: 0xcc },
  { name: 'harbour-light blue', red: 0x3a, green: 0x7c, blue: 0xc8 },
];

/** Picks the drawing mode for a stream from its TTY flag and the environment. */
export function colourModeFor(stream: { isTTY?: boolean }, env: Readonly<Record<string, string | undefined>> = process.env): ColourMode {
  if (env.NO_COLOR !== undefined && env.NO_COLOR !== '') return 'plain';
  if (!stream.isTTY) return 'plain';
  const colourTerm = (env.COLORTERM ?? '').toLowerCase();
  if (colourTerm === 'truecolor' || colourTerm === '24bit') return 'truecolour';
  return '256';
}

/** The nearest colour in the 6×6×6 cube of the 256-colour table. */
function cubeIndex(entry: PaletteEntry): number {
  const step = (v: number): number => (v < 48 ? 0 : v < 115 ? 1 : Math.min(5, Math.floor((v - 35) / 40)));
  return 16 + 36 * step(entry.red) + 6 * step(entry.green) + step(entry.blue);
}

const RESET = '\u001b[0m';

function backgroundCode(colour: number, mode: ColourMode): string {
  const entry = HARBOUR_PALETTE[colour]!;
  if (mode === 'truecolour') return `\u001b[48;2;${entry.red};${entry.green};${entry.blue}m`;
  return `\u001b[48;5;${cubeIndex(entry)}m`;
}

/** One cell: two spaces on its colour, or a character pair in plain text. */
function drawCell(colour: number, mode: ColourMode): string {
  if (mode === 'plain') {
    if (colour === EMPTY) return '  ';
    return colour === 0 ? '. ' : `${colour} `;
  }
  if (colour === EMPTY || colour > 9) return '  ';
  return `${backgroundCode(colour, mode)}  ${RESET}`;
}

/** The lines of a drawing of the grid; every line is `2 × width` columns wide on screen. */
export function drawGrid(grid: Grid, mode: ColourMode): string[] {
  const lines: string[] = [];
  for (let r = 0; r < grid.height; r++) {
    let line = '';
    for (let c = 0; c < grid.width; c++) line += drawCell(grid.get(r, c), mode);
    lines.push(mode === 'plain' ? line.trimEnd() : line);
  }
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

/** Input and output of a pair side by side, with their sizes in the labels. */
export function drawPair(input: Grid, output: Grid | undefined, mode: ColourMode, labels: { input: string; output: string } = { input: 'input', output: 'output' }): string[] {
  const blocks = [{ label: `${labels.input} ${input.height}x${input.width}`, lines: drawGrid(input, mode), width: input.width * 2 }];
  if (output) blocks.push({ label: `${labels.output} ${output.height}x${output.width}`, lines: drawGrid(output, mode), width: output.width * 2 });
  else blocks.push({ label: `${labels.output} (not given)`, lines: ['?'], width: 1 });
  return sideBySide(blocks, '  ->  ');
}
