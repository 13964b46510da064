// The browser shell (src-main/shell): 127.0.0.1 only, a per-run token on every /api request, the Host
// header checked (DNS-rebinding defence), the renderer served with the CSP, and the same channels as Electron.
import { connect } from 'node:net';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startShell, type RunningShell } from '../../src-main/shell/server';
import { RENDERER_CSP } from '../../src-main/services/static-files';
import { http, rawRequest } from './http-client';

const DEMO = readFileSync(join(import.meta.dirname, '../../examples/quillmere-reservoir.gpsite'), 'utf8');

let shell: RunningShell;
let workspace: string;
const api = (channel: string, payload: unknown, token = shell.token, extra: Record<string, string> = {}) =>
  http(
    shell.port,
    'POST',
    `/api/${channel}`,
    { 'content-type': 'application/json', 'x-gprime-token': token, ...extra },
    JSON.stringify(payload),
  );

beforeAll(async () => {
  const root = mkdtempSync(join(tmpdir(), 'gprime-shell-'));
  const renderer = join(root, 'renderer');
  mkdirSync(join(renderer, 'assets'), { recursive: true });
  writeFileSync(join(renderer, 'index.html'), '<!doctype html><title>gprime</title>');
  writeFileSync(join(renderer, 'assets', 'app.js'), 'console.log(1)');
  writeFileSync(join(root, 'secret.gpsite'), DEMO);
  workspace = join(root, 'sites');
  shell = await startShell({ workspace, dataDir: join(root, 'data'), rendererDir: renderer, version: '1.2.3' });
});
afterAll(() => shell.close());

