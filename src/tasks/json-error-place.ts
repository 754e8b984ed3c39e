/**
 * Where JSON text first breaks the grammar, as "line L, column C", for error messages (the
 * built-in parser does not always say). The scan is iterative, so any depth of nesting is fine.
 */

const NUMBER = /-?(?:0|[1-9][0-9]*)(?:\.[0-9]+)?(?:[eE][+-]?[0-9]+)?/y;
const WHITESPACE = new Set([' ', '\t', '\n', '\r']);

/** Index just past a string starting at `i` (a quote), or -(index of the problem) - 1. */
function skipString(text: string, i: number): number {
  let j = i + 1;
  while (j < text.length) {
    const c = text.charCodeAt(j);
    if (c === 34) return j + 1; // closing quote
    if (c < 0x20) return -j - 1; // control characters must be escaped
    if (c === 92) {
      const e = text[j + 1];
      if (e === 'u') {
        if (!/^[0-9a-fA-F]{4}$/.test(text.slice(j + 2, j + 6))) return -j - 1;
        j += 6;
      } else if (e !== undefined && '"\\/bfnrt'.includes(e)) j += 2;
      else return -j - 1;
    } else j++;
  }
  return -text.length - 1;
}

/** The index of the first character that breaks the JSON grammar, or -1 when the text is valid JSON. */
export function jsonErrorIndex(text: string): number {
  const stack: string[] = [];
  let i = 0;
  const skipSpace = () => {
    while (i < text.length && WHITESPACE.has(text[i]!)) i++;
  };
  /** Reads `"key" :` inside an object; false (i at the problem) when it is not there. */
  const key = (): boolean => {
    skipSpace();
    if (text[i] !== '"') return false;
    const end = skipString(text, i);
    if (end < 0) {
      i = -end - 1;
      return false;
    }
    i = end;
    skipSpace();
    if (text[i] !== ':') return false;
    i++;
    return true;
  };
  for (;;) {
    // A value starts here.
    skipSpace();
    const c = text[i];
    let closed = false;
    if (c === '{' || c === '[') {
      stack.push(c);
      i++;
      skipSpace();
      if (text[i] === (c === '{' ? '}' : ']')) {
        stack.pop();
        i++;
        closed = true;
      } else if (c === '{' && !key()) return i;
      if (!closed) continue;
    } else if (c === '"') {
      const end = skipString(text, i);
      if (end < 0) return -end - 1;
      i = end;
    } else if (c === 't' || c === 'f' || c === 'n') {
      const word = c === 't' ? 'true' : c === 'f' ? 'false' : 'null';
      if (!text.startsWith(word, i)) return i;
      i += word.length;
    } else {
      NUMBER.lastIndex = i;
      const match = NUMBER.exec(text);
      if (!match) return i;
      i += match[0].length;
    }
    // After a value: close containers, or a comma and the next value.
    for (;;) {
      skipSpace();
      const top = stack[stack.length - 1];
      if (top === undefined) return i < text.length ? i : -1;
      const d = text[i];
      if ((top === '[' && d === ']') || (top === '{' && d === '}')) {
        stack.pop();
        i++;
        continue;
      }
      if (d !== ',') return i;
      i++;
      if (top === '{' && !key()) return i;
      break;
    }
  }
}

/** "line L, column C" of a character index (1-based). */
export function linePlace(text: string, index: number): string {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < index && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      lineStart = i + 1;
    }
  }
  return `line ${line}, column ${index - lineStart + 1}`;
}
