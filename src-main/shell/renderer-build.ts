import { existsSync, readdirSync, renameSync, rmSync, statSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { processIsAlive } from '../services/temp-files';

/** Folders whose files end up in the renderer bundle. */
const RENDERER_SOURCES = ['src-renderer', 'shared-core', 'vite.config.ts', 'svelte.config.js'];

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const name of readdirSync(path))
    if (name !== 'node_modules') newest = Math.max(newest, newestMtime(join(path, name)));
  return newest;
}

/** True when dist/renderer is missing or older than a renderer or shared-core source. */
export function rendererIsStale(root: string, outDir: string): boolean {
  const index = join(outDir, 'index.html');
  if (!existsSync(index)) return true;
  const built = statSync(index).mtimeMs;
  return RENDERER_SOURCES.some((s) => newestMtime(join(root, s)) > built);
}

/** Removes the half-built folders (`<outDir>.<pid>.new|old`) that a build killed part-way left behind. */
export function removeStaleBuildFolders(outDir: string, isAlive: (pid: number) => boolean = processIsAlive): void {
  const prefix = `${basename(outDir)}.`;
  const parent = dirname(outDir);
  if (!existsSync(parent)) return;
  for (const name of readdirSync(parent)) {
    const m = name.startsWith(prefix) ? /^(\d+)\.(new|old)$/.exec(name.slice(prefix.length)) : null;
    if (m && !isAlive(Number(m[1]))) rmSync(join(parent, name), { recursive: true, force: true });
  }
}

/**
 * Builds the renderer with vite when it is missing or stale. Builds into a fresh folder first and swaps
 * it in, so a server already serving the old build never sees a half-written one.
 */
export async function ensureRendererBuilt(root: string, outDir = join(root, 'dist', 'renderer')): Promise<void> {
  removeStaleBuildFolders(outDir);
  if (!rendererIsStale(root, outDir)) return;
  const { build } = await import('vite');
  const fresh = `${outDir}.${process.pid}.new`;
  rmSync(fresh, { recursive: true, force: true });
  await build({
    configFile: join(root, 'vite.config.ts'),
    root: join(root, 'src-renderer'),
    logLevel: 'warn',
    build: { outDir: fresh, emptyOutDir: true },
  });
  const old = `${outDir}.${process.pid}.old`;
  try {
    if (existsSync(outDir)) renameSync(outDir, old);
    renameSync(fresh, outDir);
  } catch (e) {
    // another shell swapped its own fresh build in at the same moment: use that one
    if (!existsSync(join(outDir, 'index.html'))) throw e;
  } finally {
    rmSync(old, { recursive: true, force: true });
    rmSync(fresh, { recursive: true, force: true });
  }
}
