import { untrack } from 'svelte';
import { SCREENING_CAUTION } from '../../../shared-core/core/caution';
import type { Assessment, Site } from '../../../shared-core/site';
import type { AssessReply, AssessRequest } from '../lib/assess-messages';

/** Wait after an edit before the document is sent to the worker (a burst of keystrokes is one request). */
const DEBOUNCE_MS = 40;

/** An assessment with no estimates yet: what the views show until the worker's first answer. */
export function emptyAssessment(site: Site): Assessment {
  return {
    format: 'gprime-assessment',
    project: site.project,
    waterBody: site.waterBody.name,
    gprimeVersion: 'workspace',
    siteHash: '',
    units: site.units,
    caution: SCREENING_CAUTION,
    conditions: [],
    checks: [],
    estimates: [],
    compliance: [],
  };
}

/**
 * The live assessment of the open document, computed in a Web Worker (never on the UI thread). Edits are
 * debounced; only the newest answer is kept. `pending` is true from an edit until its answer arrives.
 */
export class AssessmentStore {
  current = $state.raw<Assessment | null>(null);
  pending = $state(false);
  /** the last failure of the worker itself (an estimate's own failure stays in its outcome) */
  failure = $state<string | null>(null);
  private worker: Worker | null = null;
  private seq = 0;
  private timer: ReturnType<typeof setTimeout> | undefined;
  private site: Site | null = null;

  follow(site: Site): void {
    untrack(() => {
      this.site = site;
      this.pending = true;
      clearTimeout(this.timer);
      this.timer = setTimeout(() => this.send(), this.current ? DEBOUNCE_MS : 0);
    });
  }

  dispose(): void {
    clearTimeout(this.timer);
    this.worker?.terminate();
    this.worker = null;
  }

  private send(): void {
    if (!this.site) return;
    const request: AssessRequest = { seq: ++this.seq, site: $state.snapshot(this.site) };
    this.ensureWorker().postMessage(request);
  }

  private ensureWorker(): Worker {
    if (this.worker) return this.worker;
    const w = new Worker(new URL('../workers/assess-worker.ts', import.meta.url), { type: 'module' });
    w.onmessage = (event: MessageEvent<AssessReply>) => this.receive(event.data);
    w.onerror = (event) => {
      event.preventDefault();
      this.failure = `the assessment worker failed (${event.message || 'no message'})`;
      this.worker?.terminate();
      this.worker = null;
      this.pending = false;
    };
    this.worker = w;
    return w;
  }

  private receive(reply: AssessReply): void {
    if (reply.seq !== this.seq) return; // an answer to an older document
    this.pending = false;
    if (reply.ok) {
      this.current = reply.assessment;
      this.failure = null;
    } else this.failure = reply.error;
  }
}
