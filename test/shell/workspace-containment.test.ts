// The browser shell's one containment check: every path it touches (open, save, save as, the report
// folder, the file list) is resolved through its links and must lie inside the workspace; only regular
// *.gpsite files are read or written. The cases are the holes found by probing (issue "Reliability and
// security"): a symlinked reports folder, Save as through a link, a named pipe, a dangling link, odd names.
import { execFileSync } from 'node:child_process';
import {
  existsSync,
  lstatSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  realpathSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeEach, describe, expect, it } from 'vitest';
import { createChannelHandlers, dispatch } from '../../src-main/services/channel-handlers';
import { workspaceHost } from '../../src-main/shell/workspace-host';

const DEMO = readFileSync(join(import.meta.dirname, '../../examples/quillmere-reservoir.gpsite'), 'utf8');
const SECRET = 'secret-marker: a file outside the workspace\n'; // its text must never be echoed

let root: string;
let ws: string;
let outside: string;
let call: (channel: string, payload: unknown) => Promise<any>;

beforeEach(() => {
  root = realpathSync(mkdtempSync(join(tmpdir(), 'gprime-contain-')));
  ws = join(root, 'sites');
  outside = join(root, 'outside');
  mkdirSync(ws);
  mkdirSync(outside);
  writeFileSync(join(outside, 'secret.gpsite'), SECRET);
  const handlers = createChannelHandlers({ host: workspaceHost(ws), dataDir: join(root, 'data'), version: '0' });
  call = (channel, payload) => dispatch(handlers, channel, payload);
});

const refused = (reply: any, message: RegExp) => {
  expect(reply.ok, JSON.stringify(reply)).toBe(false);
  expect(reply.error.code).toBe('forbidden');
  expect(reply.error.message).toMatch(message);
  expect(reply.error.message).not.toContain('secret-marker');
};

describe('the browser shell keeps every path inside its workspace', () => {
  it('refuses to export through a reports folder that links outside; nothing is written there', async () => {
    symlinkSync(outside, join(ws, 'reports'));
    refused(
      await call('report.export', { text: DEMO, formats: ['csv'], units: 'si', outDir: null }),
      /inside its workspace/,
    );
    expect(readdirSync(outside)).toEqual(['secret.gpsite']);
  });

  it('refuses Save as onto a name linking outside, without reading or echoing the target', async () => {
    symlinkSync(join(outside, 'secret.gpsite'), join(ws, 'site.gpsite'));
    refused(await call('site.saveAs', { text: DEMO, suggestedName: 'site' }), /inside its workspace/);
    refused(await call('site.open', { name: 'site.gpsite' }), /inside its workspace/);
    expect(readFileSync(join(outside, 'secret.gpsite'), 'utf8')).toBe(SECRET);
  });

  it('refuses a named pipe named *.gpsite at once (reading it would block) and leaves it out of the list', async () => {
    execFileSync('mkfifo', [join(ws, 'pipe.gpsite')]);
    refused(await call('site.open', { name: 'pipe.gpsite' }), /named pipe/);
    refused(await call('site.save', { path: join(ws, 'pipe.gpsite'), text: DEMO }), /named pipe/);
    expect((await call('site.recent', {})).value.paths).toEqual([]);
  });

  it('refuses a folder named *.gpsite', async () => {
    mkdirSync(join(ws, 'folder.gpsite'));
    refused(await call('site.open', { name: 'folder.gpsite' }), /a folder/);
  });

  it('keeps the recent list working past dangling links, and refuses to write through them', async () => {
    symlinkSync(join(ws, 'gone.gpsite'), join(ws, 'dangling.gpsite'));
    symlinkSync(join(outside, 'gone.gpsite'), join(ws, 'out.gpsite'));
    expect((await call('site.saveAs', { text: DEMO, suggestedName: 'kept' })).ok).toBe(true);
    mkdirSync(join(root, 'data'), { recursive: true });
    const recentFile = join(root, 'data', 'recent.json');
    const recent = JSON.parse(readFileSync(recentFile, 'utf8'));
    writeFileSync(recentFile, JSON.stringify({ paths: [join(ws, 'dangling.gpsite'), ...recent.paths] }));
    expect((await call('site.recent', {})).value.paths).toEqual([join(ws, 'kept.gpsite')]);
    refused(await call('site.save', { path: join(ws, 'out.gpsite'), text: DEMO }), /link to something missing/);
    refused(await call('site.saveAs', { text: DEMO, suggestedName: 'dangling' }), /link to something missing/);
    expect(lstatSync(join(ws, 'dangling.gpsite')).isSymbolicLink()).toBe(true);
    expect(existsSync(join(outside, 'gone.gpsite'))).toBe(false);
  });

  it('saves only regular files named *.gpsite: dot files and other names are refused with a reason', async () => {
    for (const [name, reason] of [
      ['.hidden.gpsite', /hidden files/],
      ['.gpsite', /hidden files/],
      ['notes.txt', /ends with \.gpsite/],
      ['gpsite', /ends with \.gpsite/],
    ] as const) {
      refused(await call('site.save', { path: join(ws, name), text: DEMO }), reason);
      expect(existsSync(join(ws, name)), name).toBe(false);
    }
  });

  it('answers a path with a NUL character as a bad request (found by the reliability suite)', async () => {
    const path = join(ws, 'a\u0000.gpsite');
    for (const [channel, payload] of [
      ['site.read', { path }],
      ['site.save', { path, text: DEMO }],
    ] as const)
      expect((await call(channel, payload)).error).toEqual({
        code: 'invalid-request',
        message: 'a path contains a NUL character',
      });
  });

  it("saves through a link inside the workspace into the link's target, leaving the link a link", async () => {
    expect((await call('site.saveAs', { text: DEMO, suggestedName: 'real' })).ok).toBe(true);
    symlinkSync(join(ws, 'real.gpsite'), join(ws, 'alias.gpsite'));
    const edited = DEMO.replace('"revision": "', '"revision": "B');
    const saved = await call('site.save', { path: join(ws, 'alias.gpsite'), text: edited });
    expect(saved.ok, JSON.stringify(saved)).toBe(true);
    expect(lstatSync(join(ws, 'alias.gpsite')).isSymbolicLink()).toBe(true);
    expect(readFileSync(join(ws, 'real.gpsite'), 'utf8')).toBe(edited);
    expect(readdirSync(ws).filter((n) => n.endsWith('.tmp'))).toEqual([]);
  });
});
