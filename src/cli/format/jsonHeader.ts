/**
 * jsonHeader: the first keys of every `--json` object: which tool and version wrote it, which command,
 * and the inputs that determine it (files as given, every option with the value actually used, defaults
 * included), so a saved output describes itself.
 */
import { VERSION } from '../../core/version.js';

export interface JsonHeader<Inputs> {
  readonly tool: 'polewright';
  readonly version: string;
  readonly command: string;
  readonly inputs: Inputs;
}

/** Spread it first: `{ ...jsonHeader('run', { file, shots, seed }), ...result }`. */
export function jsonHeader<Inputs extends Record<string, unknown>>(command: string, inputs: Inputs): JsonHeader<Inputs> {
  return { tool: 'polewright', version: VERSION, command, inputs };
}
