import { resolve } from 'node:path';
import { Worker } from 'node:worker_threads';
import type { ReportOptions } from './write-report';

/**
 * The worker's file, found from the repository root: this module runs from src-main/report/ (tests, tsx) and
 * bundled from dist/<shell>/ (browser shell, Electron main), both two folders below the root.
 */
const WORKER_FILE = resolve(import.meta.dirname, '..', '..', 'src-main', 'report', 'export-worker.js');

/** What the worker sends back: the written paths, or the error with what toContractError reads from it. */
type WorkerReply =
  { ok: true; files: string[] } | { ok: false; error: { name: string; message: string; code?: string; path?: string } };

function revive(e: Extract<WorkerReply, { ok: false }>['error']): Error {
  return Object.assign(
    new Error(e.message),
    { name: e.name },
    e.code ? { code: e.code } : {},
    e.path ? { path: e.path } : {},
  );
}

/**
 * exportSiteReport (write-report.ts) in a worker thread: validates and assesses the site text and writes the
 * report files, while the calling thread (the Electron main process, the browser shell) stays responsive.
 */
export function exportSiteReportInWorker(
  text: string,
  name: string,
  options: ReportOptions,
  version: string,
): Promise<string[]> {
  return new Promise((done, fail) => {
    const worker = new Worker(WORKER_FILE, { workerData: { text, name, options, version } });
    worker.once('message', (reply: WorkerReply) => (reply.ok ? done(reply.files) : fail(revive(reply.error))));
    worker.once('error', fail);
    worker.once('exit', (code) => fail(new Error(`the report worker stopped (exit code ${code}) without an answer`)));
  });
}
