import type { Assessment } from '../../../shared-core/site';

/** Main thread → assessment worker: the whole document (plain data) and a sequence number. */
export interface AssessRequest {
  seq: number;
  site: unknown;
}

/**
 * Assessment worker → main thread: the assessment, how many estimates were computed anew and the time taken. `error`
 * and every sentence of the assessment are shared-core text (quantity tokens in SI): show them through `shownText`
 * (lib/messages.ts) in the workspace's unit system.
 */
export type AssessReply =
  | { seq: number; ok: true; assessment: Assessment; computed: number; ms: number }
  | { seq: number; ok: false; error: string };
