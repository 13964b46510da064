import { rgb } from 'pdf-lib';
import type { EstimateSection, QuantityRow, ReportModel, UncertaintySection } from '../../shared-core/report/model';
import { MUTED, PdfWriter, type EmbeddedImage, type TableColumn } from './pdf-layout';

/**
 * The bodies of the calc sheet's sections: one estimate (inputs, method and reference, results, warnings,
 * charts), the compliance table with the derivation of every row, the verification appendix and the references.
 */

/** Text results longer than this are set as paragraphs under the results table. */
const LONG_TEXT = 48;
const WARN = rgb(0.6, 0.1, 0.1);

const QUANTITY_COLUMNS = (first: string): TableColumn[] => [
  { header: first, width: 0.27 },
  { header: 'Description', width: 0.4 },
  { header: 'Value', width: 0.21, align: 'right' },
  { header: 'Unit', width: 0.12 },
];

const quantityRow = (q: QuantityRow) => [q.name, q.description, q.shown, q.shownUnit];

/** "Fischer, H.B. (1972)": the leading authors and year of a citation, when it opens with them. */
export function shortCitation(source: string): string {
  const m = /^(.{3,110}?\(\d{4}[a-z]?\))/.exec(source);
  return m ? m[1] : '';
}

const BAND_COLUMNS = (pc: number): TableColumn[] => [
  { header: 'Result', width: 0.28 },
  { header: 'Nominal', width: 0.15, align: 'right' },
  { header: `Low (${(100 - pc) / 2} %)`, width: 0.15, align: 'right' },
  { header: 'Median', width: 0.15, align: 'right' },
  { header: `High (${100 - (100 - pc) / 2} %)`, width: 0.15, align: 'right' },
  { header: 'Unit', width: 0.12 },
];

function bandBody(w: PdfWriter, u: UncertaintySection): void {
  const pc = Math.round(u.coverage * 100);
  w.heading('Uncertainty band', 2, 60);
  w.text(
    `${u.caption}: ${u.inputs.map((i) => `${i.name} = ${i.nominal} ± ${i.standardUncertainty}${i.unit ? ' ' + i.unit : ''}`).join('; ')}.`,
    { size: 9, after: 4 },
  );
  w.table(
    BAND_COLUMNS(pc),
    u.rows.map((r) => [r.name, ...r.shown, r.unit]),
  );
  for (const warning of u.warnings) w.text(warning, { size: 9, indent: 12, bullet: '!', after: 2 });
  w.text('The band covers the stated input uncertainties only, not the error of the method itself.', {
    size: 8.5,
    color: MUTED,
    after: 4,
  });
}

export function sectionBody(w: PdfWriter, s: EstimateSection, images: ReadonlyMap<string, EmbeddedImage>): void {
  const where = [s.feature && `Feature: ${s.feature}`, s.condition && `Condition: ${s.condition}`]
    .filter(Boolean)
    .join(' · ');
  w.text(`Estimate ${s.id} · gprime calc ${s.method}: ${s.methodTitle}${where ? ' · ' + where : ''}`, {
    size: 9,
    color: MUTED,
    after: 6,
  });
  if (s.status === 'error')
    w.text(`Not computed: ${s.error ?? 'unknown error'}`, { size: 10, bold: true, color: WARN, after: 6 });
  if (s.inputs.length) {
    w.heading('Inputs', 2, 50);
    w.table(QUANTITY_COLUMNS('Parameter'), s.inputs.map(quantityRow));
  }
  if (s.methods.length) {
    w.heading('Method, equation and reference', 2, 50);
    for (const m of s.methods) {
      w.ensure(40);
      if (m.title) w.text(m.title, { size: 9.5, bold: true, after: 1 });
      if (m.equation) w.text(`Equation: ${m.equation}`, { size: 9, indent: 10, after: 1 });
      const short = shortCitation(m.source);
      w.text(`Reference [${m.reference}]${short ? ` ${short}` : ''}`, {
        size: 8.5,
        indent: 10,
        color: MUTED,
        after: 5,
      });
    }
  }
  if (s.status === 'incomplete')
    w.text(`Incomplete, results partial: ${s.error ?? ''}`, { size: 10, bold: true, color: WARN, after: 6 });
  if (s.status !== 'error') {
    w.heading('Results', 2, 50);
    const short = s.results.filter((r) => typeof r.value === 'number' || r.shown.length <= LONG_TEXT);
    const long = s.results.filter((r) => !short.includes(r));
    if (short.length) w.table(QUANTITY_COLUMNS('Result'), short.map(quantityRow));
    for (const r of long) w.text(`${r.name} (${r.description}): ${r.shown}`, { size: 9, after: 4 });
    if (s.uncertainty) bandBody(w, s.uncertainty);
    w.heading('Validity warnings', 2, 30);
    if (s.warnings.length === 0) w.text('None raised for this estimate.', { size: 9, after: 4 });
    for (const warning of s.warnings) w.text(warning, { size: 9, indent: 12, bullet: '!', after: 2 });
  }
  s.charts.forEach((c, k) => {
    const img = images.get(c.id);
    if (!img) return;
    // the heading stays with the first figure: its height at the drawn width, and its caption
    if (k === 0) w.heading('Charts', 2, (img.height / img.width) * Math.min(6.5 * 72, w.width) + 40);
    w.image(img, 6.5 * 72);
    w.text(`Figure ${s.number}.${k + 1}: ${c.caption}. Data: charts/${c.id}.csv`, {
      size: 8.5,
      color: MUTED,
      after: 10,
    });
  });
}

