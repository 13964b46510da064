import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CALC_METHODS } from '../../../shared-core/calc/registry';
import { runCalc, type RawArg } from '../../../shared-core/calc/resolve';
import type { CalcMethod, ParamSpec } from '../../../shared-core/calc/types';
import { InputError } from '../../../shared-core/core/errors';
import { hasQuantityToken } from '../../../shared-core/core/quantity-text';
import { parseProfileCsv } from '../../../shared-core/profile/csv';
import { ProfileError } from '../../../shared-core/profile/profile';
import { assessSite, type Assessment } from '../../../shared-core/site';
import { loadSite } from '../../../shared-core/site/load';
import { sentenceIn } from '../../../shared-core/units/sentence';
import { formatCalcText } from '../../../src-main/cli/format';

/**
 * In US display every number inside a sentence is in US customary units (issue: "units the user chose,
 * everywhere"): the assessment of both demo sites and `gprime calc` of every registered method, rendered in
 * 'us', hold no quantity token and no SI quantity. gprime's own contract; no outside source applies.
 */
const ROOT = resolve(import.meta.dirname, '..', '..', '..');
const DEMOS = ['quillmere-reservoir.gpsite', 'amsel-estuary.gpsite'];

/** An SI quantity as running text shows it: a number then an SI unit, or an SI unit name that US text never holds. */
const SI_QUANTITY =
  /\d\s?(?:m|km|cm|mm|m\/s|m³\/s|m3\/s|m²\/s|m2\/s|m\/s²|m\/s2|kg\/m³|kg\/m3|°C|degC|K|L\/s|m³|m3|m²|m2)(?![\w²³/])|degC|°C|m³\/s|m3\/s|kg\/m³|kg\/m3/;
/**
 * Names that hold a metric figure but are no quantity to convert: the 10 m wind is the standard height of
 * wind measurement (U₁₀, WMO), part of a method's name.
 */
const NAMES = [/\b10 m wind\b/g, /\bat 10 m\b/g];

/** The SI quantities left in a text (empty when none). */
function siLeft(text: string): string[] {
  const plain = NAMES.reduce((t, n) => t.replace(n, ''), text);
  return [...plain.matchAll(new RegExp(SI_QUANTITY.source, 'g'))].map((m) => m[0]);
}

/** Every sentence of an assessment a view shows: errors, warnings, text results, captions, notes. */
function sentences(a: Assessment): [string, string][] {
  const out: [string, string][] = [];
  for (const e of a.estimates) {
    if (e.error) out.push([`${e.id} error`, e.error]);
    if (e.incomplete) out.push([`${e.id} incomplete`, e.incomplete]);
    for (const w of e.warnings) out.push([`${e.id} warning ${w.code}`, w.message]);
    for (const [k, r] of Object.entries(e.results))
      if (typeof r.value === 'string') out.push([`${e.id} ${k}`, r.value]);
    for (const s of e.series) if (s.caption) out.push([`${e.id} caption ${s.kind}`, s.caption]);
    for (const w of e.uncertainty?.warnings ?? []) out.push([`${e.id} band ${w.code}`, w.message]);
  }
  for (const r of a.compliance) out.push([`compliance ${r.feature} ${r.condition}`, `${r.note} ${r.models}`]);
  for (const c of a.conditions) {
    if (c.error) out.push([`condition ${c.name}`, c.error]);
    for (const w of c.warnings) out.push([`condition ${c.name} ${w.code}`, w.message]);
    for (const i of c.issues) out.push([`condition ${c.name} row ${i.row}`, i.message]);
  }
  return out;
}

const problems = (texts: [string, string][]) =>
  texts.flatMap(([where, text]) => {
    const shown = sentenceIn(text, 'us');
    const left = siLeft(shown);
    if (hasQuantityToken(shown)) return [`${where}: token left in "${shown}"`];
    return left.length ? [`${where}: ${left.join(', ')} in "${shown}"`] : [];
  });

