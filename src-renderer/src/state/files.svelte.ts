import type { Reply } from '../../../shared-core/ipc/contract';
import { loadSite, SiteFileError, type Site } from '../../../shared-core/site';
import { bridge, isUnreachable, onReachability } from '../lib/bridge';
import { blankSite } from '../lib/templates';
import { documentKey, localRecoveries, writeLocalRecovery, removeLocalRecovery } from './local-recovery';
import type { Workspace } from './workspace.svelte';

const AUTOSAVE_MS = 800;
/** how often the browser shell is asked whether it still answers (its banner shows within this time) */
const HEARTBEAT_MS = 2000;

export interface RecoveryOffer {
  /** the recovery key of the document that left it */
  document: string;
  text: string;
  path: string | null;
  savedAt: string;
  /** kept in this browser while the shell did not answer (not in the shell's data folder) */
  local: boolean;
}

/**
 * Open, save, save-as, recent files, autosave and the offers to recover. Each open document autosaves to
 * its own recovery file (its key), also while an offer is shown; when the shell does not answer, the
 * autosave goes to this browser's storage and `reachable` turns false (the banner says so).
 */
export class FileActions {
  shell = $state<'electron' | 'browser' | 'unknown'>('unknown');
  recent = $state.raw<string[]>([]);
  /** recoveries left by sessions that did not end cleanly, newest first; the first is offered */
  offers = $state.raw<RecoveryOffer[]>([]);
  recovery = $derived<RecoveryOffer | null>(this.offers[0] ?? null);
  /** false while the shell does not answer (a refusal is an answer) */
  reachable = $state(true);
  /** where the last autosave went: the shell's recovery file, this browser's storage, or nowhere yet */
  keptIn = $state<'shell' | 'browser' | 'nowhere' | null>(null);
  /** which file dialog of our own is open (the browser shell has no native dialogs) */
  dialog = $state<'open' | 'saveAs' | null>(null);
  /** Save as found this name taken in the browser shell's folder: the dialog asks before replacing it */
  replacing = $state<string | null>(null);
  busy = $state(false);
  /** this window's document key: its autosave never lands in another window's recovery file */
  private document = documentKey();
  private timer: ReturnType<typeof setTimeout> | undefined;
  private last: { text: string; path: string | null } | null = null;

  constructor(private ws: Workspace) {
    onReachability((r) => {
      const back = r && !this.reachable;
      this.reachable = r;
      if (back && this.last) this.autosaveNow();
    });
  }

  private fail<T>(r: Reply<T>, what: string): r is { ok: false; error: { code: string; message: string } } {
    if (r.ok) return false;
    this.ws.say(`${what}: ${r.error.message}`, 'error');
    return true;
  }

  async start(): Promise<void> {
    const info = await bridge['app.info']({});
    if (info.ok) this.shell = info.value.shell;
    const rec = await bridge['recovery.check']({});
    const fromShell: RecoveryOffer[] = rec.ok ? rec.value.map((e) => ({ ...e, local: false })) : [];
    this.offers = mergeOffers(fromShell, localRecoveries());
    // a reloaded window keeps its key: never autosave over a recovery that is still on offer
    if (this.offers.some((o) => o.document === this.document)) this.document = documentKey(true);
    await this.refreshRecent();
    if (this.shell === 'browser') setInterval(() => void bridge['app.info']({}), HEARTBEAT_MS);
  }

  async refreshRecent(): Promise<void> {
    const r = await bridge['site.recent']({});
    if (r.ok) this.recent = r.value.paths;
  }

  private confirmDiscard(): boolean {
    return !this.ws.doc.dirty || confirm('The site has unsaved changes. Discard them?');
  }

  newSite(): void {
    if (!this.confirmDiscard()) return;
    this.ws.replaceDocument(blankSite(), null, true);
    this.ws.say('New site. Describe the water body, paste or import a profile, then add features.');
  }

  /** Electron: the native dialog. Browser shell: our own dialog picks a file of the workspace folder. */
  async open(name?: string): Promise<void> {
    if (this.shell === 'browser' && name === undefined) {
      await this.refreshRecent();
      this.dialog = 'open';
      return;
    }
    if (!this.confirmDiscard()) return;
    const r = await bridge['site.open'](name ? { name } : {});
    this.dialog = null;
    if (this.fail(r, 'Open') || !r.value) return;
    if (this.ws.openText(r.value.text, r.value.path)) this.ws.say(`Opened ${r.value.path}`);
  }

  async openPath(path: string): Promise<void> {
    if (!this.confirmDiscard()) return;
    const r = await bridge['site.read']({ path });
    this.dialog = null;
    if (this.fail(r, 'Open') || !r.value) return;
    if (this.ws.openText(r.value.text, r.value.path)) this.ws.say(`Opened ${r.value.path}`);
  }

  private canWrite(): boolean {
    const problems = this.ws.doc.problems;
    if (problems.length) this.ws.say(`Not saved: ${problems[0]}`, 'error');
    return problems.length === 0;
  }

