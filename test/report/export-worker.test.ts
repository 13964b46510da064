import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import ExcelJS from 'exceljs';
import { afterAll, describe, expect, it, vi } from 'vitest';

// The export channel must hand the report to a worker thread; the files must be those written in-process.
// (A property of gprime's own design: no outside source applies.)
const started = vi.hoisted(() => [] as string[]);
vi.mock('node:worker_threads', async (original) => {
  const m = await original<typeof import('node:worker_threads')>();
  class RecordedWorker extends m.Worker {
    constructor(file: string | URL, options?: import('node:worker_threads').WorkerOptions) {
      super(file, options);
      started.push(String(file));
    }
  }
  return { ...m, Worker: RecordedWorker };
});

const { createChannelHandlers, dispatch } = await import('../../src-main/services/channel-handlers');
const { exportSiteReport } = await import('../../src-main/report/write-report');

const ROOT = resolve(import.meta.dirname, '..', '..');
const SITE = join(ROOT, 'examples', 'quillmere-reservoir.gpsite');
const dir = mkdtempSync(join(tmpdir(), 'gprime-export-worker-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The demo reservoir's text with only the named estimates (a shorter report). */
function demoWith(ids: string[]): string {
  const site = JSON.parse(readFileSync(SITE, 'utf8'));
  site.estimates = site.estimates.filter((e: { id: string }) => ids.includes(e.id));
  return JSON.stringify(site, null, 2);
}

async function workbookCells(path: string): Promise<unknown[]> {
  const book = new ExcelJS.Workbook();
  await book.xlsx.readFile(path);
  return book.worksheets.map((sheet) => [sheet.name, sheet.getSheetValues()]);
}

const host = {
  shell: 'browser' as const,
  allowFile: (p: string) => p,
  allowDir: (p: string) => p,
  pickOpenPath: async () => null,
  pickSavePath: async () => null,
  pickExportDir: async () => null,
  writeClipboardImage: async () => {},
};

describe('report.export in a worker thread', () => {
  it('writes the same files as the in-process report writer (byte for byte; the workbook cell for cell)', async () => {
    const text = demoWith(['plume-summer', 'modes-summer', 'ammonia-dilution']);
    const handlers = createChannelHandlers({ host, dataDir: join(dir, 'data'), version: '9.9.9' });
    const request = { text, formats: ['pdf', 'png', 'svg', 'csv', 'xlsx'], units: 'si', outDir: join(dir, 'worker') };
    const reply = (await dispatch(handlers, 'report.export', { ...request, path: SITE })) as any;
    expect(reply.ok, JSON.stringify(reply.error)).toBe(true);
    expect(started).toEqual([join(ROOT, 'src-main', 'report', 'export-worker.js')]);

    const local = join(dir, 'local');
    const expected = await exportSiteReport(text, SITE, { outDir: local, units: 'si' }, '9.9.9');
    const names = expected.map((p) => p.slice(local.length + 1)).sort();
    expect([...reply.value.files].sort()).toEqual(names);
    for (const name of names.filter((n) => !n.endsWith('.xlsx')))
      expect(readFileSync(join(request.outDir, name)).equals(readFileSync(join(local, name))), name).toBe(true);
    // a workbook's zip entries carry the time of writing: compare its cells
    const xlsx = names.find((n) => n.endsWith('.xlsx'))!;
    expect(await workbookCells(join(request.outDir, xlsx))).toEqual(await workbookCells(join(local, xlsx)));
  }, 120_000);

  it('answers an io error raised inside the worker, and the thread keeps serving', async () => {
    const handlers = createChannelHandlers({ host, dataDir: join(dir, 'data'), version: '9.9.9' });
    const blocked = join(dir, 'blocked');
    mkdirSync(blocked);
    writeFileSync(join(blocked, 'tables'), 'a file where the worker needs the tables folder');
    const reply = (await dispatch(handlers, 'report.export', {
      text: demoWith(['ammonia-dilution']),
      formats: ['csv'],
      units: 'si',
      outDir: blocked,
    })) as any;
    expect(reply.ok).toBe(false);
    expect(reply.error.code).toBe('io');
    expect(((await dispatch(handlers, 'app.info', {})) as any).value.version).toBe('9.9.9');
  }, 120_000);
});
