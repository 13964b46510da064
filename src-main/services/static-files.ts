import { existsSync, statSync } from 'node:fs';
import { extname, join, resolve, sep } from 'node:path';

/**
 * The Content-Security-Policy of the workspace, sent with every renderer file by the browser shell and
 * the Electron window: only the app's own scripts, no inline script, no plugins, no framing, no forms,
 * fetch only back to the app itself. Inline styles stay allowed for Svelte and chart.js.
 */
export const RENDERER_CSP = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
  "frame-ancestors 'none'",
  "frame-src 'none'",
  "worker-src 'self' blob:",
].join('; ');

/** Security headers sent with every answer of the browser shell. */
export const SECURITY_HEADERS: Record<string, string> = {
  'content-security-policy': RENDERER_CSP,
  'x-content-type-options': 'nosniff',
  'referrer-policy': 'no-referrer',
  'cross-origin-opener-policy': 'same-origin',
  'cross-origin-resource-policy': 'same-origin',
  'x-frame-options': 'DENY',
};

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.woff': 'font/woff',
  '.ttf': 'font/ttf',
  '.map': 'application/json; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
};

export interface StaticFile {
  path: string;
  contentType: string;
}

/**
 * Maps a URL path to a file inside `root` ('/' → index.html). Returns null for anything outside root,
 * dot-files, folders and missing files.
 */
export function resolveStatic(root: string, urlPath: string): StaticFile | null {
  let rel: string;
  try {
    rel = decodeURIComponent(urlPath.split('?')[0].split('#')[0]);
  } catch {
    return null;
  }
  if (rel === '/' || rel === '') rel = '/index.html';
  if (rel.includes('\0') || rel.split(/[\\/]/).some((part) => part.startsWith('.'))) return null;
  const base = resolve(root);
  const path = resolve(join(base, rel));
  if (!path.startsWith(base + sep)) return null;
  if (!existsSync(path) || !statSync(path).isFile()) return null;
  return { path, contentType: TYPES[extname(path).toLowerCase()] ?? 'application/octet-stream' };
}
