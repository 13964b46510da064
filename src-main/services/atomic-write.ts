import * as fs from 'node:fs';
import { dirname } from 'node:path';
import { writeTarget } from './site-paths';
import { temporaryPathFor } from './temp-files';

/** The file operations an atomic write uses; tests swap one out to simulate a full disk. */
export interface WriteOps {
  openSync: typeof fs.openSync;
  writeSync: (fd: number, data: Buffer, offset: number, length: number) => number;
  fsyncSync: typeof fs.fsyncSync;
  closeSync: typeof fs.closeSync;
  renameSync: typeof fs.renameSync;
}

export const nodeWriteOps: WriteOps = {
  openSync: fs.openSync,
  writeSync: (fd, data, offset, length) => fs.writeSync(fd, data, offset, length),
  fsyncSync: fs.fsyncSync,
  closeSync: fs.closeSync,
  renameSync: fs.renameSync,
};

/** Flushes a directory entry (POSIX); Windows cannot open directories, and rename is durable enough there. */
function syncDirectory(dir: string): void {
  let fd: number | undefined;
  try {
    fd = fs.openSync(dir, 'r');
    fs.fsyncSync(fd);
  } catch {
    /* not supported on this platform */
  } finally {
    if (fd !== undefined) fs.closeSync(fd);
  }
}

/**
 * Replaces `path` with `text` so that the file is either the old or the new content, never a mix:
 * writes a temporary file in the same folder, flushes it to disk, then renames it over the target.
 * On any failure the temporary file is removed and the old file is left as it was. Through a symbolic
 * link the link's target is replaced, never the link; a temporary file a kill leaves behind is removed
 * at the next start (`removeStaleTemporaryFiles`).
 */
export function atomicWriteFile(linkOrPath: string, text: string, ops: WriteOps = nodeWriteOps): void {
  const path = writeTarget(linkOrPath);
  const dir = dirname(path);
  const tmp = temporaryPathFor(path);
  const data = Buffer.from(text, 'utf8');
  let mode = 0o644;
  try {
    mode = fs.statSync(path).mode & 0o777;
  } catch {
    /* new file */
  }
  let fd: number | undefined;
  try {
    fd = ops.openSync(tmp, 'wx', mode);
    for (let off = 0; off < data.length;) off += ops.writeSync(fd, data, off, data.length - off);
    ops.fsyncSync(fd);
    ops.closeSync(fd);
    fd = undefined;
    ops.renameSync(tmp, path);
  } catch (e) {
    if (fd !== undefined) {
      try {
        fs.closeSync(fd);
      } catch {
        /* already closed */
      }
    }
    fs.rmSync(tmp, { force: true });
    throw e;
  }
  syncDirectory(dir);
}
