/**
 * denseSector: all eigenpairs of H in a small sector, as complex vectors. A complex Hermitian H is
 * diagonalised through its real embedding [[A, −B], [B, A]], whose eigenvectors (x, y) give x + iy;
 * each complex eigenvector then appears twice, so every vector carries weight ½ (Σ w·c c† = projector).
 */
import { symmetricEigen } from './symmetricEigen.js';
import { zeroVec, type CVec } from './vec.js';
import type { SectorHamiltonian } from '../sectorHamiltonian.js';

export interface DenseSpectrum {
  readonly values: Float64Array;
  readonly vectors: readonly CVec[];
  /** 1 for a real H, ½ for the embedded complex one. */
  readonly weight: number;
}

export function denseSector(hamiltonian: SectorHamiltonian): DenseSpectrum {
  const dim = hamiltonian.sector.dimension;
  const complex = !hamiltonian.real;
  const size = complex ? 2 * dim : dim;
  const a = new Float64Array(size * size);
  const unit = zeroVec(dim, complex);
  const column = zeroVec(dim, complex);
  for (let c = 0; c < dim; c++) {
    unit.re[c] = 1;
    hamiltonian.apply(unit, column);
    unit.re[c] = 0;
    for (let r = 0; r < dim; r++) {
      const hr = column.re[r]!;
      a[r * size + c] = hr;
      if (complex) {
        const hi = column.im![r]!;
        a[(r + dim) * size + c + dim] = hr;
        a[(r + dim) * size + c] = hi;
        a[r * size + c + dim] = -hi;
      }
    }
  }
  const eig = symmetricEigen(a, size);
  const vectors: CVec[] = [];
  for (let k = 0; k < size; k++) {
    const v = zeroVec(dim, complex);
    for (let r = 0; r < dim; r++) {
      v.re[r] = eig.vectors[r * size + k]!;
      if (complex) v.im![r] = eig.vectors[(r + dim) * size + k]!;
    }
    vectors.push(v);
  }
  return { values: eig.values, vectors, weight: complex ? 0.5 : 1 };
}
