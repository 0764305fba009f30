/** What `npm start` decides and prints, without starting anything long-lived. */
import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from 'fs';
import os from 'os';
import path from 'path';
import { hasExcelDesktop, main, missingBuildOutputs, projectPaths, sideloadInstructions } from '../../dev/start';

describe('npm start', () => {
  it('sideloads only where Excel desktop exists', () => {
    expect(hasExcelDesktop('win32')).toBe(true);
    expect(hasExcelDesktop('darwin')).toBe(true);
    expect(hasExcelDesktop('linux')).toBe(false);
  });

  it('finds a missing build', () => {
    const root = mkdtempSync(path.join(os.tmpdir(), 'driftcell-start-'));
    try {
      const paths = projectPaths(root);
      expect(missingBuildOutputs(paths)).toHaveLength(4);
      mkdirSync(path.join(paths.addinDir, 'help'), { recursive: true });
      for (const f of ['functions.json', 'functions.js', 'taskpane.html', 'help/index.html'])
        writeFileSync(path.join(paths.addinDir, f), '');
      expect(missingBuildOutputs(paths)).toEqual([]);
    } finally {
      rmSync(root, { recursive: true, force: true });
    }
  });

  it('tells a Linux user how to sideload into Excel on the web and how to trust the certificate', () => {
    const paths = projectPaths('/project');
    const text = sideloadInstructions(paths, {
      key: Buffer.alloc(0),
      cert: Buffer.alloc(0),
      certPath: '/c/localhost.crt',
      caPath: '/c/ca.crt',
      origin: 'existing',
    });
    expect(text).toContain('https://localhost:3000/');
    expect(text).toContain('Insert > Add-ins > Upload My Add-in');
    expect(text).toContain(path.join('/project', 'manifest', 'manifest.xml'));
    expect(text).toContain('/c/ca.crt');
    const selfSigned = sideloadInstructions(paths, {
      key: Buffer.alloc(0),
      cert: Buffer.alloc(0),
      certPath: '/c/localhost.crt',
      origin: 'openssl',
    });
    expect(selfSigned).toContain('self-signed');
  });

  it('rejects unknown arguments, and --serve-only without a build', async () => {
    await expect(main(['--port', '4000'], '/nonexistent')).rejects.toThrow('unknown argument --port 4000; allowed: --serve-only');
    await expect(main(['--serve-only'], '/nonexistent')).rejects.toThrow(/the add-in is not built/);
  });
});
