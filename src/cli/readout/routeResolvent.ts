/**
 * routeResolvent: the resolvent factory the readout commands hand to the readout stage — the QSVT block-encoding of
 * (w − H)⁻¹ on the requested electron sector by the chosen route (preconditioned by the fast inverse of the one-body
 * part, or direct) at the requested precision — and the construction report of every encoding it made. The encodings
 * cover the whole Fock space, with no electron window: H conserves N, so their block on the N ± 1 sector is that
 * sector's resolvent, and the window's counter qubits are saved.
 */
import type { BlockEncoding } from '../../blocks/BlockEncoding.js';
import type { FermionModel } from '../../model/FermionModel.js';
import type { ResolventFactory } from '../../readout/ResolventFactory.js';
import { resolventEncoding } from '../../resolvent/resolventEncoding.js';
import type { ResolventReport } from '../../resolvent/ResolventReport.js';
import type { Route } from './parseReadoutOptions.js';

export interface RouteResolvent {
  readonly factory: ResolventFactory;
  /** The report of an encoding this factory made. */
  readonly reportOf: (encoding: BlockEncoding) => ResolventReport | undefined;
}

export function routeResolvent(model: FermionModel, route: Route, precision: number): RouteResolvent {
  const reports = new Map<BlockEncoding, ResolventReport>();
  return {
    factory: (w) => {
      const encoding = resolventEncoding(model, w, { route, precision });
      reports.set(encoding, encoding.report);
      return encoding;
    },
    reportOf: (encoding) => reports.get(encoding),
  };
}
