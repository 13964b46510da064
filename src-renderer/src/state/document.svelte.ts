import { serialiseSite, siteSchema, type Site } from '../../../shared-core/site';
import { placeName } from '../../../shared-core/site/words';
import { blankSite } from '../lib/templates';

const HISTORY_LIMIT = 200;

/** The document text in the schema's key order, so a reopened file serialises to the same bytes. */
function canonicalText(site: Site): string {
  const r = siteSchema.safeParse(site);
  return serialiseSite(r.success ? r.data : site);
}
/** A zod issue path as a site-file path ("features[2].portDepth"), the form placeName reads. */
const pathOf = (path: readonly PropertyKey[]) =>
  path.reduce<string>((a, k) => (typeof k === 'number' ? `${a}[${k}]` : a ? `${a}.${String(k)}` : String(k)), '');

/** The value at a zod issue path of the site (undefined where the path leads nowhere). */
function valueAt(site: Site, path: readonly PropertyKey[]): unknown {
  let v: unknown = site;
  for (const k of path) v = v && typeof v === 'object' ? (v as Record<PropertyKey, unknown>)[k] : undefined;
  return v;
}

/** Text typed into a field that the document does not hold (unreadable or out of range), kept until fixed. */
export interface FieldDraft {
  /** the field as labelled on screen */
  label: string;
  text: string;
  reason: string;
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
  /**
   * Typed text the document does not hold, by field key: an unreadable or out-of-range value is removed
   * from the document (so it is never used or saved stale) and its text kept here until the field is fixed.
   */
  drafts = $state.raw<Record<string, FieldDraft>>({});
  /**
   * What stops a save, in words: fields holding text the document could not take, then schema problems
   * (an emptied required field …) named as the editors name the field
   */
  problems = $derived.by(() => {
    const typed = Object.values(this.drafts).map((d) => `${d.label} holds “${d.text}”, which is not kept: ${d.reason}`);
    const r = siteSchema.safeParse(this.site);
    const schema = r.success
      ? []
      : r.error.issues.map((i) => {
          const place = placeName(pathOf(i.path), this.site);
          return valueAt(this.site, i.path) === undefined
            ? `${place} is empty; a value is needed`
            : `${place}: ${i.message}`;
        });
    return [...typed, ...schema];
  });

  /** Keeps (or, with null, drops) the typed text of a field the document does not hold. */
  setDraft(key: string, draft: FieldDraft | null): void {
    if (!draft && !(key in this.drafts)) return;
    const next = { ...this.drafts };
    if (draft) next[key] = draft;
    else delete next[key];
    this.drafts = next;
  }

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
    this.drafts = {};
    this.future = [this.site, ...this.future];
    this.site = this.past[this.past.length - 1];
    this.past = this.past.slice(0, -1);
    this.lastKey = '';
  }

  redo(): void {
    if (!this.future.length) return;
    this.drafts = {};
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
    this.drafts = {};
  }

  markSaved(path: string): void {
    this.path = path;
    this.savedText = this.text;
  }
}
