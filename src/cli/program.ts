/**
 * buildProgram: the commander program with every subcommand registered.
 * Each command lives in its own file under commands/ and exports one `register…` function.
 */
import { Command } from 'commander';
import { VERSION } from '../core/version.js';
import { registerCheckCommand } from './commands/check.js';
import { registerCostCommand } from './commands/cost.js';
import { registerExactCommand } from './commands/exact.js';
import { registerRunCommand } from './commands/run.js';
import { registerVerifyCommand } from './commands/verify.js';
import { registerEstimateCommand } from './commands/estimate.js';
import { registerBuildCommand } from './commands/build.js';
import { registerDemoCommand } from './commands/demo.js';

export function buildProgram(): Command {
  const program = new Command();
  program
    .name('polewright')
    .description("Quantum circuits for many-body Green's functions: synthesize, simulate, export, cost.")
    .version(VERSION)
    .exitOverride()
    .showHelpAfterError(false)
    .configureOutput({ writeErr: (text) => process.stderr.write(text) });
  registerRunCommand(program);
  registerCheckCommand(program);
  registerExactCommand(program);
  registerVerifyCommand(program);
  registerEstimateCommand(program);
  registerBuildCommand(program);
  registerDemoCommand(program);
  registerCostCommand(program);
  return program;
}
