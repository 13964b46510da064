import { readFile } from 'node:fs/promises';
import { protocol } from 'electron';
import { resolveStatic, SECURITY_HEADERS } from '../services/static-files';
import { APP_SCHEME } from './ipc-names';

/** Must run before the app is ready: makes gprime:// a standard, secure origin (like https). */
export function registerAppScheme(): void {
  protocol.registerSchemesAsPrivileged([
    { scheme: APP_SCHEME, privileges: { standard: true, secure: true, supportFetchAPI: true } },
  ]);
}

/** Answers one gprime://app/… request from the built renderer, with the CSP and the other security headers. */
export async function rendererResponse(rendererDir: string, url: string): Promise<Response> {
  const u = new URL(url);
  const file = u.host === 'app' ? resolveStatic(rendererDir, u.pathname) : null;
  if (!file)
    return new Response('not found', { status: 404, headers: { ...SECURITY_HEADERS, 'content-type': 'text/plain' } });
  return new Response(await readFile(file.path), {
    status: 200,
    headers: { ...SECURITY_HEADERS, 'content-type': file.contentType },
  });
}

/** Serves the renderer on gprime://app (call once the app is ready). */
export function serveRenderer(rendererDir: string): void {
  protocol.handle(APP_SCHEME, (request) => rendererResponse(rendererDir, request.url));
}
