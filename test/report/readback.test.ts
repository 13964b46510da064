import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { PDFDict, PDFDocument, PDFHexString, PDFName, PDFString } from 'pdf-lib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildReportModel, type ReportModel } from '../../shared-core/report';
import { hasQuantityToken } from '../../shared-core/core/quantity-text';
import { assessSite } from '../../shared-core/site';
import { readSiteFile, GPRIME_VERSION } from '../../src-main/services/site-file';
import { renderReport, type ReportFile } from '../../src-main/report/write-report';

/**
 * The calc package read back as a permit reviewer reads it: the PDF through poppler's pdftotext, the outline
 * through pdf-lib, the tables through papaparse and exceljs. One US edition of each demo site.
 */

const ROOT = resolve(import.meta.dirname, '..', '..');
const out = mkdtempSync(join(tmpdir(), 'gprime-readback-'));
afterAll(() => rmSync(out, { recursive: true, force: true }));

interface Edition {
  model: ReportModel;
  files: ReportFile[];
  pdf: Uint8Array;
  /** pdftotext -layout, one string per page */
  pages: string[];
  /** the whole text with white space collapsed */
  flat: string;
}

async function edition(site: string, formats: ('pdf' | 'svg' | 'csv' | 'xlsx')[]): Promise<Edition> {
  const loaded = readSiteFile(join(ROOT, 'examples', site));
  const a = assessSite(loaded.site, { gprimeVersion: GPRIME_VERSION, siteHash: loaded.hash });
  const model = buildReportModel(a, 'us', loaded.site, { issueDate: '2026-10-01' });
  const files = await renderReport(model, formats, 'x', loaded.site.project.date);
  const pdf = files.find((f) => f.path === 'x.pdf')!.bytes as Uint8Array;
  const path = join(out, `${site}.pdf`);
  writeFileSync(path, pdf);
  const layout = execFileSync('pdftotext', ['-layout', path, '-'], { encoding: 'utf8' });
  const pages = layout.split('\f').filter((p) => p.trim());
  return { model, files, pdf, pages, flat: layout.replace(/\s+/g, ' ') };
}

const text = (pages: readonly string[]) => pages.join('\n');
/** The pages from the first that holds `from` up to (not including) the first after it that holds `to`. */
function between(pages: readonly string[], from: RegExp, to?: RegExp): string {
  const start = pages.findIndex((p) => from.test(p));
  const end = to ? pages.findIndex((p, i) => i > start && to.test(p)) : -1;
  return text(pages.slice(start, end < 0 ? undefined : end + 1));
}

let amsel: Edition;
let quillmere: Edition;
beforeAll(async () => {
  amsel = await edition('amsel-estuary.gpsite', ['pdf', 'svg', 'csv', 'xlsx']);
  quillmere = await edition('quillmere-reservoir.gpsite', ['pdf']);
}, 300_000);

const each = () => [amsel, quillmere];

describe('summary (page 1)', () => {
  it('puts the verdicts, the cautions and the document control on page 1', () => {
    for (const e of each()) {
      const p1 = e.pages[0].replace(/\s+/g, ' ');
      expect(p1).toContain('Screening estimate only');
      expect(p1).toContain('Document control');
      for (const v of e.model.verdicts) expect(p1).toContain(v.verdict);
    }
    expect(amsel.pages[0]).toContain('Mixing-zone compliance at a glance');
  });
});

