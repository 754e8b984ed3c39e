/** A colour map: every colour goes to a colour; colours not mentioned stay as they are. */
export class Palette {
  /** `target[c]` is what colour c becomes. */
  readonly target: Uint8Array;
  readonly hash: number;

  constructor(target: Uint8Array) {
    this.target = target;
    let h = 0x27d4eb2d;
    for (let c = 0; c < 10; c++) h = Math.imul(h ^ target[c]!, 0x01000193);
    this.hash = h >>> 0;
  }

  static fromPairs(pairs: readonly (readonly [number, number])[]): Palette {
    const target = new Uint8Array(10);
    for (let c = 0; c < 10; c++) target[c] = c;
    for (const [from, to] of pairs) target[from] = to;
    return new Palette(target);
  }

  /** The pairs that change a colour, in colour order. */
  pairs(): [number, number][] {
    const out: [number, number][] = [];
    for (let c = 0; c < 10; c++) if (this.target[c] !== c) out.push([c, this.target[c]!]);
    return out;
  }

  equals(other: Palette): boolean {
    for (let c = 0; c < 10; c++) if (this.target[c] !== other.target[c]) return false;
    return true;
  }
}