describe('US display: no SI quantity inside any sentence', () => {
  for (const file of DEMOS) {
    it(`the assessment of ${file}`, () => {
      const site = loadSite(readFileSync(join(ROOT, 'examples', file), 'utf8'));
      const a = assessSite(site, { gprimeVersion: 'test', siteHash: 'h' });
      const texts = sentences(a);
      expect(texts.length).toBeGreaterThan(10);
      expect(problems(texts)).toEqual([]);
    });
  }

  it('the same sentences in SI hold no token either, and the scan does find SI text', () => {
    const site = loadSite(readFileSync(join(ROOT, 'examples', DEMOS[1]), 'utf8'));
    const texts = sentences(assessSite(site, { gprimeVersion: 'test', siteHash: 'h' }));
    for (const [, t] of texts) expect(hasQuantityToken(sentenceIn(t, 'si'))).toBe(false);
    // the scan itself: SI text is caught, US text and names are not
    expect(siLeft('merge 2.76 m above; 0.0208 m³/s per metre; 12 °C; 3 degC')).toEqual([
      '6 m',
      '8 m³/s',
      '2 °C',
      '3 degC',
    ]);
    expect(siLeft('merge 9.06 ft above; 0.224 ft²/s per foot; 54 °F; the 10 m wind; 5 mph')).toEqual([]);
  });

  it('gprime calc of every registered method, in US units', () => {
    const computed: string[] = [];
    const found: string[] = [];
    for (const method of CALC_METHODS) {
      const out = firstComputed(method);
      if (!out) continue;
      computed.push(method.id);
      const text = formatCalcText(method, out, undefined, 'us');
      // the results and warnings, not the references (sources cite papers' own metric units)
      const shown = text.slice(0, text.indexOf('\nSources:'));
      if (hasQuantityToken(shown)) found.push(`calc ${method.id}: token left`);
      const left = siLeft(shown);
      if (left.length) found.push(`calc ${method.id}: ${left.join(', ')} in\n${shown}`);
    }
    // every method computes on everyday inputs, so that none escapes the scan
    expect(CALC_METHODS.map((m) => m.id).filter((id) => !computed.includes(id))).toEqual([]);
    expect(found).toEqual([]);
  });
});

const PROFILE = parseProfileCsv(readFileSync(join(ROOT, 'examples', 'demo-profile.csv'), 'utf8'));

/** Everyday values by parameter name, for methods without a default (the demo profile is 38 m deep). Common practice, no source. */
const EVERYDAY: Record<string, number> = {
  port_depth: 20,
  depth: 20,
  total_depth: 20,
  upper_thickness: 5,
  lower_thickness: 15,
  interface_distance: 5,
  opening: 3,
  obstacle_height: 3,
  current_depth: 2,
  lock_depth: 2,
  lock_length: 10,
  rho_upper: 1000,
  rho_lower: 1002,
  effluent_density: 1000,
  ambient_density: 1024,
  g_prime: 0.02,
  velocity: 1,
  diameter: 0.3,
  buoyancy_frequency: 0.02,
  basin_length: 5000,
  wind_speed: 8,
  discharge: 10,
  width: 50,
  flux: 0.1,
  net_discharge: 100,
  end_width: 2000,
  ports: 8,
  spacing: 3,
  diffuser_length: 20,
  temperature: 12,
  salinity: 0,
  release: 10,
  target_temperature: 12,
  time: 600,
  angle: 30,
  current: 0.1,
  effluent: 10,
  ambient: 1,
  criterion: 2,
  distance: 500,
  river_discharge: 100,
  tidal_velocity: 0.8,
  bed_slope: 0.01,
};
/** Parameters given one way or another, never both (each group: one of its names is given). */
const ALTERNATIVES: Record<string, string[][]> = {
  'buoyant-jet': [['file', 'ambient_density']],
  'diffuser-plume': [['file', 'ambient_density']],
  'vertical-modes': [
    ['file', 'buoyancy_frequency'],
    ['file', 'depth'],
  ],
};
const TEXT: Record<string, string> = { hypsography: '0:2e6,10:1.2e6,25:4e5,38:0', ports: '5:10,15:10,30:10' };

/** Arguments near everyday values; a group of alternatives takes its first member, the others left out. */
function everydayArgs(method: CalcMethod, pick: number): Record<string, RawArg> {
  // each group: parameters of which exactly one is given; the `pick`-th one is
  const groups = method.oneOf ?? ALTERNATIVES[method.id] ?? [];
  const absent = new Set(groups.flatMap((g) => g.filter((_, i) => i !== Math.min(pick, g.length - 1))));
  const args: Record<string, RawArg> = {};
  for (const p of method.params) {
    if (absent.has(p.name) || hasDefault(p)) continue;
    if (p.kind === 'profile') args[p.name] = PROFILE;
    else if (p.kind === 'choice') args[p.name] = p.choices[0];
    else if (p.kind === 'text') args[p.name] = TEXT[p.name] ?? '5:10,15:10,30:10';
    else if (!p.optional || p.name in EVERYDAY) args[p.name] = numberFor(method, p);
  }
  return args;
}

const hasDefault = (p: ParamSpec) => 'default' in p && p.default !== undefined;

function numberFor(method: CalcMethod, p: Extract<ParamSpec, { kind: 'number' }>): number {
  const everyday = method.everyday?.[p.name];
  const x = everyday ? (everyday[0] + everyday[1]) / 2 : (EVERYDAY[p.name] ?? 1);
  const r = p.range ?? {};
  return Math.min(r.max ?? Infinity, Math.max(r.min ?? -Infinity, x));
}

/** The method's output for the first everyday arguments it accepts (bad-input refusals skipped). */
function firstComputed(method: CalcMethod) {
  let refusal = '';
  for (const pick of [0, 1]) {
    try {
      return runCalc(method, everydayArgs(method, pick));
    } catch (e) {
      if (!(e instanceof InputError || e instanceof ProfileError)) throw e;
      refusal ||= e.message;
    }
  }
  console.warn(`${method.id} refused everyday inputs: ${refusal}`);
  return undefined;
}
