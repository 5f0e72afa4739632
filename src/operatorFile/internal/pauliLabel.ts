// pauliLabel: Pauli strings as text with explicit qubit indices, "X0 Z1 Y3" (the empty string or "I" is the identity),
// to and from the (x, z) bit masks of PauliSum (X: x bit, Z: z bit, Y: both).

/** The masks of `label`, or a message saying what is wrong with it. */
export function parsePauliLabel(label: string): { x: bigint; z: bigint; highest: number } | { problem: string } {
  let x = 0n;
  let z = 0n;
  let highest = -1;
  const seen = new Set<number>();
  for (const token of label.trim().split(/\s+/).filter((t) => t !== '')) {
    if (token === 'I') continue;
    const match = /^([IXYZ])(\d{1,9})$/.exec(token);
    if (match === null) return { problem: `cannot read "${token}" in "${label}": expected a letter I, X, Y or Z followed by a qubit index, e.g. "X0 Z1 Y3"` };
    const qubit = Number(match[2]);
    if (seen.has(qubit)) return { problem: `qubit ${qubit} appears twice in "${label}"` };
    seen.add(qubit);
    highest = Math.max(highest, qubit);
    const bit = 1n << BigInt(qubit);
    if (match[1] === 'X' || match[1] === 'Y') x |= bit;
    if (match[1] === 'Z' || match[1] === 'Y') z |= bit;
  }
  return { x, z, highest };
}

/** "X0 Z1 Y3" for the masks (qubits in increasing order); "" for the identity. */
export function formatPauliLabel(x: bigint, z: bigint): string {
  const tokens: string[] = [];
  for (let q = 0; (x | z) >> BigInt(q) !== 0n; q++) {
    const hasX = ((x >> BigInt(q)) & 1n) === 1n;
    const hasZ = ((z >> BigInt(q)) & 1n) === 1n;
    if (hasX || hasZ) tokens.push(`${hasX && hasZ ? 'Y' : hasX ? 'X' : 'Z'}${q}`);
  }
  return tokens.join(' ');
}
