/**
 * routeResolvent: the resolvent factory the readout commands hand to the readout stage — the QSVT block-encoding of
 * (w − H)⁻¹ on the requested electron sector by the chosen route (preconditioned by the fast inverse of the one-body
 * part, or direct) at the requested precision — and the construction report of every encoding it made. The encodings
 * cover the whole Fock space, with no electron window: H conserves N, so their block on the N ± 1 sector is that
 * sector's resolvent, and the window's counter qubits are saved. A shift the construction cannot reach (a QSVT degree
 * beyond its cap, a precision the fast inverse cannot meet — RangeErrors of the resolvent and QSVT stages) is the
 * user's choice of z, route and precision, so it becomes an InputError naming w, the route and what to change.
 * The factory keeps what it made, so asking twice for the same shift and sector (a work estimate before the run, then
 * the run) builds the encoding once.
 */
import type { BlockEncoding } from '../../blocks/BlockEncoding.js';
import { InputError } from '../../core/InputError.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import type { FermionModel } from '../../model/FermionModel.js';
import type { ResolventFactory } from '../../readout/ResolventFactory.js';
import { resolventEncoding } from '../../resolvent/resolventEncoding.js';
import type { ResolventReport } from '../../resolvent/ResolventReport.js';
import { formatComplex } from './formatComplex.js';
import type { Route } from './parseReadoutOptions.js';

export interface RouteResolvent {
  readonly factory: ResolventFactory;
  /** The report of an encoding this factory made. */
  readonly reportOf: (encoding: BlockEncoding) => ResolventReport | undefined;
}

/** The InputError for a resolvent at w that cannot be built: the reason and the ways around it. */
export function unreachableResolventError(w: ComplexScalar, route: Route, precision: number, reason: string): InputError {
  const ways = ['a larger Im z (broadening)', ...(route === 'direct' ? [] : ['--route direct']), 'a coarser --precision'];
  return new InputError(
    `cannot build the resolvent (w − H)⁻¹ at w = ${formatComplex(w, 6)} by the ${route} route at precision ${precision}: ${reason}; ` +
      `try ${ways.join(', ')}, or see the sizes first with \`polewright cost\``,
  );
}

export function routeResolvent(model: FermionModel, route: Route, precision: number): RouteResolvent {
  const reports = new Map<BlockEncoding, ResolventReport>();
  const made = new Map<string, BlockEncoding>();
  return {
    factory: (w, electrons) => {
      const key = `${w.re},${w.im},${electrons}`;
      const earlier = made.get(key);
      if (earlier !== undefined) return earlier;
      let encoding;
      try {
        encoding = resolventEncoding(model, w, { route, precision });
      } catch (error) {
        if (error instanceof RangeError) throw unreachableResolventError(w, route, precision, error.message);
        throw error;
      }
      reports.set(encoding, encoding.report);
      made.set(key, encoding);
      return encoding;
    },
    reportOf: (encoding) => reports.get(encoding),
  };
}
