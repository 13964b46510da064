import { resolve } from 'node:path';
import { clipboard, ClipboardItem, dialog, type BrowserWindow } from 'electron';
import { SITE_FILE_EXTENSION } from '../../electron.config';
import type { ShellHost } from '../services/channel-handlers';
import { ServiceError } from '../services/service-error';
import { safeSiteFileName } from '../services/site-names';

const SITE_FILTERS = [{ name: 'gprime site', extensions: [SITE_FILE_EXTENSION] }];

/**
 * Files through native dialogs. The renderer may read files the user chose in this run (a dialog, the
 * menu's recent list, the command line, the desktop's "open with"), files of the recent list and folders
 * picked for reports; it may write only the files chosen in this run and the document it has open — not
 * every file ever opened. `grant` records a choice.
 */
export function electronHost(
  window: () => BrowserWindow | null,
  recent: () => string[],
): ShellHost & { grant(path: string): string } {
  const granted = new Set<string>();
  /** paths the native save dialog returned as chosen: the dialog itself asked before replacing them */
  const confirmed = new Set<string>();
  let openDocument: string | null = null;
  const grant = (path: string) => {
    const abs = resolve(path);
    granted.add(abs);
    return abs;
  };
  const refuse = (path: string, what: string): never => {
    throw new ServiceError('forbidden', `${path}: the workspace may only ${what}`);
  };
  const allowFile = (path: string, access: 'read' | 'write' = 'read') => {
    const abs = resolve(path);
    if (granted.has(abs) || abs === openDocument) return abs;
    if (access === 'read' && recent().includes(abs)) return abs;
    return access === 'read'
      ? refuse(path, 'open files chosen in a dialog or from the recent list')
      : refuse(path, 'save the open document or files chosen in this session; use Save as');
  };
  const parent = () => window() ?? undefined;
  return {
    shell: 'electron',
    grant,
    allowFile,
    allowDir: (path) =>
      granted.has(resolve(path)) ? resolve(path) : refuse(path, 'write reports into folders chosen in a dialog'),
    overwriteConfirmed: (path) => confirmed.has(resolve(path)),
    noteOpenDocument: (path) => {
      openDocument = resolve(path);
    },
    pickOpenPath: async () => {
      const options = { title: 'Open a site', properties: ['openFile' as const], filters: SITE_FILTERS };
      const win = parent();
      const r = win ? await dialog.showOpenDialog(win, options) : await dialog.showOpenDialog(options);
      return r.canceled || !r.filePaths[0] ? null : grant(r.filePaths[0]);
    },
    pickSavePath: async (suggestedName) => {
      const options = {
        title: 'Save the site as',
        defaultPath: safeSiteFileName(suggestedName),
        filters: SITE_FILTERS,
        // the native dialog asks before replacing an existing file (Linux needs it asked for; macOS and
        // Windows always ask)
        properties: ['showOverwriteConfirmation' as const, 'createDirectory' as const],
      };
      const win = parent();
      const r = win ? await dialog.showSaveDialog(win, options) : await dialog.showSaveDialog(options);
      if (r.canceled || !r.filePath) return null;
      const named = r.filePath.toLowerCase().endsWith(`.${SITE_FILE_EXTENSION}`);
      const path = grant(named ? r.filePath : `${r.filePath}.${SITE_FILE_EXTENSION}`);
      // an extension added here names a file the dialog never asked about: that one is asked in the workspace
      if (named) confirmed.add(path);
      else confirmed.delete(path);
      return path;
    },
    pickExportDir: async () => {
      const options = {
        title: 'Folder for the report',
        properties: ['openDirectory' as const, 'createDirectory' as const],
      };
      const win = parent();
      const r = win ? await dialog.showOpenDialog(win, options) : await dialog.showOpenDialog(options);
      return r.canceled || !r.filePaths[0] ? null : grant(r.filePaths[0]);
    },
    writeClipboardImage: async (png) => {
      await clipboard.write([
        new ClipboardItem({ 'image/png': new Blob([new Uint8Array(png)], { type: 'image/png' }) }),
      ]);
    },
  };
}
