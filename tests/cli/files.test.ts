/**
 * Output-file safety: the input is never the output (by path, symbolic link
 * or hard link), an existing output is only replaced when asked, and writes
 * leave no temporary files behind.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import {
  chmodSync,
  linkSync,
  lstatSync,
  mkdirSync,
  mkdtempSync,
  readFileSync,
  readdirSync,
  rmSync,
  statSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { checkOutputAgainstInput, resolveOutputPath, writeFileAtomically } from '../../src/cli/files';
import { CliFailure } from '../../src/cli/failure';

let folder: string;
beforeEach(() => {
  folder = mkdtempSync(join(tmpdir(), 'driftcell-files-'));
  writeFileSync(join(folder, 'in.xlsx'), 'input bytes');
});
afterEach(() => rmSync(folder, { recursive: true, force: true }));

const at = (name: string) => join(folder, name);

describe('checkOutputAgainstInput', () => {
  it('refuses the input itself, even with force', () => {
    expect(() => checkOutputAgainstInput(at('in.xlsx'), at('in.xlsx'), true)).toThrow(/refusing to write over the input/);
    expect(() => checkOutputAgainstInput(at('in.xlsx'), join(folder, '.', 'in.xlsx'), true)).toThrow(CliFailure);
  });

  it('refuses an output that reaches the input through a symbolic link or a hard link', () => {
    symlinkSync(at('in.xlsx'), at('soft.xlsx'));
    linkSync(at('in.xlsx'), at('hard.xlsx'));
    expect(() => checkOutputAgainstInput(at('in.xlsx'), at('soft.xlsx'), true)).toThrow(/refusing to write over the input/);
    expect(() => checkOutputAgainstInput(at('in.xlsx'), at('hard.xlsx'), true)).toThrow(/same file/);
    expect(() => checkOutputAgainstInput(at('soft.xlsx'), at('in.xlsx'), true)).toThrow(/refusing to write over the input/);
  });

  it('refuses an input reached through a linked folder', () => {
    symlinkSync(folder, at('alias'), 'dir');
    expect(() => checkOutputAgainstInput(at('in.xlsx'), join(folder, 'alias', 'in.xlsx'), true)).toThrow(/refusing/);
  });

  it('refuses an existing output without force and accepts it with force', () => {
    writeFileSync(at('out.xlsx'), 'old');
    expect(() => checkOutputAgainstInput(at('in.xlsx'), at('out.xlsx'), false)).toThrow(/already exists; add --force/);
    expect(checkOutputAgainstInput(at('in.xlsx'), at('out.xlsx'), true)).toBe(resolveOutputPath(at('out.xlsx')));
  });

  it('names a missing folder and refuses a folder as output', () => {
    mkdirSync(at('sub'));
    expect(() => resolveOutputPath(join(folder, 'nope', 'out.xlsx'))).toThrow(/folder .* does not exist/);
    expect(() => resolveOutputPath(at('sub'))).toThrow(/it is a folder/);
  });
});

describe('writeFileAtomically', () => {
  it('writes the whole content and leaves no temporary file', () => {
    writeFileAtomically(resolveOutputPath(at('out.xlsx')), Buffer.from('new content'), false);
    expect(readFileSync(at('out.xlsx'), 'utf8')).toBe('new content');
    expect(readdirSync(folder).sort()).toEqual(['in.xlsx', 'out.xlsx']);
  });

  it('does not replace a file that exists unless told to', () => {
    writeFileSync(at('out.xlsx'), 'old');
    expect(() => writeFileAtomically(resolveOutputPath(at('out.xlsx')), Buffer.from('new'), false)).toThrow(/already exists/);
    expect(readFileSync(at('out.xlsx'), 'utf8')).toBe('old');
    writeFileAtomically(resolveOutputPath(at('out.xlsx')), Buffer.from('new'), true);
    expect(readFileSync(at('out.xlsx'), 'utf8')).toBe('new');
    expect(readdirSync(folder).sort()).toEqual(['in.xlsx', 'out.xlsx']);
  });
});

describe('--force replaces only a regular file (issue 14 §4)', () => {
  const refusal = /not a regular file; choose another -o file/;

  it('refuses a device, a named pipe and a symbolic link, even with force, and leaves them as they were', () => {
    expect(() => checkOutputAgainstInput(at('in.xlsx'), '/dev/null', true)).toThrow(/\/dev\/null: it is a device, not a regular file/);
    execFileSync('mkfifo', [at('pipe.xlsx')]);
    expect(() => checkOutputAgainstInput(at('in.xlsx'), at('pipe.xlsx'), true)).toThrow(/it is a named pipe/);
    symlinkSync('/proc/self/fd/1', at('stdout.xlsx'));
    expect(() => checkOutputAgainstInput(at('in.xlsx'), at('stdout.xlsx'), true)).toThrow(/it is a symbolic link/);
    writeFileSync(at('other.xlsx'), 'other');
    symlinkSync(at('other.xlsx'), at('link.xlsx'));
    expect(() => checkOutputAgainstInput(at('in.xlsx'), at('link.xlsx'), true)).toThrow(refusal);
    // And at the moment of writing, should one appear between the check and the write.
    expect(() => writeFileAtomically(at('link.xlsx'), Buffer.from('x'), true)).toThrow(refusal);
    expect(lstatSync(at('link.xlsx')).isSymbolicLink()).toBe(true);
    expect(lstatSync(at('pipe.xlsx')).isFIFO()).toBe(true);
    expect(readFileSync(at('other.xlsx'), 'utf8')).toBe('other');
  });

  it('keeps the permissions of the file it replaces', () => {
    writeFileSync(at('out.xlsx'), 'old', { mode: 0o600 });
    chmodSync(at('out.xlsx'), 0o600);
    writeFileAtomically(at('out.xlsx'), Buffer.from('new'), true, at('in.xlsx'));
    expect(statSync(at('out.xlsx')).mode & 0o777).toBe(0o600);
  });

  it('gives a new file the input’s permissions, never wider', () => {
    chmodSync(at('in.xlsx'), 0o640);
    writeFileAtomically(at('new.xlsx'), Buffer.from('new'), false, at('in.xlsx'));
    expect(statSync(at('new.xlsx')).mode & 0o777).toBe(0o640 & ~process.umask());
    chmodSync(at('in.xlsx'), 0o755);
    writeFileAtomically(at('new2.xlsx'), Buffer.from('new'), false, at('in.xlsx'));
    expect(statSync(at('new2.xlsx')).mode & 0o111).toBe(0);
  });
});

describe('temporary files', () => {
  it('removes what a killed earlier write for the same output left, and nothing else', () => {
    // A process id that does not run: a child that has exited.
    const dead = spawnSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))'], { encoding: 'utf8' }).stdout;
    writeFileAtomically(at('out.xlsx'), Buffer.from('first'), false);
    const [ours] = readdirSync(folder).filter((n) => n.startsWith('.'));
    expect(ours).toBeUndefined();
    const stale = `.driftcell-${createHash('sha256').update('out.xlsx').digest('hex').slice(0, 16)}.${dead}.0123abcd.tmp`;
    writeFileSync(at(stale), 'half a workbook');
    writeFileSync(at('.out.xlsx.notes'), 'the user’s own');
    writeFileAtomically(at('out.xlsx'), Buffer.from('second'), true);
    expect(readdirSync(folder).sort()).toEqual(['.out.xlsx.notes', 'in.xlsx', 'out.xlsx']);
  });

  it('writes an output whose name is near the file-system limit of 255 bytes', () => {
    const name = `${'w'.repeat(250)}.xlsx`;
    writeFileAtomically(resolveOutputPath(at(name)), Buffer.from('long'), false);
    expect(readFileSync(at(name), 'utf8')).toBe('long');
    expect(readdirSync(folder).sort()).toEqual(['in.xlsx', name].sort());
  });
});
