/**
 * rotationSynthesis: T gates per arbitrary single-qubit rotation synthesised to operator-norm error ε_rot, by the
 * typical count of Ross & Selinger (Quantum Inf. Comput. 16, 901, 2016): 3·log2(1/ε_rot) + O(log log(1/ε_rot)). The
 * O(log log) term is taken as log2(log2(1/ε_rot)) + 4 — our allowance, not a constant from the paper.
 */
export const ROTATION_SYNTHESIS_SOURCE = 'Ross & Selinger, Quantum Inf. Comput. 16, 901 (2016)';

/** ⌈3·log2(1/ε) + log2(log2(1/ε)) + 4⌉. @throws RangeError unless 0 < ε < 1/2. */
export function tGatesPerRotation(epsilon: number): number {
  if (!(epsilon > 0 && epsilon < 0.5)) throw new RangeError(`tGatesPerRotation: ε = ${epsilon} is not in (0, 1/2)`);
  const bits = Math.log2(1 / epsilon);
  return Math.ceil(3 * bits + Math.log2(bits) + 4);
}
