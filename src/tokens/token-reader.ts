/** Reading a token sequence from left to right, with errors that name the place. */

/** A token sequence that does not spell what was expected; names the position (0-based). */
export class TokenError extends Error {
  constructor(
    readonly position: number,
    readonly expected: string,
    readonly found: string,
  ) {
    super(`token ${position}: expected ${expected}, found ${found}`);
    this.name = 'TokenError';
  }
}

export class TokenReader {
  position = 0;

  constructor(readonly tokens: readonly string[]) {}

  peek(): string | undefined {
    return this.tokens[this.position];
  }

  atEnd(): boolean {
    return this.position >= this.tokens.length;
  }

  /** What stands at the current position, for an error message. */
  describeHere(): string {
    const t = this.peek();
    return t === undefined ? 'the end of the tokens' : `'${t}'`;
  }

  fail(expected: string): never {
    throw new TokenError(this.position, expected, this.describeHere());
  }

  /** The next token, whatever it is; fails at the end. */
  next(expected: string): string {
    const t = this.peek();
    if (t === undefined) this.fail(expected);
    this.position++;
    return t;
  }

  expect(token: string): void {
    if (this.peek() !== token) this.fail(`'${token}'`);
    this.position++;
  }
}
