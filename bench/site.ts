import { assessSite, ProfileCache, runEstimate, SiteAssessor, type Site } from '../shared-core/site';
import { loadDemo, META } from './demo';
import { medianMs, ms, type Measured } from './harness';

const RUNS = 15;

/** The demo with its outfall's discharge changed by a different small factor on each run (one field edited). */
function editedDischarge(site: Site, run: number): Site {
  const edited = structuredClone(site);
  const outfall = edited.features.find((f) => f.kind === 'outfall');
  if (!outfall || !('discharge' in outfall) || typeof outfall.discharge !== 'number')
    throw new Error('the demo has no outfall with a numeric discharge');
  outfall.discharge *= 1 + 0.001 * (run + 1);
  return edited;
}

/** The slowest estimates of the demo, each timed warm with the profiles read (where the full assessment goes). */
function slowestEstimates(site: Site, count: number): string {
  const cache = new ProfileCache();
  const times = site.estimates.map((e, i) => ({
    id: e.id,
    ms: medianMs(
      RUNS,
      () => undefined,
      () => runEstimate(site, e, i, { bands: false }, cache),
    ),
  }));
  return times
    .sort((a, b) => b.ms - a.ms)
    .slice(0, count)
    .map((t) => `${t.id} ${ms(t.ms)}`)
    .join(', ');
}

/**
 * The live workspace's two paths on the demo reservoir, without bands: a full assessment of a freshly loaded site
 * (loading not timed), and an incremental re-assessment after one outfall field changed (SiteAssessor, warmed on the
 * demo; it recomputes only the estimates whose resolved inputs changed).
 */
export function benchSite(): Measured {
  const full = medianMs(RUNS, loadDemo, (site) => assessSite(site, META, { bands: false }));
  const loadMs = medianMs(RUNS, () => undefined, loadDemo);

  const demo = loadDemo();
  const assessor = new SiteAssessor();
  assessor.assess(demo, META, { bands: false });
  let recomputed = 0;
  const edit = medianMs(
    RUNS,
    (run) => editedDischarge(demo, run),
    (site) => {
      assessor.assess(site, META, { bands: false });
      recomputed = assessor.computed;
    },
  );
  const estimates = assessSite(demo, META, { bands: false }).estimates.length;
  return {
    values: { site_recompute_ms: full, edit_recompute_ms: edit },
    lines: [
      `${'Demo reservoir, full assessment (no bands)'.padEnd(44)} ${ms(full).padStart(10)}   median of ${RUNS}, freshly loaded each (loading: ${ms(loadMs)}; ${estimates} estimates)`,
      `${'Demo reservoir, outfall discharge edited'.padEnd(44)} ${ms(edit).padStart(10)}   incremental SiteAssessor, ${recomputed} of ${estimates} estimates recomputed`,
      `${''.padEnd(44)} ${''.padStart(10)}   slowest estimates (warm): ${slowestEstimates(demo, 4)}`,
    ],
  };
}