describe('document control', () => {
  it('has the document number, revision table, prepared/checked/approved boxes and an issue date apart from the site date', () => {
    for (const e of each()) {
      const c = e.model.documentControl;
      const p1 = e.pages[0].replace(/\s+/g, ' ');
      expect(p1).toContain(`Document number ${c.number}`);
      expect(p1).toMatch(/Rev\. Date Description Prepared Checked Approved/);
      expect(p1).toContain('Issue date 2026-10-01');
      expect(p1).toContain(`Date of the site data ${c.siteDate}`);
      for (const role of ['Prepared', 'Checked', 'Approved']) expect(p1).toContain(role);
      expect(p1.match(/Signature:/g)).toHaveLength(3);
    }
  });

  it('prints the full site hash, the document number and "Page i of n" on every page', () => {
    for (const e of each()) {
      const n = e.pages.length;
      e.pages.forEach((p, i) => {
        expect(p, `page ${i + 1}`).toContain(`Site file SHA-256 ${e.model.siteHash}`);
        expect(p, `page ${i + 1}`).toContain(`${e.model.documentControl.number} · rev A · issued 2026-10-01`);
        expect(p, `page ${i + 1}`).toContain(`Page ${i + 1} of ${n}`);
      });
    }
  });

  it('stamps every standalone figure (SVG) with the document number and the site hash', () => {
    const svgs = amsel.files.filter((f) => f.path.endsWith('.svg'));
    expect(svgs.length).toBeGreaterThan(5);
    for (const f of svgs) {
      const svg = String(f.bytes);
      expect(svg, f.path).toContain(amsel.model.siteHash);
      expect(svg, f.path).toContain(amsel.model.documentControl.number);
    }
  });

  it('has a bookmark (outline entry) per section, in order, each pointing at a page', async () => {
    for (const e of each()) {
      const doc = await PDFDocument.load(e.pdf);
      const outlines = doc.catalog.lookup(PDFName.of('Outlines'), PDFDict);
      const titles: string[] = [];
      let item = outlines.lookupMaybe(PDFName.of('First'), PDFDict);
      while (item) {
        const t = item.lookup(PDFName.of('Title'));
        titles.push(t instanceof PDFHexString || t instanceof PDFString ? t.decodeText() : String(t));
        item = item.lookupMaybe(PDFName.of('Next'), PDFDict);
      }
      for (const c of e.model.contents) {
        const estimate = e.model.estimates.find((s) => s.id === c.anchor);
        expect(titles, c.title).toContain(`${c.number} ${estimate ? estimate.title : c.title}`);
      }
      expect(titles[0]).toBe('Title block and document control');
    }
  });
});

describe('inputs, compliance derivation, verification and references', () => {
  it('lists every site input as entered in the inputs appendix', () => {
    const appendix = between(amsel.pages, /Site inputs as entered\n/, /Verification of the methods\n/).replace(
      /\s+/g,
      ' ',
    );
    expect(amsel.model.inputs.length).toBeGreaterThan(20);
    for (const i of amsel.model.inputs) expect(appendix).toContain(i.owner.split(' ')[0]);
    expect(appendix).toContain('mixingZone.distance');
  });

  it('derives each compliance row: concentrations, boundary, required and achieved dilution with its run and section', () => {
    const section = between(amsel.pages, /\d+ Mixing-zone compliance\n/, /Site inputs as entered\n/).replace(
      /\s+/g,
      ' ',
    );
    for (const d of amsel.model.complianceDerivations) {
      expect(section).toContain(d.heading);
      expect(section).toMatch(/Required dilution S_req = \(Ce − Ca\)\/\(Cc − Ca\) =/);
      expect(section).toMatch(/Zone boundary: [\d.]+ ft from the port/);
      expect(section).toMatch(/run [a-z0-9-]+, §\d+/);
    }
  });

  it('groups the checks of each method into validation, known departures and consistency checks', () => {
    const appendix = between(amsel.pages, /Verification of the methods\n/, /\d+ References\n/).replace(/\s+/g, ' ');
    expect(appendix).toContain('Validation against published values, within their stated scatter');
    expect(appendix).toContain('Known departures from published data (stated and tested as such)');
    expect(appendix).toMatch(/the stated departure of [−+]?[\d.]+ % relative reproduced within/);
  });

  it('numbers the references once, cites each where it is used, and lists every work cited', () => {
    for (const e of each()) {
      const refs = between(e.pages, /\d+ References\n/, /\d+ Cautions\n/);
      const body = text(
        e.pages.slice(
          0,
          e.pages.findIndex((p) => /\d+ References\n/.test(p)),
        ),
      );
      const listed = [...refs.matchAll(/^\s*\[(\d+)\]/gm)].map((m) => Number(m[1]));
      expect(listed).toEqual(e.model.references.map((_, i) => i + 1));
      const cited = new Set([...body.matchAll(/Reference \[(\d+)\]/g)].map((m) => Number(m[1])));
      expect([...cited].sort((x, y) => x - y)).toEqual(listed);
    }
  });
});

/**
 * Shared-core sentences that still print a number with its SI unit as text instead of a quantity token (the
 * report renders every token in the edition's units; these it cannot convert): the exchange-flow warning
 * (estuaries/exchange-net-flow.ts), the diffuser's regime sentence (jets/diffuser.ts) and the default viscosity's
 * description "water at 20 °C" (gravity-currents). Remove an entry when its sentence carries tokens. The 10 m
 * wind speed U₁₀ is a name (the standard reference height), not a length to convert.
 */
