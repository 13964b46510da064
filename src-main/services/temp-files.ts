import { lstatSync, readdirSync, rmSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { basename, dirname, join } from 'node:path';

/** The temporary file an atomic write of `path` goes through: hidden, beside it, named by process id. */
export function temporaryPathFor(path: string, pid = process.pid): string {
  return join(dirname(path), `.${basename(path)}.${pid}.${randomBytes(4).toString('hex')}.tmp`);
}

const TEMPORARY = /^\..+\.(\d+)\.[0-9a-f]{8}\.tmp$/;

/** True while a process with this id runs (signal 0 tests for it without sending anything). */
export function processIsAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Removes the temporary files that saves killed part-way left in `dir`: regular files named like ours
 * whose process no longer runs (a save in progress in another gprime is left alone). Returns their paths.
 * A folder that cannot be read is skipped: cleaning up never stops a start.
 */
export function removeStaleTemporaryFiles(dir: string, isAlive: (pid: number) => boolean = processIsAlive): string[] {
  let names: string[];
  try {
    names = readdirSync(dir);
  } catch {
    return [];
  }
  const removed: string[] = [];
  for (const name of names) {
    const m = TEMPORARY.exec(name);
    if (!m || isAlive(Number(m[1]))) continue;
    const path = join(dir, name);
    try {
      if (!lstatSync(path).isFile()) continue;
      rmSync(path);
      removed.push(path);
    } catch {
      /* gone already, or not ours to remove */
    }
  }
  return removed;
}
