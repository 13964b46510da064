import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkRecordProblems, type Check } from '../helpers/check-values';

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
      for (const c of data.checks) expect(checkRecordProblems(c), c.source).toEqual([]);
    });
  }
});

describe('a check record claims no more than it shows (validation, known bias, consistency)', () => {
  const base = { source: 'Author (2000), Table 1', cases: [{ inputs: { x: 1 }, expected: 1.6 }] };
  it('accepts a validation within its published scatter', () =>
    expect(
      checkRecordProblems({
        ...base,
        kind: 'validation',
        tolerance: { rel: 0.1 },
        scatter: { rel: 0.15, basis: 'lab' },
      }),
    ).toEqual([]));
  it('refuses a validation tolerance larger than the published scatter', () =>
    expect(
      checkRecordProblems({
        ...base,
        kind: 'validation',
        tolerance: { rel: 0.55 },
        scatter: { rel: 0.15, basis: 'lab' },
      }),
    ).toEqual([expect.stringMatching(/exceeds the stated scatter/)]));
  it('refuses a validation without a stated scatter, or one with a bias', () => {
    expect(checkRecordProblems({ ...base, kind: 'validation', tolerance: { rel: 0.1 } } as Check)).toHaveLength(1);
    expect(
      checkRecordProblems({
        ...base,
        kind: 'validation',
        tolerance: { rel: 0.1 },
        scatter: { rel: 0.1, basis: 'lab' },
        bias: { rel: -0.5 },
      }),
    ).toHaveLength(1);
  });
  it('a known-bias record states its bias, and a tolerance that covers the bias is refused', () => {
    expect(checkRecordProblems({ ...base, kind: 'known-bias', tolerance: { rel: 0.03 } })).toHaveLength(1);
    expect(checkRecordProblems({ ...base, kind: 'known-bias', tolerance: { rel: 0.03 }, bias: { rel: -0.5 } })).toEqual(
      [],
    );
    expect(checkRecordProblems({ ...base, kind: 'known-bias', tolerance: { rel: 0.55 }, bias: { rel: -0.5 } })).toEqual(
      [expect.stringMatching(/covers the stated bias/)],
    );
  });
  it('a consistency check (the coded formula against itself) is held close', () => {
    expect(checkRecordProblems({ ...base, kind: 'consistency', tolerance: { rel: 1e-12 } })).toEqual([]);
    expect(checkRecordProblems({ ...base, kind: 'consistency', tolerance: { abs: 0.2 } })).toHaveLength(1);
  });
  it('a record without a kind is refused', () =>
    expect(checkRecordProblems({ ...base, tolerance: { rel: 0.1 } } as unknown as Check)).toHaveLength(1));
});
