// applySplit: the part of T that "split.oneBodyInB" moves from A into B (each listed (i, j) with its partner (j, i)).
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import { zeroComplexMatrix } from './complexMatrix.js';
import type { Problem } from './Problem.js';

export function applySplit(oneBody: ComplexMatrix, pairs: readonly (readonly [number, number])[], problems: Problem[]): ComplexMatrix {
  const n = oneBody.n;
  const moved = zeroComplexMatrix(n);
  pairs.forEach((pair, position) => {
    let inRange = true;
    pair.forEach((index, slot) => {
      if (index < 0 || index >= n) {
        problems.push({ path: ['split', 'oneBodyInB', position, slot], message: `index ${index} out of range 0..${n - 1}` });
        inRange = false;
      }
    });
    if (!inRange) return;
    const [i, j] = pair;
    for (const e of [i * n + j, j * n + i]) {
      moved.re[e] = oneBody.re[e]!;
      moved.im[e] = oneBody.im[e]!;
    }
    if (oneBody.re[i * n + j] === 0 && oneBody.im[i * n + j] === 0) {
      problems.push({ path: ['split', 'oneBodyInB', position], message: `T[${i}][${j}] is zero; there is nothing to move` });
    }
  });
  return moved;
}
