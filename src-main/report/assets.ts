import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/**
 * The report fonts ship in the repository's assets/fonts (DejaVu Sans, licence beside them). The folder is
 * found by walking up from this module, which works from the sources (src-main/report/, vitest, tsx) and
 * from the CLI bundle (dist/cli/); the working directory is the last resort.
 */
function findFontsDir(): string {
  const tried: string[] = [];
  const starts = [dirname(fileURLToPath(import.meta.url)), process.cwd()];
  for (const start of starts) {
    let dir = start;
    for (let i = 0; i < 6; i++) {
      const candidate = join(dir, 'assets', 'fonts');
      tried.push(candidate);
      if (existsSync(join(candidate, 'DejaVuSans.ttf'))) return candidate;
      const up = dirname(dir);
      if (up === dir) break;
      dir = up;
    }
  }
  throw new Error(`report fonts not found (looked for DejaVuSans.ttf in ${tried.join(', ')})`);
}

let fontsDir: string | undefined;

export function fontPath(name: 'DejaVuSans.ttf' | 'DejaVuSans-Bold.ttf'): string {
  fontsDir ??= findFontsDir();
  return join(fontsDir, name);
}

const cache = new Map<string, Buffer>();

export function fontBytes(name: 'DejaVuSans.ttf' | 'DejaVuSans-Bold.ttf'): Buffer {
  let bytes = cache.get(name);
  if (!bytes) {
    bytes = readFileSync(fontPath(name));
    cache.set(name, bytes);
  }
  return bytes;
}

/** The family name the fonts register under in the canvas (their own name, so SVG text names a real font). */
export const FONT_FAMILY = 'DejaVu Sans';
