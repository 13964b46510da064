import { mkdirSync, readdirSync, realpathSync, statSync } from 'node:fs';
import { basename, dirname, isAbsolute, join, relative, resolve, sep } from 'node:path';
import type { ShellHost } from '../services/channel-handlers';
import { ServiceError } from '../services/service-error';
import { safeSiteFileName, SITE_EXTENSION } from '../services/site-names';

function timestamp(d: Date): string {
  return d.toISOString().slice(0, 19).replace(/[-:]/g, '').replace('T', '-');
}

/** The real path of `abs`, resolving symbolic links of the part that exists (so a link cannot lead out). */
function realpathOfExisting(abs: string): string {
  const rest: string[] = [];
  for (let p = abs; ; p = dirname(p)) {
    try {
      return join(realpathSync(p), ...rest.reverse());
    } catch {
      if (dirname(p) === p) return abs;
      rest.push(basename(p));
    }
  }
}

/**
 * The browser shell has no native dialogs: every file lives in one workspace folder. The renderer may
 * only touch paths inside it; 'site.open' takes a file name of the folder, 'site.saveAs' writes the
 * suggested name there, reports go to <workspace>/reports/.
 */
export function workspaceHost(workspaceDir: string, now: () => Date = () => new Date()): ShellHost {
  mkdirSync(workspaceDir, { recursive: true });
  const root = realpathSync(workspaceDir);
  const inside = (path: string, what: string): string => {
    const real = realpathOfExisting(resolve(root, path));
    const rel = relative(root, real);
    if (rel === '..' || rel.startsWith('..' + sep) || isAbsolute(rel))
      throw new ServiceError(
        'forbidden',
        `${path}: the browser shell only uses ${what} inside its workspace folder ${root}`,
      );
    return real;
  };
  return {
    shell: 'browser',
    allowFile: (path) => {
      const p = inside(path, 'files');
      if (p === root) throw new ServiceError('forbidden', `${path}: this is the workspace folder, not a file`);
      return p;
    },
    allowDir: (path) => inside(path, 'folders'),
    pickOpenPath: async (req) => (req.name ? inside(join(root, basename(req.name)), 'files') : null),
    pickSavePath: async (suggestedName) => join(root, safeSiteFileName(suggestedName)),
    pickExportDir: async (siteName) =>
      join(root, 'reports', `${safeSiteFileName(siteName).slice(0, -SITE_EXTENSION.length)}-${timestamp(now())}`),
    writeClipboardImage: async () => {
      throw new ServiceError(
        'unsupported',
        'the browser shell cannot reach the system clipboard; copy the chart from the browser instead',
      );
    },
    listFiles: () =>
      readdirSync(root)
        .filter((n) => n.toLowerCase().endsWith(SITE_EXTENSION) && !n.startsWith('.'))
        .map((n) => join(root, n))
        .filter((p) => statSync(p).isFile())
        .sort((a, b) => statSync(b).mtimeMs - statSync(a).mtimeMs),
  };
}
