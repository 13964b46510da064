import { Menu, type MenuItemConstructorOptions } from 'electron';
import { basename } from 'node:path';

export type MenuCommand = 'new' | 'open' | 'openRecent' | 'save' | 'saveAs' | 'export' | 'undo' | 'redo';

export interface MenuOptions {
  recent: string[];
  isMac: boolean;
  /** forwards a command to the renderer, which owns the document (and its unsaved-changes prompt) */
  send(command: MenuCommand, arg?: string): void;
  about(): void;
}

/**
 * The application menu. File commands go to the renderer; undo and redo show their keys but leave the
 * keys to the renderer (registerAccelerator: false), so a key press never undoes twice.
 */
export function menuTemplate({ recent, isMac, send, about }: MenuOptions): MenuItemConstructorOptions[] {
  const item = (
    label: string,
    command: MenuCommand,
    accelerator?: string,
    register = true,
  ): MenuItemConstructorOptions => ({
    label,
    accelerator,
    registerAccelerator: register,
    click: () => send(command),
  });
  const recentItems: MenuItemConstructorOptions[] = recent.length
    ? recent.map((path) => ({ label: basename(path), sublabel: path, click: () => send('openRecent', path) }))
    : [{ label: 'No recent sites', enabled: false }];
  return [
    ...(isMac ? [{ role: 'appMenu' as const }] : []),
    {
      label: '&File',
      submenu: [
        item('New site', 'new', 'CmdOrCtrl+N'),
        item('Open site…', 'open', 'CmdOrCtrl+O'),
        { label: 'Open recent', submenu: recentItems },
        { type: 'separator' },
        item('Save', 'save', 'CmdOrCtrl+S'),
        item('Save as…', 'saveAs', 'CmdOrCtrl+Shift+S'),
        item('Export report…', 'export', 'CmdOrCtrl+E'),
        { type: 'separator' },
        isMac ? { role: 'close' } : { role: 'quit' },
      ],
    },
    {
      label: '&Edit',
      submenu: [
        item('Undo change', 'undo', 'CmdOrCtrl+Z', false),
        item('Redo change', 'redo', isMac ? 'Cmd+Shift+Z' : 'Ctrl+Y', false),
        { type: 'separator' },
        { role: 'cut' },
        { role: 'copy' },
        { role: 'paste' },
        { role: 'selectAll' },
      ],
    },
    {
      label: '&View',
      submenu: [
        { role: 'resetZoom' },
        { role: 'zoomIn' },
        { role: 'zoomOut' },
        { type: 'separator' },
        { role: 'togglefullscreen' },
      ],
    },
    { label: '&Help', submenu: [{ label: 'About gprime', click: about }] },
  ];
}

export function installMenu(options: MenuOptions): void {
  Menu.setApplicationMenu(Menu.buildFromTemplate(menuTemplate(options)));
}
