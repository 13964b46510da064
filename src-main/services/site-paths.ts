import { lstatSync, realpathSync, statSync, type Stats } from 'node:fs';
import { basename } from 'node:path';
import { ServiceError } from './service-error';
import { SITE_EXTENSION } from './site-names';

/** A site document is at most 50 million characters (the contract's limit); a file larger than this is refused unread. */
export const MAX_SITE_FILE_BYTES = 64 * 1024 * 1024;

/** Refuses names that are not site files: dot files and names without the site extension. */
export function checkSiteFileName(path: string): void {
  const name = basename(path);
  if (name.startsWith('.'))
    throw new ServiceError('forbidden', `${path}: hidden files (names starting with ".") are not site files`);
  if (!name.toLowerCase().endsWith(SITE_EXTENSION) || name.length === SITE_EXTENSION.length)
    throw new ServiceError('forbidden', `${path}: a site file name ends with ${SITE_EXTENSION}`);
}

function kindOf(st: Stats): string {
  if (st.isDirectory()) return 'a folder';
  if (st.isFIFO()) return 'a named pipe';
  if (st.isCharacterDevice() || st.isBlockDevice()) return 'a device';
  if (st.isSocket()) return 'a socket';
  return 'not a regular file';
}

/**
 * Refuses anything but a regular file of bounded size, after following links: folders, named pipes,
 * devices, sockets and links to missing files. Reading a pipe or a device would block or never end.
 * A missing path passes when `missingOk` (a new file about to be written).
 */
export function requireRegularFile(path: string, missingOk = false): void {
  let st: Stats;
  try {
    st = statSync(path);
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code !== 'ENOENT') throw e;
    if (isLink(path)) throw new ServiceError('forbidden', `${path}: a link to a missing file`);
    if (missingOk) return;
    throw e;
  }
  if (!st.isFile()) throw new ServiceError('forbidden', `${path}: ${kindOf(st)}, not a site file`);
  if (st.size > MAX_SITE_FILE_BYTES)
    throw new ServiceError(
      'forbidden',
      `${path}: ${st.size} bytes; a site file is at most ${MAX_SITE_FILE_BYTES / 1024 / 1024} MB`,
    );
}

export function isLink(path: string): boolean {
  try {
    return lstatSync(path).isSymbolicLink();
  } catch {
    return false;
  }
}

/**
 * The file a write to `path` lands in: the link's target when `path` is a symbolic link (so a save
 * replaces the target, never the link), `path` itself when it is missing. A link to a missing file is refused.
 */
export function writeTarget(path: string): string {
  try {
    return realpathSync(path);
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code !== 'ENOENT') throw e;
    if (isLink(path)) throw new ServiceError('forbidden', `${path}: a link to a missing file; it was left unchanged`);
    return path;
  }
}
