/**
 * memoryBudget: refuse an allocation before it happens when it would not fit.
 * The limit is the smaller of the machine's free memory (os.freemem, plus what this process may
 * reuse) and an optional user limit (POLEWRIGHT_MEMORY_LIMIT, in bytes, or a value passed in).
 * Choices of algorithm never depend on the machine: they use plannedMemoryLimit (the stated limit,
 * else PLANNING_MEMORY_LIMIT), so the same input takes the same path everywhere.
 */
import { freemem, totalmem } from 'node:os';
import { InputError } from './InputError.js';

export function formatBytes(bytes: number): string {
  const units = ['B', 'KiB', 'MiB', 'GiB', 'TiB', 'PiB', 'EiB'];
  let value = bytes;
  let unit = 0;
  while (value >= 1024 && unit < units.length - 1) {
    value /= 1024;
    unit += 1;
  }
  return `${value.toFixed(unit === 0 ? 0 : 2)} ${units[unit]}`;
}

/** Memory assumed by algorithm choices when no limit is stated: 4 GiB. */
export const PLANNING_MEMORY_LIMIT = 4 * 2 ** 30;

/** The stated limit: explicit argument, else POLEWRIGHT_MEMORY_LIMIT, else undefined. */
function statedLimit(explicitLimit?: number): number | undefined {
  if (explicitLimit !== undefined) return explicitLimit;
  const fromEnv = process.env.POLEWRIGHT_MEMORY_LIMIT;
  if (fromEnv === undefined || fromEnv === '') return undefined;
  const parsed = Number(fromEnv);
  if (!Number.isFinite(parsed) || parsed <= 0) {
    throw new InputError(`POLEWRIGHT_MEMORY_LIMIT must be a positive number of bytes, got "${fromEnv}"`);
  }
  return parsed;
}

/** The limit algorithm choices plan for: the stated limit, else PLANNING_MEMORY_LIMIT; never the machine's. */
export function plannedMemoryLimit(explicitLimit?: number): number {
  return statedLimit(explicitLimit) ?? PLANNING_MEMORY_LIMIT;
}

/** The byte limit in force: explicit argument, else POLEWRIGHT_MEMORY_LIMIT, else available memory. */
export function memoryLimit(explicitLimit?: number): number {
  const stated = statedLimit(explicitLimit);
  if (stated !== undefined) return stated;
  // Free memory undercounts reclaimable page cache; allow up to 90 % of total when free is low.
  return Math.max(freemem(), 0.9 * totalmem() - process.memoryUsage().rss);
}

/** Throws an InputError naming `what` when `bytes` exceed the limit in force. */
export function ensureFits(bytes: number, what: string, explicitLimit?: number): void {
  const limit = memoryLimit(explicitLimit);
  if (!(bytes <= limit)) {
    throw new InputError(
      `${what} needs ${formatBytes(bytes)} but only ${formatBytes(limit)} is available ` +
        `(set POLEWRIGHT_MEMORY_LIMIT to change the limit)`,
    );
  }
}
