// Bundles a TypeScript entry of the Node side with esbuild when a source is newer than the bundle, so the
// browser shell starts in well under a second instead of compiling every module through a TypeScript loader.
// Plain JavaScript: it runs before any TypeScript can be loaded. Also used by the Electron build.
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, extname, join, resolve } from 'node:path';

export const ROOT = resolve(import.meta.dirname, '..', '..');
const SOURCES = ['shared-core', 'src-main', 'package.json'];
/** Libraries with native parts or big assets stay outside the bundle. */
export const EXTERNAL = [
  '@napi-rs/canvas',
  'pdf-lib',
  '@pdf-lib/fontkit',
  'exceljs',
  'electron',
  'esbuild',
  'playwright-core',
  'vite',
  '@sveltejs/vite-plugin-svelte',
  'svelte',
  'svelte/*',
];

/** newest modification time under path; 0 when it is missing (an installed build without sources) */
function newestMtime(path) {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  return readdirSync(path).reduce((m, name) => Math.max(m, newestMtime(join(path, name))), st.mtimeMs);
}

/** Writes a file under a temporary name, then renames it, so that concurrent starts never load half a file. */
function writeAtomic(path, bytes) {
  mkdirSync(dirname(path), { recursive: true });
  const tmp = `${path}.${process.pid}.tmp`;
  writeFileSync(tmp, bytes);
  renameSync(tmp, path);
}

/**
 * Builds `entry` (relative to the repository) into `outfile` unless the bundle is newer than every source.
 * `format` is 'esm' (Node, Electron main) or 'cjs' (the sandboxed Electron preload). With `splitting`
 * (esm only) every dynamic `import()` becomes a chunk beside `outfile` that loads only when it runs, so a
 * command that writes no report never loads the report libraries.
 */
export async function bundleIfStale({ entry, outfile, format = 'esm', external = EXTERNAL, splitting = false }) {
  const out = join(ROOT, outfile);
  const built = existsSync(out) ? statSync(out).mtimeMs : 0;
  if (built > Math.max(...SOURCES.map((s) => newestMtime(join(ROOT, s))))) return out;
  const { build } = await import('esbuild');
  const extension = extname(out);
  const result = await build({
    write: false,
    entryPoints: [join(ROOT, entry)],
    ...(splitting
      ? { outdir: dirname(out), entryNames: basename(out, extension), outExtension: { '.js': extension }, splitting }
      : { outfile: out }),
    bundle: true,
    platform: 'node',
    format,
    target: 'node20',
    external,
    logLevel: 'error',
    banner:
      format === 'esm'
        ? {
            js: "import { createRequire as __gprimeRequire } from 'node:module'; const require = __gprimeRequire(import.meta.url);",
          }
        : undefined,
  });
  // chunks first (their names hold a content hash), the entry last: a start never sees an entry without its chunks
  const files = [...result.outputFiles].sort((a, b) => Number(a.path === out) - Number(b.path === out));
  for (const f of files) writeAtomic(f.path, f.contents);
  if (splitting) removeOldChunks(dirname(out), new Set(files.map((f) => f.path)), built);
  return out;
}

/**
 * Removes chunks of builds before the previous one (written over a minute before the previous entry). The
 * previous build's chunks stay for a command that started on it and has not yet loaded its report chunk.
 */
function removeOldChunks(dir, current, previousBuild) {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    const written = statSync(path, { throwIfNoEntry: false })?.mtimeMs ?? Infinity; // another start may rename it
    if (!current.has(path) && !name.endsWith('.tmp') && written < previousBuild - 60_000) rmSync(path, { force: true });
  }
}
