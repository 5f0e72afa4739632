// VERSION: the package.json version, the one `polewright --version` prints and every JSON header carries.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildProgram } from '../../src/cli/program.js';
import { VERSION } from '../../src/core/version.js';

describe('VERSION', () => {
  it('equals the "version" field of package.json and the version the program reports', () => {
    const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string };
    expect(VERSION).toBe(pkg.version);
    expect(buildProgram().version()).toBe(pkg.version);
  });
});
