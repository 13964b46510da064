// The Electron window's security settings, checked against Electron's security checklist
// (electronjs.org/docs/latest/tutorial/security: context isolation, sandbox, no Node integration,
// webSecurity, CSP, navigation and new windows limited). Electron itself is mocked: no binary here.
import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeEach, describe, expect, it, vi } from 'vitest';

const h = vi.hoisted(() => ({ windows: [] as any[], headersListener: undefined as any, dialogChoice: 0 }));

vi.mock('electron', () => {
  class FakeContents {
    listeners: Record<string, (...a: any[]) => void> = {};
    openHandler: any;
    permissionRequest: any;
    permissionCheck: any;
    session = {
      setPermissionRequestHandler: (f: any) => (this.permissionRequest = f),
      setPermissionCheckHandler: (f: any) => (this.permissionCheck = f),
    };
    on(name: string, f: any) {
      this.listeners[name] = f;
      return this;
    }
    setWindowOpenHandler(f: any) {
      this.openHandler = f;
    }
  }
  class BrowserWindow {
    webContents = new FakeContents();
    url = '';
    constructor(public options: any) {
      h.windows.push(this);
    }
    once() {
      return this;
    }
    show() {}
    loadURL(url: string) {
      this.url = url;
      return Promise.resolve();
    }
  }
  return {
    BrowserWindow,
    dialog: { showMessageBoxSync: () => h.dialogChoice },
    session: { defaultSession: { webRequest: { onHeadersReceived: (f: any) => (h.headersListener = f) } } },
    protocol: { registerSchemesAsPrivileged: vi.fn(), handle: vi.fn() },
  };
});

const { createMainWindow, enforceCsp, APP_URL } = await import('../../src-main/electron/window');
const { rendererResponse } = await import('../../src-main/electron/protocol');
const { RENDERER_CSP } = await import('../../src-main/services/static-files');

/** Parses a CSP header into directive → sources. */
function csp(header: string): Record<string, string[]> {
  return Object.fromEntries(
    header
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .map(([k, ...v]) => [k, v]),
  );
}

