// Test-only checks of the defining relation U(V)† a_k† U(V) = Σ_j V_jk a_j†, U(V)|vac> = |vac>, on one-particle states, whole matrices and random states.
import { adjointMatrix } from '../../../src/linalg/adjointMatrix.js';
import type { Block } from '../../../src/circuit/types.js';
import type { ComplexMatrix } from '../../../src/linalg/ComplexMatrix.js';
import { seededRandom } from '../../../src/core/seededRandom.js';
import { expectComplexArrayClose } from '../../helpers/close.js';
import { conjTranspose, matMul } from '../../helpers/complexMatrixOps.js';
import { applyMatrix, creationMatrix, rotatedCreationMatrix } from './fockOperators.js';
import { inverseBlock } from './inverseBlock.js';
import { basisState, blockUnitary, oneParticleMatrix, simulateBlock, type State } from './simulateBlock.js';

const TOL = 1e-10;

/** The one-particle matrix of the circuit, <j|U|k>, equals V†. */
export function expectOneParticleAction(block: Block, V: ComplexMatrix): void {
  expectComplexArrayClose(oneParticleMatrix(block), adjointMatrix(V), TOL, 'one-particle matrix vs V†');
}

/** Dense check on the whole Fock space (n ≤ 6): U† a_k† U = b_k† for every k and U|vac> = |vac>. */
export function expectOperatorRelation(block: Block, V: ComplexMatrix): void {
  const U = blockUnitary(block);
  const Ud = conjTranspose(U);
  for (let k = 0; k < V.n; k++) {
    expectComplexArrayClose(matMul(Ud, matMul(creationMatrix(V.n, k), U)), rotatedCreationMatrix(V, k), TOL, `U† a_${k}† U`);
  }
  expectComplexArrayClose(simulateBlock(block, basisState(V.n, 0)), basisState(V.n, 0), TOL, 'U|vac>');
}

function randomState(dim: number, seed: number): State {
  const random = seededRandom(seed);
  const re = Float64Array.from({ length: dim }, () => random.next() - 0.5);
  const im = Float64Array.from({ length: dim }, () => random.next() - 0.5);
  let norm = 0;
  for (let i = 0; i < dim; i++) norm += re[i]! ** 2 + im[i]! ** 2;
  const scale = 1 / Math.sqrt(norm);
  return { re: re.map((x) => x * scale), im: im.map((x) => x * scale) };
}

/** On `probes` random many-particle states ψ: U† a_k† U ψ = b_k† ψ for every k (simulated, any n ≤ 12). */
export function expectRelationOnStates(block: Block, V: ComplexMatrix, probes: number, seed: number): void {
  const inverse = inverseBlock(block);
  for (let p = 0; p < probes; p++) {
    const psi = randomState(1 << V.n, seed + p);
    const rotated = simulateBlock(block, psi);
    for (let k = 0; k < V.n; k++) {
      const lhs = simulateBlock(inverse, applyMatrix(creationMatrix(V.n, k), rotated));
      expectComplexArrayClose(lhs, applyMatrix(rotatedCreationMatrix(V, k), psi), TOL, `probe ${p}: U† a_${k}† U ψ`);
    }
  }
}
