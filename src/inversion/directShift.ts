// directShift: the direct alternative to fastInverse — the LCU block-encoding of w − H (H = A + B, the model's Pauli LCU),
// whose α = |w| + ‖H's Pauli coefficients‖₁ grows with ‖A‖.
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import { modelEncodings } from '../blocks/builders/modelEncodings.js';
import { shiftedEncoding } from '../blocks/combine/shiftedEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';

/**
 * Block-encoding of w·I − H by the linear combination of the identity and H's Pauli LCU (PREPARE/SELECT, Childs & Wiebe,
 * Quantum Inf. Comput. 12, 901, 2012), α = |w| + α_H. Inverting it (e.g. by QSVT) costs a polynomial of degree
 * ∝ α·‖(w − H)⁻¹‖, the dependence on ‖A‖ that fastInverse removes.
 */
export function directShift(model: FermionModel, w: ComplexScalar, label = 'direct shift'): BlockEncoding {
  return shiftedEncoding(modelEncodings(model).H, w, label);
}
