/**
 * ResolventFactory: how the readout obtains a block-encoding of the resolvent (w − H)⁻¹ on the sector with a given
 * electron number. The caller passes it in (a QSVT resolvent, or any stand-in whose operator it can check), so the
 * readout stage builds circuits around whatever encoding it is given.
 */
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';

/** Returns a block-encoding of (w − H)⁻¹ that is correct at least on the `electrons`-electron sector. */
export type ResolventFactory = (w: ComplexScalar, electrons: number) => BlockEncoding;
