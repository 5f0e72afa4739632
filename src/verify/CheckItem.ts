/**
 * CheckItem: one encoding for a `check` row, with an optional independent reference and an optional set of system columns.
 */
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import type { ReferenceOperator } from './verifyEncoding.js';

export interface CheckItem {
  readonly encoding: BlockEncoding;
  /** The reference to compare with (default: the encoding's exact()). */
  readonly reference?: () => ReferenceOperator;
  /** Check exactly these system basis columns (verifyEncoding's `columns`). */
  readonly columns?: readonly number[];
}
