/** The keys of learned tables (object and grid rules) as text, and a 32-bit FNV-1a hash of a text. */

/** A key as text, a number and a text of the same digits apart (`n2`, `s2`). */
export function tableKeyCode(key: number | string): string {
  return typeof key === 'number' ? `n${key}` : `s${key}`;
}

export function textHash(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
  return h;
}
