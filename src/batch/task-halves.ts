/**
 * Two fixed halves of a task set, by a rule on the task id alone (no look at the task): a task
 * is in half A when the last character of its id, read as a hexadecimal digit, is even
 * (0 2 4 6 8 a c e), and in half B when it is odd. An id that does not end in a hexadecimal
 * digit goes by the parity of its last character's code. On the public training set of
 * ARC-AGI-1 (400 tasks with 8-digit hexadecimal ids) this puts 203 tasks in A and 197 in B.
 */
export type Half = 'A' | 'B';

export function halfOfTask(id: string): Half {
  const last = id.slice(-1).toLowerCase();
  const digit = /^[0-9a-f]$/.test(last) ? parseInt(last, 16) : last.charCodeAt(0) || 0;
  return digit % 2 === 0 ? 'A' : 'B';
}
