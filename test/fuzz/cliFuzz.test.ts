// The seeded fuzz sample of the `polewright` CLI: mutated model files, OpenQASM programs and options from circuits/
// must end in a result or an InputError — no internal error, no input left without an answer, no memory overrun.
// The full corpus (10 000 inputs, every command) is scripts/fuzz-cli.ts.
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { FAILURE_CLASSES, runFuzzCorpus } from './runFuzzCorpus.js';

const CIRCUITS = fileURLToPath(new URL('../../circuits', import.meta.url));

/** The commands quick enough on the seed models for CI; check and build simulate whole encodings and stay in the script. */
const SAMPLED_COMMANDS = ['run', 'exact', 'cost', 'estimate', 'verify'];

/**
 * Per-input limits of the sample, well below the script's DEFAULT_TIME_LIMITS so that one slow input cannot take the
 * sample past a minute: the slowest sampled inputs answer in about 7 s on two shared cores (a ring4 estimate refused by
 * its QSVT degree cap, a run of a million nested gates).
 */
const SAMPLE_TIME_LIMITS = { run: 20_000, exact: 20_000, cost: 20_000, estimate: 20_000, verify: 20_000 };

describe('polewright CLI on a seeded fuzz sample', () => {
  it('300 mutated inputs (corpus seed 20240601) give no internal error, timeout or memory overrun', async () => {
    const summary = await runFuzzCorpus({ circuitsFolder: CIRCUITS, corpusSeed: 20240601, count: 300, commands: SAMPLED_COMMANDS, timeLimits: SAMPLE_TIME_LIMITS });
    const failures = summary.results
      .filter((r) => FAILURE_CLASSES.includes(r.fuzzClass))
      .map((r) => `#${r.input.index} ${r.input.command} ${r.fuzzClass}: ${r.stderr.trim()} (${r.input.description.join('; ')}; replay ${r.savedTo})`);
    expect(summary.results).toHaveLength(300);
    expect(failures).toEqual([]);
    // The sample must reach both outcomes, or the mutations are too weak or too strong to test anything.
    expect(summary.results.some((r) => r.fuzzClass === 'ok')).toBe(true);
    expect(summary.results.some((r) => r.fuzzClass === 'input-error')).toBe(true);
  });
});
