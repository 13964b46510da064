import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  buildReportModel,
  chartSpecs,
  formatValue,
  LINE_STYLES,
  METHOD_CATALOGUE,
  methodsForSource,
} from '../../shared-core/report';
import { assessSite, type Assessment } from '../../shared-core/site';
import { nameText } from '../../shared-core/core/vocabulary';
import { sentenceIn } from '../../shared-core/units/sentence';
import { readSiteFile, GPRIME_VERSION } from '../../src-main/services/site-file';

const ROOT = resolve(import.meta.dirname, '..', '..');
const assess = (file: string): Assessment => {
  const l = readSiteFile(join(ROOT, 'examples', file));
  return assessSite(l.site, { gprimeVersion: GPRIME_VERSION, siteHash: l.hash });
};
const quillmere = assess('quillmere-reservoir.gpsite');

// Exact conversion factors: NIST SP 811 (2008), Appendix B.8/B.9 (1 ft = 0.3048 m exactly; 1 ft³ = 0.028316846592 m³;
// 1 lb = 0.45359237 kg) and the Fahrenheit scale t/°F = 1.8 t/°C + 32 (NIST SP 811 §B.9 temperature note).
const FT = 0.3048;
const CFS = 0.028316846592;

describe('report numbers (four significant figures, NIST SP 811 §7.9 style powers of ten)', () => {
  it.each([
    [997.4920726935004, '997.5'],
    [0.0043648999631674314, '0.004365'],
    [0.00043648999631674317, '4.365×10⁻⁴'],
    [21341.232477831985, '21341'],
    [-0.5, '−0.5'],
    [4.130675268290227, '4.131'],
    [2.5e7, '2.5×10⁷'],
    [0, '0'],
    [Infinity, '∞'],
    [Number.NaN, 'not a number'],
  ])('%s → %s', (x, text) => expect(formatValue(x)).toBe(text));
});

