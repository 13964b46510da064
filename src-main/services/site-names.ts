import { basename } from 'node:path';
import { SITE_FILE_EXTENSION } from '../../electron.config';

export const SITE_EXTENSION = `.${SITE_FILE_EXTENSION}`;

/** A file name safe in every file system: no folders, no reserved characters, with the site extension. */
export function safeSiteFileName(name: string): string {
  const base = basename(name.replace(/\\/g, '/'))
    // eslint-disable-next-line no-control-regex -- control characters are exactly what is replaced
    .replace(/[<>:"/\\|?*\u0000-\u001f]/g, '-')
    .replace(/^[.\s]+/, '')
    .trim()
    .slice(0, 120);
  const stem = base.toLowerCase().endsWith(SITE_EXTENSION) ? base.slice(0, -SITE_EXTENSION.length) : base;
  return `${stem || 'site'}${SITE_EXTENSION}`;
}
