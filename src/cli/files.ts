/**
 * Safe output files: never the input, never an existing file unless asked,
 * never anything but a regular file (a device, FIFO, socket or symbolic link
 * is refused even with --force), never half-written (a temporary file in the
 * same folder is renamed into place only once complete), and never with wider
 * permissions than the file it replaces or, for a new file, the input.
 */
import { createHash, randomBytes } from 'node:crypto';
import {
  closeSync,
  existsSync,
  fchmodSync,
  fsyncSync,
  linkSync,
  lstatSync,
  openSync,
  readdirSync,
  realpathSync,
  renameSync,
  rmSync,
  statSync,
  writeSync,
  type Stats,
} from 'node:fs';
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
  const existing = lstatOrUndefined(target);
  if (existing?.isDirectory()) throw new CliFailure(`cannot write ${output}: it is a folder; give a file name`);
  if (existing !== undefined && !existing.isFile()) {
    throw new CliFailure(`cannot write ${output}: it is ${kindOf(existing)}, not a regular file; choose another -o file`);
  }
  return target;
}

function lstatOrUndefined(path: string): Stats | undefined {
  try {
    return lstatSync(path);
  } catch {
    return undefined;
  }
}

/** What a non-regular directory entry is, for messages. */
function kindOf(stats: Stats): string {
  if (stats.isSymbolicLink()) return 'a symbolic link';
  if (stats.isCharacterDevice() || stats.isBlockDevice()) return 'a device';
  if (stats.isFIFO()) return 'a named pipe';
  if (stats.isSocket()) return 'a socket';
  return 'not a regular file';
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
  const absolute = resolve(output);
  const inputReal = realpathSync(input);
  const linked = lstatOrUndefined(absolute);
  // A link to the input is named as such (before the general refusal of links).
  if (linked?.isSymbolicLink() && existsSync(absolute) && realpathSync(absolute) === inputReal) {
    throw new CliFailure(`refusing to write over the input ${input}; choose another -o file`);
  }
  const target = resolveOutputPath(output);
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

/** Leading part of every temporary name for an output: fixed length, so long output names still fit. */
function temporaryPrefix(target: string): string {
  const hash = createHash('sha256').update(basename(target)).digest('hex').slice(0, 16);
  return `.driftcell-${hash}.`;
}

const TEMPORARY_NAME = /^\.driftcell-[0-9a-f]{16}\.(\d+)\.[0-9a-f]{8}\.tmp$/;

/** Whether a process with this id is running (a temporary of a running write is not stale). */
function processRuns(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Removes temporary files a killed earlier write for the same output left
 * beside it (ours by name: the output's hash and a process id that no longer runs).
 *
 * @param target - resolved output path
 * @returns how many were removed
 */
export function removeStaleTemporaries(target: string): number {
  const prefix = temporaryPrefix(target);
  let removed = 0;
  for (const name of readdirSync(dirname(target))) {
    const match = name.startsWith(prefix) ? TEMPORARY_NAME.exec(name) : null;
    if (match === null || Number(match[1]) === process.pid || processRuns(Number(match[1]))) continue;
    const path = join(dirname(target), name);
    if (lstatOrUndefined(path)?.isFile()) {
      rmSync(path, { force: true });
      removed++;
    }
  }
  return removed;
}

/**
 * The permissions a written file gets: those of the regular file it replaces,
 * else those of `modeFrom` (the input) without execute bits, else the usual
 * 0666; never wider than the process umask allows for a new file.
 */
function outputMode(target: string, replace: boolean, modeFrom?: string): number {
  const existing = replace ? lstatOrUndefined(target) : undefined;
  if (existing?.isFile()) return existing.mode & 0o7777;
  const umask = process.umask();
  const base = modeFrom !== undefined ? statSync(modeFrom).mode & 0o666 : 0o666;
  return base & ~umask;
}

/**
 * Writes bytes to a file atomically: readers see the old file or the whole
 * new one, never a part. The temporary file is created readable by the owner
 * only and given its final permissions (see outputMode) before it is renamed
 * into place; stale temporaries of earlier killed writes are removed first.
 *
 * @param target - resolved output path
 * @param bytes - the file's content
 * @param replace - whether an existing regular file may be replaced; if false and one appears, the write fails
 * @param modeFrom - for a new file, the file whose permissions it takes (the input); default 0666 less umask
 * @throws CliFailure when `replace` is false and the file exists, or when the target is not a regular file
 */
export function writeFileAtomically(target: string, bytes: Uint8Array, replace: boolean, modeFrom?: string): void {
  const existing = lstatOrUndefined(target);
  if (existing !== undefined && !existing.isFile()) {
    throw new CliFailure(`cannot write ${target}: it is ${kindOf(existing)}, not a regular file; choose another -o file`);
  }
  removeStaleTemporaries(target);
  const mode = outputMode(target, replace, modeFrom);
  const temporary = join(dirname(target), `${temporaryPrefix(target)}${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
  try {
    const fd = openSync(temporary, 'wx', 0o600);
    try {
      // writeSync may write less than asked (a full disk, a signal): loop until every byte is down.
      for (let written = 0; written < bytes.length;) written += writeSync(fd, bytes, written, bytes.length - written);
      fchmodSync(fd, mode);
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
      // Checked again just before the rename: only a regular file is ever replaced.
      const now = lstatOrUndefined(target);
      if (now !== undefined && !now.isFile()) {
        throw new CliFailure(`cannot write ${target}: it is ${kindOf(now)}, not a regular file; choose another -o file`);
      }
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
