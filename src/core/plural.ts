/**
 * plural: a count with its noun in the right number, e.g. "1 entry", "2 entries", "0 qubits".
 */

/** `count noun`, with `pluralForm` (default: noun + "s") unless count is exactly 1. */
export function plural(count: number, noun: string, pluralForm = `${noun}s`): string {
  return `${count} ${count === 1 ? noun : pluralForm}`;
}
