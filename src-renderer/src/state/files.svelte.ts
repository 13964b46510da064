import type { Reply } from '../../../shared-core/ipc/contract';
import { bridge } from '../lib/bridge';
import { blankSite } from '../lib/templates';
import type { Workspace } from './workspace.svelte';

const AUTOSAVE_MS = 800;

export interface RecoveryOffer {
  text: string;
  path: string | null;
  savedAt: string;
}

/** Open, save, save-as, recent files, autosave to the recovery file and the offer to recover. */
export class FileActions {
  shell = $state<'electron' | 'browser' | 'unknown'>('unknown');
  recent = $state.raw<string[]>([]);
  recovery = $state.raw<RecoveryOffer | null>(null);
  /** which file dialog of our own is open (the browser shell has no native dialogs) */
  dialog = $state<'open' | 'saveAs' | null>(null);
  busy = $state(false);
  private timer: ReturnType<typeof setTimeout> | undefined;

  constructor(private ws: Workspace) {}

  private fail<T>(r: Reply<T>, what: string): r is { ok: false; error: { code: string; message: string } } {
    if (r.ok) return false;
    this.ws.say(`${what}: ${r.error.message}`, 'error');
    return true;
  }

  async start(): Promise<void> {
    const info = await bridge['app.info']({});
    if (info.ok) this.shell = info.value.shell;
    const rec = await bridge['recovery.check']({});
    if (rec.ok && rec.value) this.recovery = rec.value;
    await this.refreshRecent();
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
    if (problems.length) this.ws.say(`Not saved: the document has a problem at ${problems[0]}`, 'error');
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

  /** Save as: the browser shell asks for a file name in our own dialog first. */
  async saveAs(name?: string): Promise<void> {
    if (this.shell === 'browser' && name === undefined) {
      this.dialog = 'saveAs';
      return;
    }
    if (!this.canWrite()) return;
    const text = this.ws.doc.text;
    const r = await bridge['site.saveAs']({ text, suggestedName: name ?? this.ws.doc.site.project.site });
    this.dialog = null;
    if (this.fail(r, 'Save as') || !r.value) return;
    this.saved(r.value.path, text);
  }

  private saved(path: string, text: string): void {
    if (this.ws.doc.text === text) this.ws.doc.markSaved(path);
    else this.ws.doc.path = path;
    void bridge['recovery.clear']({});
    void this.refreshRecent();
    this.ws.say(`Saved ${path}`);
  }

  /** Debounced autosave of unsaved work to the recovery file; call from an effect on the document text. */
  schedule(text: string, dirty: boolean, path: string | null): void {
    clearTimeout(this.timer);
    if (!dirty || this.recovery) return;
    this.timer = setTimeout(() => void bridge['recovery.write']({ text, path }), AUTOSAVE_MS);
  }

  recover(): void {
    const offer = this.recovery;
    if (!offer) return;
    this.recovery = null;
    if (this.ws.openText(offer.text, offer.path, false))
      this.ws.say(`Recovered the work autosaved at ${offer.savedAt}. Save it to keep it.`);
  }

  async discardRecovery(): Promise<void> {
    this.recovery = null;
    await bridge['recovery.clear']({});
  }
}
