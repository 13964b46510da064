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

/** The code of a Reply that no shell gave: the request never reached one (stopped, crashed, network gone). */
export const UNREACHABLE = 'unreachable';

/** True when a failed reply means the shell did not answer at all, not that it refused. */
export const isUnreachable = (r: Reply<unknown>): boolean => !r.ok && r.error.code === UNREACHABLE;

const listeners = new Set<(reachable: boolean) => void>();
/** Tells `fn` after every request whether the shell answered (any reply, a refusal included) or not. */
export function onReachability(fn: (reachable: boolean) => void): () => void {
  listeners.add(fn);
  return () => listeners.delete(fn);
}
const tell = (reachable: boolean) => listeners.forEach((fn) => fn(reachable));

function httpApi(): GprimeApi {
  const token = new URLSearchParams(location.search).get('token') ?? sessionStorage.getItem('gprime-token') ?? '';
  if (token) sessionStorage.setItem('gprime-token', token);
  const call = async <C extends Channel>(channel: C, request: RequestOf<C>): Promise<Reply<ResponseOf<C>>> => {
    let res: Response;
    try {
      res = await fetch(`api/${channel}`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'x-gprime-token': token },
        body: JSON.stringify(request),
      });
    } catch (e) {
      tell(false);
      const why = e instanceof Error ? e.message : String(e);
      return { ok: false, error: { code: UNREACHABLE, message: `the gprime shell did not answer (${why})` } };
    }
    tell(true);
    try {
      return (await res.json()) as Reply<ResponseOf<C>>;
    } catch {
      return { ok: false, error: { code: 'io', message: `the gprime shell answered ${res.status} without a reply` } };
    }
  };
  return Object.fromEntries(CHANNEL_NAMES.map((c) => [c, (req: never) => call(c, req)])) as unknown as GprimeApi;
}

export const bridge: GprimeApi = typeof window !== 'undefined' && window.gprime ? window.gprime : httpApi();
