/**
 * linearCombination: Σ_k c_k M_k from encodings of each M_k, by PREPARE (amplitudes √(|c_k| α_k / λ) on
 * an index register) then SELECT (encoding k, with the phase of c_k, when the index is k) then
 * PREPARE†; α = λ = Σ_k |c_k| α_k. Written in compute/action form, so control reaches only SELECT.
 * The projected block is Σ_k (|c_k| α_k / λ) e^{i arg c_k} Ũ_k, so its error bound is Σ_k (|c_k| α_k / λ) e_k. The index
 * register is a signal register; a work qubit is clean when it is clean for every term that uses it (a term leaves the
 * work qubits beyond its own untouched).
 */
import { defineConjugatedBlock } from '../../circuit/defineBlock.js';
import { call, gate } from '../../circuit/ops.js';
import type { UnitaryOp } from '../../circuit/types.js';
import { ancillaQubits, ancillaRoles, memoiseMatrix, type AncillaRegister, type AncillaRole, type BlockEncoding } from '../BlockEncoding.js';
import { weightedSum } from '../../linalg/weightedSum.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import { MAX_LCU_INDEX_QUBITS, prepareAmplitudes } from '../prepareAmplitudes.js';
import { indexControls } from '../internal/indexControls.js';
import { registersFromRoles } from '../internal/registersFromRoles.js';

export interface WeightedEncoding {
  readonly coefficient: ComplexScalar;
  readonly encoding: BlockEncoding;
}

export function linearCombination(terms: readonly WeightedEncoding[], label: string): BlockEncoding {
  if (terms.length === 0) throw new RangeError('linearCombination: no terms');
  const n = terms[0]!.encoding.systemQubits;
  if (terms.some((t) => t.encoding.systemQubits !== n)) throw new RangeError('linearCombination: system sizes differ');
  const magnitudes = terms.map((t) => Math.hypot(t.coefficient.re, t.coefficient.im) * t.encoding.alpha);
  const lambda = magnitudes.reduce((a, b) => a + b, 0);
  if (!(lambda > 0)) throw new RangeError('linearCombination: all coefficients are zero');
  const indexBits = Math.max(1, Math.ceil(Math.log2(terms.length)));
  const work = Math.max(0, ...terms.map((t) => ancillaQubits(t.encoding)));
  const system = Array.from({ length: n }, (_, k) => k);
  const index = Array.from({ length: indexBits }, (_, k) => n + k);
  const workQubits = Array.from({ length: work }, (_, k) => n + indexBits + k);
  const amplitudes = new Float64Array(1 << indexBits);
  magnitudes.forEach((m, k) => (amplitudes[k] = Math.sqrt(m / lambda)));
  const prepare = prepareAmplitudes(amplitudes, undefined, { name: 'lcu_prepare', role: `PREPARE of ${label}`, maxQubits: MAX_LCU_INDEX_QUBITS });
  const select: UnitaryOp[] = [];
  terms.forEach((t, k) => {
    const { controls, negControls } = indexControls(k, index);
    const phase = Math.atan2(t.coefficient.im, t.coefficient.re);
    const own = workQubits.slice(0, ancillaQubits(t.encoding));
    if (magnitudes[k] === 0) return;
    select.push(call(t.encoding.block, [...system, ...own], [], { controls, negControls }));
    if (phase !== 0) select.push(gate('gphase', [], [phase], { controls, negControls }));
  });
  const workRoles: AncillaRole[] = Array.from({ length: work }, () => 'clean');
  for (const t of terms) ancillaRoles(t.encoding).forEach((role, p) => role === 'signal' && (workRoles[p] = 'signal'));
  const ancillas: AncillaRegister[] = [{ name: 'lcu_index', size: indexBits, role: 'signal' }, ...registersFromRoles('lcu_work', workRoles)];
  const errorBound = terms.reduce((sum, t, k) => sum + (magnitudes[k]! / lambda) * t.encoding.errorBound, 0);
  return {
    label,
    block: defineConjugatedBlock(
      { name: 'lcu', role: `block-encoding of ${label} by PREPARE/SELECT`, qubits: n + indexBits + work },
      [call(prepare, index)],
      select,
    ),
    systemQubits: n,
    ancillas,
    alpha: lambda,
    exact: memoiseMatrix(() => weightedSum(terms.map((t) => ({ weight: t.coefficient, matrix: t.encoding.exact() })), 2 ** n)),
    costNotes: terms.flatMap((t) => t.encoding.costNotes),
    errorBound,
  };
}
