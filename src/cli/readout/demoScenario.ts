/**
 * demoScenario: the built-in demo — an invented double quantum dot in a gated nanowire (circuits/double-dot-nanowire.json:
 * dot levels −0.75 and 0.25, interdot tunnelling 0.375, so the one-body energies −0.875 and 0.375 lie on the 1/8 grid and
 * the fast inverse is exact; charging energy 0.5 on each dot; two electrons; η = 0.5) — the frequencies of its gate-level
 * points, and the readout folder of its one recorded point (circuits/demo-point/, also written by `demo`).
 */
import { fileURLToPath } from 'node:url';
import type { FermionModel } from '../../model/FermionModel.js';
import { greenParts } from '../../readout/greenParts.js';
import { hadamardTests } from '../../readout/hadamardTests.js';
import { jsonHeader } from '../format/jsonHeader.js';
import { readoutEncodings } from './readoutEncodings.js';
import { readoutFolderFiles } from './readoutFolderFiles.js';
import { routeResolvent } from './routeResolvent.js';
import type { SolvedGround } from './solvedGround.js';

/** The scenario file, found relative to this module (src/ or dist/ alike). */
export const DEMO_MODEL_PATH = fileURLToPath(new URL('../../../circuits/double-dot-nanowire.json', import.meta.url));

/** The entry the demo reads out: the left dot's spin-up orbital, G_00. */
export const DEMO_PAIR: readonly [number, number] = [0, 0];

/** ω of the gate-level points (z = ω + iη), spread over the spectral window. */
export const DEMO_FREQUENCIES: readonly number[] = Array.from({ length: 9 }, (_, k) => -3 + 0.75 * k);

export const DEMO_PRECISION = 1e-7;

/** The point whose circuits are written out: ω = −0.75 on the preconditioned route. */
export const DEMO_POINT = { omega: -0.75, route: 'preconditioned' as const };

/** The readout folder (Hadamard tests, block-encodings with operator files, manifest.json, README.txt) of DEMO_POINT. */
export function demoPointFiles(model: FermionModel, ground: SolvedGround): Map<string, string> {
  const z = { re: DEMO_POINT.omega, im: model.broadening };
  const resolvent = routeResolvent(model, DEMO_POINT.route, DEMO_PRECISION);
  const parts = greenParts({ modes: model.modes, electrons: model.electrons, groundEnergy: ground.energy, pair: DEMO_PAIR, z, resolvent: resolvent.factory });
  const encodings = readoutEncodings(model, DEMO_PAIR, parts, DEMO_POINT.route);
  return readoutFolderFiles(hadamardTests(parts, ground.states), {
    model: model.name,
    pair: DEMO_PAIR,
    z,
    groundEnergy: ground.energy,
    route: DEMO_POINT.route,
    precision: DEMO_PRECISION,
    initialState: ground.description,
    states: ground.states.length,
  }, jsonHeader('demo', { pair: DEMO_PAIR, z: [z.re, z.im], route: DEMO_POINT.route, precision: DEMO_PRECISION }), encodings);
}
