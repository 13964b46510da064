// `npm run serve` as users start it: the launcher prints the address line, and the server answers on it.
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const ROOT = resolve(import.meta.dirname, '..', '..');
let child: ChildProcess | undefined;
afterAll(() => child?.kill());

function firstLine(proc: ChildProcess, prefix: string): Promise<string> {
  return new Promise((done, fail) => {
    let out = '';
    let err = '';
    proc.stdout!.on('data', (c) => {
      out += c;
      const line = out.split('\n').find((l) => l.startsWith(prefix));
      if (line) done(line);
    });
    proc.stderr!.on('data', (c) => (err += c));
    proc.on('exit', (code) => fail(new Error(`the shell exited (${code}): ${err}`)));
  });
}

describe('serve command', () => {
  it('prints "gprime workspace: http://127.0.0.1:<port>/?token=<token>" and answers there', async () => {
    const tmp = mkdtempSync(join(tmpdir(), 'gprime-serve-'));
    // --no-build: this test is about the server; the renderer build is the end-to-end tests' business
    child = spawn(
      process.execPath,
      ['src-main/shell/launch.js', '--no-build', '--workspace', join(tmp, 'sites'), '--data-dir', join(tmp, 'data')],
      { cwd: ROOT },
    );
    const line = await firstLine(child, 'gprime workspace: ');
    const m = /^gprime workspace: (http:\/\/127\.0\.0\.1:(\d+)\/\?token=([\w-]{32,}))$/.exec(line);
    expect(m, line).not.toBeNull();
    const [, , port, token] = m!;
    const res = await fetch(`http://127.0.0.1:${port}/api/app.info`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-gprime-token': token },
      body: '{}',
    });
    expect(await res.json()).toEqual({ ok: true, value: { version: expect.any(String), shell: 'browser' } });
    expect((await fetch(`http://127.0.0.1:${port}/api/app.info`, { method: 'POST', body: '{}' })).status).toBe(401);
  });
});
