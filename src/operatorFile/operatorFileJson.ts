/**
 * operatorFileJson: a TargetOperator as the JSON value of an operator file (what parseOperatorFile reads back), so a
 * writer can state next to a circuit the operator it encodes.
 */
import type { TargetOperator } from './TargetOperator.js';
import { formatPauliLabel } from './internal/pauliLabel.js';

export type OperatorFileJson =
  | { readonly matrix: [number, number][][] }
  | { readonly qubits: number; readonly pauli: [number, number, string][] }
  | { readonly modes?: number; readonly ladder: [number, number, [number, 'create' | 'annihilate'][]][] };

export function operatorFileJson(target: TargetOperator): OperatorFileJson {
  if ('matrix' in target) {
    const { n, re, im } = target.matrix;
    return { matrix: Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j): [number, number] => [re[i * n + j]!, im[i * n + j]!])) };
  }
  if ('pauli' in target) {
    return { qubits: target.pauli.qubits, pauli: target.pauli.terms.map((t): [number, number, string] => [t.re, t.im, formatPauliLabel(t.x, t.z)]) };
  }
  const ladder = target.ladder.terms.map((t): [number, number, [number, 'create' | 'annihilate'][]] => [
    t.re,
    t.im,
    t.ops.map((o): [number, 'create' | 'annihilate'] => [o.mode, o.dagger ? 'create' : 'annihilate']),
  ]);
  return target.modes === undefined ? { ladder } : { modes: target.modes, ladder };
}
