/**
 * Safe output files: never the input, never an existing file unless asked,
 * and never half-written (a temporary file in the same folder is renamed
 * into place only once complete).
 */
import { randomBytes } from 'node:crypto';
import { closeSync, existsSync, fsyncSync, linkSync, openSync, realpathSync, renameSync, rmSync, statSync, writeSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { CliFailure } from './failure';

/** Error codes of link() on file systems without hard links. */
const NO_HARD_LINKS = new Set(['EPERM', 'ENOTSUP', 'EOPNOTSUPP', 'EXDEV', 'ENOSYS']);

/**
 * The absolute path an output will have, with its folder's symbolic links resolved.
 *
 * @throws CliFailure when the folder does not exist or the path is a folder
 */
export function resolveOutputPath(output: string): string {
  const absolute = resolve(output);
  const folder = dirname(absolute);
  if (!existsSync(folder) || !statSync(folder).isDirectory()) {
    throw new CliFailure(`cannot write ${output}: folder ${folder} does not exist`);
  }
  const target = join(realpathSync(folder), basename(absolute));
  if (existsSync(target) && statSync(target).isDirectory()) {
    throw new CliFailure(`cannot write ${output}: it is a folder; give a file name`);
  }
  return target;
}

/**
 * Refuses an output that is the input itself, by real path or by identity
 * (hard links, case-insensitive file systems), and an existing output unless
 * `force`.
 *
 * @param input - the input file (must exist)
 * @param output - the output as given by the user
 * @param force - whether an existing output other than the input may be replaced
 * @returns the resolved output path
 */
export function checkOutputAgainstInput(input: string, output: string, force: boolean): string {
  const target = resolveOutputPath(output);
  const inputReal = realpathSync(input);
  if (target === inputReal) throw new CliFailure(`refusing to write over the input ${input}; choose another -o file`);
  if (existsSync(target)) {
    const a = statSync(inputReal);
    const b = statSync(target);
    if ((a.dev === b.dev && a.ino === b.ino) || realpathSync(target) === inputReal) {
      throw new CliFailure(`refusing to write over the input ${input} (${output} is the same file); choose another -o file`);
    }
    if (!force) throw new CliFailure(`${output} already exists; add --force to replace it, or choose another -o file`);
  }
  return target;
}

/**
 * Writes bytes to a file atomically: readers see the old file or the whole
 * new one, never a part.
 *
 * @param target - resolved output path
 * @param bytes - the file's content
 * @param replace - whether an existing file may be replaced; if false and one appears, the write fails
 * @throws CliFailure when `replace` is false and the file exists
 */
export function writeFileAtomically(target: string, bytes: Uint8Array, replace: boolean): void {
  const temporary = join(dirname(target), `.${basename(target)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
  try {
    const fd = openSync(temporary, 'wx');
    try {
      // writeSync may write less than asked (a full disk, a signal): loop until every byte is down.
      for (let written = 0; written < bytes.length; ) written += writeSync(fd, bytes, written, bytes.length - written);
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
  } catch (e) {
    rmSync(temporary, { force: true });
    // One line for the user (no space, no permission …) instead of an unexpected-failure report.
    const code = (e as NodeJS.ErrnoException).code;
    throw new CliFailure(`cannot write ${target}${code ? ` (${code})` : ''}: ${e instanceof Error ? e.message.split('\n')[0] : String(e)}`);
  }
  try {
    if (replace) {
      renameSync(temporary, target);
      return;
    }
    try {
      // link() fails if the target exists, so a file created meanwhile is never replaced.
      linkSync(temporary, target);
      rmSync(temporary);
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code ?? '';
      if (code === 'EEXIST') throw new CliFailure(`${target} already exists; not replacing it`);
      if (!NO_HARD_LINKS.has(code)) throw e;
      if (existsSync(target)) throw new CliFailure(`${target} already exists; not replacing it`);
      renameSync(temporary, target);
    }
  } finally {
    rmSync(temporary, { force: true });
  }
}
