import { loadSite, SiteFileError, type Assessment, type Site } from '../../../shared-core/site';
import type { EstimateOutcome } from '../../../shared-core/site/assess';
import type { UnitSystem } from '../../../shared-core/units/units';
import type { Feature } from '../../../shared-core/site/schema';
import { drawEstimate, type EstimateDrawing } from '../lib/estimate-curves';
import { SiteDocument } from './document.svelte';
import { BandStore } from './bands.svelte';
import { AssessmentStore, emptyAssessment } from './assessment.svelte';

export type Selection =
  | { kind: 'project' }
  | { kind: 'waterBody' }
  | { kind: 'condition'; id: string }
  | { kind: 'feature'; id: string }
  | { kind: 'estimate'; id: string };

export interface Notice {
  tone: 'info' | 'error';
  text: string;
  /** the document as it was when the notice was given: an error stops showing once later work succeeds */
  site: Site;
}

/** The workspace: the open document, what is selected, the condition shown, and the live assessment. */
export class Workspace {
  doc = new SiteDocument();
  /** Monte Carlo uncertainty bands, computed apart in a worker (the live assessment runs without them) */
  bands = new BandStore();
  selection = $state<Selection>({ kind: 'waterBody' });
  /** the condition the section and readouts show */
  conditionChoice = $state<string | null>(null);
  /** the estimate whose detail is open */
  detailId = $state<string | null>(null);
  private noticeGiven = $state.raw<Notice | null>(null);
  /** the status line's message; an error clears once an edit, undo or redo has changed the document since */
  notice = $derived(
    this.noticeGiven && (this.noticeGiven.tone === 'info' || this.noticeGiven.site === this.doc.site)
      ? this.noticeGiven
      : null,
  );
  /** features added in this session, as added: their results say they rest on starting values until replaced */
  addedFeatures = $state.raw(new Map<string, Feature>());

  /** the unit system chosen in this session: a view setting (no edit, no undo step); null follows the file */
  private unitChoice = $state<UnitSystem | null>(null);
  units: UnitSystem = $derived(this.unitChoice ?? this.doc.site.units);
  conditionId = $derived.by(() => {
    const ids = this.doc.site.conditions.map((c) => c.id);
    return this.conditionChoice && ids.includes(this.conditionChoice) ? this.conditionChoice : ids[0];
  });
  condition = $derived(this.doc.site.conditions.find((c) => c.id === this.conditionId));
  /** the live assessment, computed in a worker; views read only this */
  live = new AssessmentStore();
  assessment: Assessment = $derived(this.live.current ?? emptyAssessment(this.doc.site));
  drawings = $derived(new Map<string, EstimateDrawing>(this.assessment.estimates.map((o) => [o.id, drawEstimate(o)])));
  /** how the profile of the condition shown reads */
  conditionOutcome = $derived(this.assessment.conditions.find((c) => c.id === this.conditionId));
  /** estimates shown for the current condition (those without a condition show under every condition), the selection's first */
  visible = $derived(
    selectedFirst(
      this.assessment.estimates.filter((o) => !o.condition || o.condition.id === this.conditionId),
      this.selection,
    ),
  );

  say(text: string, tone: Notice['tone'] = 'info'): void {
    this.noticeGiven = { tone, text, site: this.doc.site };
  }

  /** Shows every number in SI or US units; the document is not changed (the file keeps the units it opens in). */
  setUnits(system: UnitSystem): void {
    this.unitChoice = system;
  }

  /** Replaces the open document (new, open, recover) and shows it as it opens: its own units, nothing selected. */
  replaceDocument(site: Site, path: string | null, saved: boolean): void {
    this.doc.replace(site, path, saved);
    this.unitChoice = null;
    this.addedFeatures = new Map();
    this.selection = { kind: 'waterBody' };
    this.conditionChoice = null;
    this.detailId = null;
  }

  /** Opens a site from its text; a malformed or newer file is refused with the place named. */
  openText(text: string, path: string | null, saved = true): boolean {
    try {
      this.replaceDocument(loadSite(text), path, saved);
      return true;
    } catch (e) {
      const why = e instanceof SiteFileError ? e.message : 'it is not a gprime site file';
      this.say(`Cannot open ${path ?? 'the file'}: ${why}`, 'error');
      return false;
    }
  }
}

/** Whether an estimate belongs to what is selected (its feature, its condition, or itself). */
export function belongsTo(o: EstimateOutcome, selection: Selection): boolean {
  if (selection.kind === 'feature') return o.feature?.id === selection.id;
  if (selection.kind === 'estimate') return o.id === selection.id;
  if (selection.kind === 'condition') return o.condition?.id === selection.id;
  return false;
}

/** Estimates in assessment order, those of the selected feature, condition or estimate moved to the front. */
function selectedFirst(estimates: EstimateOutcome[], selection: Selection): EstimateOutcome[] {
  const first = estimates.filter((o) => belongsTo(o, selection));
  return first.length ? [...first, ...estimates.filter((o) => !belongsTo(o, selection))] : estimates;
}
