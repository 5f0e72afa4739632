/**
 * diagonalCheckItem: the check row input of the arithmetic block-encoding of a diagonal B' = B − b₀ (diagonalEncoding) on
 * the whole Fock space. On a commensurate grid (every coefficient an exact multiple of the register step, e.g. a Hubbard U)
 * the circuit is checked against B's fermion terms minus b₀. Otherwise the register rounds the coefficients, which its
 * rigorous rounding bound covers; simulating a register fine enough for the check's precision is out of reach, so the row
 * is built with at most CHECK_REGISTER_BITS bits and checked against the operator it states it encodes, the clamped
 * diagonal of the rounded coefficients (computed from the model's terms and the grid's integer weights, not from the
 * circuit), with only the floating-point part of its bound; the label says so.
 */
import { diagonalTermsOfB } from '../inversion/diagonalBound.js';
import { diagonalEncoding } from '../inversion/diagonalEncoding.js';
import type { FermionModel } from '../model/FermionModel.js';
import type { CheckItem } from './CheckItem.js';
import { fockReference } from './fockReference.js';
import { modelFockTerms } from './internal/fockOperatorMatrix.js';
import type { ReferenceOperator } from './verifyEncoding.js';

/** Register width of a rounded check row: its multiplexed flag rotation (2^m angles) keeps the row within the check's limits. */
export const CHECK_REGISTER_BITS = 8;

/** diag(d) as a reference operator on 2^n basis states. */
function diagonalReference(d: Float64Array): ReferenceOperator {
  const apply = (re: Float64Array, im: Float64Array) => ({ re: re.map((v, x) => v * d[x]!), im: im.map((v, x) => v * d[x]!) });
  return { dimension: d.length, apply, applyAdjoint: apply };
}

/** The item, or null when B is not diagonal or constant (no arithmetic encoding exists then). */
export function diagonalCheckItem(model: FermionModel, precision: number): CheckItem | null {
  const encoding = diagonalEncoding(model, { precision: Math.min(precision, 0.5), maxBits: CHECK_REGISTER_BITS });
  if ('notDiagonal' in encoding) return null;
  const n = model.modes;
  if (encoding.grid.commensurate) {
    const terms = [...modelFockTerms(model, 'B'), { factors: [], re: -encoding.shift, im: 0 }];
    return { encoding, reference: () => fockReference(terms, n) };
  }
  const terms = diagonalTermsOfB(model);
  if ('notDiagonal' in terms) return null;
  const { step, single, pairs } = encoding.grid;
  const reference = (): ReferenceOperator => {
    const d = new Float64Array(2 ** n);
    for (let x = 0; x < d.length; x++) {
      let units = 0;
      for (let p = 0; p < n; p++) if ((x >>> p) & 1) units += single[p]!;
      terms.pairs.forEach((pair, k) => {
        if ((x >>> pair.p) & 1 && (x >>> pair.q) & 1) units += pairs[k]!;
      });
      const value = terms.constant + step * units - encoding.shift;
      d[x] = Math.max(-encoding.beta, Math.min(encoding.beta, value));
    }
    return diagonalReference(d);
  };
  const rounded = {
    ...encoding,
    label: `${encoding.label}, against its rounded coefficients (rounding bound ${encoding.boundParts.rounding.toExponential(1)} of β, stated apart)`,
    errorBound: encoding.boundParts.floatingPoint,
  };
  return { encoding: rounded, reference };
}
