/**
 * programShell: the commander program without its subcommands, and a loader per subcommand that imports only that
 * command's module. `polewright <command> …` registers just the command it runs (each command module pulls in its own
 * stages, so loading all of them costs a tenth of a second or more at every start); buildProgram registers them all.
 */
import { Command } from 'commander';
import { VERSION } from '../core/version.js';

type Register = (program: Command) => void;

export function programShell(): Command {
  return new Command()
    .name('polewright')
    .description("Quantum circuits for many-body Green's functions: synthesize, simulate, export, cost.")
    .version(VERSION)
    .exitOverride()
    .showHelpAfterError(false)
    .configureOutput({ writeErr: (text) => process.stderr.write(text) });
}

/** Each subcommand's module, by command name, in the order `polewright --help` lists them. */
export const COMMAND_LOADERS: Readonly<Record<string, () => Promise<Register>>> = {
  run: async () => (await import('./commands/run.js')).registerRunCommand,
  check: async () => (await import('./commands/check.js')).registerCheckCommand,
  exact: async () => (await import('./commands/exact.js')).registerExactCommand,
  verify: async () => (await import('./commands/verify.js')).registerVerifyCommand,
  estimate: async () => (await import('./commands/estimate.js')).registerEstimateCommand,
  build: async () => (await import('./commands/build.js')).registerBuildCommand,
  demo: async () => (await import('./commands/demo.js')).registerDemoCommand,
  cost: async () => (await import('./commands/cost.js')).registerCostCommand,
};

/** The program with only `name` registered when it names a subcommand; else null (help, version, a mistyped name). */
export async function programFor(name: string | undefined): Promise<Command | null> {
  const load = name !== undefined && Object.hasOwn(COMMAND_LOADERS, name) ? COMMAND_LOADERS[name] : undefined;
  if (!load) return null;
  const program = programShell();
  (await load())(program);
  return program;
}
