/**
 * readTextFileLimited: reads a UTF-8 text file of at most `maxBytes`, refusing a larger one before
 * reading it whole: a regular file by its size, anything else (a device such as /dev/zero, a pipe)
 * once that many bytes have arrived. Memory stays below maxBytes + 1 whatever the file.
 */
import { closeSync, fstatSync, openSync, readSync } from 'node:fs';
import { formatBytes } from './memoryBudget.js';
import { InputError } from './InputError.js';

/**
 * @param what the kind of file for messages, e.g. "OpenQASM program"
 * @throws InputError naming the file: missing, a directory, unreadable, or larger than maxBytes (stating the limit).
 */
export function readTextFileLimited(path: string, maxBytes: number, what: string): string {
  if (!Number.isSafeInteger(maxBytes) || maxBytes < 0) throw new RangeError(`readTextFileLimited: maxBytes ${maxBytes} is not a byte count`);
  const tooLarge = (): InputError => new InputError(`${path}: the ${what} is larger than ${formatBytes(maxBytes)}, the most it may be`);
  let fd: number;
  try {
    fd = openSync(path, 'r');
  } catch (error) {
    throw unreadable(path, what, error);
  }
  try {
    const stat = fstatSync(fd);
    if (stat.isDirectory()) throw new InputError(`${path}: cannot read the ${what}: it is a directory`);
    if (stat.isFile() && stat.size > maxBytes) throw tooLarge();
    // A regular file's size is known; anything else grows the buffer by doubling up to the limit.
    let buffer = Buffer.allocUnsafe(stat.isFile() ? stat.size + 1 : Math.min(1 << 16, maxBytes + 1));
    let filled = 0;
    for (;;) {
      if (filled === buffer.length) {
        const larger = Buffer.allocUnsafe(Math.min(2 * buffer.length, maxBytes + 1));
        buffer.copy(larger, 0, 0, filled);
        buffer = larger;
      }
      const read = readSync(fd, buffer, filled, buffer.length - filled, null);
      if (read === 0) break;
      filled += read;
      if (filled > maxBytes) throw tooLarge();
    }
    return buffer.toString('utf8', 0, filled);
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw unreadable(path, what, error);
  } finally {
    closeSync(fd);
  }
}

function unreadable(path: string, what: string, error: unknown): InputError {
  const code = (error as NodeJS.ErrnoException).code;
  const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a directory' : (error as Error).message;
  return new InputError(`${path}: cannot read the ${what}: ${why}`);
}
