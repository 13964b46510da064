import type { RequestOf } from '../../../shared-core/ipc/contract';
import type { UnitSystem } from '../../../shared-core/units/units';
import { bridge } from '../lib/bridge';
import type { Workspace } from './workspace.svelte';

export type PackageFormat = RequestOf<'report.export'>['formats'][number];

/** The formats the panel offers, in the order it lists them, with what each one writes. */
export const PACKAGE_FORMATS: readonly { id: PackageFormat; label: string; hint: string }[] = [
  { id: 'pdf', label: 'PDF calculation sheet', hint: 'the report to file' },
  { id: 'csv', label: 'CSV tables', hint: 'summary, each estimate, compliance' },
  { id: 'xlsx', label: 'XLSX workbook', hint: 'typed cells, one sheet per table' },
  { id: 'png', label: 'Figures as PNG', hint: '300 dpi pictures' },
  { id: 'svg', label: 'Figures as SVG', hint: 'drawings that scale' },
];

/** What one finished export wrote, and from which state of the document. */
export interface PackageWritten {
  outDir: string;
  files: string[];
  units: UnitSystem;
  /** the document had changes not saved to its file: the package holds them, the file does not */
  unsaved: boolean;
  /** the site file named in the report, or null for a site never saved */
  path: string | null;
  seconds: number;
}

const TICK_MS = 250;

/**
 * Writing the calc package of the open site: the formats and unit system chosen in the panel, one export
 * at a time (the report worker on the Node side takes seconds), the time it has been running, and what it
 * wrote or why it failed. It exports the document as it is on screen, saved or not.
 */
export class PackageExport {
  panelOpen = $state(false);
  chosen = $state<Record<PackageFormat, boolean>>({ pdf: true, csv: true, xlsx: true, png: false, svg: false });
  units = $state<UnitSystem>('si');
  running = $state(false);
  /** seconds since the running export started (updated a few times a second) */
  elapsed = $state(0);
  written = $state.raw<PackageWritten | null>(null);
  error = $state<string | null>(null);
  /** the user cancelled the folder dialog (Electron) */
  cancelled = $state(false);
  private timer: ReturnType<typeof setInterval> | undefined;

  constructor(private ws: Workspace) {}

  formats = $derived(PACKAGE_FORMATS.map((f) => f.id).filter((id) => this.chosen[id]));

  /** Opens the panel with the unit system the workspace shows; a finished result stays until the next run. */
  open(): void {
    if (!this.panelOpen && !this.running) this.units = this.ws.units;
    this.panelOpen = true;
  }

  close(): void {
    this.panelOpen = false;
  }

  toggle(): void {
    if (this.panelOpen) this.close();
    else this.open();
  }

  /** Writes the package of the document as it is now; a call while an export is running does nothing. */
  async run(): Promise<void> {
    if (this.running) return;
    this.error = null;
    this.cancelled = false;
    const formats = this.formats;
    if (formats.length === 0) {
      this.error = 'Choose at least one format.';
      return;
    }
    const doc = this.ws.doc;
    if (doc.problems.length) {
      // a field holding text the document could not take would be left out silently: refused, as saving is
      this.error = `Not exported: ${doc.problems[0]}. Fix it in the editor first.`;
      return;
    }
    // the text on screen now: later edits do not change this export
    const text = doc.text;
    const path = doc.path;
    const unsaved = doc.dirty;
    const units = this.units;
    const started = performance.now();
    this.running = true;
    this.elapsed = 0;
    this.timer = setInterval(() => (this.elapsed = (performance.now() - started) / 1000), TICK_MS);
    try {
      const r = await bridge['report.export']({ text, formats, units, outDir: null, path });
      const seconds = (performance.now() - started) / 1000;
      if (!r.ok) {
        this.error = `The package was not written: ${r.error.message}`;
        this.ws.say(this.error, 'error');
      } else if (r.value === null) {
        this.cancelled = true;
      } else {
        this.written = { ...r.value, units, unsaved, path, seconds };
        this.ws.say(`Calc package written to ${r.value.outDir} (${r.value.files.length} files)`);
      }
    } finally {
      clearInterval(this.timer);
      this.running = false;
    }
  }
}
