import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, PDFName, rgb, type PDFPage } from 'pdf-lib';
import type { EstimateSection, QuantityRow, ReportModel, UncertaintySection } from '../../shared-core/report/model';
import { fontBytes } from './assets';
import {
  embedRgb,
  MUTED,
  PdfWriter,
  textWidth,
  type EmbeddedImage,
  type Reserved,
  type TableColumn,
} from './pdf-layout';

/**
 * The calc sheet as PDF: title block, contents, summary, one section per estimate (inputs, method
 * equations and sources, results, validity warnings, charts), compliance, references and cautions, with
 * page numbers. Deterministic: the document dates come from the project date, not the clock.
 */

const A4: [number, number] = [595.28, 841.89];
const LETTER: [number, number] = [612, 792];
/** Text results longer than this are set as paragraphs under the results table. */
const LONG_TEXT = 48;

const QUANTITY_COLUMNS = (first: string): TableColumn[] => [
  { header: first, width: 0.25 },
  { header: 'Description', width: 0.42 },
  { header: 'Value', width: 0.21, align: 'right' },
  { header: 'Unit', width: 0.12 },
];

/** The title block; its value column holds a 64-digit SHA-256 on one line on A4 and Letter. */
export const TITLE_COLUMNS: TableColumn[] = [
  { header: 'Title block', width: 0.21 },
  { header: '', width: 0.79 },
];

const quantityRow = (q: QuantityRow) => [q.name, q.description, q.shown, q.shownUnit];

