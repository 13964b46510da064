// Bundles a TypeScript entry of the Node side with esbuild when a source is newer than the bundle, so the
// browser shell starts in well under a second instead of compiling every module through a TypeScript loader.
// Plain JavaScript: it runs before any TypeScript can be loaded. Also used by the Electron build.
import { existsSync, mkdirSync, readdirSync, renameSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';

export const ROOT = resolve(import.meta.dirname, '..', '..');
const SOURCES = ['shared-core', 'src-main', 'package.json'];
/** Libraries with native parts or big assets stay outside the bundle. */
export const EXTERNAL = [
  '@napi-rs/canvas',
  'pdf-lib',
  '@pdf-lib/fontkit',
  'exceljs',
  'electron',
  'playwright-core',
  'vite',
  '@sveltejs/vite-plugin-svelte',
  'svelte',
  'svelte/*',
];

function newestMtime(path) {
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  return readdirSync(path).reduce((m, name) => Math.max(m, newestMtime(join(path, name))), st.mtimeMs);
}

/**
 * Builds `entry` (relative to the repository) into `outfile` unless the bundle is newer than every source.
 * `format` is 'esm' (Node, Electron main) or 'cjs' (the sandboxed Electron preload).
 */
export async function bundleIfStale({ entry, outfile, format = 'esm', external = EXTERNAL }) {
  const out = join(ROOT, outfile);
  const built = existsSync(out) ? statSync(out).mtimeMs : 0;
  if (built > Math.max(...SOURCES.map((s) => newestMtime(join(ROOT, s))))) return out;
  const { build } = await import('esbuild');
  const result = await build({
    write: false,
    entryPoints: [join(ROOT, entry)],
    outfile: out,
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
  mkdirSync(dirname(out), { recursive: true });
  // write then rename, so that concurrent starts never load a half-written bundle
  const tmp = `${out}.${process.pid}.tmp`;
  writeFileSync(tmp, result.outputFiles[0].contents);
  renameSync(tmp, out);
  return out;
}
