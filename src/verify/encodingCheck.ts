/**
 * encodingCheck: one row of a verification table — an encoding's sizes, α, gate counts and the error found by
 * verifyEncoding against a reference, with its verdict: `pass` (error within max(tolerance, the encoding's bound) and the
 * bound within the precision), `fail` (error above that), `inconclusive` (error within the bound but the bound above the
 * precision, so the check could not tell a correct block from a broken one) or `skipped` (too large, with the reason).
 */
import { ancillaQubits, type BlockEncoding, type CostNote } from '../blocks/BlockEncoding.js';
import { blockCounts, countsToObject } from '../circuit/gateCounts.js';
import { verifyEncoding, type VerifyOptions } from './verifyEncoding.js';

export type Verdict = 'pass' | 'fail' | 'inconclusive' | 'skipped';

/** `probe (lower bound)`: random states only, so the error found may be below the true one. */
/** `qubitized`: the QSVT sequence's queried block simulated on the columns, the sequence through its 2×2 reduction (qubitizedColumns). */
export type CheckMethod = 'exhaustive' | 'columns' | 'probe (lower bound)' | 'state' | 'qubitized' | 'skipped';

export interface CheckThresholds {
  /** Largest accepted error of an exact construction (rounding level). */
  readonly tolerance: number;
  /** Largest accepted error bound of an approximate construction: a row whose bound exceeds it is inconclusive. */
  readonly precision: number;
}

export interface CheckRow {
  readonly label: string;
  readonly systemQubits: number;
  readonly ancillaQubits: number;
  readonly alpha: number;
  /** Largest entry error found (see VerifyReport.maxError); null when skipped. */
  readonly maxError: number | null;
  /** The encoding's own error bound (0 when exact). */
  readonly errorBound: number;
  readonly unitarityDeviation: number | null;
  readonly method: CheckMethod;
  /** Probe rows: the power-iteration estimate of the operator-norm error and its iteration count. */
  readonly powerIteration?: { readonly estimate: number; readonly iterations: number };
  readonly gates: Record<string, number>;
  /** Costs the builder knows beyond the simulated gates (e.g. SELECT by unary iteration). */
  readonly costNotes: readonly CostNote[];
  readonly verdict: Verdict;
  /** verdict === 'pass'. */
  readonly passed: boolean;
  /** Why a row was skipped, failed a side check or was inconclusive. */
  readonly reason?: string;
}

/** The verdict for an error found (and, for probes, the power-iteration estimate) against the thresholds. */
export function judge(error: number, errorBound: number, unitarityDeviation: number, thresholds: CheckThresholds): { verdict: Verdict; reason?: string } {
  if (!(error <= Math.max(thresholds.tolerance, errorBound))) {
    return { verdict: 'fail', reason: `error ${error.toExponential(2)} exceeds max(tolerance, bound)` };
  }
  if (!(unitarityDeviation <= thresholds.tolerance)) {
    return { verdict: 'fail', reason: `unitarity deviation ${unitarityDeviation.toExponential(2)} exceeds the tolerance` };
  }
  if (errorBound > thresholds.precision) {
    return { verdict: 'inconclusive', reason: `bound ${errorBound.toExponential(2)} exceeds the precision ${thresholds.precision}` };
  }
  return { verdict: 'pass' };
}

function rowBase(encoding: BlockEncoding) {
  return {
    label: encoding.label,
    systemQubits: encoding.systemQubits,
    ancillaQubits: ancillaQubits(encoding),
    alpha: encoding.alpha,
    errorBound: encoding.errorBound,
    gates: countsToObject(blockCounts(encoding.block)),
    costNotes: encoding.costNotes,
  };
}

/** The row of an error found by some other method than verifyEncoding, judged like encodingCheck's rows. */
export function judgedRow(encoding: BlockEncoding, found: { maxError: number; unitarityDeviation: number; method: CheckMethod }, limits: CheckThresholds): CheckRow {
  const { verdict, reason } = judge(found.maxError, encoding.errorBound, found.unitarityDeviation, limits);
  return {
    ...rowBase(encoding),
    maxError: found.maxError,
    unitarityDeviation: found.unitarityDeviation,
    method: found.method,
    verdict,
    passed: verdict === 'pass',
    ...(reason === undefined ? {} : { reason }),
  };
}

/** A row not checked because it is too large; the reason says what limit it meets. */
export function skippedRow(encoding: BlockEncoding, reason: string): CheckRow {
  return { ...rowBase(encoding), maxError: null, unitarityDeviation: null, method: 'skipped', verdict: 'skipped', passed: false, reason };
}

/** A row whose encoding could not be built at all (e.g. a polynomial degree beyond its cap); the reason says why. */
export function unbuiltRow(label: string, systemQubits: number, reason: string): CheckRow {
  return {
    label, systemQubits, ancillaQubits: 0, alpha: Number.NaN, errorBound: Number.NaN, gates: {}, costNotes: [],
    maxError: null, unitarityDeviation: null, method: 'skipped', verdict: 'skipped', passed: false, reason,
  };
}

export function encodingCheck(encoding: BlockEncoding, thresholds: CheckThresholds | number, options: VerifyOptions = {}): CheckRow {
  const limits = typeof thresholds === 'number' ? { tolerance: thresholds, precision: Infinity } : thresholds;
  const report = verifyEncoding(encoding, options);
  const found = Math.max(report.maxError, report.powerIteration?.estimate ?? 0);
  const { verdict, reason } = judge(found, encoding.errorBound, report.unitarityDeviation, limits);
  return {
    ...rowBase(encoding),
    maxError: report.maxError,
    unitarityDeviation: report.unitarityDeviation,
    method: report.method === 'probe' ? 'probe (lower bound)' : report.method,
    ...(report.powerIteration ? { powerIteration: report.powerIteration } : {}),
    verdict,
    passed: verdict === 'pass',
    ...(reason === undefined ? {} : { reason }),
  };
}
