import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(import.meta.dirname, '..', '..');

function files(dir: string, ext: RegExp): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? files(p, ext) : ext.test(name) ? [p] : [];
  });
}

const IMPORT =
  /(?:import|export)[^'"]*?from\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)|require\(\s*['"]([^'"]+)['"]\s*\)/g;
const imports = (file: string) => [...readFileSync(file, 'utf8').matchAll(IMPORT)].map((m) => m[1] ?? m[2] ?? m[3]);

const NODE_BUILTINS = /^(node:|fs$|path$|os$|child_process$|url$|http$|https$|crypto$|stream$|util$|worker_threads$)/;

describe('layering (DEVELOPERS.md: shared-core is pure; the renderer never reaches Node or Electron)', () => {
  it('shared-core imports nothing from Node, DOM, Electron or Svelte, nor from other project folders', () => {
    const bad: string[] = [];
    for (const f of files(join(ROOT, 'shared-core'), /\.ts$/)) {
      for (const spec of imports(f)) {
        if (
          NODE_BUILTINS.test(spec) ||
          /^(electron|svelte)/.test(spec) ||
          /\.\.\/\.\.\/(src-main|src-renderer)/.test(spec) ||
          spec.includes('src-main') ||
          spec.includes('src-renderer')
        ) {
          bad.push(`${f.slice(ROOT.length + 1)} imports ${spec}`);
        }
      }
      const text = readFileSync(f, 'utf8').replace(/\/\*[\s\S]*?\*\/|\/\/.*$/gm, '');
      if (/\b(window|document|process|console)\./.test(text))
        bad.push(`${f.slice(ROOT.length + 1)} uses a DOM/Node global`);
    }
    expect(bad).toEqual([]);
  });

  it('src-renderer never imports electron or Node modules', () => {
    const bad: string[] = [];
    for (const f of files(join(ROOT, 'src-renderer'), /\.(ts|svelte)$/)) {
      for (const spec of imports(f))
        if (NODE_BUILTINS.test(spec) || /^electron/.test(spec) || spec.includes('src-main'))
          bad.push(`${f.slice(ROOT.length + 1)} imports ${spec}`);
    }
    expect(bad).toEqual([]);
  });
});