describe('the workspace window', () => {
  beforeEach(() => (h.windows.length = 0));

  it('isolates and sandboxes the renderer, without Node, with web security', () => {
    createMainWindow('/app/preload.cjs');
    const prefs = h.windows[0].options.webPreferences;
    expect(prefs.contextIsolation).toBe(true);
    expect(prefs.sandbox).toBe(true);
    expect(prefs.nodeIntegration).toBe(false);
    expect(prefs.nodeIntegrationInWorker).toBe(false);
    expect(prefs.nodeIntegrationInSubFrames).toBe(false);
    expect(prefs.webSecurity).toBe(true);
    expect(prefs.allowRunningInsecureContent).toBe(false);
    expect(prefs.webviewTag).toBe(false);
    expect(prefs.preload).toBe('/app/preload.cjs');
  });

  it('has no DevTools in a packaged build (nor when not told otherwise), and DevTools in development', () => {
    createMainWindow('/p.cjs', true);
    createMainWindow('/p.cjs');
    createMainWindow('/p.cjs', false);
    expect(h.windows.map((w) => w.options.webPreferences.devTools)).toEqual([false, false, true]);
  });

  it('loads the renderer from the app scheme, never from file:// or the web', () => {
    createMainWindow('/p.cjs');
    expect(h.windows[0].url).toBe(APP_URL);
    expect(APP_URL.startsWith('gprime://app/')).toBe(true);
  });

  it('denies navigation, redirects, webviews, new windows and permission requests', () => {
    createMainWindow('/p.cjs');
    const wc = h.windows[0].webContents;
    for (const name of ['will-navigate', 'will-frame-navigate', 'will-redirect', 'will-attach-webview']) {
      const event = { preventDefault: vi.fn() };
      wc.listeners[name](event, 'https://example.org/');
      expect(event.preventDefault, name).toHaveBeenCalled();
    }
    expect(wc.openHandler({ url: 'https://example.org/' })).toEqual({ action: 'deny' });
    const callback = vi.fn();
    wc.permissionRequest(wc, 'media', callback, { requestingUrl: APP_URL, isMainFrame: true });
    expect(callback).toHaveBeenCalledWith(false);
    expect(wc.permissionCheck(wc, 'clipboard-read', 'gprime://app/')).toBe(false);
  });

  it("grants clipboard writing (Copy image, Copy table) to the app's own pages and nothing else", () => {
    createMainWindow('/p.cjs');
    const wc = h.windows[0].webContents;
    const asked = (permission: string, requestingUrl?: string) => {
      const callback = vi.fn();
      wc.permissionRequest(
        wc,
        permission,
        callback,
        requestingUrl === undefined ? undefined : { requestingUrl, isMainFrame: true },
      );
      return callback.mock.calls[0][0];
    };
    expect(asked('clipboard-sanitized-write', APP_URL)).toBe(true);
    expect(wc.permissionCheck(wc, 'clipboard-sanitized-write', 'gprime://app/')).toBe(true);
    expect(wc.permissionCheck(wc, 'clipboard-sanitized-write', 'gprime://app')).toBe(true);
    // reading the clipboard, other permissions, other origins and a missing origin stay denied
    expect(asked('clipboard-read', APP_URL)).toBe(false);
    expect(asked('notifications', APP_URL)).toBe(false);
    expect(asked('clipboard-sanitized-write', 'https://example.org/')).toBe(false);
    expect(asked('clipboard-sanitized-write', 'gprime://other/index.html')).toBe(false);
    expect(asked('clipboard-sanitized-write')).toBe(false);
    expect(wc.permissionCheck(wc, 'clipboard-sanitized-write', 'file:///')).toBe(false);
    expect(wc.permissionCheck(wc, 'clipboard-sanitized-write', '')).toBe(false);
  });

  it('asks before discarding unsaved changes and closes only when the user agrees', () => {
    createMainWindow('/p.cjs');
    const wc = h.windows[0].webContents;
    for (const [choice, closes] of [
      [0, true],
      [1, false],
    ] as const) {
      h.dialogChoice = choice;
      const event = { preventDefault: vi.fn() };
      wc.listeners['will-prevent-unload'](event);
      expect(event.preventDefault).toHaveBeenCalledTimes(closes ? 1 : 0);
    }
  });
});

describe('the content security policy', () => {
  it("allows only the app's own scripts: no inline script, no eval, no plugins, no framing", () => {
    const p = csp(RENDERER_CSP);
    expect(p['default-src']).toEqual(["'self'"]);
    expect(p['script-src']).toEqual(["'self'"]);
    expect(p['object-src']).toEqual(["'none'"]);
    expect(p['frame-ancestors']).toEqual(["'none'"]);
    expect(p['base-uri']).toEqual(["'none'"]);
    expect(RENDERER_CSP).not.toMatch(/unsafe-eval|\*/);
  });

  it('is sent with every renderer file of gprime://app and added to every response of the session', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'gprime-renderer-'));
    mkdirSync(join(dir, 'assets'));
    writeFileSync(join(dir, 'index.html'), '<!doctype html><title>t</title>');
    writeFileSync(join(dir, 'assets', 'a.js'), 'export {}');
    const page = await rendererResponse(dir, 'gprime://app/index.html');
    expect(page.status).toBe(200);
    expect(page.headers.get('content-security-policy')).toBe(RENDERER_CSP);
    expect(page.headers.get('content-type')).toMatch(/text\/html/);
    expect((await rendererResponse(dir, 'gprime://app/assets/a.js')).headers.get('content-type')).toMatch(/javascript/);
    expect((await rendererResponse(dir, 'gprime://app/%2e%2e/%2e%2e/etc/passwd')).status).toBe(404);
    expect((await rendererResponse(dir, 'gprime://other/index.html')).status).toBe(404);

    enforceCsp();
    const done = vi.fn();
    h.headersListener({ responseHeaders: { 'Content-Type': ['text/html'] } }, done);
    expect(done.mock.calls[0][0].responseHeaders['Content-Security-Policy']).toEqual([RENDERER_CSP]);
    expect(done.mock.calls[0][0].responseHeaders['Content-Type']).toEqual(['text/html']);
  });
});
