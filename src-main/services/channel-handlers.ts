import { existsSync, mkdirSync } from 'node:fs';
import { dirname, relative } from 'node:path';
import {
  CHANNELS,
  parseRequest,
  type Channel,
  type Reply,
  type RequestOf,
  type ResponseOf,
} from '../../shared-core/ipc/contract';
import { loadSite } from '../../shared-core/site';
import { exportSiteReportInWorker } from '../report/export-in-worker';
import { readSiteText, RecentFiles, saveSiteText } from './file-store';
import { RecoveryStore } from './recovery';
import { ServiceError, toContractError } from './service-error';
import { removeStaleTemporaryFiles } from './temp-files';

/**
 * What differs between the Electron window and the browser shell: how the user picks files, which paths
 * the renderer may touch, and the clipboard. Everything else is answered the same way by both.
 */
export interface ShellHost {
  shell: 'electron' | 'browser';
  /**
   * returns the absolute path when the renderer may read (or, with 'write', replace) this file, else
   * throws ServiceError('forbidden')
   */
  allowFile(path: string, access?: 'read' | 'write'): string;
  /** the same for a folder the report is written into */
  allowDir(path: string): string;
  pickOpenPath(request: RequestOf<'site.open'>): Promise<string | null>;
  pickSavePath(suggestedName: string): Promise<string | null>;
  /** the folder a report goes into when the renderer gives none; null when the user cancelled */
  pickExportDir(siteName: string): Promise<string | null>;
  writeClipboardImage(png: Buffer): Promise<void>;
  /** files the user may reopen beyond the recent list (the browser shell's workspace folder) */
  listFiles?(): string[];
  /**
   * true when the user already agreed to replace this existing file in the host's own dialog (the native
   * save dialog's confirmation); otherwise Save as refuses an existing file until asked again with
   * `overwrite`
   */
  overwriteConfirmed?(path: string): boolean;
  /** told of the document the renderer opened or saved (the Electron shell lets it be saved again) */
  noteOpenDocument?(path: string): void;
}

export interface HandlerOptions {
  host: ShellHost;
  dataDir: string;
  version: string;
}

export type ChannelHandlers = { [C in Channel]: (request: RequestOf<C>) => Promise<ResponseOf<C>> };

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** The handlers of every channel of the contract, shared by the Electron main process and the browser shell. */
export function createChannelHandlers({ host, dataDir, version }: HandlerOptions): ChannelHandlers {
  const recent = new RecentFiles(dataDir);
  const recovery = new RecoveryStore(dataDir);
  // saves killed part-way leave temporary files beside their targets: remove them at the start
  for (const dir of new Set([dataDir, ...recent.list().map((p) => dirname(p))])) removeStaleTemporaryFiles(dir);
  const opened = (path: string) => {
    const r = readSiteText(path);
    recent.add(path);
    host.noteOpenDocument?.(path);
    return r;
  };
  const saved = (path: string, text: string) => {
    saveSiteText(path, text);
    recent.add(path);
    host.noteOpenDocument?.(path);
    return { path };
  };
  // a dangling link, a vanished file or a path now refused drops out of the list; it never breaks it
  const mayUse = (p: string) => {
    try {
      return existsSync(host.allowFile(p, 'read'));
    } catch {
      return false;
    }
  };

  return {
    'site.open': async (req) => {
      const path = await host.pickOpenPath(req);
      return path === null ? null : opened(path);
    },
    'site.read': async (req) => opened(host.allowFile(req.path, 'read')),
    'site.save': async (req) => saved(host.allowFile(req.path, 'write'), req.text),
    'site.saveAs': async (req) => {
      const path = await host.pickSavePath(req.suggestedName);
      if (path === null) return null;
      if (existsSync(path) && req.overwrite !== true && host.overwriteConfirmed?.(path) !== true)
        throw new ServiceError(
          'exists',
          `${path}: a site file of this name already exists; it was left unchanged (replace it only when the user agrees)`,
        );
      return saved(path, req.text);
    },
    'site.recent': async () => {
      const paths = [...recent.list().filter(mayUse), ...(host.listFiles?.() ?? [])];
      return { paths: [...new Set(paths)] };
    },
    'recovery.write': async (req) => {
      recovery.write(req.text, req.path, req.document);
      return {};
    },
    'recovery.check': async () => recovery.check(),
    'recovery.clear': async (req) => {
      recovery.clear(req.document);
      return {};
    },
    'report.export': async (req) => {
      const site = loadSite(req.text);
      const outDir = req.outDir !== null ? host.allowDir(req.outDir) : await host.pickExportDir(site.project.name);
      if (outDir === null) return null;
      mkdirSync(outDir, { recursive: true });
      // assessing and drawing take seconds: a worker thread does both, so this process keeps answering
      const options = { outDir, formats: req.formats, units: req.units };
      const written = await exportSiteReportInWorker(req.text, req.path ?? '(unsaved site)', options, version);
      return { outDir, files: written.map((w) => relative(outDir, w) || w) };
    },
    'clipboard.writeImage': async (req) => {
      const png = Buffer.from(req.pngBase64, 'base64');
      if (!png.subarray(0, 8).equals(PNG_SIGNATURE))
        throw new ServiceError('invalid-request', 'clipboard.writeImage: pngBase64: not a PNG image');
      await host.writeClipboardImage(png);
      return {};
    },
    'app.info': async () => ({ version, shell: host.shell }),
  };
}

/**
 * Answers one request: validates the payload against the contract, runs the handler, checks the response
 * against the contract too, and never throws — every failure is a Reply error with a code and message.
 */
export async function dispatch(handlers: ChannelHandlers, channel: string, payload: unknown): Promise<Reply<unknown>> {
  if (!Object.hasOwn(CHANNELS, channel))
    return { ok: false, error: { code: 'invalid-request', message: `unknown channel "${channel}"` } };
  const c = channel as Channel;
  const request = parseRequest(c, payload);
  if (!request.ok) return request;
  try {
    const value = await (handlers[c] as (r: unknown) => Promise<unknown>)(request.value);
    const checked = CHANNELS[c].response.safeParse(value);
    if (!checked.success)
      return {
        ok: false,
        error: {
          code: 'internal',
          message: `${c}: the answer did not match the contract (${checked.error.issues[0].message})`,
        },
      };
    return { ok: true, value: checked.data };
  } catch (e) {
    return { ok: false, error: toContractError(e) };
  }
}
