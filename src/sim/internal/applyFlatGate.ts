/**
 * applyFlatGate: applies one flattened standard gate to a state, choosing the kernel from what
 * resolveGate gives: identities are skipped, X and Z matrices, diagonal and anti-diagonal matrices
 * (detected exactly) get their fast paths, controls restrict every kernel to the matching indices.
 */
import type { FlatGate } from '../../circuit/flatten.js';
import { resolveGate } from '../../circuit/resolveGate.js';
import type { StateVector } from '../StateVector.js';
import { applyAntiDiagonalPairs } from '../kernels/applyAntiDiagonalPairs.js';
import { applyDiagonalPairs } from '../kernels/applyDiagonalPairs.js';
import { applyMatrixPairs } from '../kernels/applyMatrixPairs.js';
import { applyMatrixStride } from '../kernels/applyMatrixStride.js';
import { applySwapPairs } from '../kernels/applySwapPairs.js';
import { scaleMatching } from '../kernels/scaleMatching.js';
import { indexPattern, maskOf } from './indexPattern.js';

export function applyFlatGate(state: StateVector, gate: FlatGate): void {
  const resolved = resolveGate(gate);
  const { re, im, qubits: n } = state;
  const fixedControls = [...resolved.controls, ...resolved.negControls];
  const controlValue = maskOf(resolved.controls);
  if (resolved.kind === 'phase') {
    if (resolved.angle === 0) return;
    const pattern = indexPattern(n, fixedControls, controlValue);
    scaleMatching(re, im, pattern, Math.cos(resolved.angle), Math.sin(resolved.angle));
    return;
  }
  if (resolved.kind === 'swap') {
    if (resolved.phaseRe === 1 && resolved.phaseIm === 0) return;
    const bitA = 1 << resolved.a;
    const pattern = indexPattern(n, [...fixedControls, resolved.a, resolved.b], controlValue | bitA);
    applySwapPairs(re, im, pattern, bitA, 1 << resolved.b, resolved.phaseRe, resolved.phaseIm);
    return;
  }
  const m = resolved.matrix;
  const [ar, ai, br, bi, cr, ci, dr, di] = m;
  const target = resolved.target;
  const stride = 1 << target;
  const diagonal = br === 0 && bi === 0 && cr === 0 && ci === 0;
  if (diagonal && ar === 1 && ai === 0) {
    if (dr === 1 && di === 0) return;
    // diag(1, d): only the target-1 half changes (this covers p, s, t, z and their controlled forms).
    scaleMatching(re, im, indexPattern(n, [...fixedControls, target], controlValue | stride), dr, di);
    return;
  }
  if (fixedControls.length === 0 && !diagonal && !(ar === 0 && ai === 0 && dr === 0 && di === 0)) {
    if (target >= n) throw new RangeError(`qubit ${target} out of range 0..${n - 1}`);
    applyMatrixStride(re, im, stride, m);
    return;
  }
  const pattern = indexPattern(n, [...fixedControls, target], controlValue);
  if (diagonal) applyDiagonalPairs(re, im, pattern, stride, ar, ai, dr, di);
  else if (ar === 0 && ai === 0 && dr === 0 && di === 0) applyAntiDiagonalPairs(re, im, pattern, stride, br, bi, cr, ci);
  else applyMatrixPairs(re, im, pattern, stride, m);
}