describe('browser shell', () => {
  it('listens on 127.0.0.1 at a random port and prints a URL with the token', async () => {
    expect(shell.url).toBe(`http://127.0.0.1:${shell.port}/?token=${shell.token}`);
    expect(shell.token.length).toBeGreaterThanOrEqual(32);
    const other = await startShell({
      workspace,
      dataDir: join(workspace, '..', 'data2'),
      rendererDir: workspace,
      version: '0',
    });
    try {
      expect(other.port).not.toBe(shell.port);
      expect(other.port).toBeGreaterThan(0);
      expect(other.token).not.toBe(shell.token);
    } finally {
      await other.close();
    }
  });

  it('requires the token on every /api request: 401 without, 403 with a wrong one', async () => {
    const none = await http(shell.port, 'POST', '/api/app.info', { 'content-type': 'application/json' }, '{}');
    expect(none.status).toBe(401);
    expect(none.json).toMatchObject({ ok: false, error: { code: 'forbidden' } });
    const wrong = await api(
      'app.info',
      {},
      shell.token.replace(/^./, (c) => (c === 'a' ? 'b' : 'a')),
    );
    expect(wrong.status).toBe(403);
    expect((await api('app.info', {}, 'short')).status).toBe(403);
  });

  it('refuses a foreign Host header (even with the token) and a foreign Origin', async () => {
    for (const host of [
      'evil.example',
      `evil.example:${shell.port}`,
      `127.0.0.1:${shell.port + 1}`,
      `127.0.0.1.evil.example:${shell.port}`,
    ]) {
      expect((await http(shell.port, 'GET', '/', { host })).status, host).toBe(403);
      expect((await api('app.info', {}, shell.token, { host })).status, host).toBe(403);
    }
    // HTTP/1.0 allows a request without any Host header: refused too
    const raw = await new Promise<string>((done) => {
      const socket = connect(shell.port, '127.0.0.1', () => socket.end('GET / HTTP/1.0\r\n\r\n'));
      let text = '';
      socket.on('data', (c) => (text += c)).on('close', () => done(text));
    });
    expect(raw).toMatch(/^HTTP\/1\.\d 403/);
    expect((await http(shell.port, 'GET', '/', { host: `localhost:${shell.port}` })).status).toBe(200);
    expect((await api('app.info', {}, shell.token, { origin: 'https://evil.example' })).status).toBe(403);
    expect((await api('app.info', {}, shell.token, { origin: `http://127.0.0.1:${shell.port}` })).status).toBe(200);
  });

  it('serves the renderer with the CSP and refuses paths outside it', async () => {
    const page = await http(shell.port, 'GET', `/?token=${shell.token}`);
    expect(page.status).toBe(200);
    expect(page.body).toContain('<title>gprime</title>');
    expect(page.headers['content-security-policy']).toBe(RENDERER_CSP);
    expect(page.headers['x-content-type-options']).toBe('nosniff');
    expect(page.headers['referrer-policy']).toBe('no-referrer');
    const js = await http(shell.port, 'GET', '/assets/app.js');
    expect(js.headers['content-type']).toMatch(/javascript/);
    for (const path of ['/../secret.gpsite', '/%2e%2e/secret.gpsite', '/assets/../../secret.gpsite', '/missing.js']) {
      expect((await http(shell.port, 'GET', path)).status, path).toBe(404);
    }
    expect((await http(shell.port, 'DELETE', '/')).status).toBe(405);
    expect((await http(shell.port, 'GET', '/api/app.info', { 'x-gprime-token': shell.token })).status).toBe(405);
  });

  it('answers a channel round trip: save as, recent, open by name, save, read', async () => {
    expect((await api('app.info', {})).json).toEqual({ ok: true, value: { version: '1.2.3', shell: 'browser' } });
    expect((await api('site.open', {})).json).toEqual({ ok: true, value: null });
    const saved = (await api('site.saveAs', { text: DEMO, suggestedName: '../Quillmere: week 32' })).json;
    expect(saved.ok).toBe(true);
    expect(saved.value.path).toBe(join(workspace, 'Quillmere- week 32.gpsite'));
    expect(readFileSync(saved.value.path, 'utf8')).toBe(DEMO);
    expect((await api('site.recent', {})).json.value.paths).toContain(saved.value.path);
    const opened = (await api('site.open', { name: 'Quillmere- week 32.gpsite' })).json;
    expect(opened).toEqual({ ok: true, value: { path: saved.value.path, text: DEMO } });
    const edited = DEMO.replace('"revision": "', '"revision": "B');
    expect((await api('site.save', { path: saved.value.path, text: edited })).json.ok).toBe(true);
    expect((await api('site.read', { path: saved.value.path })).json.value.text).toBe(edited);
  });

  it('refuses Save as onto an existing file until the request says overwrite (the user agreed)', async () => {
    const first = (await api('site.saveAs', { text: DEMO, suggestedName: 'kept twice' })).json;
    expect(first.ok).toBe(true);
    const edited = DEMO.replace('"revision": "', '"revision": "C');
    const refused = (await api('site.saveAs', { text: edited, suggestedName: 'kept twice' })).json;
    expect(refused.ok).toBe(false);
    expect(refused.error.code).toBe('exists');
    expect(refused.error.message).toMatch(/already exists; it was left unchanged/);
    expect(readFileSync(first.value.path, 'utf8')).toBe(DEMO);
    const agreed = (await api('site.saveAs', { text: edited, suggestedName: 'kept twice', overwrite: true })).json;
    expect(agreed).toEqual({ ok: true, value: { path: first.value.path } });
    expect(readFileSync(first.value.path, 'utf8')).toBe(edited);
  });

  it('keeps the renderer inside the workspace folder, symbolic links included', async () => {
    const outside = join(workspace, '..', 'secret.gpsite');
    symlinkSync(join(workspace, '..'), join(workspace, 'link'));
    for (const path of [outside, join(workspace, 'link', 'secret.gpsite'), '/etc/passwd']) {
      const r = (await api('site.read', { path })).json;
      expect(r.ok, path).toBe(false);
      expect(r.error.code).toBe('forbidden');
    }
    expect((await api('site.save', { path: outside, text: DEMO })).json.error.code).toBe('forbidden');
    expect(
      (await api('report.export', { text: DEMO, formats: ['csv'], units: 'si', outDir: '/tmp' })).json.error.code,
    ).toBe('forbidden');
  });

  it('writes a report into the workspace when no folder is given', async () => {
    const r = (await api('report.export', { text: DEMO, formats: ['csv'], units: 'si', outDir: null, path: null }))
      .json;
    expect(r.ok, JSON.stringify(r.error)).toBe(true);
    expect(r.value.outDir.startsWith(join(workspace, 'reports'))).toBe(true);
    expect(r.value.files.length).toBeGreaterThan(0);
    for (const f of r.value.files) expect(existsSync(join(r.value.outDir, f)), f).toBe(true);
  });

  it('answers bad requests with a Reply error', async () => {
    expect((await api('no.such', {})).json.error.code).toBe('invalid-request');
    expect((await api('site.save', { path: 3 })).json.error.code).toBe('invalid-request');
    const notJson = await http(
      shell.port,
      'POST',
      '/api/app.info',
      { 'content-type': 'application/json', 'x-gprime-token': shell.token },
      '{',
    );
    expect(notJson.status).toBe(400);
    const form = await http(
      shell.port,
      'POST',
      '/api/app.info',
      { 'content-type': 'text/plain', 'x-gprime-token': shell.token },
      '{}',
    );
    expect(form.status).toBe(415);
  });

  it('keeps the recovery file across shells sharing a data folder', async () => {
    expect((await api('recovery.write', { text: DEMO, path: null })).json).toEqual({ ok: true, value: {} });
    const check = (await api('recovery.check', {})).json;
    expect(check.value[0].text).toBe(DEMO);
    expect(Number.isNaN(Date.parse(check.value[0].savedAt))).toBe(false);
    expect((await api('recovery.clear', {})).json.ok).toBe(true);
    expect((await api('recovery.check', {})).json.value).toEqual([]);
  });

  it('keeps the autosave of each document apart and clears only the one named', async () => {
    await api('recovery.write', { text: DEMO, path: null, document: 'tab-a' });
    await api('recovery.write', { text: '{"b": 1}', path: null, document: 'tab-b' });
    const docs = (await api('recovery.check', {})).json.value.map((e: { document: string }) => e.document);
    expect(docs.sort()).toEqual(['tab-a', 'tab-b']);
    await api('recovery.clear', { document: 'tab-a' });
    expect((await api('recovery.check', {})).json.value.map((e: { document: string }) => e.document)).toEqual([
      'tab-b',
    ]);
    await api('recovery.clear', { document: 'tab-b' });
    const bad = (await api('recovery.write', { text: DEMO, path: null, document: '../escape' })).json;
    expect(bad.ok).toBe(false);
    expect(bad.error.code).toBe('invalid-request');
  });
});

