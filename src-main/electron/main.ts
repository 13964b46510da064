// The Electron main process: one window, the application menu, native file dialogs and the typed IPC.
// Computation never comes here: the renderer imports shared-core itself.
import { join, resolve } from 'node:path';
import { app, BrowserWindow, dialog } from 'electron';
import { createChannelHandlers } from '../services/channel-handlers';
import { RecentFiles } from '../services/file-store';
import { electronHost } from './electron-host';
import { registerIpc } from './ipc';
import { MENU_EVENT } from './ipc-names';
import { installMenu, type MenuCommand } from './menu';
import { registerAppScheme, serveRenderer } from './protocol';
import { createMainWindow, enforceCsp, lockDown } from './window';

const here = import.meta.dirname; // dist/electron once bundled
let win: BrowserWindow | null = null;

registerAppScheme();
app.enableSandbox();

/** Site files named on the command line (or by the desktop's "open with"). */
const siteArgs = (argv: string[]) =>
  argv.slice(app.isPackaged ? 1 : 2).filter((a) => !a.startsWith('-') && a.endsWith('.gpsite'));

if (!app.requestSingleInstanceLock()) app.quit();
else {
  app.on('web-contents-created', (_event, contents) => lockDown(contents));
  app.on('window-all-closed', () => app.quit());
  void app.whenReady().then(start);
}

function start(): void {
  const dataDir = process.env.GPRIME_DATA_DIR ?? app.getPath('userData');
  const recent = new RecentFiles(dataDir);
  const host = electronHost(
    () => win,
    () => recent.list(),
  );
  // a recent file picked in the menu is the user's choice: the renderer may save it again
  const send = (command: MenuCommand, arg?: string) =>
    win?.webContents.send(MENU_EVENT, command, command === 'openRecent' && arg ? host.grant(arg) : arg);
  const refreshMenu = () =>
    installMenu({
      recent: recent.list(),
      isMac: process.platform === 'darwin',
      send,
      about: () =>
        void dialog.showMessageBox({
          title: 'About gprime',
          message: `gprime ${app.getVersion()}`,
          detail: 'Screening estimates for stratified flows and density currents.',
        }),
    });
  const openFromOutside = (path: string) => send('openRecent', resolve(path));

  const handlers = createChannelHandlers({ host, dataDir, version: app.getVersion() });
  for (const c of ['site.open', 'site.read', 'site.save', 'site.saveAs'] as const) {
    const inner = handlers[c] as (r: unknown) => Promise<never>;
    (handlers as Record<string, unknown>)[c] = async (r: unknown) => {
      const value = await inner(r);
      refreshMenu();
      return value;
    };
  }
  serveRenderer(join(here, '..', 'renderer'));
  enforceCsp();
  registerIpc(handlers);
  refreshMenu();
  win = createMainWindow(join(here, 'preload.cjs'), app.isPackaged);
  win.on('closed', () => (win = null));
  const initial = siteArgs(process.argv);
  if (initial[0]) win.webContents.once('did-finish-load', () => openFromOutside(initial[0]));

  app.on('second-instance', (_event, argv) => {
    if (!win) return;
    if (win.isMinimized()) win.restore();
    win.focus();
    const path = siteArgs(argv)[0];
    if (path) openFromOutside(path);
  });
  app.on('open-file', (event, path) => {
    event.preventDefault();
    openFromOutside(path);
  });
}