const AWAITING_TOKENS: readonly RegExp[] = [
  // the name of a quantity, not a length: wind speed at the standard reference height of 10 m (U₁₀)
  /(?:at|from) the 10 m wind|at 10 m(?= (?:U₁₀|=|\(from|wind))|speed at 10 m\b/g,
];

describe('the words and numbers of the US edition', () => {
  it('has no forbidden working phrases anywhere in the report', () => {
    for (const e of each())
      expect(e.flat).not.toMatch(/from memory|our reading|was not checked|this program|known-bias record/i);
  });

  it('leaves no quantity token unrendered and no E-notation number', () => {
    for (const e of each()) {
      expect(hasQuantityToken(e.flat)).toBe(false);
      expect(e.flat).not.toMatch(/\d\.\d+E[-+]?\d/);
    }
  });

  it('truncates no contents title and strands no heading at a page foot', () => {
    for (const e of each()) {
      const all = text(e.pages);
      const from = all.search(/^Contents$/m);
      const contents = all.slice(from, from + all.slice(from).search(/^1 Summary of estimates\s*$/m));
      expect(contents.length).toBeGreaterThan(100);
      expect(contents).not.toContain('…');
      for (const p of e.pages) {
        const lines = p.split('\n').filter((l) => l.trim());
        // the last line above the two footer lines is never a heading (a figure is not text: "Charts" followed by
        // its caption has the figure between them); a numbered section heading is never the last either
        const last = lines.at(-3)?.trim() ?? '';
        expect(
          /^(Inputs|Results|Validity warnings|Charts|Method, equation and reference|Uncertainty band)$/.test(last),
          last,
        ).toBe(false);
        expect(/^\d+ [A-Z][^.]*$/.test(last) && !/\d$/.test(last), last).toBe(false);
      }
    }
  });

  it('labels results and inputs in words, not by their parameter names', () => {
    for (const e of each())
      for (const name of ['n2_max', 'l_q', 'mixed_layer_depth', 'g_prime ']) expect(e.flat).not.toContain(` ${name} `);
  });

  it('shows every length, speed, flow and temperature in US units in its prose and tables', () => {
    // the inputs appendix (SI column), verification appendix and references quote SI on purpose
    const SI = /(?<![\w.])[−-]?\d[\d.,]*(?:×10[⁻⁰-⁹]+)? ?(?:m|m³\/s|m\/s|m²\/s|°C|km|mm|cm)(?![\w³²⁴/^(])/g;
    for (const e of each()) {
      const main = text(
        e.pages.slice(
          0,
          e.pages.findIndex((p) => /\d+ (Site inputs as entered|Verification of the methods)\n/.test(p)),
        ),
      );
      let shown = main.replace(/\s+/g, ' ');
      for (const t of AWAITING_TOKENS) shown = shown.replace(t, '');
      const hits = [...shown.matchAll(SI)].map((m) => m[0]);
      expect(hits, hits.join(' | ')).toEqual([]);
      expect(e.flat).toContain(e.model.densityNote);
      expect(e.flat).toMatch(/densities in lb\/ft³/);
    }
  });
});

describe('CSV and XLSX hold numbers as numbers', () => {
  it('the compliance CSV has units in its headers and numbers in its cells', () => {
    const csv = String(amsel.files.find((f) => f.path === 'tables/compliance.csv')!.bytes);
    const rows = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true }).data;
    expect(rows.length).toBe(amsel.model.compliance!.values.length);
    expect(Object.keys(rows[0])).toContain('Boundary distance (ft)');
    for (const r of rows) {
      for (const k of ['Required dilution', 'Achieved dilution', 'Margin (%)', 'Boundary distance (ft)'])
        expect(r[k], k).toMatch(/^-?\d+(\.\d+)?(e[-+]?\d+)?$/);
    }
  });

  it('the workbook types its cells: numeric results and compliance values are numbers', async () => {
    const wb = new ExcelJS.Workbook();
    const bytes = amsel.files.find((f) => f.path === 'x.xlsx')!.bytes as Uint8Array;
    await wb.xlsx.load(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer);
    const ws = wb.getWorksheet('Compliance')!;
    const header = (ws.getRow(1).values as unknown[]).slice(1);
    const col = header.indexOf('Achieved dilution') + 1;
    expect(col).toBeGreaterThan(0);
    for (let r = 2; r <= ws.rowCount; r++) expect(typeof ws.getRow(r).getCell(col).value).toBe('number');
    const report = wb.getWorksheet('Report')!;
    const numeric = (report.getSheetValues() as unknown[][]).filter(Boolean).filter((r) => typeof r[3] === 'number');
    expect(numeric.length).toBeGreaterThan(5);
  });
});
