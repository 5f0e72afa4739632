/**
 * indexControls: the positive and negative control lists that fire when an index register
 * (qubit b = bit b of the value) holds `value`.
 */
export function indexControls(value: number, index: readonly number[]): { controls: number[]; negControls: number[] } {
  const controls: number[] = [];
  const negControls: number[] = [];
  index.forEach((q, b) => ((value >> b) & 1 ? controls : negControls).push(q));
  return { controls, negControls };
}
