/**
 * Output-file safety: the input is never the output (by path, symbolic link
 * or hard link), an existing output is only replaced when asked, and writes
 * leave no temporary files behind.
 */
import { linkSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
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
