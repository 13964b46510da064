import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildReportModel } from '../../shared-core/report';
import { nameText } from '../../shared-core/core/vocabulary';
import { sentenceIn } from '../../shared-core/units/sentence';
import { assessSite, type Assessment } from '../../shared-core/site';
import { readSiteFile, GPRIME_VERSION, type LoadedSite } from '../../src-main/services/site-file';
import { exportSiteReport, renderReport, writeReport } from '../../src-main/report/write-report';

const ROOT = resolve(import.meta.dirname, '..', '..');
const SITE = join(ROOT, 'examples', 'quillmere-reservoir.gpsite');
let out: string;
let loaded: LoadedSite;
let assessment: Assessment;
let written: string[];

/** "4.365×10⁻³", "−0.5", "997.5" → number (the PDF's typeset numbers). */
function parseShown(text: string): number {
  const sup: Record<string, string> = {
    '⁻': '-',
    '⁰': '0',
    '¹': '1',
    '²': '2',
    '³': '3',
    '⁴': '4',
    '⁵': '5',
    '⁶': '6',
    '⁷': '7',
    '⁸': '8',
    '⁹': '9',
  };
  const t = text.replace(/−/g, '-');
  const m = /^(-?[\d.]+)(?:×10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+))?$/.exec(t);
  if (!m) return Number.NaN;
  return Number(m[1]) * (m[2] ? 10 ** Number([...m[2]].map((c) => sup[c]).join('')) : 1);
}

beforeAll(async () => {
  out = mkdtempSync(join(tmpdir(), 'gprime-report-'));
  loaded = readSiteFile(SITE);
  assessment = assessSite(loaded.site, { gprimeVersion: GPRIME_VERSION, siteHash: loaded.hash });
  written = await writeReport(loaded, assessment, { outDir: out, units: 'si' });
});
afterAll(() => rmSync(out, { recursive: true, force: true }));

describe('report files', () => {
  it('writes the calc sheet, the workbook, every chart as PNG, SVG and CSV, and a table per estimate', () => {
    const rel = written.map((p) => p.slice(out.length + 1)).sort();
    expect(rel).toContain('quillmere-reservoir.pdf');
    expect(rel).toContain('quillmere-reservoir.xlsx');
    expect(rel).toContain('tables/summary.csv');
    for (const e of assessment.estimates) expect(rel).toContain(`tables/${e.id}.csv`);
    const charts = buildReportModel(assessment, 'si').estimates.flatMap((s) => s.charts);
    expect(charts.length).toBeGreaterThan(0);
    for (const c of charts) for (const ext of ['png', 'svg', 'csv']) expect(rel).toContain(`charts/${c.id}.${ext}`);
  });
});

