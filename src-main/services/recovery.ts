import { mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { z } from 'zod';
import { atomicWriteFile } from './atomic-write';

const recoverySchema = z.object({
  format: z.literal('gprime-recovery'),
  text: z.string().min(2),
  path: z.string().min(1).nullable(),
  savedAt: z.string(),
});

export interface RecoveryEntry {
  text: string;
  /** the file the unsaved document belongs to, or null for a new document */
  path: string | null;
  /** ISO 8601 time of the autosave */
  savedAt: string;
}

/**
 * The autosave of the unsaved document, one file in the per-user data folder. It survives a crash; the
 * workspace offers it back on the next start and clears it after a save or when the user declines.
 */
export class RecoveryStore {
  readonly file: string;
  constructor(
    private readonly dataDir: string,
    private readonly now: () => Date = () => new Date(),
  ) {
    this.file = join(dataDir, 'recovery.json');
  }

  write(text: string, path: string | null): void {
    mkdirSync(this.dataDir, { recursive: true });
    const entry = { format: 'gprime-recovery', text, path, savedAt: this.now().toISOString() };
    atomicWriteFile(this.file, JSON.stringify(entry));
  }

  /** The recovery left behind, or null when there is none (an unreadable one counts as none). */
  check(): RecoveryEntry | null {
    let raw: string;
    try {
      raw = readFileSync(this.file, 'utf8');
    } catch {
      return null;
    }
    try {
      const r = recoverySchema.safeParse(JSON.parse(raw));
      return r.success ? { text: r.data.text, path: r.data.path, savedAt: r.data.savedAt } : null;
    } catch {
      return null;
    }
  }

  clear(): void {
    rmSync(this.file, { force: true });
  }
}
