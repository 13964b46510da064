import {
  CHANNEL_NAMES,
  type Channel,
  type GprimeApi,
  type Reply,
  type RequestOf,
  type ResponseOf,
} from '../../../shared-core/ipc/contract';

/**
 * The renderer's way to the Node side. Under Electron the preload exposes `window.gprime` (one function
 * per channel). In the browser shell the same channels are POSTed to /api/<channel> with the per-run
 * token that the shell put in the page URL (?token=…).
 */
declare global {
  interface Window {
    gprime?: GprimeApi;
  }
}

function httpApi(): GprimeApi {
  const token = new URLSearchParams(location.search).get('token') ?? sessionStorage.getItem('gprime-token') ?? '';
  if (token) sessionStorage.setItem('gprime-token', token);
  const call = async <C extends Channel>(channel: C, request: RequestOf<C>): Promise<Reply<ResponseOf<C>>> => {
    try {
      const res = await fetch(`api/${channel}`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'x-gprime-token': token },
        body: JSON.stringify(request),
      });
      return (await res.json()) as Reply<ResponseOf<C>>;
    } catch (e) {
      return { ok: false, error: { code: 'io', message: `the gprime shell did not answer (${String(e)})` } };
    }
  };
  return Object.fromEntries(CHANNEL_NAMES.map((c) => [c, (req: never) => call(c, req)])) as unknown as GprimeApi;
}

export const bridge: GprimeApi = typeof window !== 'undefined' && window.gprime ? window.gprime : httpApi();
