/**
 * totalOf: the sum of a gate-count object's values.
 */
export function totalOf(counts: Readonly<Record<string, number>>): number {
  return Object.values(counts).reduce((a, b) => a + b, 0);
}
