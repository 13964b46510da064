import { SITE_FORMAT, SITE_VERSION, siteSchema, type Site } from './schema';
import { migrations } from './migrations';
import { duplicateIds } from './checks';

/** A site file that cannot be opened; names the place in the document and never modifies the file. */
export class SiteFileError extends Error {
  readonly place: string;
  constructor(place: string, message: string) {
    super(place ? `${place}: ${message}` : message);
    this.name = 'SiteFileError';
    this.place = place;
  }
}

function placeOf(path: readonly PropertyKey[]): string {
  return path.reduce<string>(
    (acc, k) => (typeof k === 'number' ? `${acc}[${k}]` : acc ? `${acc}.${String(k)}` : String(k)),
    '',
  );
}

/**
 * Parses and validates a site document (text or an already parsed object): checks the format marker,
 * migrates older versions forward, refuses newer ones, and validates with zod.
 */
export function loadSite(input: string | unknown): Site {
  let doc: unknown = input;
  if (typeof input === 'string') {
    try {
      doc = JSON.parse(input);
    } catch (e) {
      const m = /position (\d+)/.exec(String(e));
      const place = m ? `character ${m[1]} (line ${input.slice(0, Number(m[1])).split('\n').length})` : 'the file';
      throw new SiteFileError(place, `not valid JSON (${(e as Error).message})`);
    }
  }
  if (!doc || typeof doc !== 'object' || Array.isArray(doc))
    throw new SiteFileError('', 'a site file must hold one JSON object');
  const obj = doc as Record<string, unknown>;
  if (obj.format !== SITE_FORMAT)
    throw new SiteFileError(
      'format',
      `expected "${SITE_FORMAT}", found ${JSON.stringify(obj.format)}: this is not a gprime site file`,
    );
  const version = obj.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1)
    throw new SiteFileError('version', `expected a whole number ≥ 1, found ${JSON.stringify(version)}`);
  if (version > SITE_VERSION) {
    throw new SiteFileError(
      'version',
      `this site file is version ${version}; this gprime reads versions up to ${SITE_VERSION}. Open it with a newer gprime; the file was not changed.`,
    );
  }
  let current: Record<string, unknown> = obj;
  for (let v = version; v < SITE_VERSION; v++) current = migrations[v](current);
  const parsed = siteSchema.safeParse(current);
  if (!parsed.success) {
    const issues = parsed.error.issues.slice(0, 8).map((i) => `${placeOf(i.path) || '(top)'}: ${i.message}`);
    throw new SiteFileError(
      placeOf(parsed.error.issues[0].path),
      `${issues.length > 1 ? `${parsed.error.issues.length} problems — ` : ''}${issues.join('; ')}`,
    );
  }
  // estimates name their feature and condition by id: an id used twice would make them ambiguous
  const twice = duplicateIds(parsed.data);
  if (twice.length) {
    const d = twice[0];
    const more = twice.length > 1 ? ` (and ${twice.length - 1} more repeated id${twice.length > 2 ? 's' : ''})` : '';
    throw new SiteFileError(
      d.place,
      `the id "${d.id}" is already used at ${d.first}; ids must differ within ${d.group}${more}`,
    );
  }
  return parsed.data;
}

/** Serialises a site in a stable, diff-friendly form (two-space indent, trailing newline). */
export function serialiseSite(site: Site): string {
  return JSON.stringify(site, null, 2) + '\n';
}
