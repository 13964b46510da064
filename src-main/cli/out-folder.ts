import { accessSync, constants, realpathSync, statSync } from 'node:fs';
import { dirname, resolve, sep } from 'node:path';
import { UsageError } from './errors';

/** Kernel and device file systems: no place for report files (writes there fail late, hang or reach a device). */
const SYSTEM_FOLDERS = ['/proc', '/sys', '/dev'];

/** The path itself when it exists, else its nearest existing parent folder (which mkdir would create under). */
function nearestExisting(path: string): string {
  for (let p = path; ; p = dirname(p)) {
    try {
      statSync(p);
      return p;
    } catch {
      if (dirname(p) === p) return p;
    }
  }
}

/**
 * Checks `--out` before the assessment and the report are computed: it must be a folder (or a path where one can be
 * created) that is writable and outside the kernel's file systems. Refuses with a message naming the path.
 */
export function checkOutFolder(out: string): void {
  const path = resolve(out);
  const existing = nearestExisting(path);
  const real = realpathSync(existing);
  const system = SYSTEM_FOLDERS.find((f) => real === f || real.startsWith(f + sep));
  if (system)
    throw new UsageError(`--out ${out}: ${real} lies in ${system}, a system file system, not a place for report files`);
  if (!statSync(existing).isDirectory())
    throw new UsageError(
      existing === path
        ? `--out ${out} is an existing file, not a folder; give a folder (it is created when missing)`
        : `--out ${out}: ${existing} is a file, so no folder can be created under it`,
    );
  try {
    accessSync(existing, constants.W_OK);
  } catch {
    throw new UsageError(`--out ${out}: the folder ${existing} is not writable`);
  }
}
