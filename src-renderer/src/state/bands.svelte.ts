import { untrack } from 'svelte';
import type { Site } from '../../../shared-core/site';
import type { UncertaintyResult } from '../../../shared-core/uncertainty';
import type { BandReply, BandRequest } from '../lib/band-messages';

export type BandState =
  | { status: 'computing'; progress?: number }
  | { status: 'done'; result: UncertaintyResult }
  | { status: 'error'; message: string }
  | { status: 'cancelled' };

/** Wait after the last edit before a band is recomputed (typing a value is one request). */
const DEBOUNCE_MS = 400;

/** What an estimate's band depends on: the site without the other estimates, the unit system or the project. */
function fingerprint(site: Site, index: number): string {
  const { estimates, units: _units, project: _project, ...rest } = site;
  return JSON.stringify([rest, estimates[index]]);
}

const hasUncertainty = (e: Site['estimates'][number]) => !!e.uncertainty && Object.keys(e.uncertainty).length > 0;

/**
 * Uncertainty bands of the estimates that state input uncertainties, keyed by estimate id. They are
 * computed one at a time in a Web Worker, the most recently edited first; an edit makes a band stale, and
 * a worker busy when a newer request comes is terminated and restarted (an unfinished band that is still
 * wanted is queued again), so the newest request never waits behind a long or stale job.
 */
export class BandStore {
  states = $state.raw<Record<string, BandState>>({});
  private wanted = new Map<string, string>();
  /** the finished state of each band and the fingerprint it was computed for (an undo finds it again) */
  private done = new Map<string, { print: string; state: BandState }>();
  private queue: string[] = [];
  /** estimates changed most recently first: their bands are computed first */
  private recent: string[] = [];
  private site: Site | null = null;
  private worker: Worker | null = null;
  private running: { id: string; print: string; seq: number } | null = null;
  private seq = 0;
  private timer: ReturnType<typeof setTimeout> | undefined;

  /** Follows the document: marks changed bands as computing at once, sends them after a short pause. */
  follow(site: Site): void {
    untrack(() => this.update(site));
  }

  private update(site: Site): void {
    this.site = site;
    const next = new Map<string, string>();
    site.estimates.forEach((e, i) => {
      if (hasUncertainty(e)) next.set(e.id, fingerprint(site, i));
    });
    const states: Record<string, BandState> = {};
    for (const [id, print] of next) {
      const finished = this.done.get(id);
      states[id] = finished?.print === print ? finished.state : { status: 'computing' };
    }
    for (const id of this.done.keys()) if (!next.has(id)) this.done.delete(id);
    const changed = [...next].filter(([id, print]) => this.wanted.get(id) !== print).map(([id]) => id);
    this.wanted = next;
    this.states = states;
    // a newer request never waits behind a running band: the running one, if still wanted, is queued again
    if (this.running && (changed.length > 0 || this.wanted.get(this.running.id) !== this.running.print))
      this.stopWorker();
    this.recent = [...changed, ...this.recent.filter((id) => !changed.includes(id))];
    clearTimeout(this.timer);
    this.timer = setTimeout(() => this.schedule(), DEBOUNCE_MS);
  }

  get(id: string): BandState | undefined {
    return this.states[id];
  }

  /** Stops an estimate's band; it stays cancelled until the estimate is edited or computed on request. */
  cancel(id: string): void {
    const print = this.wanted.get(id);
    if (print === undefined) return;
    if (this.running?.id === id) this.stopWorker();
    this.queue = this.queue.filter((q) => q !== id);
    this.done.set(id, { print, state: { status: 'cancelled' } });
    this.states = { ...this.states, [id]: { status: 'cancelled' } };
    this.next();
  }

  /** Computes a cancelled band after all. */
  resume(id: string): void {
    if (this.states[id]?.status !== 'cancelled') return;
    this.done.delete(id);
    this.states = { ...this.states, [id]: { status: 'computing' } };
    this.queue = [id, ...this.queue];
    this.next();
  }

  dispose(): void {
    clearTimeout(this.timer);
    this.stopWorker();
  }

  private schedule(): void {
    const stale = [...this.wanted].filter(([id, print]) => this.done.get(id)?.print !== print).map(([id]) => id);
    this.queue = [
      ...this.recent.filter((id) => stale.includes(id)),
      ...stale.filter((id) => !this.recent.includes(id)),
    ];
    this.recent = [];
    this.next();
  }

  private next(): void {
    if (this.running || !this.site) return;
    const site = this.site;
    const id = this.queue.shift();
    if (id === undefined) return;
    const index = site.estimates.findIndex((e) => e.id === id);
    const print = this.wanted.get(id);
    if (index < 0 || print === undefined || this.done.get(id)?.print === print) return this.next();
    const seq = ++this.seq;
    this.running = { id, print, seq };
    const request: BandRequest = { seq, site: $state.snapshot(site), index };
    this.ensureWorker().postMessage(request);
  }

  private ensureWorker(): Worker {
    if (this.worker) return this.worker;
    const w = new Worker(new URL('../workers/band-worker.ts', import.meta.url), { type: 'module' });
    w.onmessage = (event: MessageEvent<BandReply>) => this.receive(event.data);
    w.onerror = (event) => {
      event.preventDefault();
      if (this.running)
        this.receive({
          seq: this.running.seq,
          ok: false,
          error: `the band worker failed (${event.message || 'no message'})`,
        });
    };
    this.worker = w;
    return w;
  }

  private receive(reply: BandReply): void {
    const job = this.running;
    if (!job || reply.seq !== job.seq) return; // a stale reply
    if ('progress' in reply) {
      if (this.wanted.get(job.id) === job.print)
        this.states = { ...this.states, [job.id]: { status: 'computing', progress: reply.progress } };
      return;
    }
    this.running = null;
    const state: BandState = reply.ok
      ? { status: 'done', result: reply.uncertainty }
      : { status: 'error', message: reply.error };
    this.done.set(job.id, { print: job.print, state });
    if (this.wanted.get(job.id) === job.print) this.states = { ...this.states, [job.id]: state };
    this.next();
  }

  private stopWorker(): void {
    this.worker?.terminate();
    this.worker = null;
    this.running = null;
  }
}
