/**
 * angleLevel: how far a numeric angle is from the Clifford group — 0 for a multiple of 2π (nothing), 1 for an odd
 * multiple of π, 2 for an odd multiple of π/2, 3 for an odd multiple of π/4 (a T-type phase), 4 for anything else or
 * an angle that is a symbolic expression (an arbitrary rotation that needs synthesis).
 */
export type AngleLevel = 0 | 1 | 2 | 3 | 4;

const QUARTER_TURNS_TOLERANCE = 1e-9;

export function angleLevel(angle: number | null): AngleLevel {
  if (angle === null || !Number.isFinite(angle)) return 4;
  const eighths = (angle / Math.PI) * 4;
  const nearest = Math.round(eighths);
  if (Math.abs(eighths - nearest) > QUARTER_TURNS_TOLERANCE * Math.max(1, Math.abs(eighths))) return 4;
  const m = ((nearest % 8) + 8) % 8;
  if (m === 0) return 0;
  if (m === 4) return 1;
  if (m % 2 === 0) return 2;
  return 3;
}
