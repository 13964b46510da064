import type { UncertaintyResult } from '../../../shared-core/uncertainty';

/** Main thread → band worker: a whole site (plain data) and which estimate to band. */
export interface BandRequest {
  seq: number;
  site: unknown;
  index: number;
}

/**
 * Band worker → main thread: the band, or the reason it cannot be computed (an InputError names the field). `error`
 * and the band's warnings are shared-core text: show them through `shownText` (lib/messages.ts).
 */
export type BandReply =
  | { seq: number; ok: true; uncertainty: UncertaintyResult }
  | { seq: number; ok: false; error: string }
  | { seq: number; progress: number };
