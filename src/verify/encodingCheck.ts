/**
 * encodingCheck: one row of a verification table — an encoding's sizes, α, gate counts and the error
 * found by verifyEncoding, judged against a tolerance.
 */
import { ancillaQubits, type BlockEncoding, type CostNote } from '../blocks/BlockEncoding.js';
import { blockCounts, countsToObject } from '../circuit/gateCounts.js';
import { verifyEncoding, type VerifyOptions } from './verifyEncoding.js';

export interface CheckRow {
  readonly label: string;
  readonly systemQubits: number;
  readonly ancillaQubits: number;
  readonly alpha: number;
  /** Largest entry error found (see VerifyReport.maxError). */
  readonly maxError: number;
  /** The encoding's own error bound (0 when exact); a row passes when maxError ≤ max(tolerance, errorBound). */
  readonly errorBound: number;
  readonly unitarityDeviation: number;
  readonly method: 'exhaustive' | 'probe' | 'state';
  readonly gates: Record<string, number>;
  /** Costs the builder knows beyond the simulated gates (e.g. SELECT by unary iteration). */
  readonly costNotes: readonly CostNote[];
  readonly passed: boolean;
}

export function encodingCheck(encoding: BlockEncoding, tolerance: number, options: VerifyOptions = {}): CheckRow {
  const report = verifyEncoding(encoding, options);
  const errorBound = encoding.errorBound;
  return {
    label: encoding.label,
    systemQubits: encoding.systemQubits,
    ancillaQubits: ancillaQubits(encoding),
    alpha: encoding.alpha,
    maxError: report.maxError,
    errorBound,
    unitarityDeviation: report.unitarityDeviation,
    method: report.method,
    gates: countsToObject(blockCounts(encoding.block)),
    costNotes: encoding.costNotes,
    passed: report.maxError <= Math.max(tolerance, errorBound) && report.unitarityDeviation <= tolerance,
  };
}
