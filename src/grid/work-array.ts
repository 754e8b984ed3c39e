/**
 * A typed work array kept by one call site and reused from call to call. A typed array longer
 * than a few dozen bytes gets a buffer of its own outside the JavaScript heap: a native
 * allocation, and memory the garbage collector is told about, so that many of them start
 * collections early. Primitives run millions of times in a search; a work array for each place
 * that needs one avoids all that.
 *
 * The holder must not keep the array beyond its call or hand it on (the next call reuses it), and
 * must not call itself while using it. Contents are left from the last call: clear what you read.
 */
export class WorkArray<T extends { readonly length: number }> {
  private buffer: T;

  constructor(private readonly make: new (length: number) => T) {
    this.buffer = new make(64);
  }

  /** An array of at least `length` entries. */
  take(length: number): T {
    if (this.buffer.length < length) this.buffer = new this.make(Math.max(length, 2 * this.buffer.length));
    return this.buffer;
  }
}
