/**
 * Output files are never half-written: failures simulated while the
 * temporary file is written, flushed or renamed leave neither a partial
 * output nor a temporary file, and end in a one-line CliFailure. A write
 * that the system accepts only in part (writeSync returning fewer bytes) is
 * continued, not renamed into place short.
 */
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { writeFileAtomically } from '../../src/cli/files';
import { CliFailure } from '../../src/cli/failure';

// The module's own bindings are not reconfigurable, so the calls a failure is simulated in are wrapped once, here.
jest.mock('node:fs', () => {
  const actual = jest.requireActual<typeof import('node:fs')>('node:fs');
  return { ...actual, writeSync: jest.fn(actual.writeSync), fsyncSync: jest.fn(actual.fsyncSync), renameSync: jest.fn(actual.renameSync) };
});
const actualFs = jest.requireActual<typeof import('node:fs')>('node:fs');
const fs = jest.requireMock<{ writeSync: jest.Mock; fsyncSync: jest.Mock; renameSync: jest.Mock }>('node:fs');

let folder: string;
beforeEach(() => {
  folder = mkdtempSync(join(tmpdir(), 'driftcell-atomic-'));
});
afterEach(() => {
  fs.writeSync.mockImplementation(actualFs.writeSync);
  fs.fsyncSync.mockImplementation(actualFs.fsyncSync);
  fs.renameSync.mockImplementation(actualFs.renameSync);
  rmSync(folder, { recursive: true, force: true });
});

const payload = Buffer.from('x'.repeat(100_000));

function diskFull(): never {
  throw Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });
}

describe('writeFileAtomically under failure', () => {
  it('leaves nothing behind when the disk fills half-way through the write', () => {
    let calls = 0;
    const realWrite = actualFs.writeSync as (fd: number, b: Uint8Array, o: number, l: number) => number;
    fs.writeSync.mockImplementation((fd: number, buffer: Uint8Array, offset?: number, length?: number) => {
      calls++;
      if (calls % 2 === 1) return realWrite(fd, buffer, offset ?? 0, Math.floor((length ?? buffer.length) / 2));
      return diskFull();
    });
    const target = join(folder, 'out.xlsx');
    expect(() => writeFileAtomically(target, payload, false)).toThrow(CliFailure);
    expect(() => writeFileAtomically(target, payload, false)).toThrow(
      /^cannot write .*out\.xlsx \(ENOSPC\): ENOSPC: no space left on device, write$/,
    );
    expect(readdirSync(folder)).toEqual([]);
  });

  it('keeps the old output whole when flushing fails, with --force', () => {
    const target = join(folder, 'out.xlsx');
    writeFileSync(target, 'previous complete file');
    fs.fsyncSync.mockImplementation(() => diskFull());
    expect(() => writeFileAtomically(target, payload, true)).toThrow(/cannot write/);
    expect(readFileSync(target, 'utf8')).toBe('previous complete file');
    expect(readdirSync(folder)).toEqual(['out.xlsx']);
  });

  it('removes the temporary file when the rename fails', () => {
    const target = join(folder, 'out.xlsx');
    fs.renameSync.mockImplementation(() => {
      throw Object.assign(new Error('EACCES: permission denied, rename'), { code: 'EACCES' });
    });
    expect(() => writeFileAtomically(target, payload, true)).toThrow(/EACCES/);
    expect(readdirSync(folder)).toEqual([]);
  });

  it('finishes a write the system accepts only in part, instead of renaming a short file into place', () => {
    const realWrite = actualFs.writeSync as (fd: number, b: Uint8Array, o: number, l: number) => number;
    fs.writeSync.mockImplementation((fd: number, buffer: Uint8Array, offset?: number, length?: number) =>
      realWrite(fd, buffer, offset ?? 0, Math.min(length ?? buffer.length, 4096)),
    );
    const target = join(folder, 'out.xlsx');
    writeFileAtomically(target, payload, false);
    expect(readFileSync(target).equals(payload)).toBe(true);
    expect(readdirSync(folder)).toEqual(['out.xlsx']);
  });
});
