/**
 * gateStep: the program step of one resolved gate on state bits, choosing the kernel exactly as
 * applyFlatGate does (identities dropped, X/Z/diagonal/anti-diagonal fast paths, controls folded
 * into the index pattern), so compiled and streamed simulation give the same amplitudes.
 */
import type { ResolvedGate } from '../../circuit/resolveGate.js';
import type { Matrix2 } from '../../circuit/standardGates.js';
import { indexPattern, maskOf } from './indexPattern.js';
import { ANTI_DIAGONAL, DIAGONAL, MATRIX, SCALE, STRIDE, SWAP, makeStep, type Step } from './Program.js';

const factor = (re: number, im: number): Matrix2 => [re, im, 0, 0, 0, 0, 0, 0];

/** Returns null for a gate that acts as the identity. */
export function gateStep(resolved: ResolvedGate, n: number): Step | null {
  const fixedControls = [...resolved.controls, ...resolved.negControls];
  const controlValue = maskOf(resolved.controls);
  if (resolved.kind === 'phase') {
    if (resolved.angle === 0) return null;
    return makeStep({ code: SCALE, pattern: indexPattern(n, fixedControls, controlValue), numbers: factor(Math.cos(resolved.angle), Math.sin(resolved.angle)) });
  }
  if (resolved.kind === 'swap') {
    if (resolved.phaseRe === 1 && resolved.phaseIm === 0) return null;
    const bitA = 1 << resolved.a;
    const pattern = indexPattern(n, [...fixedControls, resolved.a, resolved.b], controlValue | bitA);
    const targets = Int32Array.from([resolved.a, resolved.b]).sort();
    return makeStep({ code: SWAP, pattern, stride: bitA, other: 1 << resolved.b, numbers: factor(resolved.phaseRe, resolved.phaseIm), targets });
  }
  const m = resolved.matrix;
  const [ar, ai, br, bi, cr, ci, dr, di] = m;
  const target = resolved.target;
  const stride = 1 << target;
  const diagonal = br === 0 && bi === 0 && cr === 0 && ci === 0;
  if (diagonal && ar === 1 && ai === 0) {
    if (dr === 1 && di === 0) return null;
    // diag(1, d): only the target-1 half changes (p, s, t, z and their controlled forms).
    return makeStep({ code: SCALE, pattern: indexPattern(n, [...fixedControls, target], controlValue | stride), numbers: factor(dr, di) });
  }
  const antiDiagonal = ar === 0 && ai === 0 && dr === 0 && di === 0;
  if (fixedControls.length === 0 && !diagonal && !antiDiagonal) {
    if (target < 0 || target >= n) throw new RangeError(`qubit ${target} out of range 0..${n - 1}`);
    return makeStep({ code: STRIDE, stride, numbers: m, targets: Int32Array.of(target) });
  }
  const pattern = indexPattern(n, [...fixedControls, target], controlValue);
  const code = diagonal ? DIAGONAL : antiDiagonal ? ANTI_DIAGONAL : MATRIX;
  return makeStep({ code, pattern, stride, numbers: m, targets: Int32Array.of(target) });
}
