/**
 * A small static file server for the built add-in (dist/addin), over HTTPS
 * for Excel or plain HTTP for tests. It serves files under one root folder
 * only, answers GET and HEAD, and binds to the loopback address by default.
 */
import { createReadStream, promises as fs } from 'fs';
import http from 'http';
import https from 'https';
import type { AddressInfo } from 'net';
import path from 'path';

/** Content types of the files the add-in build produces. */
export const CONTENT_TYPES: Readonly<Record<string, string>> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.png': 'image/png',
  '.svg': 'image/svg+xml',
  '.ico': 'image/x-icon',
  '.xml': 'application/xml; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
};

const FALLBACK_TYPE = 'application/octet-stream';

export type RequestHandler = (req: http.IncomingMessage, res: http.ServerResponse) => void;

function send(res: http.ServerResponse, status: number, text: string): void {
  res.writeHead(status, { 'Content-Type': 'text/plain; charset=utf-8', 'Cache-Control': 'no-store' });
  res.end(text);
}

/**
 * Resolves a request path to a file inside root, or null if it would leave root.
 *
 * @param root - absolute folder served
 * @param requestUrl - the request's URL (path and query)
 */
export function resolveInside(root: string, requestUrl: string): string | null {
  let pathname: string;
  try {
    pathname = decodeURIComponent(new URL(requestUrl, 'http://localhost').pathname);
  } catch {
    return null;
  }
  if (pathname.includes('\0')) return null;
  const resolved = path.resolve(root, `.${pathname}`);
  const relative = path.relative(root, resolved);
  if (relative.startsWith('..') || path.isAbsolute(relative)) return null;
  return resolved;
}

/**
 * A request handler serving the files under root; a folder serves its index.html.
 *
 * @param root - folder to serve (made absolute)
 */
export function staticRequestHandler(root: string): RequestHandler {
  const absoluteRoot = path.resolve(root);
  return (req, res) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') {
      res.setHeader('Allow', 'GET, HEAD');
      send(res, 405, `method ${req.method} not allowed; this server only serves files (GET, HEAD)`);
      return;
    }
    const target = resolveInside(absoluteRoot, req.url ?? '/');
    if (target === null) {
      send(res, 400, 'bad path');
      return;
    }
    void serveFile(target, req, res);
  };
}

async function serveFile(target: string, req: http.IncomingMessage, res: http.ServerResponse): Promise<void> {
  let file = target;
  try {
    let stat = await fs.stat(file);
    if (stat.isDirectory()) {
      file = path.join(file, 'index.html');
      stat = await fs.stat(file);
    }
    if (!stat.isFile()) throw new Error('not a file');
    res.writeHead(200, {
      'Content-Type': CONTENT_TYPES[path.extname(file).toLowerCase()] ?? FALLBACK_TYPE,
      'Content-Length': stat.size,
      // A development server: always serve the latest build.
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
      // Excel on the web reads functions.json and the bundle from its own origin.
      'Access-Control-Allow-Origin': '*',
    });
    if (req.method === 'HEAD') {
      res.end();
      return;
    }
    createReadStream(file)
      .on('error', () => res.destroy())
      .pipe(res);
  } catch {
    send(res, 404, `not found: ${req.url ?? '/'}`);
  }
}

export interface TlsFiles {
  readonly key: Buffer | string;
  readonly cert: Buffer | string;
}

export interface ServerOptions {
  /** Port to listen on; 0 picks a free one. */
  readonly port: number;
  /** Address to bind; defaults to 127.0.0.1 (loopback only). */
  readonly host?: string;
  /** Key and certificate for HTTPS; plain HTTP without. */
  readonly tls?: TlsFiles;
}

export interface RunningServer {
  /** Base URL, e.g. https://localhost:3000 or http://127.0.0.1:41234. */
  readonly url: string;
  readonly port: number;
  close(): Promise<void>;
}

/**
 * Starts a server with the given handler.
 *
 * @param handler - the request handler (e.g. staticRequestHandler(root))
 * @param options - port, host, TLS material
 * @returns the running server; rejects with a clear message if the port is taken
 */
export function startServer(handler: RequestHandler, options: ServerOptions): Promise<RunningServer> {
  const host = options.host ?? '127.0.0.1';
  const server = options.tls ? https.createServer({ key: options.tls.key, cert: options.tls.cert }, handler) : http.createServer(handler);
  const scheme = options.tls ? 'https' : 'http';
  return new Promise((resolve, reject) => {
    server.once('error', (err: NodeJS.ErrnoException) => {
      reject(
        err.code === 'EADDRINUSE'
          ? new Error(`port ${options.port} on ${host} is already in use; stop the other server (another npm start?) and try again`)
          : err,
      );
    });
    server.listen(options.port, host, () => {
      const port = (server.address() as AddressInfo).port;
      // Certificates name "localhost"; plain HTTP tests use the numeric address.
      const urlHost = options.tls ? 'localhost' : host.includes(':') ? `[${host}]` : host;
      resolve({
        url: `${scheme}://${urlHost}:${port}`,
        port,
        close: () =>
          new Promise<void>((done, fail) => {
            server.close((e) => (e ? fail(e) : done()));
            server.closeAllConnections();
          }),
      });
    });
  });
}

/**
 * Serves a folder.
 *
 * @param root - folder to serve
 * @param options - port, host, TLS material
 */
export function startStaticServer(root: string, options: ServerOptions): Promise<RunningServer> {
  return startServer(staticRequestHandler(root), options);
}
