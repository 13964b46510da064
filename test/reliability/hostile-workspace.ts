// A workspace full of traps, for the reliability suite: links leading out (to a file, to a folder), a
// dangling link, a named pipe and a folder named *.gpsite, a hidden site file, a site written by a newer
// gprime, a non-site file, and a folder outside. `changed()` names every watched entry that is no longer
// as it was at the previous call (content, kind or link target), including new entries outside.
import { createHash } from 'node:crypto';
import { execFileSync } from 'node:child_process';
import {
  lstatSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  readlinkSync,
  realpathSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join, sep } from 'node:path';

export interface HostileWorkspace {
  ws: string;
  outside: string;
  dataDir: string;
  /** every trap and ordinary entry, as absolute paths (for generators) */
  entries: string[];
  /** the watched entries changed since the previous call (the first call compares with the start) */
  changed(): string[];
}

/** Kind and content of an entry; a folder's listing counts only outside the workspace (saves inside may add files). */
function fingerprint(path: string, ws: string): string {
  const st = lstatSync(path, { throwIfNoEntry: false });
  if (!st) return 'missing';
  if (st.isSymbolicLink()) return `link → ${readlinkSync(path)}`;
  if (st.isFIFO()) return 'pipe';
  if (st.isDirectory()) return path.startsWith(ws + sep) ? 'folder' : `folder: ${readdirSync(path).sort().join(',')}`;
  return `file ${createHash('sha256').update(readFileSync(path)).digest('hex')}`;
}

export function hostileWorkspace(site: string, newerSite: string): HostileWorkspace {
  const root = realpathSync(mkdtempSync(join(tmpdir(), 'gprime-hostile-')));
  const ws = join(root, 'sites');
  const outside = join(root, 'outside');
  mkdirSync(join(ws, 'sub'), { recursive: true });
  mkdirSync(join(ws, 'folder.gpsite'));
  mkdirSync(outside);
  const files: Record<string, string> = {
    [join(outside, 'secret.gpsite')]: site,
    [join(outside, 'notes.txt')]: 'outside the workspace\n',
    [join(ws, 'kept.gpsite')]: site,
    [join(ws, 'sub', 'inner.gpsite')]: site,
    [join(ws, 'newer.gpsite')]: newerSite,
    [join(ws, '.hidden.gpsite')]: site,
    [join(ws, 'notes.txt')]: 'not a site\n',
  };
  for (const [path, text] of Object.entries(files)) writeFileSync(path, text);
  symlinkSync(join(outside, 'secret.gpsite'), join(ws, 'link-out.gpsite'));
  symlinkSync(outside, join(ws, 'link-out-dir'));
  symlinkSync(outside, join(ws, 'reports'));
  symlinkSync(join(ws, 'gone.gpsite'), join(ws, 'dangling.gpsite'));
  symlinkSync(join(ws, 'kept.gpsite'), join(ws, 'link-in.gpsite'));
  execFileSync('mkfifo', [join(ws, 'pipe.gpsite')]);

  // watched: everything no request may change. Site files inside may be saved or created (kept.gpsite,
  // sub/inner.gpsite, gone.gpsite — a save to it by name is legitimate and turns the dangling link into a good one)
  const watched = [
    outside,
    join(outside, 'secret.gpsite'),
    join(outside, 'notes.txt'),
    join(ws, 'newer.gpsite'),
    join(ws, '.hidden.gpsite'),
    join(ws, 'notes.txt'),
    join(ws, 'link-out.gpsite'),
    join(ws, 'link-out-dir'),
    join(ws, 'reports'),
    join(ws, 'dangling.gpsite'),
    join(ws, 'link-in.gpsite'),
    join(ws, 'pipe.gpsite'),
    join(ws, 'folder.gpsite'),
  ];
  let last = watched.map((p) => fingerprint(p, ws));
  return {
    ws,
    outside,
    dataDir: join(root, 'data'),
    entries: [...new Set([...Object.keys(files), ...watched, join(ws, 'sub'), ws])],
    changed: () => {
      const now = watched.map((p) => fingerprint(p, ws));
      const changed = watched.filter((_p, i) => now[i] !== last[i]);
      last = now;
      return changed;
    },
  };
}