function documentDate(text: string): Date {
  const t = Date.parse(text);
  return Number.isFinite(t) ? new Date(t) : new Date(Date.UTC(2000, 0, 1));
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
  w.heading('Uncertainty band', 2, 40);
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

function sectionBody(w: PdfWriter, s: EstimateSection, images: ReadonlyMap<string, EmbeddedImage>): void {
  const where = [s.feature && `Feature: ${s.feature}`, s.condition && `Condition: ${s.condition}`]
    .filter(Boolean)
    .join(' · ');
  w.text(`Estimate ${s.id} · gprime calc ${s.method}: ${s.methodTitle}${where ? ' · ' + where : ''}`, {
    size: 9,
    color: MUTED,
    after: 6,
  });
  if (s.status === 'error') {
    w.text(`Not computed: ${s.error ?? 'unknown error'}`, {
      size: 10,
      bold: true,
      color: rgb(0.6, 0.1, 0.1),
      after: 6,
    });
  }
  if (s.inputs.length) {
    w.heading('Inputs', 2, 40);
    w.table(QUANTITY_COLUMNS('Parameter'), s.inputs.map(quantityRow));
  }
  if (s.methods.length) {
    w.heading('Method, equation and published source', 2, 40);
    for (const m of s.methods) {
      if (m.title) w.text(m.title, { size: 9.5, bold: true, after: 1 });
      if (m.equation) w.text(`Equation: ${m.equation}`, { size: 9, indent: 10, after: 1 });
      w.text(`Source: ${m.source}`, { size: 8.5, indent: 10, color: MUTED, after: 5 });
    }
  }
  if (s.status === 'incomplete') {
    w.text(`Incomplete, results partial: ${s.error ?? ''}`, {
      size: 10,
      bold: true,
      color: rgb(0.6, 0.1, 0.1),
      after: 6,
    });
  }
  if (s.status !== 'error') {
    w.heading('Results', 2, 40);
    const short = s.results.filter((r) => typeof r.value === 'number' || r.shown.length <= LONG_TEXT);
    const long = s.results.filter((r) => !short.includes(r));
    if (short.length) w.table(QUANTITY_COLUMNS('Result'), short.map(quantityRow));
    for (const r of long) w.text(`${r.name} (${r.description}): ${r.shown}`, { size: 9, after: 4 });
    if (s.uncertainty) bandBody(w, s.uncertainty);
    w.heading('Validity warnings', 2, 24);
    if (s.warnings.length === 0) w.text('None raised for this estimate.', { size: 9, after: 4 });
    for (const warning of s.warnings) w.text(warning, { size: 9, indent: 12, bullet: '!', after: 2 });
  }
  s.charts.forEach((c, k) => {
    const img = images.get(c.id);
    if (!img) return;
    if (k === 0) w.heading('Charts', 2, 260);
    w.image(img, 6.5 * 72);
    w.text(`Figure ${s.number}.${k + 1}: ${c.caption}. Data: charts/${c.id}.csv`, {
      size: 8.5,
      color: MUTED,
      after: 10,
    });
  });
}

/** Raw RGB pixels of a chart drawn without caption (the PDF sets the caption as text). */
export interface ChartPixels {
  width: number;
  height: number;
  rgb: Buffer;
}

/** Builds the calc sheet; `charts` maps chart ids to their pixels. */
export async function buildPdf(
  model: ReportModel,
  charts: ReadonlyMap<string, ChartPixels>,
  projectDate: string,
): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.registerFontkit(fontkit);
  const fonts = {
    regular: await doc.embedFont(fontBytes('DejaVuSans.ttf'), { subset: true }),
    bold: await doc.embedFont(fontBytes('DejaVuSans-Bold.ttf'), { subset: true }),
  };
  const date = documentDate(projectDate);
  doc.setTitle(`${model.title} — calculation sheet`);
  doc.setSubject(model.subtitle);
  doc.setAuthor(model.titleBlock.find((r) => r.label === 'Prepared by')?.value ?? '');
  doc.setCreator(`gprime ${model.gprimeVersion}`);
  doc.setProducer(`gprime ${model.gprimeVersion} (pdf-lib)`);
  doc.setCreationDate(date);
  doc.setModificationDate(date);
  doc.setKeywords([`site-sha256:${model.siteHash}`]);

  const images = new Map<string, EmbeddedImage>();
  for (const [id, pixels] of charts) images.set(id, embedRgb(doc, pixels));

  const w = new PdfWriter(doc, fonts, model.units === 'us' ? LETTER : A4);
  w.text(model.title, { size: 18, bold: true, after: 2 });
  w.text(model.subtitle, { size: 12, color: MUTED, after: 10 });
  w.table(
    TITLE_COLUMNS,
    model.titleBlock.map((r) => [r.label, r.value]),
    9,
  );
  w.box(model.cautions[0]);
  if (model.verdicts.length) {
    w.heading('Mixing-zone compliance at a glance', 2, 60);
    w.table(
      [
        { header: 'Outfall', width: 0.15 },
        { header: 'Limit', width: 0.23 },
        { header: 'Tightest condition', width: 0.17 },
        { header: 'Required', width: 0.115, align: 'right' },
        { header: 'Achieved', width: 0.115, align: 'right' },
        { header: 'Margin', width: 0.09, align: 'right' },
        { header: 'Verdict', width: 0.13 },
      ],
      model.verdicts.map((v) => [v.outfall, v.limit, v.condition, v.required, v.achieved, v.margin, v.verdict]),
      8.5,
    );
    w.text(`Verdict rule: ${model.verdictRule} The derivation of every row is in the compliance section.`, {
      size: 8,
      color: MUTED,
      after: 6,
    });
  }
  w.heading('Contents', 2, 40);
  const toc: { entry: ReportModel['contents'][number]; at: Reserved }[] = model.contents.map((entry) => ({
    entry,
    at: w.reserveLine(10),
  }));
  const pageOf = new Map<string, number>();
  const startSection = (anchor: string, title: string) => {
    w.heading(title, 1);
    pageOf.set(anchor, w.pages.indexOf(w.page));
  };
  const entry = (anchor: string) => model.contents.find((c) => c.anchor === anchor)!;

  startSection('summary', `1  ${entry('summary').title}`);
  w.table(
    [
      { header: '§', width: 0.06 },
      { header: 'Estimate', width: 0.36 },
      { header: 'Key result', width: 0.46 },
      { header: 'Warnings', width: 0.12, align: 'right' },
    ],
    model.summary.map((r, i) => [
      String(i + 2),
      `${r.title} (${r.id})${r.where ? `\n${r.where}` : ''}`,
      r.keyResult,
      String(r.warnings),
    ]),
  );
  for (const s of model.estimates) {
    startSection(s.id, `${s.number}  ${s.title}`);
    sectionBody(w, s, images);
  }
  if (model.compliance) {
    startSection('compliance', `${entry('compliance').number}  Mixing-zone compliance`);
    const widths = [0.12, 0.115, 0.135, 0.065, 0.1, 0.1, 0.08, 0.08, 0.185];
    w.table(
      model.compliance.header.map((h, i) => ({
        header: h,
        width: widths[i],
        align: i >= 4 && i <= 6 ? 'right' : 'left',
      })),
      model.compliance.rows,
      8,
    );
    w.text(`Verdict rule: ${model.verdictRule}`, { size: 8.5, after: 6 });
    w.heading('Derivation of each verdict', 2, 40);
    for (const d of model.complianceDerivations) w.text(d, { size: 8.5, indent: 12, bullet: '•', after: 4 });
  }
  if (model.inputs.length) {
    startSection('inputs', `${entry('inputs').number}  Site inputs as entered`);
    w.text('Every quantity of the site file as typed, its SI value and its value in the display units.', {
      size: 9,
      after: 6,
    });
    w.table(
      [
        { header: 'Belongs to', width: 0.24 },
        { header: 'Field', width: 0.22 },
        { header: 'As entered', width: 0.26 },
        { header: 'SI', width: 0.14, align: 'right' },
        { header: 'Shown', width: 0.14, align: 'right' },
      ],
      model.inputs.map((i) => [i.owner, i.field, i.typed, i.si, i.shown]),
      8,
    );
  }
  startSection('verification', `${entry('verification').number}  Verification of the methods`);
  w.text(
    'Each method below is tested against the external references listed, with the number of cases and the accepted difference; the tests run with every build of gprime.',
    { size: 9, after: 6 },
  );
  for (const v of model.verification) {
    w.text(v.method, { size: 9.5, bold: true, after: 2 });
    if (!v.checks.length) w.text('No external check recorded.', { size: 8.5, indent: 12, after: 2 });
    for (const c of v.checks) w.text(c, { size: 8.5, indent: 12, bullet: '•', after: 2 });
    if (v.provenance) w.text(`Note: ${v.provenance}`, { size: 8.5, indent: 12, color: MUTED, after: 2 });
    w.text('', { size: 4, after: 3 });
  }
  startSection('references', `${entry('references').number}  References`);
  model.references.forEach((r, i) => w.text(r, { size: 8.5, indent: 26, bullet: `[${i + 1}]`, after: 3 }));
  startSection('cautions', `${entry('cautions').number}  Cautions`);
  model.cautions.forEach((c) => w.text(c, { size: 9.5, indent: 12, bullet: '•', after: 4 }));

  // contents with page numbers, then the footer of every page
  for (const { entry: e, at } of toc) {
    const page = (pageOf.get(e.anchor) ?? 0) + 1;
    const label = `${e.number}  ${e.title}`;
    const num = String(page);
    const size = 10;
    const numWidth = textWidth(fonts.regular, num, size);
    let shown = label;
    while (textWidth(fonts.regular, shown, size) > w.width - numWidth - 30 && shown.length > 4)
      shown = shown.slice(0, -2);
    if (shown !== label) shown = shown.trimEnd() + '…';
    at.page.drawText(shown, { x: w.left, y: at.y + 3, size, font: fonts.regular });
    const dotsFrom = w.left + textWidth(fonts.regular, shown, size) + 6;
    const dotsTo = w.left + w.width - numWidth - 6;
    const dots = '.'.repeat(Math.max(0, Math.floor((dotsTo - dotsFrom) / textWidth(fonts.regular, '.', size))));
    at.page.drawText(dots, { x: dotsFrom, y: at.y + 3, size, font: fonts.regular, color: MUTED });
    at.page.drawText(num, { x: w.left + w.width - numWidth, y: at.y + 3, size, font: fonts.regular });
    linkTo(doc, at.page, w.pages[page - 1], [w.left, at.y, w.left + w.width, at.y + size + 3]);
  }
  const n = w.pages.length;
  const left = `${model.titleBlock[1].value} · rev ${model.titleBlock.find((r) => r.label === 'Revision')?.value ?? ''}`;
  const right = `gprime ${model.gprimeVersion} · site file ${model.siteHash.slice(0, 12)}…`;
  w.pages.forEach((page, i) => {
    const size = 7.5;
    const y = 30;
    const center = `Page ${i + 1} of ${n}`;
    page.drawLine({
      start: { x: w.left, y: y + 11 },
      end: { x: w.left + w.width, y: y + 11 },
      thickness: 0.4,
      color: MUTED,
    });
    page.drawText(left, { x: w.left, y, size, font: fonts.regular, color: MUTED });
    page.drawText(center, {
      x: w.left + (w.width - textWidth(fonts.regular, center, size)) / 2,
      y,
      size,
      font: fonts.regular,
      color: MUTED,
    });
    page.drawText(right, {
      x: w.left + w.width - textWidth(fonts.regular, right, size),
      y,
      size,
      font: fonts.regular,
      color: MUTED,
    });
  });
  return doc.save();
}

/** A clickable contents line that jumps to the page of its section. */
function linkTo(doc: PDFDocument, from: PDFPage, to: PDFPage, rect: number[]): void {
  const annot = doc.context.obj({
    Type: 'Annot',
    Subtype: 'Link',
    Rect: rect,
    Border: [0, 0, 0],
    Dest: [to.ref, 'Fit'],
  });
  const ref = doc.context.register(annot);
  const existing = from.node.Annots();
  if (existing) existing.push(ref);
  else from.node.set(PDFName.of('Annots'), doc.context.obj([ref]));
}