  async save(): Promise<void> {
    if (!this.ws.doc.path) return this.saveAs();
    if (!this.canWrite()) return;
    const text = this.ws.doc.text;
    const r = await bridge['site.save']({ path: this.ws.doc.path, text });
    if (this.fail(r, 'Save')) return;
    this.saved(r.value.path, text);
  }

  /**
   * Save as: the browser shell asks for a file name in our own dialog first. A name already taken is
   * refused by the shell ('exists'); the dialog then asks, and `overwrite` resends with the user's consent.
   */
  async saveAs(name?: string, overwrite = false): Promise<void> {
    if (this.shell === 'browser' && name === undefined) {
      this.replacing = null;
      this.dialog = 'saveAs';
      return;
    }
    if (!this.canWrite()) return;
    const text = this.ws.doc.text;
    const suggestedName = name ?? this.ws.doc.site.project.site;
    const r = await bridge['site.saveAs']({ text, suggestedName, ...(overwrite ? { overwrite: true } : {}) });
    if (!r.ok && r.error.code === 'exists' && this.shell === 'browser') {
      this.replacing = suggestedName;
      return;
    }
    this.dialog = null;
    this.replacing = null;
    if (this.fail(r, 'Save as') || !r.value) return;
    this.saved(r.value.path, text);
  }

  private saved(path: string, text: string): void {
    if (this.ws.doc.text === text) this.ws.doc.markSaved(path);
    else this.ws.doc.path = path;
    if (!this.ws.doc.dirty) {
      clearTimeout(this.timer);
      void bridge['recovery.clear']({ document: this.document });
      removeLocalRecovery(this.document);
      this.keptIn = null;
    }
    void this.refreshRecent();
    this.ws.say(`Saved ${path}`);
  }

  /**
   * Debounced autosave of unsaved work to this document's recovery file; call from an effect on the
   * document text. It never pauses, an offer on screen included (the offer lives in its own file).
   */
  schedule(text: string, dirty: boolean, path: string | null): void {
    clearTimeout(this.timer);
    if (!dirty) return;
    this.last = { text, path };
    this.timer = setTimeout(() => this.autosaveNow(), AUTOSAVE_MS);
  }

  private autosaveNow(): void {
    const work = this.last;
    if (!work) return;
    const savedAt = new Date().toISOString();
    void bridge['recovery.write']({ ...work, document: this.document }).then((r) => {
      if (this.last !== work && !isUnreachable(r)) return; // newer work is on its way
      if (r.ok) {
        removeLocalRecovery(this.document);
        this.keptIn = 'shell';
      } else if (isUnreachable(r)) {
        this.keptIn = writeLocalRecovery(this.document, { ...work, savedAt }) ? 'browser' : 'nowhere';
      } else {
        this.keptIn = writeLocalRecovery(this.document, { ...work, savedAt }) ? 'browser' : 'nowhere';
        this.ws.say(`Autosave: ${r.error.message}`, 'error');
      }
    });
  }

  /** Opens the offered work; unsaved work in the window is replaced only when the user agrees. */
  recover(): void {
    const offer = this.offers[0];
    if (!offer) return;
    if (this.ws.doc.dirty && !confirm('Recovering replaces the unsaved changes made in this window. Replace them?'))
      return;
    const opened = openRecovered(this.ws, offer);
    if (!opened) return;
    this.offers = this.offers.slice(1);
    // the window's own autosave is replaced by the recovered document's file (which it now keeps current)
    void bridge['recovery.clear']({ document: this.document });
    removeLocalRecovery(this.document);
    this.document = offer.document;
    this.ws.say(`Recovered the work autosaved at ${new Date(offer.savedAt).toLocaleString()}. Save it to keep it.`);
  }

  async discardRecovery(): Promise<void> {
    const offer = this.offers[0];
    if (!offer) return;
    this.offers = this.offers.slice(1);
    removeLocalRecovery(offer.document);
    await bridge['recovery.clear']({ document: offer.document });
  }
}

/** The offers of the shell and of this browser, one per document (the newer one when both kept it), newest first. */
function mergeOffers(shell: RecoveryOffer[], local: RecoveryOffer[]): RecoveryOffer[] {
  const byDoc = new Map<string, RecoveryOffer>();
  for (const o of [...shell, ...local]) {
    const had = byDoc.get(o.document);
    if (!had || had.savedAt < o.savedAt) byDoc.set(o.document, o);
  }
  return [...byDoc.values()].sort((a, b) => (a.savedAt < b.savedAt ? 1 : a.savedAt > b.savedAt ? -1 : 0));
}

/**
 * Opens recovered text. Work in progress may hold an emptied required field, which a site file may not:
 * such a document opens as it was (its problems listed, saving refused until they are fixed) rather than
 * being lost; a text that is not our document at all is refused.
 */
function openRecovered(ws: Workspace, offer: RecoveryOffer): boolean {
  try {
    loadSite(offer.text);
  } catch (e) {
    const schemaOnly =
      e instanceof SiteFileError && !['format', 'version', ''].includes(e.place) && !/^character /.test(e.place);
    if (!schemaOnly) return ws.openText(offer.text, offer.path, false);
    ws.replaceDocument(JSON.parse(offer.text) as Site, offer.path, false);
    return true;
  }
  return ws.openText(offer.text, offer.path, false);
}
