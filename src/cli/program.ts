/**
 * buildProgram: the commander program with every subcommand registered (the command line registers only the one it
 * runs, programShell.programFor). Each command lives in its own file under commands/ and exports one `register…` function.
 */
import type { Command } from 'commander';
import { programShell } from './programShell.js';
import { registerCheckCommand } from './commands/check.js';
import { registerCostCommand } from './commands/cost.js';
import { registerExactCommand } from './commands/exact.js';
import { registerRunCommand } from './commands/run.js';
import { registerVerifyCommand } from './commands/verify.js';
import { registerEstimateCommand } from './commands/estimate.js';
import { registerBuildCommand } from './commands/build.js';
import { registerDemoCommand } from './commands/demo.js';

export function buildProgram(): Command {
  const program = programShell();
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
