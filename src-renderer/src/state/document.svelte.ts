import { serialiseSite, siteSchema, type Site } from '../../../shared-core/site';
import { blankSite } from '../lib/templates';

const HISTORY_LIMIT = 200;

/** The document text in the schema's key order, so a reopened file serialises to the same bytes. */
function canonicalText(site: Site): string {
  const r = siteSchema.safeParse(site);
  return serialiseSite(r.success ? r.data : site);
}
/** Edits of the same field within this time form one undo step (typing a word is one step). */
const COALESCE_MS = 1200;

/**
 * The open site document with its undo history. The site is replaced whole on every change
 * (never mutated), so history entries are cheap snapshots.
 */
export class SiteDocument {
  site = $state.raw<Site>(blankSite());
  path = $state<string | null>(null);
  /** serialised text at the last open or save; dirty when the current text differs */
  savedText = $state(canonicalText(blankSite()));
  private past = $state.raw<Site[]>([]);
  private future = $state.raw<Site[]>([]);
  private lastKey = '';
  private lastAt = 0;

  text = $derived(canonicalText(this.site));
  dirty = $derived(this.text !== this.savedText);
  canUndo = $derived(this.past.length > 0);
  canRedo = $derived(this.future.length > 0);
  /** schema problems that would make the saved file unreadable (named by place) */
  problems = $derived.by(() => {
    const r = siteSchema.safeParse(this.site);
    return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
  });

  /** Applies an edit to a copy of the site. `key` groups fast repeated edits of one field into one undo step. */
  change(edit: (draft: Site) => void, key = ''): void {
    const draft = structuredClone(this.site);
    edit(draft);
    const now = Date.now();
    const coalesce = key !== '' && key === this.lastKey && now - this.lastAt < COALESCE_MS;
    if (!coalesce) this.past = [...this.past.slice(-HISTORY_LIMIT + 1), this.site];
    this.future = [];
    this.lastKey = key;
    this.lastAt = now;
    this.site = draft;
  }

  undo(): void {
    if (!this.past.length) return;
    this.future = [this.site, ...this.future];
    this.site = this.past[this.past.length - 1];
    this.past = this.past.slice(0, -1);
    this.lastKey = '';
  }

  redo(): void {
    if (!this.future.length) return;
    this.past = [...this.past, this.site];
    this.site = this.future[0];
    this.future = this.future.slice(1);
    this.lastKey = '';
  }

  /** Replaces the document (new, open, recover); clears history. `saved` false keeps it marked unsaved. */
  replace(site: Site, path: string | null, saved: boolean): void {
    this.site = site;
    this.path = path;
    this.savedText = saved ? canonicalText(site) : '';
    this.past = [];
    this.future = [];
    this.lastKey = '';
  }

  markSaved(path: string): void {
    this.path = path;
    this.savedText = this.text;
  }
}
