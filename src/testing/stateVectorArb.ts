/**
 * stateVectorArb: a fast-check arbitrary of random normalised states on a few qubits (Box–Muller Gaussian amplitudes,
 * normalised, so directions are uniform), for property tests of circuits. Reproducible through fast-check's own seed.
 */
import fc from 'fast-check';
import { StateVector } from '../sim/StateVector.js';

/** Unit-norm states of `qubits` qubits (1 … 16). */
export function stateVectorArb(qubits: number): fc.Arbitrary<StateVector> {
  if (!Number.isInteger(qubits) || qubits < 1 || qubits > 16) throw new RangeError(`stateVectorArb: qubits must be an integer in 1…16, got ${qubits}`);
  const dim = 2 ** qubits;
  const uniform = fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true });
  return fc
    .array(fc.tuple(uniform, uniform), { minLength: dim, maxLength: dim })
    .map((pairs) => {
      const re = new Float64Array(dim);
      const im = new Float64Array(dim);
      pairs.forEach(([u, v], k) => {
        const r = Math.sqrt(-2 * Math.log(1 - u));
        re[k] = r * Math.cos(2 * Math.PI * v);
        im[k] = r * Math.sin(2 * Math.PI * v);
      });
      let norm = 0;
      for (let k = 0; k < dim; k++) norm += re[k]! ** 2 + im[k]! ** 2;
      return { re, im, norm: Math.sqrt(norm) };
    })
    // Shrinking drives the uniforms to 0 and so the amplitudes to 0: keep states that can be normalised safely.
    .filter(({ norm }) => norm > 1e-6)
    .map(({ re, im, norm }) => StateVector.fromAmplitudes(re.map((a) => a / norm), im.map((a) => a / norm)));
}
