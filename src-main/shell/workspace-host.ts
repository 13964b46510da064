import { existsSync, lstatSync, mkdirSync, readdirSync, realpathSync, statSync } from 'node:fs';
import { basename, dirname, isAbsolute, join, relative, resolve, sep } from 'node:path';
import type { ShellHost } from '../services/channel-handlers';
import { ServiceError } from '../services/service-error';
import { safeSiteFileName, SITE_EXTENSION } from '../services/site-names';
import { removeStaleTemporaryFiles } from '../services/temp-files';

function timestamp(d: Date): string {
  return d.toISOString().slice(0, 19).replace(/[-:]/g, '').replace('T', '-');
}

/**
 * The real path of `abs`: symbolic links of the part that exists resolved, so a link cannot lead out.
 * A link to something missing is refused (its target could be anywhere).
 */
function realpathOfExisting(abs: string, asked: string): string {
  const rest: string[] = [];
  for (let p = abs; ; p = dirname(p)) {
    try {
      return join(realpathSync(p), ...rest.reverse());
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code !== 'ENOENT' && (e as NodeJS.ErrnoException).code !== 'ENOTDIR') throw e;
      if (lstatSync(p, { throwIfNoEntry: false })?.isSymbolicLink())
        throw new ServiceError('forbidden', `${asked}: leads through a link to something missing; refused`);
      if (dirname(p) === p) return abs;
      rest.push(basename(p));
    }
  }
}

/**
 * The browser shell has no native dialogs: every file lives in one workspace folder. Every path it
 * touches (open, save, save as, the report folder, the file list) goes through one containment check that
 * resolves links: the real path must lie inside the workspace. 'site.open' takes a file name of the
 * folder, 'site.saveAs' writes the suggested name there, each report goes to a new folder of <workspace>/reports/.
 */
export function workspaceHost(workspaceDir: string, now: () => Date = () => new Date()): ShellHost {
  mkdirSync(workspaceDir, { recursive: true });
  const root = realpathSync(workspaceDir);
  removeStaleTemporaryFiles(root);
  const contained = (path: string, what: string): string => {
    const real = realpathOfExisting(resolve(root, path), path);
    const rel = relative(root, real);
    if (rel === '..' || rel.startsWith('..' + sep) || isAbsolute(rel))
      throw new ServiceError(
        'forbidden',
        `${path}: the browser shell only uses ${what} inside its workspace folder ${root}`,
      );
    return real;
  };
  const containedFile = (path: string) => {
    const real = contained(path, 'files');
    if (real === root) throw new ServiceError('forbidden', `${path}: this is the workspace folder, not a file`);
    return real;
  };
  const modified = (p: string) => statSync(p, { throwIfNoEntry: false })?.mtimeMs ?? 0;
  const listable = (p: string) => {
    try {
      return statSync(containedFile(p)).isFile();
    } catch {
      return false; // a dangling link, a link leading out, a file that vanished: not listed, never an error
    }
  };
  return {
    shell: 'browser',
    allowFile: (path) => containedFile(path),
    allowDir: (path) => contained(path, 'folders'),
    pickOpenPath: async (req) => (req.name ? containedFile(join(root, basename(req.name))) : null),
    pickSavePath: async (suggestedName) => containedFile(join(root, safeSiteFileName(suggestedName))),
    pickExportDir: async (siteName) => {
      // one new folder per export: a second export within the same second gets -2, -3 … (never overwrites)
      const base = `${safeSiteFileName(siteName).slice(0, -SITE_EXTENSION.length)}-${timestamp(now())}`;
      let dir = contained(join(root, 'reports', base), 'folders');
      for (let k = 2; existsSync(dir); k++) dir = contained(join(root, 'reports', `${base}-${k}`), 'folders');
      return dir;
    },
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
        .filter(listable)
        .sort((a, b) => modified(b) - modified(a)),
  };
}
