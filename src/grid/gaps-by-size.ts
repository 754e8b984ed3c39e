/**
 * Filling the largest or the smallest gaps: regions of background cells joined through edges;
 * every region of the extreme size (all of them on ties) takes a colour.
 */
import { backgroundColour } from './components.ts';
import { Grid, copyCells } from './grid.ts';
import { WorkArray } from './work-array.ts';

/** Work arrays for the labelling below. */
const labels = new WorkArray(Int32Array);
const queues = new WorkArray(Int32Array);

export function fillGapsBySize(g: Grid, colour: number, largest: boolean): Grid {
  const { height, width, cells } = g;
  const n = cells.length;
  const background = backgroundColour(g);
  const label = labels.take(n).fill(-1, 0, n);
  const sizes: number[] = [];
  const queue = queues.take(n);
  for (let s = 0; s < n; s++) {
    if (cells[s] !== background || label[s] !== -1) continue;
    const id = sizes.length;
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    label[s] = id;
    while (head < tail) {
      const i = queue[head++]!;
      const r = (i / width) | 0;
      const c = i - r * width;
      if (r > 0 && cells[i - width] === background && label[i - width] === -1) (label[i - width] = id), (queue[tail++] = i - width);
      if (r < height - 1 && cells[i + width] === background && label[i + width] === -1) (label[i + width] = id), (queue[tail++] = i + width);
      if (c > 0 && cells[i - 1] === background && label[i - 1] === -1) (label[i - 1] = id), (queue[tail++] = i - 1);
      if (c < width - 1 && cells[i + 1] === background && label[i + 1] === -1) (label[i + 1] = id), (queue[tail++] = i + 1);
    }
    sizes.push(tail);
  }
  if (sizes.length === 0) return g;
  let best = sizes[0]!;
  for (const s of sizes) if (largest ? s > best : s < best) best = s;
  const out = copyCells(cells);
  for (let i = 0; i < n; i++) if (label[i]! >= 0 && sizes[label[i]!] === best) out[i] = colour;
  return new Grid(height, width, out);
}
