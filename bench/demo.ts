import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { findCalcMethod } from '../shared-core/calc/registry';
import { resolveArgs } from '../shared-core/calc/resolve';
import type { BuoyantJetInput } from '../shared-core/jets/buoyant-jet';
import { buoyantJetInputFromArgs } from '../shared-core/jets/calc';
import { estimateArgs, loadSite, makeContext, ProfileCache, type Site } from '../shared-core/site';

/** The invented demo reservoir that the benchmarks run on. */
export const ROOT = resolve(import.meta.dirname, '..');
export const DEMO_PATH = join(ROOT, 'examples', 'quillmere-reservoir.gpsite');
export const DEMO_TEXT = readFileSync(DEMO_PATH, 'utf8');
export const META = { gprimeVersion: 'bench', siteHash: 'bench' };

export const loadDemo = (): Site => loadSite(DEMO_TEXT);

/** The model input of the demo's buoyant jet (estimate plume-summer), bound from the site as an assessment binds it. */
export function demoJetInput(): BuoyantJetInput {
  const site = loadDemo();
  const estimate = site.estimates.find((e) => e.id === 'plume-summer');
  const method = findCalcMethod('buoyant-jet');
  if (!estimate || !method) throw new Error('the demo has no plume-summer buoyant jet');
  const ctx = makeContext(site, estimate.condition, estimate.feature, new ProfileCache());
  return buoyantJetInputFromArgs(resolveArgs(method, estimateArgs(method, ctx, estimate)));
}