describe('PDF calc sheet (read back with poppler pdftotext / pdfinfo / pdfimages)', () => {
  let text = '';
  let layout = '';
  beforeAll(() => {
    const pdf = join(out, 'quillmere-reservoir.pdf');
    text = execFileSync('pdftotext', [pdf, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    layout = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
  });

  it('holds the title block, the contents, page numbers and the cautions', () => {
    const p = assessment.project;
    for (const s of [
      p.name,
      p.site,
      p.preparedBy,
      p.checkedBy,
      p.date,
      `gprime version ${GPRIME_VERSION}`,
      assessment.siteHash,
      'Contents',
      'References',
      assessment.caution,
    ]) {
      expect(text, s).toContain(s);
    }
    const pages = Number(
      /Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [join(out, 'quillmere-reservoir.pdf')], { encoding: 'utf8' }))![1],
    );
    expect(pages).toBeGreaterThan(3);
    for (let i = 1; i <= pages; i++) expect(text).toContain(`Page ${i} of ${pages}`);
  });

  it('has a section per estimate with its inputs, equation, source and every validity warning', () => {
    const model = buildReportModel(assessment, 'si');
    for (const s of model.estimates) {
      expect(text).toContain(`${s.number} ${s.title}`);
      for (const q of s.inputs) expect(text).toContain(q.name);
      for (const m of s.methods) if (m.equation) expect(text).toContain(m.equation.replace(/\s+/g, ' ').slice(0, 40));
      for (const w of s.warnings) expect(text).toContain(w.replace(/\s+/g, ' '));
      for (const r of s.uncertainty?.rows ?? [])
        expect(layout).toMatch(new RegExp(r.shown.map((v) => v.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')).join('\\s+')));
    }
    expect(model.estimates.filter((s) => s.uncertainty).length).toBeGreaterThan(0);
    expect(text).toMatch(/Reference \[\d+\] Craya, A\. \(1949\)/);
  });

  it('prints every numeric result equal to `assess --json` within its four-figure rounding', () => {
    let pos = -1;
    let checked = 0;
    const lines = layout.split('\n');
    for (const e of assessment.estimates) {
      pos = lines.findIndex((l, i) => i > pos && l.trim().startsWith(`Estimate ${e.id} · gprime calc ${e.method}`));
      expect(pos, e.id).toBeGreaterThan(0);
      const results = lines.findIndex((l, i) => i > pos && /^\s*Result\s+Description\s+Value/.test(l));
      for (const [name, r] of Object.entries(e.results)) {
        if (typeof r.value !== 'number') continue;
        // the row starts with the label in words (its first word stays on the first line of the cell)
        const value = r.value;
        const prefix = nameText(name, e.method, 'result').split(' ')[0].replace(/,$/, '');
        const end = lines.findIndex((l, i) => i > results && l.trim().startsWith('Estimate '));
        const values = lines
          .filter((l, i) => i > results && (end < 0 || i < end) && l.trim().startsWith(prefix))
          .map((l) =>
            l
              .trim()
              .split(/\s+/)
              .filter((t) => !Number.isNaN(parseShown(t)))
              .pop(),
          ) // value column: last number on the row
          .filter((t): t is string => t !== undefined)
          .map(parseShown);
        expect(
          values.some((v) => Math.abs(v - value) <= 5e-4 * Math.abs(value) + 1e-300),
          `${e.id}.${name} = ${r.value}: rows starting "${prefix}" show ${values.join(', ')}`,
        ).toBe(true);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(20);
  });

  it('embeds the charts at 300 ppi', () => {
    const list = execFileSync('pdfimages', ['-list', join(out, 'quillmere-reservoir.pdf')], { encoding: 'utf8' })
      .trim()
      .split('\n')
      .slice(2);
    expect(list.length).toBe(buildReportModel(assessment, 'si').estimates.flatMap((s) => s.charts).length);
    for (const row of list) {
      const cols = row.trim().split(/\s+/);
      expect(Number(cols[3])).toBe(1950); // width in pixels
      expect(Number(cols[12])).toBeGreaterThanOrEqual(299); // x-ppi
    }
  });
});

describe('tables round-trip to the numbers of `assess`', () => {
  it('each estimate CSV holds every input and result at full precision (SI)', () => {
    for (const e of assessment.estimates) {
      const rows = Papa.parse<Record<string, string>>(readFileSync(join(out, 'tables', `${e.id}.csv`), 'utf8'), {
        header: true,
        skipEmptyLines: true,
      }).data;
      for (const [section, values] of [
        ['input', e.inputs],
        ['result', e.results],
      ] as const) {
        for (const [name, v] of Object.entries(values)) {
          const row = rows.find((r) => r.section === section && r.name === name)!;
          expect(row, `${e.id} ${name}`).toBeDefined();
          if (typeof v.value === 'number') expect(Number(row.value)).toBe(v.value);
          else expect(row.value).toBe(sentenceIn(v.value, 'si'));
          expect(row.unit).toBe(v.unit === '1' ? '' : v.unit);
        }
      }
      expect(rows.filter((r) => r.section === 'warning').map((r) => r.value)).toEqual(
        e.warnings.map((w) => sentenceIn(w.message, 'si')),
      );
    }
  });

  it('the workbook has a sheet per estimate whose results equal `assess` exactly', async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(join(out, 'quillmere-reservoir.xlsx'));
    expect(wb.worksheets.map((w) => w.name)).toEqual([
      'Report',
      ...assessment.estimates.map((e) => e.id),
      ...(assessment.compliance.length ? ['Compliance'] : []),
    ]);
    const report = wb.getWorksheet('Report')!;
    const cells = report.getSheetValues().flat().map(String);
    expect(cells).toContain(assessment.siteHash);
    for (const e of assessment.estimates) {
      const ws = wb.getWorksheet(e.id)!;
      const rows = (ws.getSheetValues() as unknown[][]).filter(Boolean).map((r) => r.slice(1));
      const start = rows.findIndex((r) => r[0] === 'Results');
      for (const [name, v] of Object.entries(e.results)) {
        const row = rows.find((r, i) => i > start && r[4] === name)!;
        expect(row?.[2], `${e.id} ${name}`).toBe(typeof v.value === 'number' ? v.value : sentenceIn(v.value, 'si'));
      }
    }
  });

  it('US customary tables equal the SI numbers converted with the exact NIST SP 811 factors', async () => {
    const dir = join(out, 'us');
    await writeReport(loaded, assessment, { outDir: dir, units: 'us', formats: ['csv'] });
    const factor: Record<string, [string, (x: number) => number]> = {
      m: ['ft', (x) => x / 0.3048],
      'm3/s': ['cfs', (x) => x / 0.028316846592],
      'm/s': ['ft/s', (x) => x / 0.3048],
      'm/s2': ['ft/s2', (x) => x / 0.3048],
      degC: ['degF', (x) => 1.8 * x + 32],
      'kg/m3': ['lb/ft3', (x) => (x * 0.028316846592) / 0.45359237],
    };
    let checked = 0;
    for (const e of assessment.estimates) {
      const rows = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'tables', `${e.id}.csv`), 'utf8'), {
        header: true,
        skipEmptyLines: true,
      }).data;
      for (const [name, v] of Object.entries({ ...e.inputs, ...e.results })) {
        if (typeof v.value !== 'number' || !factor[v.unit]) continue;
        const row = rows.find((r) => r.name === name)!;
        expect(row.unit).toBe(factor[v.unit][0]);
        expect(Number(row.value)).toBeCloseTo(factor[v.unit][1](v.value), 8);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(20);
  });
});

describe('reproducibility', () => {
  it('the same site gives byte-identical PDF, SVG, PNG and CSV files', { timeout: 120_000 }, async () => {
    const model = buildReportModel(assessment, 'si');
    const a = await renderReport(model, ['pdf', 'svg', 'png', 'csv'], 'x', loaded.site.project.date);
    const again = assessSite(readSiteFile(SITE).site, { gprimeVersion: GPRIME_VERSION, siteHash: loaded.hash });
    const b = await renderReport(
      buildReportModel(again, 'si'),
      ['pdf', 'svg', 'png', 'csv'],
      'x',
      loaded.site.project.date,
    );
    expect(b.map((f) => f.path)).toEqual(a.map((f) => f.path));
    a.forEach((f, i) => expect(Buffer.from(b[i].bytes).equals(Buffer.from(f.bytes)), f.path).toBe(true));
  });

  it('a report exported from the document text records the SHA-256 of that text (as sha256sum computes it)', async () => {
    const dir = join(out, 'from-text');
    const files = await exportSiteReport(readFileSync(SITE, 'utf8'), 'Quillmere.gpsite', {
      outDir: dir,
      units: 'si',
      formats: ['csv'],
    });
    const expected = execFileSync('sha256sum', [SITE], { encoding: 'utf8' }).split(' ')[0];
    expect(files.some((f) => f.endsWith('summary.csv'))).toBe(true);
    expect(readFileSync(join(dir, 'tables', 'summary.csv'), 'utf8')).toContain(`Site file SHA-256,${expected}`);
  });

  it('refuses an unknown format naming the known ones', async () => {
    await expect(
      writeReport(loaded, assessment, { outDir: join(out, 'bad'), units: 'si', formats: ['docx'] }),
    ).rejects.toThrow(/unknown format "docx".*pdf, png, svg, csv, xlsx/);
  });
});