describe('report model', () => {
  it('is deterministic: the same assessment gives the same model', () => {
    expect(buildReportModel(assess('quillmere-reservoir.gpsite'), 'si')).toEqual(buildReportModel(quillmere, 'si'));
  });

  it('has a title block with project, people, date, revision, version and the site-file hash', () => {
    const m = buildReportModel(quillmere, 'si');
    const block = Object.fromEntries(m.titleBlock.map((r) => [r.label, r.value]));
    expect(block).toMatchObject({
      Project: quillmere.project.name,
      Site: quillmere.project.site,
      'Prepared by': quillmere.project.preparedBy,
      'Checked by': quillmere.project.checkedBy,
      'Date of the site data': quillmere.project.date,
      'Issue date': 'not issued (draft for checking)',
      Revision: quillmere.project.revision,
      'Document number': `GP-QUILLMERE-RESERVOIR-${quillmere.siteHash.slice(0, 8).toUpperCase()}`,
      'gprime version': GPRIME_VERSION,
      'Site file SHA-256': quillmere.siteHash,
    });
    expect(m.cautions[0]).toBe(quillmere.caution);
    // an issue date is the caller's, apart from the site date; an impossible date is not an issue date
    const issued = buildReportModel(quillmere, 'si', undefined, { issueDate: '2026-10-01' }).documentControl;
    expect(issued).toMatchObject({ issueDate: '2026-10-01', siteDate: quillmere.project.date, revision: 'A' });
    expect(issued.revisions[0]).toMatchObject({ date: '2026-10-01', prepared: quillmere.project.preparedBy });
    expect(issued.signatures.map((x) => x.role)).toEqual(['Prepared', 'Checked', 'Approved']);
    expect(buildReportModel(quillmere, 'si', undefined, { issueDate: '2026-02-30' }).documentControl.issueDate).toBe(
      '',
    );
  });

  it('lists summary, every estimate, references and cautions in the contents, numbered in order', () => {
    const m = buildReportModel(quillmere, 'si');
    expect(m.contents.map((c) => c.anchor)).toEqual([
      'summary',
      ...quillmere.estimates.map((e) => e.id),
      ...(quillmere.compliance.length ? ['compliance'] : []),
      'verification',
      'references',
      'cautions',
    ]);
    expect(m.contents.map((c) => c.number)).toEqual(m.contents.map((_, i) => String(i + 1)));
  });

  it('converts inputs and results to US customary units with the exact NIST factors', () => {
    const si = quillmere.estimates.find((e) => e.id === 'layer-upper')!;
    const us = buildReportModel(quillmere, 'us').estimates.find((e) => e.id === 'layer-upper')!;
    const q = Object.fromEntries(us.inputs.map((r) => [r.key, r]));
    expect(q.discharge.unit).toBe('cfs');
    expect(q.discharge.value).toBeCloseTo((si.inputs.discharge.value as number) / CFS, 9);
    expect(q.reservoir_length.value).toBeCloseTo((si.inputs.reservoir_length.value as number) / FT, 9);
    const thickness = us.results.find((r) => r.key === 'thickness')!;
    expect(thickness.shownUnit).toBe('ft');
    expect(thickness.value).toBeCloseTo((si.results.thickness.value as number) / FT, 9);
    const blend = buildReportModel(quillmere, 'us').estimates.find((e) => e.id === 'release-summer')!;
    const t = blend.inputs.find((r) => r.key === 'target_temperature')!;
    expect(t.shownUnit).toBe('°F');
    expect(t.value).toBeCloseTo(1.8 * 13.88888888888889 + 32, 9); // the site gives 57 °F
  });

  it('draws profile charts with depth on the vertical axis, downwards, with units of the display system', () => {
    const charts = buildReportModel(quillmere, 'us').estimates[0].charts;
    expect(charts.length).toBeGreaterThanOrEqual(4);
    for (const c of charts) {
      expect(c.y).toMatchObject({ label: 'Depth', unit: 'ft', reverse: true, title: 'Depth (ft)' });
      expect(c.x.reverse).toBe(false);
    }
    const temp = charts.find((c) => c.title === 'Temperature')!;
    expect(temp.x.title).toBe('Temperature (°F)');
    const si = quillmere.estimates[0].series.find((s) => s.title === 'Temperature')!;
    expect(temp.datasets[0].points[0].y).toBeCloseTo(si.x.values[0] / FT, 9);
    expect(temp.datasets[0].points[0].x).toBeCloseTo(1.8 * si.y[0].values[0] + 32, 9);
    expect(new Set(charts.map((c) => c.id)).size).toBe(charts.length);
  });

  it('renders any series generically: one chart per unit, gaps for non-finite values, depth as y drawn downwards', () => {
    const charts = chartSpecs(
      [
        {
          kind: 'front-position',
          title: 'Front position',
          x: { label: 'Time', unit: 's', values: [0, 10, 20] },
          y: [
            { label: 'Benjamin', unit: 'm', values: [0, 5, 9] },
            { label: 'Shin', unit: 'm', values: [0, 4, Number.NaN] },
            { label: 'Speed', unit: 'm/s', values: [0.5, 0.45, 0.4] },
          ],
          caption: 'Front position against time',
        },
        {
          kind: 'plume-centreline',
          title: 'Plume path',
          x: { label: 'Distance', unit: 'm', values: [0, 1, 2] },
          y: [{ label: 'Centreline depth', unit: 'm', values: [20, 18, 17] }],
          depthAxis: true,
        },
      ],
      'si',
      'e1',
    );
    expect(charts.map((c) => c.title)).toEqual([
      'Front position: Benjamin, Shin',
      'Front position: Speed',
      'Plume path',
    ]);
    expect(charts[0].datasets.map((d) => d.style)).toEqual([0, 1]);
    expect(charts[0].datasets[1].points[2]).toEqual({ x: 20, y: null });
    expect(charts[0].table.rows[2]).toEqual([20, 9, null]);
    expect(charts[2].x).toMatchObject({ title: 'Distance (m)', reverse: false });
    expect(charts[2].y).toMatchObject({ title: 'Centreline depth (m)', reverse: true });
    expect(charts[2].caption).toBe('Centreline depth against distance');
  });

  it('uses line styles that differ in dash pattern and marker, not only in colour (grayscale printing)', () => {
    const dashes = LINE_STYLES.map((s) => s.dash.join(','));
    const markers = LINE_STYLES.map((s) => s.marker);
    expect(new Set(dashes).size).toBe(LINE_STYLES.length);
    expect(new Set(markers).size).toBe(LINE_STYLES.length);
  });

  it('shows an estimate that could not be computed, and a compliance table when rows exist', () => {
    const a: Assessment = {
      ...quillmere,
      estimates: [{ ...quillmere.estimates[0], status: 'error', error: 'file: no profile', results: {}, series: [] }],
      compliance: [
        {
          feature: 'Outfall',
          condition: 'Late summer',
          constituent: 'ammonia',
          unit: 'mg/L',
          zone: 'chronic',
          boundary: 50,
          effluent: 12,
          ambient: 0.05,
          criterion: 1.2,
          requiredDilution: 10.4,
          nearFieldDilution: 6.24,
          farFieldFactor: 2,
          achievedDilution: 12.48,
          margin: 0.2,
          verdict: 'meets',
          note: '',
          models: 'buoyant-jet (plume) × far-field (far)',
          governing: true,
        },
      ],
    };
    const m = buildReportModel(a, 'si');
    expect(m.summary[0]).toMatchObject({ status: 'error', keyResult: 'not computed: file: no profile' });
    expect(m.compliance?.rows[0]).toEqual([
      'Outfall',
      'Late summer (governs)',
      'ammonia (chronic)',
      '12 / 0.05 / 1.2 mg/L',
      '50',
      '10.4',
      '6.24 × 2 = 12.48',
      '20 %',
      'meets',
    ]);
    // the spreadsheets get the same row as numbers; the US edition gives the boundary in feet (NIST SP 811: 1 ft = 0.3048 m)
    expect(m.compliance?.values[0]).toEqual([
      'Outfall',
      'Late summer',
      'yes',
      'ammonia',
      'chronic',
      'mg/L',
      12,
      0.05,
      1.2,
      50,
      10.4,
      6.24,
      2,
      12.48,
      20,
      'meets',
    ]);
    expect(buildReportModel(a, 'us').compliance?.values[0][9]).toBeCloseTo(50 / FT, 9);
    expect(buildReportModel(a, 'us').compliance?.header[9]).toBe('Boundary distance (ft)');
    expect(m.contents.map((c) => c.anchor)).toContain('compliance');
  });
});

