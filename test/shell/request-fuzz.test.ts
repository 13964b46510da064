// Fuzzing the browser shell's request paths and headers (fast-check) against a running server: whatever
// the path, method, token, Host, Origin, content type or extra headers, every request gets an HTTP answer
// other than 500, nothing hangs, the server keeps answering, and no file changes.
import { createHash } from 'node:crypto';
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CHANNEL_NAMES } from '../../shared-core/ipc/contract';
import { startShell, type RunningShell } from '../../src-main/shell/server';
import { rawRequest } from './http-client';

const DEMO = readFileSync(join(import.meta.dirname, '../../examples/quillmere-reservoir.gpsite'), 'utf8');
let shell: RunningShell;
let watched: string[];
const digest = () => watched.map((f) => createHash('sha256').update(readFileSync(f)).digest('hex'));

beforeAll(async () => {
  const root = mkdtempSync(join(tmpdir(), 'gprime-fuzz-'));
  mkdirSync(join(root, 'renderer'));
  writeFileSync(join(root, 'renderer', 'index.html'), '<!doctype html><title>gprime</title>');
  mkdirSync(join(root, 'sites'));
  watched = [join(root, 'outside.gpsite'), join(root, 'sites', 'kept.gpsite'), join(root, 'sites', 'notes.txt')];
  for (const f of watched) writeFileSync(f, DEMO);
  shell = await startShell({
    workspace: join(root, 'sites'),
    dataDir: join(root, 'data'),
    rendererDir: join(root, 'renderer'),
    version: '0',
  });
});
afterAll(() => shell.close());

/** Pieces that tend to break URL decoding, path joining and routing. */
const pathPiece = fc.oneof(
  fc.constantFrom(
    '%',
    '%E0%A4%A',
    '%ED%A0%80',
    '%C0%AF',
    '%2e%2e',
    '%2F',
    '%00',
    '%zz',
    '..',
    '.',
    '/',
    '//',
    '?',
    '#',
  ),
  fc.constantFrom('api', 'api/', 'index.html', 'favicon.ico', ...CHANNEL_NAMES),
  fc.string({ maxLength: 6 }),
  fc.stringMatching(/^%[0-9A-Fa-f]{2}$/),
);
const headerValue = fc.oneof(fc.string({ maxLength: 40 }), fc.constantFrom('', ' ', '\u0000', 'é', '\u2028'));

const request = fc.record({
  method: fc.constantFrom('GET', 'POST', 'HEAD', 'PUT', 'DELETE', 'OPTIONS', 'PATCH', 'CONNECT', 'X'),
  path: fc.array(pathPiece, { maxLength: 8 }).map((p) => `/${p.join('')}`),
  host: fc.oneof(fc.constant('ours'), fc.constant('localhost'), fc.constant(null), headerValue),
  token: fc.oneof(fc.constant('ours'), fc.constant(null), headerValue),
  origin: fc.oneof(fc.constant(null), fc.constant('ours'), headerValue),
  contentType: fc.oneof(fc.constant('application/json'), fc.constant(null), headerValue),
  extra: fc.array(fc.tuple(fc.stringMatching(/^[A-Za-z][A-Za-z0-9-]{0,12}$/), headerValue), { maxLength: 3 }),
  body: fc.oneof(fc.constant(''), fc.json({ maxDepth: 2 }), fc.string({ maxLength: 50 })),
});

type FuzzRequest = typeof request extends fc.Arbitrary<infer T> ? T : never;

function encode(r: FuzzRequest): { head: Buffer; body: Buffer } {
  const us = `127.0.0.1:${shell.port}`;
  const lines = [`${r.method} ${r.path} HTTP/1.1`];
  if (r.host !== null)
    lines.push(`host: ${r.host === 'ours' ? us : r.host === 'localhost' ? `localhost:${shell.port}` : r.host}`);
  if (r.token !== null) lines.push(`x-gprime-token: ${r.token === 'ours' ? shell.token : r.token}`);
  if (r.origin !== null) lines.push(`origin: ${r.origin === 'ours' ? `http://${us}` : r.origin}`);
  if (r.contentType !== null) lines.push(`content-type: ${r.contentType}`);
  for (const [name, value] of r.extra) lines.push(`${name}: ${value}`);
  const body = Buffer.from(r.body, 'utf8');
  lines.push(`content-length: ${body.length}`, 'connection: close');
  return { head: Buffer.from(lines.join('\r\n'), 'utf8'), body };
}

describe('request fuzzing of the browser shell', () => {
  it('answers every generated request without a 500, a hang or a changed file, and keeps serving', async () => {
    const before = digest();
    const statuses = new Map<number | null, number>();
    await fc.assert(
      fc.asyncProperty(request, async (r) => {
        const { head, body } = encode(r);
        const status = await rawRequest(shell.port, head, body);
        statuses.set(status, (statuses.get(status) ?? 0) + 1);
        expect(status, head.toString('latin1')).not.toBeNull();
        expect(status, head.toString('latin1')).not.toBe(500);
      }),
      { numRuns: Number(process.env.GPRIME_FUZZ_RUNS ?? 400) },
    );
    expect(digest()).toEqual(before);
    const alive = Buffer.from(
      `POST /api/app.info HTTP/1.1\r\nhost: 127.0.0.1:${shell.port}\r\nx-gprime-token: ${shell.token}\r\n` +
        'content-type: application/json\r\ncontent-length: 2\r\nconnection: close',
    );
    expect(await rawRequest(shell.port, alive, Buffer.from('{}'))).toBe(200);
    // the generator reached the refusals that matter (the counts vary with the seed; each is common)
    for (const s of [400, 403]) expect(statuses.get(s) ?? 0, `status ${s}`).toBeGreaterThan(0);
  });
});
