/**
 * encodingFolderFiles: each readout block-encoding as its own OpenQASM 3 file (registers `system`, then the encoding's
 * ancilla registers under their own names) with its operator file beside it, and the manifest entry that states α, the
 * registers by role and the exact `polewright verify` command line (run in the folder) that checks the pair.
 */
import { ancillaQubits } from '../../blocks/BlockEncoding.js';
import { CircuitBuilder } from '../../circuit/CircuitBuilder.js';
import { call } from '../../circuit/ops.js';
import { operatorFileJson } from '../../operatorFile/operatorFileJson.js';
import { writeQasmNamed } from '../../qasm/writeQasm.js';
import { DEFAULT_EXHAUSTIVE_LIMIT } from '../../verify/verifyCircuit.js';
import type { ReadoutEncoding } from './readoutEncodings.js';

/** Rounding allowance of an encoding exact up to floating point (verify's default tolerance). */
const ROUNDING_TOLERANCE = 1e-8;

/** Random states of the stated command when the circuit is too wide to check column by column. */
const VERIFY_PROBES = 8;

interface RegisterEntry {
  readonly name: string;
  readonly qubits: number;
}

export interface EncodingManifestEntry {
  readonly file: string;
  readonly kind: 'block-encoding';
  readonly encodes: string;
  /** The operator file beside it, and its form. */
  readonly operator: string;
  readonly operatorForm: 'matrix' | 'pauli' | 'ladder';
  readonly alpha: number;
  /** Rigorous bound on ‖block − M/α‖ (0: exact up to rounding). */
  readonly errorBound: number;
  readonly registers: { readonly system: RegisterEntry; readonly signal: readonly RegisterEntry[]; readonly clean: readonly RegisterEntry[] };
  readonly qubits: number;
  /** How the stated command checks: every system basis column, or seeded random states (a lower bound on the error). */
  readonly verifyMode: 'exhaustive' | 'probe';
  /** errorBound plus the rounding allowance, rounded up to three digits. */
  readonly tolerance: number;
  /** The command line, run in the folder; exit 0 when the file encodes the operator within the tolerance. */
  readonly verify: string;
  /** The same command as an argument list (after `polewright`). */
  readonly verifyArgs: readonly string[];
}

export interface EncodingFolderFiles {
  readonly files: Map<string, string>;
  readonly entries: readonly EncodingManifestEntry[];
}

/** x rounded up to three significant digits. */
function roundUp3(x: number): number {
  const unit = 10 ** (Math.floor(Math.log10(x)) - 2);
  return Number((Math.ceil(x / unit) * unit).toPrecision(3));
}

function rendered(item: ReadoutEncoding): { qasm: string; entry: EncodingManifestEntry; operator: string } {
  const { encoding } = item;
  const builder = new CircuitBuilder();
  const qubits = [...builder.qubits('system', encoding.systemQubits), ...encoding.ancillas.flatMap((r) => builder.qubits(r.name, r.size))];
  builder.add(call(encoding.block, qubits));
  const circuit = builder.build();
  const { text: qasm, qubitRegisterNames } = writeQasmNamed(circuit);
  const file = `${item.stem}.qasm`;
  // The writer renames a register that clashes with an OpenQASM word; the command names the registers as written.
  const written = circuit.qubitRegisters.map((r, k) => ({ name: qubitRegisterNames[k]!, qubits: r.size }));
  const system = written[0]!;
  const ancillas = written.slice(1);
  const signal = ancillas.filter((_, k) => encoding.ancillas[k]!.role === 'signal');
  const clean = ancillas.filter((_, k) => encoding.ancillas[k]!.role === 'clean');
  const total = encoding.systemQubits + ancillaQubits(encoding);
  const verifyMode = total <= DEFAULT_EXHAUSTIVE_LIMIT ? 'exhaustive' : 'probe';
  const tolerance = roundUp3(encoding.errorBound + ROUNDING_TOLERANCE);
  const operator = `${item.stem}.operator.json`;
  const list = (registers: readonly RegisterEntry[]) => registers.map((r) => r.name).join(',');
  const verifyArgs = [
    'verify', file, '--encodes', operator, '--alpha', String(encoding.alpha), '--system', system.name,
    ...(signal.length > 0 ? ['--signal', list(signal)] : []),
    ...(clean.length > 0 ? ['--clean', list(clean)] : []),
    ...(verifyMode === 'probe' ? ['--probes', String(VERIFY_PROBES), '--seed', '1'] : []),
    '--tolerance', String(tolerance),
  ];
  const target = item.operator;
  const operatorForm = 'matrix' in target ? 'matrix' : 'pauli' in target ? 'pauli' : 'ladder';
  const description = `${item.encodes}; mode j is qubit j of register '${system.name}' of ${file}`;
  return {
    qasm,
    operator: `${JSON.stringify({ description, ...operatorFileJson(target) })}\n`,
    entry: {
      file,
      kind: 'block-encoding',
      encodes: item.encodes,
      operator,
      operatorForm,
      alpha: encoding.alpha,
      errorBound: encoding.errorBound,
      registers: { system, signal, clean },
      qubits: total,
      verifyMode,
      tolerance,
      verify: `polewright ${verifyArgs.join(' ')}`,
      verifyArgs,
    },
  };
}

export function encodingFolderFiles(encodings: readonly ReadoutEncoding[]): EncodingFolderFiles {
  const files = new Map<string, string>();
  const entries: EncodingManifestEntry[] = [];
  for (const item of encodings) {
    const { qasm, operator, entry } = rendered(item);
    files.set(entry.file, qasm);
    files.set(entry.operator, operator);
    entries.push(entry);
  }
  return { files, entries };
}
