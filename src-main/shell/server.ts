import { createReadStream } from 'node:fs';
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import type { Duplex } from 'node:stream';
import type { Reply } from '../../shared-core/ipc/contract';
import { createChannelHandlers, dispatch } from '../services/channel-handlers';
import { resolveStatic, SECURITY_HEADERS } from '../services/static-files';
import { workspaceHost } from './workspace-host';

export interface ShellOptions {
  /** 0 (the default) picks a free port at random */
  port?: number;
  /** the folder site files are opened from and saved to */
  workspace: string;
  /** the per-user data folder (recent files, recovery file) */
  dataDir: string;
  /** the built renderer (dist/renderer) */
  rendererDir: string;
  version: string;
}

export interface RunningShell {
  url: string;
  port: number;
  token: string;
  close(): Promise<void>;
}

const MAX_BODY = 64 * 1024 * 1024;

function send(res: ServerResponse, status: number, type: string, body: string): void {
  res.writeHead(status, { ...SECURITY_HEADERS, 'content-type': type, 'cache-control': 'no-store' });
  res.end(body);
}

function sendReply(res: ServerResponse, status: number, reply: Reply<unknown>): void {
  send(res, status, 'application/json; charset=utf-8', JSON.stringify(reply));
}

const refuse = (res: ServerResponse, status: number, code: string, message: string) =>
  sendReply(res, status, { ok: false, error: { code, message } });

/**
 * The request body, or null when it is over MAX_BODY. An oversized body is read to its end and dropped
 * rather than cut off, so the client receives the 413 answer instead of a connection reset.
 */
function readBody(req: IncomingMessage): Promise<string | null> {
  return new Promise((done, fail) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on('data', (c: Buffer) => {
      size += c.length;
      if (size <= MAX_BODY) chunks.push(c);
      else chunks.length = 0;
    });
    req.on('end', () => done(size > MAX_BODY ? null : Buffer.concat(chunks).toString('utf8')));
    req.on('error', fail);
  });
}

function sameToken(given: string, token: string): boolean {
  const a = Buffer.from(given);
  const b = Buffer.from(token);
  return a.length === b.length && timingSafeEqual(a, b);
}

/**
 * Starts the browser shell: the built renderer and the same channel handlers as the Electron window,
 * on 127.0.0.1 only. Every /api request needs the per-run token; every request needs a Host header
 * naming this server (so another web page cannot reach it through DNS rebinding).
 */
export async function startShell(opts: ShellOptions): Promise<RunningShell> {
  const token = randomBytes(24).toString('base64url');
  const handlers = createChannelHandlers({
    host: workspaceHost(opts.workspace),
    dataDir: opts.dataDir,
    version: opts.version,
  });
  let origins: string[] = [];

  const api = async (req: IncomingMessage, res: ServerResponse, channel: string) => {
    if (req.method !== 'POST') return refuse(res, 405, 'invalid-request', 'use POST');
    const given = req.headers['x-gprime-token'];
    if (typeof given !== 'string' || given === '')
      return refuse(res, 401, 'forbidden', 'the gprime token is missing; open the address the shell printed');
    if (!sameToken(given, token))
      return refuse(res, 403, 'forbidden', 'wrong gprime token; open the address the shell printed');
    if (req.headers.origin !== undefined && !origins.includes(req.headers.origin))
      return refuse(res, 403, 'forbidden', 'requests from other sites are refused');
    if (!/^application\/json\b/i.test(req.headers['content-type'] ?? ''))
      return refuse(res, 415, 'invalid-request', 'send JSON (content-type: application/json)');
    const body = await readBody(req);
    if (body === null) {
      res.setHeader('connection', 'close');
      return refuse(res, 413, 'invalid-request', `the request is over ${MAX_BODY / 1024 / 1024} MB`);
    }
    let payload: unknown;
    try {
      payload = body.trim() === '' ? {} : JSON.parse(body);
    } catch {
      return refuse(res, 400, 'invalid-request', 'the request is not valid JSON');
    }
    sendReply(res, 200, await dispatch(handlers, channel, payload));
  };

  const files = (req: IncomingMessage, res: ServerResponse, path: string) => {
    if (req.method !== 'GET' && req.method !== 'HEAD')
      return send(res, 405, 'text/plain; charset=utf-8', 'method not allowed');
    const file = resolveStatic(opts.rendererDir, path);
    if (!file && path === '/favicon.ico') return send(res, 204, 'image/x-icon', ''); // browsers ask for it unprompted
    if (!file) return send(res, 404, 'text/plain; charset=utf-8', 'not found');
    res.writeHead(200, { ...SECURITY_HEADERS, 'content-type': file.contentType, 'cache-control': 'no-cache' });
    if (req.method === 'HEAD') return res.end();
    createReadStream(file.path)
      .on('error', () => res.destroy())
      .pipe(res);
  };

  const route = async (req: IncomingMessage, res: ServerResponse) => {
    if (!req.headers.host || !origins.some((o) => o === `http://${req.headers.host}`)) {
      return send(res, 403, 'text/plain; charset=utf-8', 'this gprime shell answers only to 127.0.0.1 and localhost');
    }
    const path = (req.url ?? '/').split('?')[0];
    if (!path.startsWith('/api/')) return files(req, res, path);
    let channel: string;
    try {
      channel = decodeURIComponent(path.slice(5));
    } catch {
      return refuse(res, 400, 'invalid-request', 'the request path is not valid percent-encoding');
    }
    return api(req, res, channel);
  };

  // every request, whatever its path or headers, is answered inside this boundary: nothing it sends can
  // throw past it and stop the server
  const server = createServer((req, res) => {
    req.on('error', () => res.destroy());
    res.on('error', () => res.destroy());
    route(req, res).catch((e: unknown) => {
      if (!res.headersSent) refuse(res, 500, 'internal', e instanceof Error ? e.message : String(e));
      else res.destroy();
    });
  });
  // a request Node cannot parse (bad request line, header too large) gets a 400; CONNECT and protocol
  // upgrades (which Node hands over as raw sockets) get a 405; the socket closes
  const answerRaw = (socket: Duplex, status: string) => {
    socket.on('error', () => socket.destroy());
    if (socket.writable) socket.end(`HTTP/1.1 ${status}\r\nconnection: close\r\ncontent-length: 0\r\n\r\n`);
    else socket.destroy();
  };
  server.on('clientError', (_e, socket: Duplex) => answerRaw(socket, '400 Bad Request'));
  server.on('connect', (_req, socket: Duplex) => answerRaw(socket, '405 Method Not Allowed'));
  server.on('upgrade', (_req, socket: Duplex) => answerRaw(socket, '405 Method Not Allowed'));

  await new Promise<void>((done, fail) => {
    server.once('error', fail);
    server.listen(opts.port ?? 0, '127.0.0.1', done);
  });
  const port = (server.address() as AddressInfo).port;
  origins = [`http://127.0.0.1:${port}`, `http://localhost:${port}`];
  return {
    url: `http://127.0.0.1:${port}/?token=${token}`,
    port,
    token,
    close: () =>
      new Promise<void>((done) => {
        server.close(() => done());
        server.closeAllConnections();
      }),
  };
}
