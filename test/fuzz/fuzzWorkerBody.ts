/**
 * fuzzWorkerBody: runs fuzz inputs through the `polewright` program in this worker thread, one message per input,
 * exactly as src/cli/main.ts maps failures to exit codes (0 ok, 2 InputError or usage, 1 internal error or a
 * reported failure), capturing stdout and stderr; replies with the outcome and the memory this isolate holds.
 */
import { parentPort } from 'node:worker_threads';
import { CommanderError } from 'commander';
import { isInputError } from '../../src/core/InputError.js';
import { buildProgram } from '../../src/cli/program.js';

export interface WorkerRequest {
  readonly index: number;
  readonly argv: readonly string[];
}

export type WorkerOutcome = 'ok' | 'input-error' | 'internal-error' | 'reported-failure';

export interface WorkerReply {
  readonly index: number;
  readonly outcome: WorkerOutcome;
  readonly exitCode: number;
  readonly stdout: string;
  readonly stderr: string;
  /** Error name and message for an internal error, with the stack. */
  readonly error?: string;
  /** heapUsed + arrayBuffers of this isolate after the input, in bytes. */
  readonly retainedBytes: number;
}

/** Captured output is cut to this length: enough to read the message, small enough for 10 000 replies. */
const KEEP_CHARACTERS = 2000;

const port = parentPort;
if (port === null) throw new RangeError('fuzzWorkerBody: must run in a worker thread');

type Write = typeof process.stdout.write;

function capture(stream: NodeJS.WriteStream, sink: { text: string }): Write {
  const original = stream.write;
  stream.write = ((chunk: string | Uint8Array) => {
    if (sink.text.length < KEEP_CHARACTERS) sink.text += typeof chunk === 'string' ? chunk : Buffer.from(chunk).toString('utf8');
    return true;
  }) as Write;
  return original;
}

async function runOne(request: WorkerRequest): Promise<WorkerReply> {
  const out = { text: '' };
  const err = { text: '' };
  const originalOut = capture(process.stdout, out);
  const originalErr = capture(process.stderr, err);
  process.exitCode = undefined;
  let outcome: WorkerOutcome = 'ok';
  let exitCode = 0;
  let error: string | undefined;
  try {
    await buildProgram().parseAsync(['node', 'polewright', ...request.argv]);
    if (process.exitCode !== undefined && process.exitCode !== 0) {
      outcome = 'reported-failure';
      exitCode = Number(process.exitCode);
    }
  } catch (thrown) {
    if (thrown instanceof CommanderError) {
      outcome = thrown.exitCode === 0 ? 'ok' : 'input-error';
      exitCode = thrown.exitCode === 0 ? 0 : 2;
    } else if (isInputError(thrown)) {
      outcome = 'input-error';
      exitCode = 2;
      err.text += `polewright: ${thrown.message}\n`;
    } else {
      outcome = 'internal-error';
      exitCode = 1;
      const detail = thrown instanceof Error ? thrown.message : String(thrown);
      err.text += `polewright: internal error: ${detail}\n`;
      error = thrown instanceof Error ? (thrown.stack ?? `${thrown.name}: ${thrown.message}`) : String(thrown);
    }
  } finally {
    process.stdout.write = originalOut;
    process.stderr.write = originalErr;
    process.exitCode = undefined;
  }
  const usage = process.memoryUsage();
  return {
    index: request.index,
    outcome,
    exitCode,
    stdout: out.text.slice(0, KEEP_CHARACTERS),
    stderr: err.text.slice(0, KEEP_CHARACTERS),
    ...(error === undefined ? {} : { error }),
    retainedBytes: usage.heapUsed + usage.arrayBuffers,
  };
}

port.on('message', (request: WorkerRequest) => {
  void runOne(request).then((reply) => port.postMessage(reply));
});
port.postMessage({ ready: buildProgram().commands.map((command) => command.name()) });
