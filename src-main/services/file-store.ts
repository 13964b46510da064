import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { loadSite, SiteFileError } from '../../shared-core/site/load';
import { atomicWriteFile, type WriteOps } from './atomic-write';
import { checkSiteFileName, requireRegularFile } from './site-paths';

export interface SiteText {
  path: string;
  text: string;
}

/**
 * Reads a site file and validates it (format, version, schema); the file is never modified. Only regular
 * files named *.gpsite of bounded size are read (a pipe or a device would block the process).
 */
export function readSiteText(path: string): SiteText {
  checkSiteFileName(path);
  requireRegularFile(path);
  const text = readFileSync(path, 'utf8');
  try {
    loadSite(text);
  } catch (e) {
    if (e instanceof SiteFileError)
      throw new SiteFileError(
        e.place ? `${path}, ${e.place}` : path,
        e.message.slice(e.place ? e.place.length + 2 : 0),
      );
    throw e;
  }
  return { path, text };
}

/**
 * Saves a site document atomically. Refuses text that is not a valid site document, and refuses to
 * replace an existing file that does not load (malformed, or written by a newer gprime): such a file is
 * never modified. Only a regular file named *.gpsite (or a new one) is written.
 */
export function saveSiteText(path: string, text: string, ops?: WriteOps): SiteText {
  checkSiteFileName(path);
  requireRegularFile(path, true);
  loadSite(text);
  if (existsSync(path)) {
    try {
      readSiteText(path);
    } catch (e) {
      if (!(e instanceof SiteFileError)) throw e;
      throw new SiteFileError(
        path,
        `the existing file does not open in this gprime (${e.message}); it was left unchanged — save under another name`,
      );
    }
  }
  atomicWriteFile(path, text, ops);
  return { path, text };
}

const MAX_RECENT = 10;

/** The recently opened or saved site files, most recent first, kept in the per-user data folder. */
export class RecentFiles {
  private readonly file: string;
  constructor(dataDir: string) {
    this.file = join(dataDir, 'recent.json');
  }

  list(): string[] {
    try {
      const parsed: unknown = JSON.parse(readFileSync(this.file, 'utf8'));
      const paths = (parsed as { paths?: unknown })?.paths;
      return Array.isArray(paths)
        ? paths.filter((p): p is string => typeof p === 'string' && p.length > 0).slice(0, MAX_RECENT)
        : [];
    } catch {
      return [];
    }
  }

  add(path: string): string[] {
    const abs = resolve(path);
    const paths = [abs, ...this.list().filter((p) => p !== abs)].slice(0, MAX_RECENT);
    mkdirSync(join(this.file, '..'), { recursive: true });
    atomicWriteFile(this.file, JSON.stringify({ paths }, null, 2) + '\n');
    return paths;
  }
}
