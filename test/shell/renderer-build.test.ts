// The renderer build's leftovers: a build killed part-way leaves <outDir>.<pid>.new (or .old); the next
// start removes those of processes that no longer run, and nothing else.
import { existsSync, mkdirSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { removeStaleBuildFolders } from '../../src-main/shell/renderer-build';

describe('renderer build leftovers', () => {
  it('removes the half-built folders of dead builds only', () => {
    const dist = mkdtempSync(join(tmpdir(), 'gprime-dist-'));
    const out = join(dist, 'renderer');
    const names = [
      'renderer',
      'renderer.111.new',
      'renderer.111.old',
      'renderer.222.new',
      'renderer.x.new',
      'other.111.new',
    ];
    for (const n of names) mkdirSync(join(dist, n));
    removeStaleBuildFolders(out, (pid) => pid === 222);
    expect(names.filter((n) => existsSync(join(dist, n)))).toEqual([
      'renderer',
      'renderer.222.new',
      'renderer.x.new',
      'other.111.new',
    ]);
  });
});
