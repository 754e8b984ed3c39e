/** Fuzzing readers of user files: random small edits of a valid text (fast-check). */
import fc from 'fast-check';

export type TextMutation = readonly ['replace' | 'insert' | 'delete', number, string];

/** One edit: its kind, where (a share of the text's length) and the character it writes. */
export function textMutation(alphabet: string): fc.Arbitrary<TextMutation> {
  return fc.tuple(fc.constantFrom('replace' as const, 'insert' as const, 'delete' as const), fc.double({ min: 0, max: 1, noNaN: true }), fc.constantFrom(...alphabet));
}

/** The text with the edits made in order. */
export function mutate(text: string, mutations: readonly TextMutation[]): string {
  let t = text;
  for (const [kind, share, character] of mutations) {
    const at = Math.floor(share * t.length);
    t = kind === 'insert' ? t.slice(0, at) + character + t.slice(at) : kind === 'delete' ? t.slice(0, at) + t.slice(at + 1) : t.slice(0, at) + character + t.slice(at + 1);
  }
  return t;
}
