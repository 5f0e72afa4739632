#!/usr/bin/env node
/**
 * The `polewright` command: builds the program from the command module it runs (all of them for help, version or a
 * mistyped name) and maps failures to exit codes (0 success, 2 bad input or usage, 1 internal error). No stack trace
 * for user mistakes.
 */
import { CommanderError } from 'commander';
import { programFor } from './programShell.js';
import { isInputError } from '../core/InputError.js';

// A reader that closes the pipe early (`polewright … --json | head`) ends the command quietly, not with a stack trace.
process.stdout.on('error', (error: NodeJS.ErrnoException) => {
  if (error.code === 'EPIPE') process.exit(0);
  throw error;
});

async function main(argv: string[]): Promise<number> {
  const program = (await programFor(argv[2])) ?? (await import('./program.js')).buildProgram();
  try {
    await program.parseAsync(argv);
    return 0;
  } catch (error) {
    if (error instanceof CommanderError) {
      // Commander has already printed its message; help and version are successes.
      return error.exitCode === 0 ? 0 : 2;
    }
    if (isInputError(error)) {
      process.stderr.write(`polewright: ${error.message}\n`);
      return 2;
    }
    const detail = error instanceof Error ? error.message : String(error);
    process.stderr.write(`polewright: internal error: ${detail}\n`);
    if (process.env.POLEWRIGHT_DEBUG && error instanceof Error && error.stack) {
      process.stderr.write(`${error.stack}\n`);
    }
    return 1;
  }
}

main(process.argv).then(
  (code) => {
    // A command may itself report a failed check (exit 1) through process.exitCode.
    if (code !== 0 || process.exitCode === undefined) process.exitCode = code;
  },
  () => {
    process.exitCode = 1;
  },
);
