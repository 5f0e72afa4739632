// bench-robustness: the timing figures the tests no longer assert — refusing 100,000 nested
// parentheses, parsing every truncation of the example programs, and counting the gates of a
// 1,000-gate block repeated 1,000,000 times. Prints wall times. Not part of the tests.
import { readFileSync } from 'node:fs';
import { CircuitBuilder } from '../src/circuit/CircuitBuilder.js';
import { call, gate } from '../src/circuit/ops.js';
import { defineBlock } from '../src/circuit/defineBlock.js';
import { gateCounts, totalGates } from '../src/circuit/gateCounts.js';
import { parseQasm } from '../src/qasm/parseQasm.js';
import { QasmParseError } from '../src/qasm/QasmParseError.js';

function timed(label: string, work: () => string): void {
  const start = performance.now();
  const detail = work();
  console.log(`${label}: ${(performance.now() - start).toFixed(1)} ms (${detail})`);
}

function outcome(text: string): 'circuit' | 'refused' {
  try {
    parseQasm(text, 'bench.qasm');
    return 'circuit';
  } catch (error) {
    if (error instanceof QasmParseError) return 'refused';
    throw error;
  }
}

const HEADER = 'OPENQASM 3.0;\ninclude "stdgates.inc";\n';
timed('100,000 nested parentheses', () => outcome(`${HEADER}qubit q;\nrz(${'('.repeat(100_000)}1${')'.repeat(100_000)}) q;`));

const seeds = ['bell.qasm', 'ghz.qasm', 'teleport.qasm', 'golden/basics.qasm', 'golden/blocks.qasm', 'golden/conjugated.qasm']
  .map((name) => readFileSync(new URL(`../circuits/${name}`, import.meta.url), 'utf8'));
timed('every truncation of the example programs', () => {
  let parsed = 0;
  for (const seed of seeds) for (let end = 0; end <= seed.length; end++, parsed++) outcome(seed.slice(0, end));
  return `${parsed} programs`;
});

timed('gate counts of 10^9 gates', () => {
  const ops = [];
  for (let k = 0; k < 1000; k++) ops.push(k % 2 === 0 ? gate('h', [k % 3]) : gate('cx', [k % 3, (k + 1) % 3]));
  const layer = defineBlock({ name: 'layer', role: 'bench layer', qubits: 3 }, ops);
  const b = new CircuitBuilder();
  b.add(call(layer, b.qubits('q', 3), [], { power: 1_000_000 }));
  return `${totalGates(gateCounts(b.build()))} gates`;
});
