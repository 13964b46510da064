import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runGprime } from '../helpers/cli';

// The CLI loads the report libraries only for commands that write reports (gprime's own design: no outside source).
const REPORT_LIBRARIES = ['pdf-lib', '@pdf-lib/fontkit', '@napi-rs/canvas', 'exceljs'];

/** What a bundle file loads before it runs: its own chunks (followed) and the packages they import statically. */
function staticLoad(file: string, load = { files: new Map<string, string>(), packages: new Set<string>() }) {
  if (load.files.has(file)) return load;
  const code = readFileSync(file, 'utf8');
  load.files.set(file, code);
  for (const m of code.matchAll(/^import\s+(?:[^'";]*?\s+from\s+)?["']([^"']+)["']/gm)) {
    if (m[1].startsWith('.')) staticLoad(join(dirname(file), m[1]), load);
    else load.packages.add(m[1]);
  }
  return load;
}

describe('CLI start', () => {
  it('a calc command loads no report library and no site schema; assess and its report writer are chunks loaded on demand', () => {
    expect(runGprime(['calc', 'water-density', 'temperature=20']).code).toBe(0);
    const { files, packages } = staticLoad(join(ROOT, 'dist', 'cli', 'gprime.mjs'));
    expect(packages.has('node:fs'), 'the scan finds static imports').toBe(true);
    for (const lib of REPORT_LIBRARIES) expect(packages.has(lib), lib).toBe(false);
    const code = [...files.values()].join('\n');
    // chart.js and zod are bundled rather than external: esbuild marks each bundled module with its path
    expect(code).not.toContain('node_modules/chart.js/');
    expect(code, 'the site schema (zod) loads only for assess').not.toContain('node_modules/zod/');
    const assess = /import\(["']\.\/(assess-command-[\w-]+\.mjs)["']\)/.exec(code);
    expect(assess, 'assess is a chunk loaded by a dynamic import').not.toBeNull();
    const assessCode = readFileSync(join(ROOT, 'dist', 'cli', assess![1]), 'utf8');
    expect(assessCode).toMatch(/import\(["']\.\/write-report-[\w-]+\.mjs["']\)/);
  });
});
