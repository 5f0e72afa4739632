/**
 * sampleOutcomes: counts of `shots` independent draws from a discrete distribution, drawn with the
 * project's seeded generator, so the same seed always gives the same counts.
 */
import { seededRandom } from '../core/seededRandom.js';

/** Shots between two progress reports. */
export const PROGRESS_INTERVAL = 2 ** 16;

/**
 * Draws `shots` outcomes x with probability probabilities[x] / Σ probabilities (inverse-CDF
 * sampling, one uniform double per shot) and returns the count of each outcome; `onProgress(done, shots)`
 * is called every PROGRESS_INTERVAL shots and at the end. Throws RangeError for a negative or non-finite
 * weight, an all-zero distribution or a bad shot count.
 */
export function sampleOutcomes(
  probabilities: ArrayLike<number>,
  shots: number,
  seed: number,
  onProgress?: (done: number, total: number) => void,
): Float64Array {
  if (!Number.isSafeInteger(shots) || shots < 0) throw new RangeError(`sampleOutcomes: shots ${shots} is not a non-negative integer`);
  const cumulative = new Float64Array(probabilities.length);
  let total = 0;
  for (let x = 0; x < probabilities.length; x++) {
    const p = probabilities[x]!;
    if (!(p >= 0) || !Number.isFinite(p)) throw new RangeError(`sampleOutcomes: probability ${p} at ${x} is not a finite non-negative number`);
    total += p;
    cumulative[x] = total;
  }
  if (!(total > 0)) throw new RangeError('sampleOutcomes: the probabilities sum to zero');
  const counts = new Float64Array(probabilities.length);
  const random = seededRandom(seed);
  for (let s = 0; s < shots; s++) {
    const u = random.next() * total;
    // First x with cumulative[x] > u: outcomes of zero probability are never drawn.
    let lo = 0;
    let hi = cumulative.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (cumulative[mid]! > u) hi = mid;
      else lo = mid + 1;
    }
    counts[lo] += 1;
    if (onProgress !== undefined && (s + 1) % PROGRESS_INTERVAL === 0) onProgress(s + 1, shots);
  }
  onProgress?.(shots, shots);
  return counts;
}
