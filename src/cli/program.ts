/**
 * buildProgram: the commander program with every subcommand registered.
 * Each command lives in its own file under commands/ and exports one `register…` function.
 */
import { Command } from 'commander';
import { registerCheckCommand } from './commands/check.js';
import { registerExactCommand } from './commands/exact.js';
import { registerRunCommand } from './commands/run.js';

export function buildProgram(): Command {
  const program = new Command();
  program
    .name('polewright')
    .description("Quantum circuits for many-body Green's functions: synthesize, simulate, export, cost.")
    .version('0.1.0')
    .exitOverride()
    .showHelpAfterError(false)
    .configureOutput({ writeErr: (text) => process.stderr.write(text) });
  registerRunCommand(program);
  registerCheckCommand(program);
  registerExactCommand(program);
  return program;
}
