import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(import.meta.dirname, '..', '..');

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? files(p) : p.endsWith('.ts') ? [p] : [];
  });
}

/** Every exported MethodInfo descriptor in shared-core, with its id and topic folder. */
function methodDescriptors(): { topic: string; id: string; file: string }[] {
  const out: { topic: string; id: string; file: string }[] = [];
  for (const f of files(join(ROOT, 'shared-core'))) {
    const text = readFileSync(f, 'utf8');
    for (const m of text.matchAll(/export const \w+\s*:\s*MethodInfo\s*=\s*\{\s*id:\s*'([^']+)'/g)) {
      out.push({ topic: relative(join(ROOT, 'shared-core'), f).split(/[\\/]/)[0], id: m[1], file: relative(ROOT, f) });
    }
  }
  return out;
}

describe('every published method has check values (style.md §5; empty allow-list)', () => {
  const methods = methodDescriptors();
  it('finds the descriptors', () => expect(methods.length).toBeGreaterThan(10));
  it('method ids are unique', () => {
    const ids = methods.map((m) => m.id);
    expect(ids.filter((id, i) => ids.indexOf(id) !== i)).toEqual([]);
  });
  for (const m of methods) {
    it(`${m.id} (${m.file}) has test/check-values/${m.topic}/${m.id}.json with a named source`, () => {
      const path = join(ROOT, 'test', 'check-values', m.topic, `${m.id}.json`);
      expect(existsSync(path), `missing ${relative(ROOT, path)}`).toBe(true);
      const data = JSON.parse(readFileSync(path, 'utf8'));
      expect(data.method).toBe(m.id);
      expect(data.checks.length).toBeGreaterThan(0);
      for (const c of data.checks) {
        expect(c.source.length).toBeGreaterThan(10);
        expect(c.cases.length).toBeGreaterThan(0);
      }
    });
  }
});
