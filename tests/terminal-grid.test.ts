// Terminal drawing: the mode follows the TTY flag and NO_COLOR; plain text uses digits and '.'
// for 0; colour modes give two-column cells in our own palette.
import { describe, expect, it } from 'vitest';
import { Grid } from '../src/grid/grid.ts';
import { colourModeFor, drawGrid, drawPair, HARBOUR_PALETTE, visibleWidth } from '../src/output/terminal-grid.ts';

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
    const red = HARBOUR_PALETTE[2]!;
    expect(lines[0]).toContain(`48;2;${red.red};${red.green};${red.blue}m`);
    expect(visibleWidth(lines[0]!)).toBe(6);
    expect(drawGrid(Grid.fromRows([[5]]), '256')[0]).toMatch(/\u001b\[48;5;\d+m {2}\u001b\[0m/);
  });

  it('has ten distinct colours', () => {
    expect(HARBOUR_PALETTE).toHaveLength(10);
    expect(new Set(HARBOUR_PALETTE.map((c) => `${c.red},${c.green},${c.blue}`)).size).toBe(10);
  });

  it('draws a pair side by side with sizes in the labels', () => {
    const lines = drawPair(Grid.fromRows([[1, 0]]), Grid.fromRows([[0], [1]]), 'plain');
    expect(lines[0]).toMatch(/^input 1x2 +output 2x1$/);
    expect(lines[1]).toMatch(/^1 \. +-> +\.$/);
    expect(lines[2]).toMatch(/^ +1$/);
  });
});
