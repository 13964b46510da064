// The IPC layer of the Electron main process and the preload, with Electron mocked: one handler per
// contract channel, the sender frame checked, payloads validated, and every answer a Reply.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { CHANNEL_NAMES } from '../../shared-core/ipc/contract';
import type { ShellHost } from '../../src-main/services/channel-handlers';

const h = vi.hoisted(() => ({
  handlers: new Map<string, (event: unknown, payload: unknown) => Promise<unknown>>(),
  exposed: {} as Record<string, any>,
  invoke: vi.fn(),
}));

vi.mock('electron', () => ({
  ipcMain: { handle: (name: string, f: any) => h.handlers.set(name, f) },
  contextBridge: { exposeInMainWorld: (key: string, api: unknown) => (h.exposed[key] = api) },
  ipcRenderer: { invoke: h.invoke, on: vi.fn() },
}));

const { registerIpc, isTrustedSender } = await import('../../src-main/electron/ipc');
const { createChannelHandlers } = await import('../../src-main/services/channel-handlers');

const host: ShellHost = {
  shell: 'electron',
  allowFile: (p) => p,
  allowDir: (p) => p,
  pickOpenPath: async () => null,
  pickSavePath: async () => null,
  pickExportDir: async () => null,
  writeClipboardImage: async () => {},
};
registerIpc(createChannelHandlers({ host, dataDir: mkdtempSync(join(tmpdir(), 'gprime-ipc-')), version: '9.9.9' }));

const ours = { url: 'gprime://app/index.html', parent: null };
const call = (channel: string, payload: unknown, senderFrame: unknown = ours) =>
  h.handlers.get(`gprime:${channel}`)!({ senderFrame }, payload);

describe('IPC handlers', () => {
  it('registers exactly one handler per contract channel', () => {
    expect([...h.handlers.keys()].sort()).toEqual(CHANNEL_NAMES.map((c) => `gprime:${c}`).sort());
  });

  it('answers our own top frame', async () => {
    expect(await call('app.info', {})).toEqual({ ok: true, value: { version: '9.9.9', shell: 'electron' } });
  });

  it('refuses foreign pages, sub-frames, file:// pages and a missing frame with a forbidden Reply', async () => {
    const foreign = [
      { url: 'https://example.org/', parent: null },
      { url: 'gprime://app/index.html', parent: { url: 'gprime://app/index.html' } },
      { url: 'file:///tmp/index.html', parent: null },
      { url: 'gprime://elsewhere/index.html', parent: null },
      null,
    ];
    for (const frame of foreign) {
      expect(isTrustedSender(frame as never)).toBe(false);
      const reply = (await call('app.info', {}, frame)) as any;
      expect(reply.ok).toBe(false);
      expect(reply.error.code).toBe('forbidden');
    }
  });

  it('refuses invalid payloads with an invalid-request Reply naming the field', async () => {
    const cases: [string, unknown, RegExp][] = [
      ['site.save', { path: 5, text: '{}' }, /path/],
      ['site.read', { path: '' }, /path/],
      ['site.read', { path: '/x', extra: true }, /extra|unrecognized/i],
      ['report.export', { text: '{}', formats: ['doc'], units: 'si', outDir: null }, /formats/],
      ['recovery.write', 'not an object', /request/],
    ];
    for (const [channel, payload, field] of cases) {
      const reply = (await call(channel, payload)) as any;
      expect(reply.ok, channel).toBe(false);
      expect(reply.error.code).toBe('invalid-request');
      expect(reply.error.message).toMatch(field);
    }
  });
});

describe('the preload', () => {
  it('exposes one function per contract channel, each invoking its own IPC channel', async () => {
    await import('../../src-main/electron/preload.cts');
    const api = h.exposed.gprime;
    expect(Object.keys(api).sort()).toEqual([...CHANNEL_NAMES].sort());
    for (const c of CHANNEL_NAMES) {
      h.invoke.mockClear();
      api[c]({ probe: c });
      expect(h.invoke).toHaveBeenCalledWith(`gprime:${c}`, { probe: c });
    }
    expect(Object.keys(h.exposed).sort()).toEqual(['gprime', 'gprimeMenu']);
  });
});
