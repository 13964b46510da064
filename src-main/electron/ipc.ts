import { ipcMain } from 'electron';
import { CHANNEL_NAMES, type Reply } from '../../shared-core/ipc/contract';
import { dispatch, type ChannelHandlers } from '../services/channel-handlers';
import { APP_ORIGIN, IPC_PREFIX } from './ipc-names';

/** The parts of a WebFrameMain the sender check reads. */
export interface SenderFrame {
  url: string;
  parent: unknown;
}

/** Only the top frame of our own page (gprime://app) may call main; iframes and foreign pages may not. */
export function isTrustedSender(frame: SenderFrame | null | undefined): boolean {
  if (!frame || frame.parent) return false;
  try {
    const u = new URL(frame.url);
    return `${u.protocol}//${u.host}` === APP_ORIGIN;
  } catch {
    return false;
  }
}

const FORBIDDEN: Reply<never> = {
  ok: false,
  error: { code: 'forbidden', message: 'this request did not come from the gprime workspace' },
};

/** Registers one handler per contract channel: sender checked, payload validated, answer always a Reply. */
export function registerIpc(
  handlers: ChannelHandlers,
  trusted: (frame: SenderFrame | null | undefined) => boolean = isTrustedSender,
): void {
  for (const channel of CHANNEL_NAMES) {
    ipcMain.handle(IPC_PREFIX + channel, async (event, payload: unknown) =>
      trusted(event.senderFrame) ? dispatch(handlers, channel, payload) : FORBIDDEN,
    );
  }
}
