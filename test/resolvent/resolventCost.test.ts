import { describe, expect, it } from 'vitest';
import { resolventCost } from '../../src/resolvent/resolventCost.js';
import { resolventEncoding } from '../../src/resolvent/resolventEncoding.js';
import { UnreachablePrecisionError } from '../../src/resolvent/UnreachablePrecisionError.js';
import { hubbard } from '../helpers/models.js';

/**
 * Childs, Kothari & Somma (SIAM J. Comput. 46, 1920, 2017, Lemmas 17–19): 1/x on δ ≤ |x| ≤ 1 to relative error ε by an odd
 * polynomial of degree 2 j0 + 1, b = ⌈ln(1/(δ·¾ε)) / −ln(1 − δ²)⌉, j0 = ⌈√(b ln(4b/(ε/4)))⌉ (with the ¾ / ¼ split of ε).
 */
function paperDegree(delta: number, epsilon: number): number {
  const b = Math.ceil(Math.log(1 / (delta * 0.75 * epsilon)) / -Math.log1p(-delta * delta));
  return 2 * Math.ceil(Math.sqrt(b * Math.log((16 * b) / epsilon))) + 1;
}

describe('resolventCost', () => {
  const U = 1;
  const eta = 0.5;
  const w = { re: 0.3, im: eta };
  const precision = 1e-2;
  const hoppings = [1, 10, 100, 1000];
  const reports = (route: 'preconditioned' | 'direct') =>
    hoppings.map((t) => resolventCost(hubbard({ sites: 2, hopping: t, interaction: U, chemicalPotential: 0.5 }), w, { route, precision, fastInverse: { maxBits: 24 } }).report);

  it('keeps the preconditioned query count below one bound set by ‖B‖ and η alone, within 10 % from t = 100 to t = 1000', () => {
    // ‖B‖ = U·L for the Hubbard interaction U Σ n↑n↓ on L = 2 sites (all sites doubly occupied; common practice).
    const normB = U * 2;
    const kappa = (1 + normB / eta) ** 2;
    const bound = paperDegree(1 / (2 * kappa), 0.4 * precision);
    const pre = reports('preconditioned');
    for (const r of pre) {
      expect(r.delta).toBeGreaterThanOrEqual(1 / (2 * kappa));
      expect(r.queries.M).toBeLessThanOrEqual(bound);
      expect(r.errorBound).toBeLessThanOrEqual(precision);
    }
    expect(Math.abs(pre[3]!.queries.M - pre[2]!.queries.M)).toBeLessThanOrEqual(0.1 * pre[2]!.queries.M);
  });

  it('makes the direct route’s query count grow at least in proportion to t', () => {
    const direct = reports('direct');
    for (let k = 1; k < hoppings.length; k++) {
      expect(direct[k]!.queries.M / direct[k - 1]!.queries.M).toBeGreaterThanOrEqual(hoppings[k]! / hoppings[k - 1]! * 0.5);
    }
    expect(direct[3]!.queries.M / direct[2]!.queries.M).toBeGreaterThanOrEqual(10);
  });

  it('bounds the degree the full build measures (truncation bound ≥ built degree) with the same α_M and δ', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 0.5, chemicalPotential: 0.3 });
    for (const route of ['direct', 'preconditioned'] as const) {
      const { report: cost, encoding } = resolventCost(model, { re: 0.2, im: 1 }, { route, precision: 0.05 });
      const builtEncoding = resolventEncoding(model, { re: 0.2, im: 1 }, { route, precision: 0.05 });
      const built = builtEncoding.report;
      expect(encoding.block.qubits).toBe(builtEncoding.block.qubits);
      expect(encoding.ancillas).toEqual(builtEncoding.ancillas);
      expect(encoding.alpha).toBe(cost.alphas.total);
      expect(encoding.errorBound).toBe(cost.errorBound);
      expect(() => encoding.exact()).toThrow(/placeholder phases/);
      expect(cost.estimated).toBe(true);
      expect(cost.degree).toBeGreaterThanOrEqual(built.degree);
      expect(cost.delta).toBe(built.delta);
      expect(cost.alphas.M).toBe(built.alphas.M);
      expect(cost.qubits).toEqual(built.qubits);
    }
  });

  it('plans for the reachable precision when asked, and says so, when the capped fast inverse cannot meet ε', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 0.5, chemicalPotential: 0.3 });
    // A 3-bit register at η = 3 is coarse enough to miss ε = 1e-9 yet keep δ > 0 (found by trying widths 3…9, η = 0.3…3).
    const w = { re: 0.2, im: 3 };
    const options = { route: 'preconditioned', precision: 1e-9, fastInverse: { maxBits: 3 }, reachablePrecision: true } as const;
    const { report } = resolventCost(model, w, options);
    expect(report.requestedPrecision).toBe(1e-9);
    expect(report.precision).toBeGreaterThan(1e-9);
    expect(report.errorBound).toBeLessThanOrEqual(report.precision);
    expect(() => resolventCost(model, w, { ...options, reachablePrecision: false })).toThrow(/cannot be met.*is reachable/);
  });

  it('refuses Im w = 0, ε ≥ 1, δ ≤ 0 and a degree beyond the cap with RangeErrors naming the value', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 0.5, chemicalPotential: 0.3 });
    expect(() => resolventEncoding(model, { re: 0.2, im: 0 }, { route: 'direct', precision: 0.05 })).toThrow(/Im w ≠ 0/);
    expect(() => resolventCost(model, { re: 0.2, im: 0 }, { route: 'preconditioned', precision: 0.05 })).toThrow(/Im w ≠ 0/);
    expect(() => resolventEncoding(model, { re: 0.2, im: 1 }, { route: 'direct', precision: 1 })).toThrow(/precision ε = 1 /);
    expect(() => resolventEncoding(model, { re: 0.2, im: 1 }, { route: 'direct', precision: 0.05, maxDegree: 11 })).toThrow(/beyond the cap 11/);
    // A fast inverse with a one-bit energy register is too coarse: its error leaves nothing (or δ ≤ 0).
    expect(() => resolventEncoding(model, { re: 0.2, im: 0.05 }, { route: 'preconditioned', precision: 1e-3, fastInverse: { maxBits: 1 } })).toThrow(
      /cannot be met|δ = .* ≤ 0/,
    );
    // |w| near the double range: 1/(α_M K) underflows; the direct route is unreachable, not an internal failure (a fuzz finding).
    expect(() => resolventCost(model, { re: 1e300, im: 1e-10 }, { route: 'direct', precision: 0.05 })).toThrow(UnreachablePrecisionError);
  });
});
