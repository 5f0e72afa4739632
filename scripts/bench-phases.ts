// bench-phases: time and residual of QSP phase factors (qspPhases) for the 1/x approximation (inverseApproximation,
// ε = 1e-6, δ chosen for degrees near 100, 500, 2,000 and 10,000). Run: npx tsx scripts/bench-phases.ts
import { evaluateChebyshev } from '../src/polynomial/evaluateChebyshev.js';
import { inverseApproximation } from '../src/polynomial/inverseApproximation.js';
import { qspMatrixElement, qspPhases } from '../src/polynomial/qspPhases.js';

const EPSILON = 1e-6;
const reference = inverseApproximation(0.1, EPSILON).degree * 0.1; // degree ≈ reference / δ

console.log('| target degree | δ | degree | scale | polynomial s | phases s | iterations | residual | direct check (997 pts) |');
console.log('|---:|---:|---:|---:|---:|---:|---:|---:|---:|');
for (const wanted of [100, 500, 2000, 10000]) {
  const delta = Number((reference / wanted).toPrecision(3));
  let start = performance.now();
  const approximation = inverseApproximation(delta, EPSILON);
  const polynomialSeconds = (performance.now() - start) / 1000;
  start = performance.now();
  const phases = qspPhases(approximation.polynomial);
  const phaseSeconds = (performance.now() - start) / 1000;
  let direct = 0;
  for (let l = 0; l < 997; l++) {
    const x = -1 + (2 * l) / 996;
    direct = Math.max(direct, Math.abs(qspMatrixElement(phases.phases, x).re - evaluateChebyshev(approximation.polynomial, x)));
  }
  console.log(
    `| ${wanted} | ${delta} | ${approximation.degree} | ${approximation.scale.toPrecision(3)} | ${polynomialSeconds.toFixed(2)} | ` +
      `${phaseSeconds.toFixed(2)} | ${phases.iterations} | ${phases.residual.toExponential(1)} | ${direct.toExponential(1)} |`,
  );
}
