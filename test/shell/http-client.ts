// Raw HTTP clients for the browser-shell tests: `http` sets any Host header (fetch would not allow it);
// `rawRequest` sends bytes exactly as given, so malformed paths and headers reach the server unchanged.
import { request } from 'node:http';
import { connect } from 'node:net';

export interface Answer {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: string;
  json?: any;
}

function parseJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

export function http(
  port: number,
  method: string,
  path: string,
  headers: Record<string, string> = {},
  body?: string | Buffer,
): Promise<Answer> {
  return new Promise((done, fail) => {
    const req = request(
      { host: '127.0.0.1', port, method, path, headers: { host: `127.0.0.1:${port}`, ...headers } },
      (res) => {
        let text = '';
        res
          .setEncoding('utf8')
          .on('data', (c) => (text += c))
          .on('end', () =>
            done({ status: res.statusCode ?? 0, headers: res.headers, body: text, json: parseJson(text) }),
          );
      },
    );
    req.on('error', fail);
    req.end(body);
  });
}

/**
 * Sends `head` (request line and headers, without the blank line) and `body` on a fresh connection and
 * resolves with the status of the answer as soon as its status line arrives, or null when the server
 * closed the connection without one. Rejects when neither happens within `waitMs` (a hang). The socket
 * is not half-closed: Node's server would drop an answer still being written.
 */
export function rawRequest(
  port: number,
  head: Buffer,
  body: Buffer = Buffer.alloc(0),
  waitMs = 10_000,
): Promise<number | null> {
  return new Promise((done, fail) => {
    const socket = connect(port, '127.0.0.1');
    let received = Buffer.alloc(0);
    const finish = (status: number | null) => {
      clearTimeout(timer);
      socket.destroy();
      done(status);
    };
    const timer = setTimeout(() => {
      socket.destroy();
      fail(new Error(`no answer within ${waitMs} ms to ${JSON.stringify(head.toString('latin1').slice(0, 200))}`));
    }, waitMs);
    socket.on('connect', () => socket.write(Buffer.concat([head, Buffer.from('\r\n\r\n'), body])));
    socket.on('data', (c) => {
      received = Buffer.concat([received, c]);
      const m = /^HTTP\/1\.[01] (\d{3})/.exec(received.toString('latin1'));
      if (m) finish(Number(m[1]));
    });
    socket.on('error', () => {}); // a reset still ends in 'close'
    socket.on('close', () => finish(null));
  });
}
