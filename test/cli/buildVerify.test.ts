// polewright build then polewright verify (built CLI): every block-encoding that build writes for the demo scenario passes
// the verify command line its manifest states, run in the output folder (exit 0, "ok": true); the readout files are
// declared Hadamard tests, not block-encodings; a file with one gate altered fails its command (exit 1).
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../helpers/close.js';
import { runCli } from '../helpers/runCli.js';

const DEMO = fileURLToPath(new URL('../../circuits/double-dot-nanowire.json', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'polewright-build-verify-'));

interface EncodingEntry {
  readonly file: string;
  readonly kind: string;
  readonly operator: string;
  readonly operatorForm: string;
  readonly alpha: number;
  readonly errorBound: number;
  readonly qubits: number;
  readonly tolerance: number;
  readonly verifyMode: 'exhaustive' | 'probe';
  readonly verify: string;
  readonly verifyArgs: string[];
  readonly registers: { system: { name: string; qubits: number }; signal: { name: string }[]; clean: { name: string }[] };
}

function build(name: string, args: readonly string[]): { out: string; manifest: { files: { kind: string }[]; encodings: EncodingEntry[]; encodingsOmitted: unknown[] } } {
  const out = join(dir, name);
  const result = runCli(['build', DEMO, ...args, '--out', out]);
  expect(result.stderr).toBe('');
  expect(result.status).toBe(0);
  return { out, manifest: JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')) };
}

/** Runs `polewright ARGS --json` in `out`; extra options come last, so they override the stated ones. */
function verify(out: string, args: readonly string[], extra: readonly string[] = []): { status: number | null; report: { ok: boolean; alpha: number; mode: string; maxError: number; clean: Record<string, number> } } {
  const result = runCli([...args, ...extra, '--json'], { cwd: out });
  expect(result.stderr, args.join(' ')).toBe('');
  return { status: result.status, report: JSON.parse(result.stdout) };
}

/** The stated command passes: exit 0, ok, the stated α, the stated mode, every clean register back to |0>. */
function expectPasses(out: string, entry: EncodingEntry, extra: readonly string[] = []): void {
  expect(entry.verify).toBe(`polewright ${entry.verifyArgs.join(' ')}`);
  const { status, report } = verify(out, entry.verifyArgs, extra);
  expect(status, entry.verify).toBe(0);
  expect(report.ok, entry.verify).toBe(true);
  // verify reports α as 1/(1/α): equal up to one rounding.
  expectClose(report.alpha, entry.alpha, 1e-14, `${entry.file}: alpha`);
  expect(report.mode).toBe(entry.verifyMode);
  expect(report.maxError).toBeLessThanOrEqual(entry.tolerance);
  expect(Object.keys(report.clean)).toEqual(entry.registers.clean.map((r) => r.name));
}

describe('polewright build writes block-encodings that polewright verify accepts', () => {
  it('the demo point (pair 0,0, z = -0.75 + 0.5i, preconditioned route, precision 1e-7, as `polewright demo` builds it)', () => {
    const { out, manifest } = build('demo-point', ['--pair', '0,0', '--z', '-0.75,0.5', '--route', 'preconditioned', '--precision', '1e-7']);
    expect(manifest.files.map((f) => f.kind)).toEqual(['hadamard-test', 'hadamard-test', 'hadamard-test', 'hadamard-test']);
    expect(manifest.encodingsOmitted).toEqual([]);
    expect(manifest.encodings.map((e) => e.file)).toEqual([
      'encoding-H.qasm', 'encoding-A.qasm', 'encoding-B.qasm', 'encoding-a0.qasm', 'encoding-a0-dagger.qasm',
      'encoding-resolvent-particle.qasm', 'encoding-particle.qasm', 'encoding-resolvent-hole.qasm', 'encoding-hole.qasm',
    ]);
    const readme = readFileSync(join(out, 'README.txt'), 'utf8');
    for (const entry of manifest.encodings) {
      expect(entry.kind).toBe('block-encoding');
      expect(readme).toContain(entry.verify);
      expect(entry.registers.system).toEqual({ name: 'system', qubits: 4 });
      if (entry.verifyMode === 'exhaustive') expectPasses(out, entry);
      // 16 qubits from a QASM file (no native fast-inverse kernel) cost seconds per run: one probe, as the stated command
      // with --probes 1 (the clean register's leak is checked on one more random input).
      else if (entry.file.startsWith('encoding-resolvent-')) expectPasses(out, entry, ['--probes', '1']);
    }
    // Which were checked here: the 18-qubit parts (tens of seconds per probe) are checked on the direct route below.
    expect(manifest.encodings.filter((e) => e.verifyMode === 'probe').map((e) => [e.file, e.qubits])).toEqual([
      ['encoding-resolvent-particle.qasm', 16], ['encoding-particle.qasm', 18], ['encoding-resolvent-hole.qasm', 16], ['encoding-hole.qasm', 18],
    ]);
  });

  it('the direct route for an off-diagonal pair: every written encoding, the parts included, column by column', () => {
    const { out, manifest } = build('direct-01', ['--pair', '0,1', '--z', '-0.75,0.5', '--route', 'direct']);
    expect(manifest.encodings.map((e) => e.file)).toEqual([
      'encoding-H.qasm', 'encoding-A.qasm', 'encoding-B.qasm', 'encoding-a0.qasm', 'encoding-a1-dagger.qasm',
      'encoding-resolvent-particle.qasm', 'encoding-particle.qasm', 'encoding-resolvent-hole.qasm', 'encoding-hole.qasm',
    ]);
    for (const entry of manifest.encodings) {
      expect(entry.verifyMode).toBe('exhaustive');
      expectPasses(out, entry);
    }
    // The approximate encodings state a tolerance that covers their rigorous bound; the exact ones only rounding.
    const resolvent = manifest.encodings.find((e) => e.file === 'encoding-resolvent-particle.qasm')!;
    expect(resolvent.errorBound).toBeGreaterThan(0);
    expect(resolvent.tolerance).toBeGreaterThanOrEqual(resolvent.errorBound);
    expect(manifest.encodings.find((e) => e.file === 'encoding-H.qasm')!.tolerance).toBe(1e-8);
  });

  it('a written encoding with one rotation angle altered fails its stated command with exit 1', () => {
    const { out, manifest } = build('mutated', ['--pair', '0,1', '--z', '-0.75,0.5', '--route', 'direct']);
    const entry = manifest.encodings.find((e) => e.file === 'encoding-H.qasm')!;
    const text = readFileSync(join(out, entry.file), 'utf8');
    const mutated = text.replace(/ry\((-?[0-9.e-]+)\)/, (_, angle: string) => `ry(${Number(angle) + 0.01})`);
    expect(mutated).not.toBe(text);
    writeFileSync(join(out, entry.file), mutated);
    const { status, report } = verify(out, entry.verifyArgs);
    expect(status).toBe(1);
    expect(report.ok).toBe(false);
    expect(report.maxError).toBeGreaterThan(entry.tolerance);
  });
});
