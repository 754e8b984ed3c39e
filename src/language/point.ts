/** A position or an offset, in rows and columns. */
export class Point {
  constructor(
    readonly row: number,
    readonly column: number,
  ) {}

  equals(other: Point): boolean {
    return this.row === other.row && this.column === other.column;
  }

  get hash(): number {
    return (Math.imul(this.row + 1000, 0x9e3779b1) ^ (this.column + 1000)) >>> 0;
  }
}