describe('method equations come from the MethodInfo descriptors', () => {
  function files(dir: string): string[] {
    return readdirSync(dir).flatMap((n) =>
      statSync(join(dir, n)).isDirectory() ? files(join(dir, n)) : n.endsWith('.ts') ? [join(dir, n)] : [],
    );
  }
  it('the catalogue holds every exported MethodInfo of shared-core', () => {
    const declared = files(join(ROOT, 'shared-core')).flatMap((f) =>
      [...readFileSync(f, 'utf8').matchAll(/export const \w+\s*:\s*MethodInfo\s*=\s*\{\s*id:\s*'([^']+)'/g)].map(
        (m) => m[1],
      ),
    );
    const known = new Set(METHOD_CATALOGUE.map((m) => m.id));
    expect(declared.filter((id) => !known.has(id))).toEqual([]);
  });
  it('every source cited by the demo sites has its equation', () => {
    for (const a of [quillmere, assess('amsel-estuary.gpsite')]) {
      const missing = a.estimates.flatMap((e) => e.sources).filter((s) => methodsForSource(s).length === 0);
      expect(missing).toEqual([]);
    }
  });
});

describe('uncertainty bands in the report model', () => {
  it('carries each stated input uncertainty and a low ≤ median ≤ high band per numeric result, converted like the results', () => {
    const si = buildReportModel(quillmere, 'si').estimates.find((s) => s.id === 'plunge-summer')!;
    const us = buildReportModel(quillmere, 'us').estimates.find((s) => s.id === 'plunge-summer')!;
    const words = (n: string, role: 'input' | 'result') => nameText(n, si.method, role);
    expect(si.uncertainty?.inputs.map((i) => i.name)).toEqual([words('discharge', 'input')]);
    const depth = si.uncertainty!.rows.find((r) => r.name === words('plunge_depth', 'result'))!;
    const [nominal, low, median, high] = depth.values;
    expect(nominal).toBe(si.results.find((r) => r.key === 'plunge_depth')!.value);
    expect(low).toBeLessThan(median);
    expect(median).toBeLessThan(high);
    // the typed 15 % of the bound discharge, in m³/s and in ft³/s (1 ft³ = 0.028316846592 m³, NIST SP 811 App. B.8)
    const q = Number(si.inputs.find((r) => r.key === 'discharge')!.value);
    expect(si.uncertainty!.inputs[0].standardUncertaintyValue).toBeCloseTo(0.15 * q, 9);
    expect(us.uncertainty!.rows.find((r) => r.name === words('plunge_depth', 'result'))!.values[3]).toBeCloseTo(
      high / FT,
      6,
    );
    expect(si.methods.some((m) => /JCGM 101:2008/.test(m.source))).toBe(true);
  });
  it('gives no band where the estimate states no uncertainty', () => {
    expect(
      buildReportModel(quillmere, 'si').estimates.find((s) => s.id === 'strat-summer')!.uncertainty,
    ).toBeUndefined();
  });
});

