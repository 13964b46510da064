import { z } from 'zod';

/**
 * The one contract between the renderer and the Node side (Electron IPC or the browser shell's HTTP API).
 * Each channel maps to a request and a response validator. Computation never crosses it: the renderer
 * imports shared-core directly; the Node side handles files, dialogs, clipboard and exports only.
 */
const empty = z.object({}).strict();
const siteText = z.string().min(2).max(50_000_000);
const filePath = z.string().min(1).max(4096);
/** a document's recovery key: letters, digits, "-" and "_" (the renderer makes one per opened document) */
const documentKey = z
  .string()
  .min(1)
  .max(64)
  .regex(/^[A-Za-z0-9_-]+$/, 'letters, digits, "-" or "_"');
const exportFormat = z.enum(['pdf', 'png', 'svg', 'csv', 'xlsx']);

export const CHANNELS = {
  /**
   * native open dialog; null when cancelled. The browser shell has no dialog: there `name` picks a file of
   * its workspace folder (as listed by 'site.recent'), and a request without `name` answers null.
   */
  'site.open': {
    request: z.object({ name: z.string().min(1).max(255).optional() }).strict(),
    response: z.object({ path: filePath, text: siteText }).nullable(),
  },
  /** read a known path (recent files, reopen) */
  'site.read': {
    request: z.object({ path: filePath }).strict(),
    response: z.object({ path: filePath, text: siteText }),
  },
  /** atomic save to a known path (temporary file, flush, rename) */
  'site.save': {
    request: z.object({ path: filePath, text: siteText }).strict(),
    response: z.object({ path: filePath }),
  },
  /**
   * native save dialog then atomic save; null when cancelled. An existing file is replaced only when the
   * user agreed: in the native dialog's own confirmation (Electron), or by resending with `overwrite: true`
   * after the refusal coded 'exists' (the browser shell, whose dialog is ours).
   */
  'site.saveAs': {
    request: z
      .object({ text: siteText, suggestedName: z.string().max(255), overwrite: z.boolean().optional() })
      .strict(),
    response: z.object({ path: filePath }).nullable(),
  },
  'site.recent': { request: empty, response: z.object({ paths: z.array(filePath) }) },
  /**
   * autosave of an unsaved document to its own recovery file: `document` tells documents (and windows)
   * apart, so two never overwrite each other's autosave; without it, one shared file
   */
  'recovery.write': {
    request: z.object({ text: siteText, path: filePath.nullable(), document: documentKey.optional() }).strict(),
    response: empty,
  },
  /** the recovery files left by sessions that did not end cleanly, newest first (empty when none) */
  'recovery.check': {
    request: empty,
    response: z.array(
      z.object({ document: documentKey, text: siteText, path: filePath.nullable(), savedAt: z.string() }),
    ),
  },
  /** removes one document's recovery file (after a save, or when the user declined the offer) */
  'recovery.clear': { request: z.object({ document: documentKey.optional() }).strict(), response: empty },
  /** writes the report of a site (text of the site document) into a folder; returns the files written */
  'report.export': {
    request: z
      .object({
        text: siteText,
        formats: z.array(exportFormat).min(1),
        units: z.enum(['si', 'us']),
        outDir: filePath.nullable(),
        /** the site's file, when it has one (named in the report) */
        path: filePath.nullable().optional(),
      })
      .strict(),
    response: z.object({ outDir: filePath, files: z.array(z.string()) }).nullable(),
  },
  /** copies a PNG (base64) to the system clipboard */
  'clipboard.writeImage': {
    request: z.object({ pngBase64: z.string().min(1).max(100_000_000) }).strict(),
    response: empty,
  },
  'app.info': { request: empty, response: z.object({ version: z.string(), shell: z.enum(['electron', 'browser']) }) },
} as const;

export type Channel = keyof typeof CHANNELS;
export type RequestOf<C extends Channel> = z.infer<(typeof CHANNELS)[C]['request']>;
export type ResponseOf<C extends Channel> = z.infer<(typeof CHANNELS)[C]['response']>;

export interface ContractError {
  /**
   * 'invalid-request' | 'forbidden' | 'not-found' | 'exists' (save as onto an existing file without
   * `overwrite`) | 'io' | 'site-file' | 'internal' | 'unreachable' (the renderer found no shell to ask)
   */
  code: string;
  message: string;
}

export type Reply<T> = { ok: true; value: T } | { ok: false; error: ContractError };

/** The API the renderer sees: one function per channel, each answering a Reply. */
export type GprimeApi = { [C in Channel]: (request: RequestOf<C>) => Promise<Reply<ResponseOf<C>>> };

export const CHANNEL_NAMES = Object.keys(CHANNELS) as Channel[];

/** Validates a request; returns the parsed value or a ContractError naming the first bad field. */
export function parseRequest<C extends Channel>(channel: C, payload: unknown): Reply<RequestOf<C>> {
  const spec = CHANNELS[channel];
  if (!spec) return { ok: false, error: { code: 'invalid-request', message: `unknown channel "${String(channel)}"` } };
  const r = spec.request.safeParse(payload ?? {});
  if (r.success) return { ok: true, value: r.data as RequestOf<C> };
  const i = r.error.issues[0];
  return {
    ok: false,
    error: { code: 'invalid-request', message: `${channel}: ${i.path.join('.') || '(request)'}: ${i.message}` },
  };
}
