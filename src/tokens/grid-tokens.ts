/**
 * Grids as token sequences: `<grid>`, then each row's cells as colour tokens `#0` … `#9`
 * followed by `<row>`, then `</grid>`. A 2×3 grid is 1 + 2 × (3 + 1) + 1 = 10 tokens:
 *
 *   <grid> #0 #5 #0 <row> #5 #5 #5 <row> </grid>
 */
import { Grid, shapeAllowed } from '../grid/grid.ts';
import { colourToken, readColour } from './literal-tokens.ts';
import { TokenReader } from './token-reader.ts';

export function tokenizeGrid(grid: Grid): string[] {
  const out: string[] = ['<grid>'];
  for (let r = 0; r < grid.height; r++) {
    for (let c = 0; c < grid.width; c++) out.push(colourToken(grid.get(r, c)));
    out.push('<row>');
  }
  out.push('</grid>');
  return out;
}

/** Reads one grid from the reader's position (used by detokenizeGrid and by readers of longer sequences). */
export function readGrid(r: TokenReader): Grid {
  r.expect('<grid>');
  const rows: number[][] = [];
  let row: number[] = [];
  for (;;) {
    const t = r.peek();
    if (t === '</grid>') {
      if (row.length > 0) r.fail("'<row>' ending the last row");
      if (rows.length === 0) r.fail('at least one row');
      r.position++;
      break;
    }
    if (t === '<row>') {
      if (row.length === 0) r.fail('a colour token (a row has at least one cell)');
      if (rows.length > 0 && row.length !== rows[0]!.length) r.fail(`a row of ${rows[0]!.length} cells, as long as the first`);
      if (!shapeAllowed(rows.length + 1, row.length)) r.fail('a grid within the size cap');
      r.position++;
      rows.push(row);
      row = [];
      continue;
    }
    row.push(readColour(r));
  }
  return Grid.fromRows(rows);
}

/** The grid a token sequence spells; throws TokenError naming the position otherwise. */
export function detokenizeGrid(tokens: readonly string[]): Grid {
  const r = new TokenReader(tokens);
  const grid = readGrid(r);
  if (!r.atEnd()) r.fail('the end after </grid>');
  return grid;
}
