import {
  assessSite,
  runEstimate,
  loadSite,
  SiteFileError,
  type Assessment,
  type EstimateOutcome,
  type Site,
} from '../../../shared-core/site';
import { SCREENING_CAUTION } from '../../../shared-core/core/caution';
import type { UnitSystem } from '../../../shared-core/units/units';
import { drawEstimate, type EstimateDrawing } from '../lib/estimate-curves';
import { SiteDocument } from './document.svelte';
import { BandStore } from './bands.svelte';

export type Selection =
  | { kind: 'project' }
  | { kind: 'waterBody' }
  | { kind: 'condition'; id: string }
  | { kind: 'feature'; id: string }
  | { kind: 'estimate'; id: string };

export interface Notice {
  tone: 'info' | 'error';
  text: string;
}

/** Runs every estimate; an unexpected failure of one estimate never hides the others. */
function assess(site: Site): Assessment {
  try {
    return assessSite(site, { gprimeVersion: 'workspace', siteHash: '' }, { bands: false });
  } catch {
    const estimates: EstimateOutcome[] = site.estimates.map((e, i) => {
      try {
        return runEstimate(site, e, i, { bands: false });
      } catch (err) {
        return {
          id: e.id,
          method: e.method,
          title: e.title ?? e.method,
          status: 'error',
          inputs: {},
          results: {},
          warnings: [],
          sources: [],
          series: [],
          error: `could not be computed (${String(err)})`,
        };
      }
    });
    return {
      format: 'gprime-assessment',
      project: site.project,
      waterBody: site.waterBody.name,
      gprimeVersion: 'workspace',
      siteHash: '',
      units: site.units,
      caution: SCREENING_CAUTION,
      estimates,
      compliance: [],
    };
  }
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
  notice = $state<Notice | null>(null);

  units: UnitSystem = $derived(this.doc.site.units);
  conditionId = $derived.by(() => {
    const ids = this.doc.site.conditions.map((c) => c.id);
    return this.conditionChoice && ids.includes(this.conditionChoice) ? this.conditionChoice : ids[0];
  });
  condition = $derived(this.doc.site.conditions.find((c) => c.id === this.conditionId));
  assessment = $derived(assess(this.doc.site));
  drawings = $derived(
    new Map<string, EstimateDrawing>(this.assessment.estimates.map((o) => [o.id, drawEstimate(this.doc.site, o)])),
  );
  /** estimates shown for the current condition (those without a condition show under every condition) */
  visible = $derived(this.assessment.estimates.filter((o) => !o.condition || o.condition.id === this.conditionId));

  say(text: string, tone: Notice['tone'] = 'info'): void {
    this.notice = { tone, text };
  }

  setUnits(system: UnitSystem): void {
    if (system !== this.units)
      this.doc.change((d) => {
        d.units = system;
      });
  }

  /** Opens a site from its text; a malformed or newer file is refused with the place named. */
  openText(text: string, path: string | null, saved = true): boolean {
    try {
      const site = loadSite(text);
      this.doc.replace(site, path, saved);
      this.selection = { kind: 'waterBody' };
      this.conditionChoice = null;
      this.detailId = null;
      return true;
    } catch (e) {
      this.say(e instanceof SiteFileError ? `Cannot open ${path ?? 'the file'}: ${e.message}` : String(e), 'error');
      return false;
    }
  }
}
