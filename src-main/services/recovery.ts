import { mkdirSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { z } from 'zod';
import { atomicWriteFile } from './atomic-write';
import { ServiceError } from './service-error';

const recoverySchema = z.object({
  format: z.literal('gprime-recovery'),
  text: z.string().min(2),
  path: z.string().min(1).nullable(),
  savedAt: z.string(),
});

export interface RecoveryEntry {
  /** the document's key: each open document (each window) autosaves to its own file */
  document: string;
  text: string;
  /** the file the unsaved document belongs to, or null for a new document */
  path: string | null;
  /** ISO 8601 time of the autosave */
  savedAt: string;
}

/** The key of a request without one (and of the single recovery file older versions wrote). */
export const SHARED_DOCUMENT = 'default';
const DOCUMENT_KEY = /^[A-Za-z0-9_-]{1,64}$/;

/**
 * Autosaves of unsaved documents, one file per document in the data folder (recovery-<document>.json; the
 * shared document, and earlier versions' single autosave, in recovery.json), so two windows never
 * overwrite each other's. They survive a crash; the workspace offers them back on the next start and a
 * document's file is removed after it is saved or when the user declines its offer.
 */
export class RecoveryStore {
  constructor(
    readonly dir: string,
    private readonly now: () => Date = () => new Date(),
  ) {}

  /** the file of one document; the key is checked again here, so no request can name another path */
  fileOf(document: string): string {
    if (!DOCUMENT_KEY.test(document))
      throw new ServiceError('invalid-request', `recovery: document key "${document}" is not letters, digits, - or _`);
    return join(this.dir, document === SHARED_DOCUMENT ? 'recovery.json' : `recovery-${document}.json`);
  }

  write(text: string, path: string | null, document = SHARED_DOCUMENT): void {
    const file = this.fileOf(document);
    mkdirSync(this.dir, { recursive: true });
    const entry = { format: 'gprime-recovery', text, path, savedAt: this.now().toISOString() };
    atomicWriteFile(file, JSON.stringify(entry));
  }

  /** Every recovery left behind, newest first (an unreadable file counts as none and is left as it is). */
  check(): RecoveryEntry[] {
    let names: string[] = [];
    try {
      names = readdirSync(this.dir);
    } catch {
      // no data folder yet
    }
    const found: RecoveryEntry[] = [];
    for (const n of names) {
      const m = /^recovery(?:-([A-Za-z0-9_-]{1,64}))?\.json$/.exec(n);
      if (!m || m[1] === SHARED_DOCUMENT) continue;
      const e = readEntry(join(this.dir, n), m[1] ?? SHARED_DOCUMENT);
      if (e) found.push(e);
    }
    return found.sort((a, b) => (a.savedAt < b.savedAt ? 1 : a.savedAt > b.savedAt ? -1 : 0));
  }

  /** Removes one document's recovery. */
  clear(document = SHARED_DOCUMENT): void {
    rmSync(this.fileOf(document), { force: true });
  }
}

function readEntry(file: string, document: string): RecoveryEntry | null {
  let raw: string;
  try {
    raw = readFileSync(file, 'utf8');
  } catch {
    return null;
  }
  try {
    const r = recoverySchema.safeParse(JSON.parse(raw));
    return r.success ? { document, text: r.data.text, path: r.data.path, savedAt: r.data.savedAt } : null;
  } catch {
    return null;
  }
}