describe('the calc package traces every verdict', () => {
  const m = buildReportModel(quillmere, 'si');

  it('page 1 lists the verdict of each limit under its tightest condition', () => {
    const limits = new Set(quillmere.compliance.map((r) => `${r.feature}|${r.constituent}|${r.zone}`));
    expect(m.verdicts).toHaveLength(limits.size);
    for (const v of m.verdicts) expect(['meets', 'does not meet', 'cannot tell']).toContain(v.verdict);
    expect(m.verdictRule).toMatch(/20 %/);
  });

  it('each compliance row has its derivation: Ce, Ca, Cc, S required, the runs and their warnings', () => {
    expect(m.complianceDerivations).toHaveLength(quillmere.compliance.length);
    quillmere.compliance.forEach((r, i) => {
      const d = [...m.complianceDerivations[i].lines, ...m.complianceDerivations[i].warnings].join(' ');
      expect(d).toContain(`Ce = ${formatValue(r.effluent!)}`);
      expect(d).toContain(`S_req = (Ce − Ca)/(Cc − Ca) = ${formatValue(r.requiredDilution!)}`);
      expect(d).toContain(`${formatValue(r.boundary!)} m from the port`);
      const section = m.estimates.find((s) => s.id === r.estimate)!.number;
      expect(d).toContain(`${r.estimate!}, §${section}`);
      const run = quillmere.estimates.find((o) => o.id === r.estimate)!;
      for (const w of run.warnings) expect(d).toContain(sentenceIn(w.message, 'si'));
    });
  });

  it('every input names its origin: typed, from the site, or the method default', () => {
    const jet = m.estimates.find((s) => s.id === 'plume-summer')!;
    expect(jet.inputs.find((q) => q.key === 'diameter')!.description).toMatch(/from the site: Treatment works outfall/);
    const added = m.estimates.find((s) => s.id.endsWith('far-chronic'))!;
    expect(added.inputs.find((q) => q.key === 'width')!.description).toMatch(/derived from the near-field run/);
    expect(added.inputs.find((q) => q.key === 'alpha')!.description).toMatch(/default/);
  });
});
