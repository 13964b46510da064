/**
 * The autosave kept in this browser's storage while the shell does not answer, and this window's
 * document key. Local storage belongs to the page's address, so the next start of the shell at the same
 * address (`npm run serve -- --port <n>`) offers these edits back.
 */
const PREFIX = 'gprime-recovery:';
const KEY_SLOT = 'gprime-document';

export interface LocalRecovery {
  document: string;
  text: string;
  path: string | null;
  savedAt: string;
  local: true;
}

function storage(kind: 'local' | 'session'): Storage | null {
  try {
    return kind === 'local' ? window.localStorage : window.sessionStorage;
  } catch {
    return null; // storage switched off in this browser
  }
}

/** This window's document key (kept over a reload of the tab); `fresh` makes a new one. */
export function documentKey(fresh = false): string {
  const s = storage('session');
  const kept = fresh ? null : s?.getItem(KEY_SLOT);
  if (kept && /^[A-Za-z0-9_-]{1,64}$/.test(kept)) return kept;
  const key = `w-${crypto.randomUUID().replace(/-/g, '')}`;
  s?.setItem(KEY_SLOT, key);
  return key;
}

/** Keeps one document's autosave here; false when the browser refused (storage full or switched off). */
export function writeLocalRecovery(
  document: string,
  entry: { text: string; path: string | null; savedAt: string },
): boolean {
  try {
    const s = storage('local');
    if (!s) return false;
    s.setItem(PREFIX + document, JSON.stringify(entry));
    return true;
  } catch {
    return false;
  }
}

export function removeLocalRecovery(document: string): void {
  storage('local')?.removeItem(PREFIX + document);
}

/** Every autosave kept here, read back; damaged entries are skipped (and left for inspection). */
export function localRecoveries(): LocalRecovery[] {
  const s = storage('local');
  if (!s) return [];
  const out: LocalRecovery[] = [];
  for (let i = 0; i < s.length; i++) {
    const k = s.key(i);
    if (!k?.startsWith(PREFIX)) continue;
    try {
      const e = JSON.parse(s.getItem(k) ?? '') as { text?: unknown; path?: unknown; savedAt?: unknown };
      if (
        typeof e.text === 'string' &&
        typeof e.savedAt === 'string' &&
        (e.path === null || typeof e.path === 'string')
      )
        out.push({ document: k.slice(PREFIX.length), text: e.text, path: e.path, savedAt: e.savedAt, local: true });
    } catch {
      // not ours, or cut short
    }
  }
  return out;
}
