// Site files on disk: atomic saves, refusal of files that do not load (never modified), recent files and
// the recovery file. Failures are injected through the write operations (a full disk), not simulated by hand.
import { mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { atomicWriteFile, nodeWriteOps, type WriteOps } from '../../src-main/services/atomic-write';
import { createChannelHandlers, dispatch, type ShellHost } from '../../src-main/services/channel-handlers';
import { readSiteText, RecentFiles, saveSiteText } from '../../src-main/services/file-store';
import { RecoveryStore } from '../../src-main/services/recovery';

const DEMO = readFileSync(join(import.meta.dirname, '../../examples/quillmere-reservoir.gpsite'), 'utf8');
const OLD = readFileSync(join(import.meta.dirname, '../fixtures/sites/version1.gpsite'), 'utf8');
const tmp = () => mkdtempSync(join(tmpdir(), 'gprime-store-'));
const diskFull = (): NodeJS.ErrnoException =>
  Object.assign(new Error('ENOSPC: no space left on device'), { code: 'ENOSPC' });

describe('atomic save', () => {
  it('replaces the whole file and keeps its permissions', () => {
    const dir = tmp();
    const file = join(dir, 'a.gpsite');
    writeFileSync(file, OLD, { mode: 0o640 });
    saveSiteText(file, DEMO);
    expect(readFileSync(file, 'utf8')).toBe(DEMO);
    expect(statSync(file).mode & 0o777).toBe(0o640);
    expect(readdirSync(dir)).toEqual(['a.gpsite']);
  });

  for (const step of ['writeSync', 'fsyncSync', 'renameSync'] as const) {
    it(`leaves the old file intact and no temporary file behind when ${step} fails`, () => {
      const dir = tmp();
      const file = join(dir, 'a.gpsite');
      writeFileSync(file, OLD);
      let written = 0;
      const ops: WriteOps = {
        ...nodeWriteOps,
        // the write fails half-way, as on a full disk
        writeSync:
          step === 'writeSync'
            ? (fd, data, off) => {
                if (written++) throw diskFull();
                return nodeWriteOps.writeSync(fd, data, off, 100);
              }
            : nodeWriteOps.writeSync,
        fsyncSync:
          step === 'fsyncSync'
            ? () => {
                throw diskFull();
              }
            : nodeWriteOps.fsyncSync,
        renameSync:
          step === 'renameSync'
            ? () => {
                throw diskFull();
              }
            : nodeWriteOps.renameSync,
      };
      expect(() => saveSiteText(file, DEMO, ops)).toThrow(/ENOSPC/);
      expect(readFileSync(file, 'utf8')).toBe(OLD);
      expect(readdirSync(dir)).toEqual(['a.gpsite']);
    });
  }

  it('creates a new file', () => {
    const file = join(tmp(), 'new.json');
    atomicWriteFile(file, '{"a":1}');
    expect(readFileSync(file, 'utf8')).toBe('{"a":1}');
  });
});

describe('files that do not load are refused and never modified', () => {
  const newer = DEMO.replace(/"version": \d+/, '"version": 99');
  const malformed = DEMO.slice(0, 400);
  const badField = DEMO.replace(/"kind": "reservoir"/, '"kind": "swimming pool"');
  const host: ShellHost = {
    shell: 'browser',
    allowFile: (p) => p,
    allowDir: (p) => p,
    pickOpenPath: async () => null,
    pickSavePath: async () => null,
    pickExportDir: async () => null,
    writeClipboardImage: async () => {},
  };

  for (const [what, text, place] of [
    ['a newer version', newer, /version 99.*newer gprime/],
    ['malformed JSON', malformed, /not valid JSON/],
    ['an invalid field', badField, /waterBody\.kind/],
  ] as const) {
    it(`${what}: reading answers a site-file error naming the place; saving over it is refused`, async () => {
      const dir = tmp();
      const file = join(dir, 'x.gpsite');
      writeFileSync(file, text);
      const before = statSync(file).mtimeMs;
      const handlers = createChannelHandlers({ host, dataDir: join(dir, 'data'), version: '0' });
      const read = (await dispatch(handlers, 'site.read', { path: file })) as any;
      expect(read.ok).toBe(false);
      expect(read.error.code).toBe('site-file');
      expect(read.error.message).toContain(file);
      expect(read.error.message).toMatch(place);
      const save = (await dispatch(handlers, 'site.save', { path: file, text: DEMO })) as any;
      expect(save.ok).toBe(false);
      expect(save.error.message).toMatch(/left unchanged/);
      expect(readFileSync(file, 'utf8')).toBe(text);
      expect(statSync(file).mtimeMs).toBe(before);
      expect(readdirSync(dir).filter((n) => n.endsWith('.tmp'))).toEqual([]);
    });
  }

  it('refuses to save text that is not a valid site document', () => {
    const file = join(tmp(), 'y.gpsite');
    writeFileSync(file, DEMO);
    expect(() => saveSiteText(file, badField)).toThrow(/waterBody\.kind/);
    expect(readFileSync(file, 'utf8')).toBe(DEMO);
  });

  it('opens an older version (it migrates in memory) and leaves the file as it was', () => {
    const file = join(tmp(), 'old.gpsite');
    writeFileSync(file, OLD);
    expect(readSiteText(file).text).toBe(OLD);
    expect(readFileSync(file, 'utf8')).toBe(OLD);
  });
});

describe('recent files', () => {
  it('keeps the latest first, without duplicates, at most ten', () => {
    const recent = new RecentFiles(tmp());
    for (let i = 0; i < 12; i++) recent.add(`/s/${i}.gpsite`);
    recent.add('/s/5.gpsite');
    const list = recent.list();
    expect(list).toHaveLength(10);
    expect(list[0]).toBe('/s/5.gpsite');
    expect(list[1]).toBe('/s/11.gpsite');
    expect(new Set(list).size).toBe(10);
  });

  it('treats a damaged list as empty', () => {
    const dir = tmp();
    writeFileSync(join(dir, 'recent.json'), '{"paths": [1, ');
    expect(new RecentFiles(dir).list()).toEqual([]);
  });
});

describe('recovery files', () => {
  it('writes, checks and clears the autosave of the shared document', () => {
    const dir = join(tmp(), 'nested', 'data');
    const store = new RecoveryStore(dir, () => new Date('2030-01-02T03:04:05Z'));
    expect(store.check()).toEqual([]);
    store.write(DEMO, '/s/a.gpsite');
    expect(store.check()).toEqual([
      { document: 'default', text: DEMO, path: '/s/a.gpsite', savedAt: '2030-01-02T03:04:05.000Z' },
    ]);
    store.write('{"draft": true}', null);
    expect(store.check()[0].path).toBeNull();
    store.clear();
    expect(store.check()).toEqual([]);
    store.clear();
  });

  it('keeps one file per document, so two windows never overwrite each other', () => {
    const dir = tmp();
    let t = Date.parse('2030-01-02T03:04:05Z');
    const store = new RecoveryStore(dir, () => new Date((t += 1000)));
    store.write('{"window": 1}', '/s/a.gpsite', 'win-1');
    store.write('{"window": 2}', null, 'win-2');
    store.write('{"window": 1, "later": true}', '/s/a.gpsite', 'win-1');
    const all = store.check();
    expect(all.map((e) => e.document)).toEqual(['win-1', 'win-2']); // newest first
    expect(all[0].text).toBe('{"window": 1, "later": true}');
    expect(all[1].text).toBe('{"window": 2}');
    store.clear('win-1');
    expect(store.check().map((e) => e.document)).toEqual(['win-2']);
  });

  it('refuses a document key that could name another path', () => {
    const store = new RecoveryStore(tmp());
    for (const bad of ['../x', 'a/b', '', 'a.b', 'x'.repeat(65)])
      expect(() => store.write(DEMO, null, bad)).toThrow(/document key/);
  });

  it('still offers the single recovery file of earlier versions, and a damaged one counts as none', () => {
    const dir = tmp();
    const entry = { format: 'gprime-recovery', text: DEMO, path: null, savedAt: '2029-05-01T00:00:00.000Z' };
    writeFileSync(join(dir, 'recovery.json'), JSON.stringify(entry));
    expect(new RecoveryStore(dir).check()).toEqual(
      [{ document: 'default', ...entry, format: undefined }].map(({ format: _f, ...e }) => e),
    );
    new RecoveryStore(dir).clear();
    writeFileSync(join(dir, 'recovery.json'), '{"format":"gprime-recovery","text":');
    expect(new RecoveryStore(dir).check()).toEqual([]);
  });
});