describe('hostile requests never stop the shell', () => {
  const stillAnswers = async () => expect((await api('app.info', {})).json?.ok).toBe(true);

  it('answers request paths that are not valid percent-encoding with 400, with or without the token', async () => {
    // '/api/%E0%A4%A' (a truncated UTF-8 sequence) once threw outside the error boundary and stopped the process
    for (const path of ['/api/%E0%A4%A', '/api/%', '/api/%zz', '/api/%C0%AF', '/api/%ED%A0%80']) {
      expect((await http(shell.port, 'GET', path)).status, path).toBe(400);
      const r = await http(shell.port, 'POST', path, {
        'content-type': 'application/json',
        'x-gprime-token': shell.token,
      });
      expect(r.status, path).toBe(400);
      expect(r.json?.error.code).toBe('invalid-request');
    }
    await stillAnswers();
  });

  it('answers a body over the limit with 413 (not a connection reset) and keeps serving', async () => {
    const body = Buffer.alloc(70 * 1024 * 1024, 0x20); // 70 MB of spaces: over the 64 MB limit
    const r = await http(
      shell.port,
      'POST',
      '/api/site.save',
      { 'content-type': 'application/json', 'x-gprime-token': shell.token },
      body,
    );
    expect(r.status).toBe(413);
    expect(r.json?.error.message).toMatch(/64 MB/);
    await stillAnswers();
  });

  it('answers a request Node cannot parse with 400', async () => {
    const head = (line: string) => Buffer.from(`${line}\r\nhost: 127.0.0.1:${shell.port}`, 'latin1');
    expect(await rawRequest(shell.port, head('GET /\u0000 HTTP/1.1'))).toBe(400);
    expect(await rawRequest(shell.port, head('BREW / HTTP/1.1\r\nbad header'))).toBe(400);
    await stillAnswers();
  });
});
