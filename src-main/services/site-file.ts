import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { loadSite, SiteFileError, type Site } from '../../shared-core/site';
import pkg from '../../package.json' with { type: 'json' };

export const GPRIME_VERSION: string = pkg.version;

export interface LoadedSite {
  site: Site;
  /** SHA-256 of the file's bytes */
  hash: string;
  path: string;
}

/** Reads and validates a site file; the file itself is never modified. */
export function readSiteFile(path: string): LoadedSite {
  let bytes: Buffer;
  try {
    bytes = readFileSync(path);
  } catch (e) {
    throw new SiteFileError(path, `cannot read the file (${(e as NodeJS.ErrnoException).code ?? String(e)})`);
  }
  return { site: loadSite(bytes.toString('utf8')), hash: createHash('sha256').update(bytes).digest('hex'), path };
}
