/** IPC channel of contract channel `c` is `${IPC_PREFIX}${c}`. Shared by main and preload. */
export const IPC_PREFIX = 'gprime:';
/** Main → renderer: a menu command (new, open, openRecent, save, saveAs, export, undo, redo). */
export const MENU_EVENT = 'gprime-menu';
/** The renderer is served from this privileged scheme and host, never from file://. */
export const APP_SCHEME = 'gprime';
export const APP_ORIGIN = `${APP_SCHEME}://app`;
