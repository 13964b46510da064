// Generated HTTP requests for the browser shell: paths that tend to break URL decoding and routing, and
// any method, token, Host, Origin, content type, extra headers and body. Used by the request fuzz test and
// the reliability suite.
import fc from 'fast-check';
import { CHANNEL_NAMES } from '../../shared-core/ipc/contract';

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

export const hostileRequest = fc.record({
  method: fc.constantFrom('GET', 'POST', 'HEAD', 'PUT', 'DELETE', 'OPTIONS', 'PATCH', 'CONNECT', 'X'),
  path: fc.array(pathPiece, { maxLength: 8 }).map((p) => `/${p.join('')}`),
  host: fc.oneof(fc.constant('ours'), fc.constant('localhost'), fc.constant(null), headerValue),
  token: fc.oneof(fc.constant('ours'), fc.constant(null), headerValue),
  origin: fc.oneof(fc.constant(null), fc.constant('ours'), headerValue),
  contentType: fc.oneof(fc.constant('application/json'), fc.constant(null), headerValue),
  extra: fc.array(fc.tuple(fc.stringMatching(/^[A-Za-z][A-Za-z0-9-]{0,12}$/), headerValue), { maxLength: 3 }),
  body: fc.oneof(fc.constant(''), fc.json({ maxDepth: 2 }), fc.string({ maxLength: 50 })),
});

export type HostileRequest = typeof hostileRequest extends fc.Arbitrary<infer T> ? T : never;

/** The request as bytes on the wire, for the shell listening on `port` with `token`. */
export function encodeRequest(r: HostileRequest, port: number, token: string): { head: Buffer; body: Buffer } {
  const us = `127.0.0.1:${port}`;
  const lines = [`${r.method} ${r.path} HTTP/1.1`];
  if (r.host !== null)
    lines.push(`host: ${r.host === 'ours' ? us : r.host === 'localhost' ? `localhost:${port}` : r.host}`);
  if (r.token !== null) lines.push(`x-gprime-token: ${r.token === 'ours' ? token : r.token}`);
  if (r.origin !== null) lines.push(`origin: ${r.origin === 'ours' ? `http://${us}` : r.origin}`);
  if (r.contentType !== null) lines.push(`content-type: ${r.contentType}`);
  for (const [name, value] of r.extra) lines.push(`${name}: ${value}`);
  const body = Buffer.from(r.body, 'utf8');
  lines.push(`content-length: ${body.length}`, 'connection: close');
  return { head: Buffer.from(lines.join('\r\n'), 'utf8'), body };
}
