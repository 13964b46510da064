import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, PDFName, type PDFPage } from 'pdf-lib';
import type { ReportModel } from '../../shared-core/report/model';
import { fontBytes } from './assets';
import { documentControlBlock, drawFooters, writeOutline, type Bookmark } from './pdf-control';
import {
  embedRgb,
  MUTED,
  PdfWriter,
  textWidth,
  type EmbeddedImage,
  type Reserved,
  type TableColumn,
  wrapText,
} from './pdf-layout';
import { complianceBody, referencesBody, sectionBody, verificationBody } from './pdf-sections';

/**
 * The calc sheet as PDF: title block, document control, compliance at a glance, contents, summary, one section
 * per estimate (inputs, method equations and references, results, validity warnings, charts), compliance with
 * derivations, inputs, verification, references and cautions; bookmarks per section and a footer with the site
 * file's hash on every page. Deterministic: the document dates come from the project date, not the clock.
 */

const A4: [number, number] = [595.28, 841.89];
const LETTER: [number, number] = [612, 792];

/** The title block; its value column holds a 64-digit SHA-256 on one line on A4 and Letter. */
export const TITLE_COLUMNS: TableColumn[] = [
  { header: 'Title block', width: 0.21 },
  { header: '', width: 0.79 },
];

function documentDate(text: string): Date {
  const t = Date.parse(text);
  return Number.isFinite(t) ? new Date(t) : new Date(Date.UTC(2000, 0, 1));
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
  const marks: Bookmark[] = [];
  const mark = (title: string) => marks.push({ title, page: w.page, y: w.y + 24 });
  w.text(model.title, { size: 18, bold: true, after: 2 });
  w.text(model.subtitle, { size: 12, color: MUTED, after: 10 });
  mark('Title block and document control');
  w.table(
    TITLE_COLUMNS,
    model.titleBlock.map((r) => [r.label, r.value]),
    9,
  );
  documentControlBlock(w, model);
  w.box(model.cautions[0]);
  if (model.verdicts.length) {
    w.heading('Mixing-zone compliance at a glance', 2, 60);
    mark('Mixing-zone compliance at a glance');
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
  mark('Contents');
  const TOC_SIZE = 10;
  const tocLines = (e: ReportModel['contents'][number]) =>
    wrapText(`${e.number}  ${e.title}`, fonts.regular, TOC_SIZE, w.width - 40);
  const toc: { entry: ReportModel['contents'][number]; at: Reserved; lines: string[] }[] = model.contents.map(
    (entry) => {
      const lines = tocLines(entry);
      return { entry, lines, at: w.reserveLine(TOC_SIZE, lines.length) };
    },
  );
  const pageOf = new Map<string, number>();
  const startSection = (anchor: string, title: string) => {
    w.heading(title, 1);
    pageOf.set(anchor, w.pages.indexOf(w.page));
    mark(title.replace(/\s{2,}/g, ' '));
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
    complianceBody(w, model);
  }
  if (model.inputs.length) {
    startSection('inputs', `${entry('inputs').number}  Site inputs as entered`);
    w.text(
      'Every quantity of the site file as typed, its SI value and its value in the units of this edition. Derived inputs of each estimate (g′, N, effluent density, converted flows) are listed with their origin in the estimate’s own inputs table.',
      { size: 9, after: 6 },
    );
    w.table(
      [
        { header: 'Belongs to', width: 0.24 },
        { header: 'Field', width: 0.22 },
        { header: 'As entered', width: 0.26 },
        { header: 'SI', width: 0.14, align: 'right' },
        { header: 'This edition', width: 0.14, align: 'right' },
      ],
      model.inputs.map((i) => [i.owner, i.field, i.typed, i.si, i.shown]),
      8,
    );
  }
  startSection('verification', `${entry('verification').number}  Verification of the methods`);
  verificationBody(w, model);
  startSection('references', `${entry('references').number}  References`);
  referencesBody(w, model);
  startSection('cautions', `${entry('cautions').number}  Cautions`);
  model.cautions.forEach((c) => w.text(c, { size: 9.5, indent: 12, bullet: '•', after: 4 }));

  // contents with page numbers (titles wrapped, never cut), then the footer of every page and the bookmarks
  for (const { entry: e, at, lines } of toc) {
    const page = (pageOf.get(e.anchor) ?? 0) + 1;
    const num = String(page);
    const font = fonts.regular;
    const numWidth = textWidth(font, num, TOC_SIZE);
    lines.forEach((line, k) => {
      const y = at.y + 3 - k * TOC_SIZE * 1.3;
      at.page.drawText(k === 0 ? line : `     ${line}`, { x: w.left, y, size: TOC_SIZE, font });
      if (k < lines.length - 1) return;
      const dotsFrom = w.left + textWidth(font, k === 0 ? line : `     ${line}`, TOC_SIZE) + 6;
      const dotsTo = w.left + w.width - numWidth - 6;
      const dots = '.'.repeat(Math.max(0, Math.floor((dotsTo - dotsFrom) / textWidth(font, '.', TOC_SIZE))));
      at.page.drawText(dots, { x: dotsFrom, y, size: TOC_SIZE, font, color: MUTED });
      at.page.drawText(num, { x: w.left + w.width - numWidth, y, size: TOC_SIZE, font });
    });
    const bottom = at.y - (lines.length - 1) * TOC_SIZE * 1.3;
    linkTo(doc, at.page, w.pages[page - 1], [w.left, bottom, w.left + w.width, at.y + TOC_SIZE + 3]);
  }
  drawFooters(w, model);
  writeOutline(doc, marks);
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
