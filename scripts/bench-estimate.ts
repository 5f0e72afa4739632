// bench-estimate: wall time, qubits and gate counts of one exact-expectation readout of G_00(z) (particle + hole parts,
// QSVT resolvent at precision 1e-6) for both routes — the Hubbard dimer (circuits/hubbard-dimer.json) and a 3-site
// Hubbard chain (U = 4, μ = 2, N = 3), at z = 0.5 + 1i (η = 1: with U = 4 the preconditioned degree grows like
// (1 + α_B/η)², about 1,300 for the dimer at η = 1 and 3,800 at η = 0.5; the files' η = 0.1 is far out of reach).
// Run: npx tsx scripts/bench-estimate.ts
import { fileURLToPath } from 'node:url';
import { totalGates } from '../src/circuit/gateCounts.js';
import { greensFunction } from '../src/exact/greensFunction.js';
import { parseModel } from '../src/model/parseModel.js';
import { loadModelFile } from '../src/model/loadModelFile.js';
import type { FermionModel } from '../src/model/FermionModel.js';
import { estimateGreen } from '../src/readout/estimateGreen.js';
import { resolventEncoding } from '../src/resolvent/resolventEncoding.js';
import type { ResolventReport } from '../src/resolvent/ResolventReport.js';
import { solvedGround } from '../src/cli/readout/solvedGround.js';

const z = { re: 0.5, im: 1 };
const models: FermionModel[] = [
  loadModelFile(fileURLToPath(new URL('../circuits/hubbard-dimer.json', import.meta.url))),
  parseModel({ name: 'hubbard-chain3', lattice: { shape: 'chain', sites: 3, hopping: 1 }, interaction: 4, chemicalPotential: 2, electrons: 3 }, 'chain3'),
];

const rows: string[] = ['| model | route | degree (particle/hole) | α | qubits (circuit) | gates per part | wall time | |G − exact| | bound |', '|---|---|---|---|---|---|---|---|---|'];
for (const model of models) {
  const ground = solvedGround(model);
  const exact = greensFunction(model, ground.level, { z: [z], pairs: [[0, 0]] }).entries[0]!;
  for (const route of ['preconditioned', 'direct'] as const) {
    const reports: ResolventReport[] = [];
    const t0 = performance.now();
    const estimate = estimateGreen({
      modes: model.modes, electrons: model.electrons, groundEnergy: ground.energy, states: ground.states, pair: [0, 0], z,
      resolvent: (w) => {
        const encoding = resolventEncoding(model, w, { route, precision: 1e-6 });
        reports.push(encoding.report);
        return encoding;
      },
    });
    const seconds = (performance.now() - t0) / 1000;
    const gap = Math.hypot(estimate.value.re - exact.re[0]!, estimate.value.im - exact.im[0]!);
    rows.push(`| ${model.name} (${model.modes} modes, ${ground.states.length} ground state${ground.states.length > 1 ? 's' : ''}) | ${route} | ${reports.map((r) => r.degree).join(' / ')} | ` +
      `${Math.max(...estimate.parts.map((p) => p.alpha)).toFixed(1)} | ${estimate.qubits} | ${estimate.parts.map((p) => totalGates(p.gates)).join(' / ')} | ` +
      `${seconds.toFixed(1)} s | ${gap.toExponential(1)} | ${estimate.errorBound.toExponential(1)} |`);
    process.stderr.write(`${rows.at(-1)}\n`);
  }
}
process.stdout.write(`${rows.join('\n')}\n`);
