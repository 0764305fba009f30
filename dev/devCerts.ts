/**
 * HTTPS certificates for serving the add-in on https://localhost.
 *
 * Order of preference:
 * 1. certificates already in the folder office-addin-dev-certs uses
 *    (~/.office-addin-dev-certs), if present, matching and not expiring;
 * 2. new ones made there by office-addin-dev-certs (pure JavaScript; it makes a
 *    local CA and a localhost certificate, and installs nothing);
 * 3. a self-signed localhost certificate from the `openssl` program.
 * Node itself cannot make X.509 certificates, so without 2 and 3 this fails
 * with a message saying what to install.
 */
import { spawnSync } from 'child_process';
import { X509Certificate, createPrivateKey } from 'crypto';
import { existsSync, mkdirSync, mkdtempSync, readFileSync } from 'fs';
import os from 'os';
import path from 'path';

export interface DevCertificate {
  readonly key: Buffer;
  readonly cert: Buffer;
  /** The CA that signed cert, when there is one to trust. */
  readonly caPath?: string;
  readonly certPath: string;
  /** How the certificate was obtained, for the console. */
  readonly origin: 'existing' | 'office-addin-dev-certs' | 'openssl';
}

/** office-addin-dev-certs' folder and file names (its defaults module). */
export const DEV_CERT_DIRECTORY = path.join(os.homedir(), '.office-addin-dev-certs');
const CA_FILE = 'ca.crt';
const CERT_FILE = 'localhost.crt';
const KEY_FILE = 'localhost.key';
/** Days a new certificate is valid; office-addin-dev-certs uses 30 too. */
const VALID_DAYS = 30;
/** A certificate this close to expiry is replaced rather than reused. */
const MIN_REMAINING_MS = 24 * 3600 * 1000;

/**
 * Whether a certificate/key pair can serve https://localhost now.
 *
 * @returns null if usable, otherwise why not
 */
export function whyUnusable(certPem: Buffer, keyPem: Buffer, now: Date = new Date()): string | null {
  let x509: X509Certificate;
  try {
    x509 = new X509Certificate(certPem);
  } catch (e) {
    return `certificate cannot be read (${e instanceof Error ? e.message : String(e)})`;
  }
  if (Date.parse(x509.validTo) - now.getTime() < MIN_REMAINING_MS) return `certificate expires ${x509.validTo}`;
  if (Date.parse(x509.validFrom) > now.getTime()) return `certificate is valid only from ${x509.validFrom}`;
  if (!(x509.subjectAltName ?? '').includes('DNS:localhost')) return 'certificate does not name localhost';
  try {
    if (!x509.checkPrivateKey(createPrivateKey(keyPem))) return 'key does not match the certificate';
  } catch (e) {
    return `key cannot be read (${e instanceof Error ? e.message : String(e)})`;
  }
  return null;
}

function readIfUsable(directory: string): DevCertificate | null {
  const certPath = path.join(directory, CERT_FILE);
  const keyPath = path.join(directory, KEY_FILE);
  if (!existsSync(certPath) || !existsSync(keyPath)) return null;
  const cert = readFileSync(certPath);
  const key = readFileSync(keyPath);
  if (whyUnusable(cert, key) !== null) return null;
  const caPath = path.join(directory, CA_FILE);
  return { key, cert, certPath, caPath: existsSync(caPath) ? caPath : undefined, origin: 'existing' };
}

async function generateWithOfficeTool(directory: string): Promise<DevCertificate | null> {
  let tool: typeof import('office-addin-dev-certs');
  try {
    tool = await import('office-addin-dev-certs');
  } catch {
    return null; // a production install without dev dependencies
  }
  mkdirSync(directory, { recursive: true });
  await tool.generateCertificates(
    path.join(directory, CA_FILE),
    path.join(directory, CERT_FILE),
    path.join(directory, KEY_FILE),
    VALID_DAYS,
    ['127.0.0.1', 'localhost'],
  );
  const made = readIfUsable(directory);
  return made && { ...made, origin: 'office-addin-dev-certs' };
}

function generateWithOpenssl(directory: string): DevCertificate | null {
  mkdirSync(directory, { recursive: true });
  const certPath = path.join(directory, CERT_FILE);
  const keyPath = path.join(directory, KEY_FILE);
  const result = spawnSync(
    'openssl',
    [
      'req',
      '-x509',
      '-newkey',
      'rsa:2048',
      '-nodes',
      '-keyout',
      keyPath,
      '-out',
      certPath,
      '-days',
      String(VALID_DAYS),
      '-subj',
      '/CN=localhost',
      '-addext',
      'subjectAltName=DNS:localhost,IP:127.0.0.1',
    ],
    { stdio: 'pipe' },
  );
  if (result.error || result.status !== 0) return null;
  const made = readIfUsable(directory);
  return made && { ...made, caPath: undefined, origin: 'openssl' };
}

export interface CertificateOptions {
  /** Folder to reuse or fill; defaults to office-addin-dev-certs' folder. */
  readonly directory?: string;
  /** Skip office-addin-dev-certs (for tests of the openssl path). */
  readonly useOfficeTool?: boolean;
}

/**
 * Finds or makes a certificate for https://localhost.
 *
 * @param options - folder and generator choice
 * @returns key, certificate and where they came from
 * @throws Error naming what to install when no generator is available
 */
export async function loadDevCertificate(options: CertificateOptions = {}): Promise<DevCertificate> {
  const directory = options.directory ?? DEV_CERT_DIRECTORY;
  const existing = readIfUsable(directory);
  if (existing) return existing;
  // office-addin-dev-certs never overwrites an existing CA, so stale files mean a fresh folder.
  const stale = existsSync(path.join(directory, CA_FILE)) || existsSync(path.join(directory, CERT_FILE));
  const target = stale ? mkdtempSync(path.join(os.tmpdir(), 'driftcell-certs-')) : directory;
  const made = (options.useOfficeTool === false ? null : await generateWithOfficeTool(target)) ?? generateWithOpenssl(target);
  if (made) return made;
  throw new Error(
    'no HTTPS certificate for localhost could be found or made: install the dev dependencies (npm install, which brings ' +
      'office-addin-dev-certs) or the openssl program (Debian: sudo apt-get install openssl)',
  );
}
