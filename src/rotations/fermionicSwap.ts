// The fermionic swap of two adjacent modes: one-particle swap |p> ↔ |p+1>, |11> → −|11> (Verstraete, Cirac & Latorre 2009).
import { defineBlock } from '../circuit/defineBlock.js';
import { gate } from '../circuit/ops.js';
import type { Block } from '../circuit/types.js';

/**
 * `fermionic_swap` on qubits (mode p, mode p+1): swap then cz, so a_p† ↔ a_{p+1}† under conjugation and the
 * doubly occupied pair picks up the exchange sign (Verstraete, Cirac & Latorre, Phys. Rev. A 79, 032316, 2009).
 */
export const fermionicSwap: Block = defineBlock(
  { name: 'fermionic_swap', role: 'fermionic swap of two adjacent modes (swap, then the exchange sign cz)', qubits: 2 },
  [gate('swap', [0, 1]), gate('cz', [0, 1])],
);