const COMPLIANCE_WIDTHS = [0.12, 0.12, 0.12, 0.14, 0.1, 0.1, 0.12, 0.08, 0.1];

export function complianceBody(w: PdfWriter, model: ReportModel): void {
  if (!model.compliance) return;
  w.table(
    model.complianceColumns.map((h, i) => ({
      header: h,
      width: COMPLIANCE_WIDTHS[i],
      align: i >= 4 && i <= 7 ? 'right' : 'left',
    })),
    model.compliance.rows,
    8,
  );
  w.text(`Verdict rule: ${model.verdictRule}`, { size: 8.5, after: 6 });
  w.heading('Derivation of each verdict', 2, 80);
  model.complianceDerivations.forEach((d, i) => {
    w.ensure(70);
    w.text(`${i + 1}. ${d.heading}`, { size: 9, bold: true, after: 2 });
    for (const line of d.lines) w.text(line, { size: 8.5, indent: 12, after: 1.5 });
    if (d.warnings.length === 0) w.text('The runs behind this row raised no warnings.', { size: 8.5, indent: 12 });
    else {
      w.text('Warnings of the runs behind this row:', { size: 8.5, indent: 12, after: 1 });
      for (const warning of d.warnings) w.text(warning, { size: 8.5, indent: 24, bullet: '!', after: 1.5 });
    }
    w.space(5);
  });
}

export function verificationBody(w: PdfWriter, model: ReportModel): void {
  w.text(
    'Each method below is tested against the external references listed, with the number of cases and the accepted difference; the tests run with every build of gprime. Validations compare with published values within their stated scatter; known departures state by how much the method differs from published data, and the tests hold it to that difference; consistency checks compare the coded formula with its own closed form or the published coefficients it uses.',
    { size: 9, after: 6 },
  );
  for (const v of model.verification) {
    w.ensure(60);
    w.text(`${v.method}${v.reference ? ` [${v.reference}]` : ''}`, { size: 9.5, bold: true, after: 2 });
    if (!v.groups.length) w.text('No external check recorded.', { size: 8.5, indent: 12, after: 2 });
    for (const g of v.groups) {
      w.ensure(36);
      w.text(g.title, { size: 8.5, bold: true, indent: 6, after: 1.5 });
      for (const c of g.checks) w.text(c, { size: 8.5, indent: 18, bullet: '•', after: 2 });
    }
    if (v.provenance)
      w.text(`How the coefficients were obtained: ${v.provenance}`, { size: 8.5, indent: 12, color: MUTED, after: 2 });
    w.space(4);
  }
}

export function referencesBody(w: PdfWriter, model: ReportModel): void {
  model.references.forEach((r, i) => w.text(r, { size: 8.5, indent: 26, bullet: `[${i + 1}]`, after: 3 }));
}
