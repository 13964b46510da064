// What the Electron renderer may touch (Electron mocked: no binary here): it reads files chosen in this
// run and files of the recent list, but writes only files chosen in this run (dialogs, the menu, the
// command line) and the document it has open — not every file ever opened.
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeEach, describe, expect, it, vi } from 'vitest';

const h = vi.hoisted(() => ({ picked: '', saveOptions: undefined as unknown }));
vi.mock('electron', () => ({
  dialog: {
    showOpenDialog: async () => ({ canceled: false, filePaths: [h.picked] }),
    showSaveDialog: async (options: unknown) => {
      h.saveOptions = options;
      return { canceled: false, filePath: h.picked };
    },
  },
  clipboard: {},
  ClipboardItem: class {},
}));

const { electronHost } = await import('../../src-main/electron/electron-host');
const { createChannelHandlers, dispatch } = await import('../../src-main/services/channel-handlers');
const { RecentFiles } = await import('../../src-main/services/file-store');

const DEMO = readFileSync(join(import.meta.dirname, '../../examples/quillmere-reservoir.gpsite'), 'utf8');
let dir: string;
let host: ReturnType<typeof electronHost>;
let call: (channel: string, payload: unknown) => Promise<any>;
const file = (name: string) => join(dir, name);

beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'gprime-host-'));
  for (const n of ['a.gpsite', 'b.gpsite', 'c.gpsite']) writeFileSync(file(n), DEMO);
  const data = join(dir, 'data');
  mkdirSync(data);
  const recent = new RecentFiles(data);
  recent.add(file('a.gpsite'));
  recent.add(file('b.gpsite')); // opened in an earlier run
  host = electronHost(
    () => null,
    () => recent.list(),
  );
  const handlers = createChannelHandlers({ host, dataDir: data, version: '0' });
  call = (channel, payload) => dispatch(handlers, channel, payload);
});

const edited = DEMO.replace('"revision": "', '"revision": "B');
const save = (name: string) => call('site.save', { path: file(name), text: edited });

describe('the Electron renderer’s file access', () => {
  it('may read recent files but not save one it has not opened in this run', async () => {
    expect((await call('site.read', { path: file('a.gpsite') })).ok).toBe(true);
    const r = await save('b.gpsite');
    expect(r.error?.code).toBe('forbidden');
    expect(r.error.message).toMatch(/Save as/);
    expect(readFileSync(file('b.gpsite'), 'utf8')).toBe(DEMO);
  });

  it('may save the document it has open; opening another one withdraws that', async () => {
    await call('site.read', { path: file('a.gpsite') });
    expect((await save('a.gpsite')).ok).toBe(true);
    await call('site.read', { path: file('b.gpsite') });
    expect((await save('b.gpsite')).ok).toBe(true);
    expect((await save('a.gpsite')).error?.code).toBe('forbidden');
  });

  it('keeps files chosen in this run writable (dialogs, the recent menu, the command line)', async () => {
    h.picked = file('c.gpsite');
    expect((await call('site.open', {})).value.path).toBe(file('c.gpsite'));
    host.grant(file('a.gpsite')); // what main does for the menu's recent list and the command line
    await call('site.read', { path: file('b.gpsite') });
    expect((await save('c.gpsite')).ok).toBe(true);
    expect((await save('a.gpsite')).ok).toBe(true);
  });

  it('refuses files and folders never chosen', async () => {
    expect((await call('site.read', { path: file('c.gpsite') })).error?.code).toBe('forbidden');
    expect(() => host.allowDir(dir)).toThrow(/folders chosen in a dialog/);
    h.picked = dir;
    expect(await host.pickExportDir('x')).toBe(dir);
    expect(host.allowDir(dir)).toBe(dir);
  });

  it('replaces an existing file through Save as only when the native dialog asked (its own confirmation)', async () => {
    h.picked = file('c.gpsite');
    expect((await call('site.saveAs', { text: edited, suggestedName: 'c' })).ok).toBe(true);
    expect((h.saveOptions as { properties: string[] }).properties).toContain('showOverwriteConfirmation');
    expect(readFileSync(file('c.gpsite'), 'utf8')).toBe(edited);
    // a name typed without the extension: the dialog asked about "c", not "c.gpsite"; refused unless agreed
    h.picked = file('c');
    const r = await call('site.saveAs', { text: DEMO, suggestedName: 'c' });
    expect(r.error?.code).toBe('exists');
    expect(readFileSync(file('c.gpsite'), 'utf8')).toBe(edited);
    expect((await call('site.saveAs', { text: DEMO, suggestedName: 'c', overwrite: true })).ok).toBe(true);
    expect(readFileSync(file('c.gpsite'), 'utf8')).toBe(DEMO);
  });
});
