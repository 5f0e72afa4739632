/**
 * registersFromRoles: ancilla registers for a list of per-qubit roles, one register per run of equal roles, named
 * `prefix` (a single run) or `prefix_0`, `prefix_1`, … (several runs).
 */
import type { AncillaRegister, AncillaRole } from '../BlockEncoding.js';

export function registersFromRoles(prefix: string, roles: readonly AncillaRole[]): AncillaRegister[] {
  const runs: { role: AncillaRole; size: number }[] = [];
  for (const role of roles) {
    const last = runs[runs.length - 1];
    if (last && last.role === role) last.size++;
    else runs.push({ role, size: 1 });
  }
  return runs.map((run, k) => ({ name: runs.length === 1 ? prefix : `${prefix}_${k}`, size: run.size, role: run.role }));
}
