import { PDFHexString, PDFName, PDFNull, rgb, type PDFDocument, type PDFPage, type PDFRef } from 'pdf-lib';
import type { ReportModel } from '../../shared-core/report/model';
import { INK, MUTED, PdfWriter, textWidth, type TableColumn } from './pdf-layout';

/**
 * Document control of the calc sheet as PDF: the revision table and the prepared / checked / approved boxes,
 * the footer of every page (document number, revision, page, the site file's full SHA-256) and the bookmarks.
 */

export const REVISION_COLUMNS: TableColumn[] = [
  { header: 'Rev.', width: 0.08 },
  { header: 'Date', width: 0.14 },
  { header: 'Description', width: 0.3 },
  { header: 'Prepared', width: 0.16 },
  { header: 'Checked', width: 0.16 },
  { header: 'Approved', width: 0.16 },
];

/** Revision table and three signature boxes (name, signature, date). */
export function documentControlBlock(w: PdfWriter, model: ReportModel): void {
  const c = model.documentControl;
  w.heading('Document control', 2, 150);
  w.text(`Document ${c.number}, revision ${c.revision}. Status: ${c.status}.`, { size: 9, after: 4 });
  w.table(
    REVISION_COLUMNS,
    c.revisions.map((r) => [r.revision, r.date, r.description, r.prepared, r.checked, r.approved]),
    8.5,
  );
  const boxH = 58;
  w.ensure(boxH + 8);
  const gap = 8;
  const bw = (w.width - 2 * gap) / 3;
  const top = w.y;
  c.signatures.forEach((s, i) => {
    const x = w.left + i * (bw + gap);
    w.page.drawRectangle({
      x,
      y: top - boxH,
      width: bw,
      height: boxH,
      borderColor: MUTED,
      borderWidth: 0.6,
      color: rgb(1, 1, 1),
    });
    const line = (text: string, dy: number, bold = false, color = INK) =>
      w.page.drawText(text, { x: x + 5, y: top - dy, size: 8, font: bold ? w.fonts.bold : w.fonts.regular, color });
    line(s.role, 11, true);
    line(`Name: ${s.name || '________________'}`, 24);
    line('Signature: ______________', 38, false, MUTED);
    line(`Date: ${s.date || '__________'}`, 52, false, s.date ? INK : MUTED);
  });
  w.space(boxH + 8);
}

/** The footer of every page: document number and revision, page n of N, gprime version, the full site hash. */
export function drawFooters(w: PdfWriter, model: ReportModel): void {
  const font = w.fonts.regular;
  const c = model.documentControl;
  const n = w.pages.length;
  const left = `${c.number} · rev ${c.revision}${c.issueDate ? ` · issued ${c.issueDate}` : ' · draft'}`;
  const right = `gprime ${model.gprimeVersion}`;
  const hash = `Site file SHA-256 ${model.siteHash}`;
  w.pages.forEach((page, i) => {
    const size = 7.5;
    const y = 34;
    const center = `Page ${i + 1} of ${n}`;
    page.drawLine({
      start: { x: w.left, y: y + 11 },
      end: { x: w.left + w.width, y: y + 11 },
      thickness: 0.4,
      color: MUTED,
    });
    page.drawText(left, { x: w.left, y, size, font, color: MUTED });
    page.drawText(center, { x: w.left + (w.width - textWidth(font, center, size)) / 2, y, size, font, color: MUTED });
    page.drawText(right, { x: w.left + w.width - textWidth(font, right, size), y, size, font, color: MUTED });
    page.drawText(hash, { x: w.left, y: y - 10, size: 6.5, font, color: MUTED });
  });
}

export interface Bookmark {
  title: string;
  page: PDFPage;
  /** top of the section on its page [pt] */
  y: number;
}

/** Writes the document outline (bookmarks), one entry per section, and opens the file with it shown. */
export function writeOutline(doc: PDFDocument, marks: readonly Bookmark[]): void {
  if (marks.length === 0) return;
  const ctx = doc.context;
  const root = ctx.nextRef();
  const refs: PDFRef[] = marks.map(() => ctx.nextRef());
  marks.forEach((m, i) => {
    const dict = ctx.obj({});
    dict.set(PDFName.of('Title'), PDFHexString.fromText(m.title));
    dict.set(PDFName.of('Parent'), root);
    dict.set(PDFName.of('Dest'), ctx.obj([m.page.ref, PDFName.of('XYZ'), PDFNull, m.y, PDFNull]));
    if (i > 0) dict.set(PDFName.of('Prev'), refs[i - 1]);
    if (i < refs.length - 1) dict.set(PDFName.of('Next'), refs[i + 1]);
    ctx.assign(refs[i], dict);
  });
  const outlines = ctx.obj({});
  outlines.set(PDFName.of('Type'), PDFName.of('Outlines'));
  outlines.set(PDFName.of('First'), refs[0]);
  outlines.set(PDFName.of('Last'), refs[refs.length - 1]);
  outlines.set(PDFName.of('Count'), ctx.obj(refs.length));
  ctx.assign(root, outlines);
  doc.catalog.set(PDFName.of('Outlines'), root);
  doc.catalog.set(PDFName.of('PageMode'), PDFName.of('UseOutlines'));
}
