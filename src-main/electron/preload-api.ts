import { contextBridge, ipcRenderer } from 'electron';
import { CHANNEL_NAMES } from '../../shared-core/ipc/contract';
import { IPC_PREFIX, MENU_EVENT } from './ipc-names';

/**
 * Exposes one function per contract channel as window.gprime, and the menu commands as
 * window.gprimeMenu. Nothing else of Electron or Node reaches the page: no generic send or invoke.
 */
export function exposeGprime(): void {
  const api = Object.fromEntries(
    CHANNEL_NAMES.map((channel) => [channel, (request: unknown) => ipcRenderer.invoke(IPC_PREFIX + channel, request)]),
  );
  contextBridge.exposeInMainWorld('gprime', api);
  contextBridge.exposeInMainWorld('gprimeMenu', {
    /** calls back with a menu command ('new', 'open', 'openRecent' + path, 'save', 'saveAs', 'export', 'undo', 'redo') */
    onCommand(callback: (command: string, arg?: string) => void): void {
      ipcRenderer.on(MENU_EVENT, (_event, command: unknown, arg: unknown) => {
        if (typeof command === 'string') callback(command, typeof arg === 'string' ? arg : undefined);
      });
    },
  });
}
