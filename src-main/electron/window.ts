import {
  BrowserWindow,
  dialog,
  session,
  type BrowserWindowConstructorOptions,
  type WebContents,
  type WebPreferences,
} from 'electron';
import { windowSettings } from '../../electron.config';
import { RENDERER_CSP } from '../services/static-files';
import { APP_ORIGIN } from './ipc-names';

export const APP_URL = `${APP_ORIGIN}/index.html`;

/**
 * The renderer gets no Node, runs sandboxed in its own JavaScript world, and reaches main only through the
 * preload. A packaged build has no DevTools.
 */
export function secureWebPreferences(preload: string, packaged = true): WebPreferences {
  return {
    preload,
    devTools: !packaged,
    contextIsolation: true,
    sandbox: true,
    nodeIntegration: false,
    nodeIntegrationInWorker: false,
    nodeIntegrationInSubFrames: false,
    webSecurity: true,
    allowRunningInsecureContent: false,
    webviewTag: false,
    experimentalFeatures: false,
    navigateOnDragDrop: false,
    spellcheck: true,
  };
}

export function windowOptions(preload: string, packaged = true): BrowserWindowConstructorOptions {
  return {
    ...windowSettings,
    show: false,
    autoHideMenuBar: false,
    webPreferences: secureWebPreferences(preload, packaged),
  };
}

/** The one permission the renderer gets: writing to the clipboard ("Copy image", "Copy table"), from the app's own pages. */
export function permissionAllowed(permission: string, url: string | undefined): boolean {
  if (permission !== 'clipboard-sanitized-write' || !url) return false;
  try {
    const u = new URL(url);
    // the origin of a custom scheme is opaque to WHATWG URL: compare scheme and host
    return `${u.protocol}//${u.host}` === APP_ORIGIN;
  } catch {
    return false;
  }
}

/**
 * Denies navigation (of the page and of any frame in it), new windows, webviews and every permission but
 * clipboard writing.
 */
export function lockDown(contents: WebContents): void {
  contents.on('will-navigate', (event) => event.preventDefault());
  contents.on('will-frame-navigate', (event) => event.preventDefault());
  contents.on('will-redirect', (event) => event.preventDefault());
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(() => ({ action: 'deny' }));
  contents.session.setPermissionRequestHandler((_contents, permission, callback, details) =>
    callback(permissionAllowed(permission, details?.requestingUrl)),
  );
  contents.session.setPermissionCheckHandler((_contents, permission, requestingOrigin) =>
    permissionAllowed(permission, requestingOrigin),
  );
}

/** Adds the CSP to every response the session receives, on top of the header the gprime:// handler sends. */
export function enforceCsp(): void {
  session.defaultSession.webRequest.onHeadersReceived((details, callback) => {
    callback({ responseHeaders: { ...details.responseHeaders, 'Content-Security-Policy': [RENDERER_CSP] } });
  });
}

/**
 * The one workspace window. When the renderer holds unsaved changes it blocks unloading
 * (beforeunload); main then asks whether to discard them.
 */
export function createMainWindow(preload: string, packaged = true): BrowserWindow {
  const win = new BrowserWindow(windowOptions(preload, packaged));
  lockDown(win.webContents);
  win.webContents.on('will-prevent-unload', (event) => {
    const choice = dialog.showMessageBoxSync(win, {
      type: 'question',
      buttons: ['Discard changes', 'Keep editing'],
      defaultId: 1,
      cancelId: 1,
      message: 'This site has unsaved changes.',
      detail: 'Close anyway and discard them?',
    });
    if (choice === 0) event.preventDefault();
  });
  win.once('ready-to-show', () => win.show());
  void win.loadURL(APP_URL);
  return win;
}
