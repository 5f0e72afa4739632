import { describe, expect, it } from 'vitest';
import { buildProgram } from '../../src/cli/program.js';
import { COMMAND_LOADERS, programFor } from '../../src/cli/programShell.js';

describe('programFor (the command line registers only the command it runs)', () => {
  it('knows every command of the full program, in its order', () => {
    expect(Object.keys(COMMAND_LOADERS)).toEqual(buildProgram().commands.map((c) => c.name()));
  });

  it('registers each command with the same options, arguments and help as the full program', async () => {
    const full = buildProgram();
    for (const name of Object.keys(COMMAND_LOADERS)) {
      const program = await programFor(name);
      expect(program!.commands.map((c) => c.name())).toEqual([name]);
      const alone = program!.commands[0]!;
      const reference = full.commands.find((c) => c.name() === name)!;
      expect(alone.helpInformation(), name).toBe(reference.helpInformation());
      expect(program!.version()).toBe(full.version());
    }
  });

  it('gives null for help, version, a missing or a mistyped command name (the full program answers those)', async () => {
    for (const name of [undefined, '--help', '-V', 'help', 'nosuch', 'toString', '__proto__']) expect(await programFor(name)).toBeNull();
  });
});
