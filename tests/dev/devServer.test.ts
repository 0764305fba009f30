/**
 * The development server: static files over HTTP and HTTPS on a free
 * loopback port, nothing outside its folder, and certificates made in a
 * temporary folder (never the user's own).
 */
import { mkdtempSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'fs';
import http from 'http';
import https from 'https';
import os from 'os';
import path from 'path';
import { spawnSync } from 'child_process';
import { loadDevCertificate, whyUnusable } from '../../dev/devCerts';
import { resolveInside, startStaticServer, type RunningServer } from '../../dev/devServer';

interface Reply {
  status: number;
  type: string | undefined;
  body: string;
}

function request(url: string, options: https.RequestOptions = {}): Promise<Reply> {
  const client = url.startsWith('https:') ? https : http;
  return new Promise((resolve, reject) => {
    const req = client.request(url, { timeout: 5000, ...options }, (res) => {
      let body = '';
      res.setEncoding('utf8');
      res.on('data', (d: string) => (body += d));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, type: res.headers['content-type'], body }));
    });
    req.on('timeout', () => req.destroy(new Error(`no answer from ${url}`)));
    req.on('error', reject);
    req.end();
  });
}

let folder: string;
beforeAll(() => {
  folder = mkdtempSync(path.join(os.tmpdir(), 'driftcell-serve-'));
  mkdirSync(path.join(folder, 'site', 'help'), { recursive: true });
  writeFileSync(path.join(folder, 'site', 'functions.json'), '{"functions":[]}');
  writeFileSync(path.join(folder, 'site', 'help', 'index.html'), '<!doctype html><title>help</title>');
  writeFileSync(path.join(folder, 'secret.txt'), 'outside the served folder');
});
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('startStaticServer over HTTP', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startStaticServer(path.join(folder, 'site'), { port: 0 });
  });
  afterAll(() => server.close());

  it('listens on a free loopback port', () => {
    expect(server.port).toBeGreaterThan(0);
    expect(server.url).toBe(`http://127.0.0.1:${server.port}`);
  });

  it('serves a file with its content type', async () => {
    const reply = await request(`${server.url}/functions.json`);
    expect(reply).toEqual({ status: 200, type: 'application/json; charset=utf-8', body: '{"functions":[]}' });
  });

  it('serves a folder by its index.html', async () => {
    const reply = await request(`${server.url}/help/`);
    expect(reply.status).toBe(200);
    expect(reply.body).toContain('<title>help</title>');
  });

  it('answers 404 for a missing file and never leaves its folder', async () => {
    expect((await request(`${server.url}/nothing.js`)).status).toBe(404);
    // The URL parser folds an encoded dot-dot segment back inside the folder: not found, not the secret.
    const dotted = await request(`${server.url}/%2e%2e/secret.txt`);
    expect(dotted.status).toBe(404);
    expect(dotted.body).not.toContain('outside the served folder');
    expect((await request(`${server.url}/..%2fsecret.txt`)).status).toBe(400);
    expect(resolveInside(path.join(folder, 'site'), '/../secret.txt')).toBe(path.join(folder, 'site', 'secret.txt'));
  });

  it('refuses methods other than GET and HEAD', async () => {
    const reply = await request(`${server.url}/functions.json`, { method: 'POST' });
    expect(reply.status).toBe(405);
    const head = await request(`${server.url}/functions.json`, { method: 'HEAD' });
    expect(head.status).toBe(200);
    expect(head.body).toBe('');
  });

  it('reports a taken port clearly', async () => {
    await expect(startStaticServer(folder, { port: server.port })).rejects.toThrow(`port ${server.port} on 127.0.0.1 is already in use`);
  });
});

describe('startStaticServer over HTTPS', () => {
  it('serves with a certificate made by office-addin-dev-certs in a temporary folder', async () => {
    const certFolder = path.join(folder, 'certs-office');
    const cert = await loadDevCertificate({ directory: certFolder });
    expect(cert.origin).toBe('office-addin-dev-certs');
    expect(cert.caPath).toBe(path.join(certFolder, 'ca.crt'));
    expect(whyUnusable(cert.cert, cert.key)).toBeNull();
    const server = await startStaticServer(path.join(folder, 'site'), { port: 0, tls: cert });
    try {
      expect(server.url).toBe(`https://localhost:${server.port}`);
      const reply = await request(`https://127.0.0.1:${server.port}/functions.json`, {
        ca: [readFileSync(cert.caPath as string)],
        servername: 'localhost',
      });
      expect(reply.status).toBe(200);
      expect(reply.body).toBe('{"functions":[]}');
    } finally {
      await server.close();
    }
    // A second call reuses the certificate instead of making another.
    expect((await loadDevCertificate({ directory: certFolder })).origin).toBe('existing');
  });

  const hasOpenssl = spawnSync('openssl', ['version']).status === 0;
  (hasOpenssl ? it : it.skip)('falls back to a self-signed certificate from openssl', async () => {
    const cert = await loadDevCertificate({ directory: path.join(folder, 'certs-openssl'), useOfficeTool: false });
    expect(cert.origin).toBe('openssl');
    expect(cert.caPath).toBeUndefined();
    const server = await startStaticServer(path.join(folder, 'site'), { port: 0, tls: cert });
    try {
      const reply = await request(`https://127.0.0.1:${server.port}/help/index.html`, { ca: [cert.cert], servername: 'localhost' });
      expect(reply.status).toBe(200);
    } finally {
      await server.close();
    }
  });

  it('explains why a certificate is unusable', () => {
    expect(whyUnusable(Buffer.from('not a certificate'), Buffer.from(''))).toMatch(/certificate cannot be read/);
  });
});
