// The browser shell's report folder: each export gets a folder of its own under <workspace>/reports/, named by
// the site and the time, and a second export within the same second never lands in (or overwrites) the first.
import { mkdirSync, mkdtempSync, realpathSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, dirname, join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { workspaceHost } from '../../src-main/shell/workspace-host';

let base: string;
const at = new Date('2026-09-14T08:30:05Z');

beforeEach(() => {
  base = mkdtempSync(join(tmpdir(), 'gprime-report-folder-'));
});
afterEach(() => rmSync(base, { recursive: true, force: true }));

describe('browser shell report folder', () => {
  it('is a new folder of <workspace>/reports named by the site and the time', async () => {
    const host = workspaceHost(join(base, 'sites'), () => at);
    const dir = (await host.pickExportDir('Quillmere Reservoir'))!;
    expect(dirname(dir)).toBe(join(realpathSync(join(base, 'sites')), 'reports'));
    expect(basename(dir)).toMatch(/^Quillmere Reservoir-20260914-083005$/);
  });

  it('gives a second export within the same second a folder of its own', async () => {
    const host = workspaceHost(join(base, 'sites'), () => at);
    const first = (await host.pickExportDir('Quillmere Reservoir'))!;
    mkdirSync(first, { recursive: true });
    const second = (await host.pickExportDir('Quillmere Reservoir'))!;
    expect(second).toBe(`${first}-2`);
    mkdirSync(second);
    expect(await host.pickExportDir('Quillmere Reservoir')).toBe(`${first}-3`);
  });
});
