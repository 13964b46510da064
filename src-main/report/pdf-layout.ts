import { deflateSync } from 'node:zlib';
import {
  concatTransformationMatrix,
  drawObject,
  PDFDocument,
  popGraphicsState,
  pushGraphicsState,
  rgb,
  type PDFFont,
  type PDFPage,
  type PDFRef,
  type RGB,
} from 'pdf-lib';

/**
 * A small flowing-layout writer on pdf-lib: wrapped paragraphs, headings, tables whose cells wrap and
 * whose header repeats after a page break, images, and reserved lines filled in later (contents).
 */

export interface Fonts {
  regular: PDFFont;
  bold: PDFFont;
}

export interface TableColumn {
  header: string;
  /** share of the text width */
  width: number;
  align?: 'left' | 'right';
}

export interface TextStyle {
  size?: number;
  bold?: boolean;
  color?: RGB;
  indent?: number;
  /** space after the paragraph [pt] */
  after?: number;
  /** first-line prefix drawn in the indent (bullets) */
  bullet?: string;
}

export interface Reserved {
  page: PDFPage;
  y: number;
}

/** An image XObject already registered in the document. */
export interface EmbeddedImage {
  ref: PDFRef;
  width: number;
  height: number;
}

/**
 * Embeds raw 8-bit RGB pixels as a Flate-compressed image. (pdf-lib's own PNG path decodes and
 * re-compresses in JavaScript, several times slower for 300-dpi charts.)
 */
export function embedRgb(doc: PDFDocument, pixels: { width: number; height: number; rgb: Buffer }): EmbeddedImage {
  const raw = doc.context.stream(deflateSync(pixels.rgb, { level: 6 }), {
    Type: 'XObject',
    Subtype: 'Image',
    Width: pixels.width,
    Height: pixels.height,
    ColorSpace: 'DeviceRGB',
    BitsPerComponent: 8,
    Filter: 'FlateDecode',
  });
  return { ref: doc.context.register(raw), width: pixels.width, height: pixels.height };
}

export const INK = rgb(0.13, 0.13, 0.13);
export const MUTED = rgb(0.35, 0.35, 0.35);
export const ACCENT = rgb(0.12, 0.3, 0.6);
const RULE = rgb(0.75, 0.75, 0.75);
const HEADER_FILL = rgb(0.9, 0.92, 0.95);

/** Widths at size 1 per font and text: fontkit shapes the text on every measurement, and wrapping repeats words. */
const widthCache = new WeakMap<PDFFont, Map<string, number>>();

/** Width of text set in font at size [pt], cached (widths scale with the size). */
export function textWidth(font: PDFFont, text: string, size: number): number {
  let cache = widthCache.get(font);
  if (!cache) widthCache.set(font, (cache = new Map()));
  let width = cache.get(text);
  if (width === undefined) cache.set(text, (width = font.widthOfTextAtSize(text, 1)));
  return width * size;
}

const NUMBER = /^[([]?[−+±~≈<>≤≥-]?[\d.,]*\d(?:×10[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)?$/;
const UNIT_LIKE = /^(?:[a-zA-Zµ°%‰][^\s]{0,7}|×|±|–|−)$/;

/**
 * The words of a paragraph, with a number and the short word after it (its unit: "15 ft", "1.2 %") kept as one
 * unit, so that no value is broken across lines.
 */
function unbreakableWords(paragraph: string): string[] {
  const words = paragraph.split(/ +/).filter(Boolean);
  const out: string[] = [];
  for (let i = 0; i < words.length; i++) {
    const next = words[i + 1];
    if (next !== undefined && NUMBER.test(words[i]) && UNIT_LIKE.test(next)) {
      out.push(`${words[i]} ${next}`);
      i++;
    } else out.push(words[i]);
  }
  return out;
}

/**
 * Splits text into lines no wider than `width`; a value stays with its unit; words longer than a line are broken
 * between characters. A line's width is the sum of its words and spaces (no kerning across a space).
 */
export function wrapText(text: string, font: PDFFont, size: number, width: number): string[] {
  const out: string[] = [];
  const space = textWidth(font, ' ', size);
  for (const paragraph of text.split('\n')) {
    let line = '',
      lineWidth = 0;
    const push = (word: string) => {
      const wordWidth = textWidth(font, word, size);
      if (line && lineWidth + space + wordWidth <= width) {
        line += ` ${word}`;
        lineWidth += space + wordWidth;
        return;
      }
      if (line) out.push(line);
      [line, lineWidth] = [word, wordWidth];
      if (wordWidth <= width) return;
      let piece = '',
        pieceWidth = 0;
      for (const ch of word) {
        const w = textWidth(font, ch, size);
        if (pieceWidth + w > width && piece) {
          out.push(piece);
          [piece, pieceWidth] = ['', 0];
        }
        piece += ch;
        pieceWidth += w;
      }
      [line, lineWidth] = [piece, pieceWidth];
    };
    for (const word of unbreakableWords(paragraph)) push(word);
    out.push(line);
  }
  return out;
}

export class PdfWriter {
  readonly pages: PDFPage[] = [];
  page!: PDFPage;
  y = 0;
  readonly left: number;
  readonly width: number;
  private readonly top: number;
  private readonly bottom: number;

  constructor(
    readonly doc: PDFDocument,
    readonly fonts: Fonts,
    readonly pageSize: [number, number],
    margin = 54,
  ) {
    this.left = margin;
    this.width = pageSize[0] - 2 * margin;
    this.top = pageSize[1] - margin;
    this.bottom = margin + 18;
    this.newPage();
  }

  newPage(): void {
    this.page = this.doc.addPage(this.pageSize);
    this.pages.push(this.page);
    this.y = this.top;
  }

  /** Starts a new page unless `height` points still fit. */
  ensure(height: number): void {
    if (this.y - height < this.bottom) this.newPage();
  }

  space(points: number): void {
    this.y -= points;
  }

  text(text: string, style: TextStyle = {}): void {
    const size = style.size ?? 10;
    const font = style.bold ? this.fonts.bold : this.fonts.regular;
    const indent = style.indent ?? 0;
    const lead = size * 1.3;
    const lines = wrapText(text, font, size, this.width - indent);
    lines.forEach((line, i) => {
      this.ensure(lead);
      this.y -= lead;
      if (i === 0 && style.bullet) {
        const bx = Math.max(this.left, this.left + indent - textWidth(font, style.bullet, size) - 4);
        this.page.drawText(style.bullet, { x: bx, y: this.y + size * 0.25, size, font, color: style.color ?? INK });
      }
      this.page.drawText(line, {
        x: this.left + indent,
        y: this.y + size * 0.25,
        size,
        font,
        color: style.color ?? INK,
      });
    });
    this.y -= style.after ?? 3;
  }

  /** A heading kept together with at least `keep` points of what follows. */
  heading(text: string, level: 1 | 2, keep = 90): void {
    const size = level === 1 ? 14 : 11;
    this.ensure(size * 1.6 + keep);
    this.space(level === 1 ? 10 : 6);
    this.text(text, { size, bold: true, color: level === 1 ? ACCENT : INK, after: level === 1 ? 4 : 2 });
    if (level === 1) {
      this.page.drawLine({
        start: { x: this.left, y: this.y + 1 },
        end: { x: this.left + this.width, y: this.y + 1 },
        thickness: 0.8,
        color: ACCENT,
      });
      this.space(4);
    }
  }

  /** Reserves `lines` lines for text written later (table of contents); the returned y is of the first line. */
  reserveLine(size: number, lines = 1): Reserved {
    this.ensure(size * 1.5 * lines);
    this.y -= size * 1.5;
    const at = { page: this.page, y: this.y };
    this.y -= size * 1.3 * (lines - 1);
    return at;
  }

  table(columns: readonly TableColumn[], rows: readonly string[][], size = 8.5): void {
    const pad = 3;
    const lead = size * 1.25;
    const widths = columns.map((c) => c.width * this.width);
    const layoutRow = (cells: readonly string[], font: PDFFont) =>
      cells.map((c, i) => wrapText(c, font, size, widths[i] - 2 * pad));
    const rowHeight = (wrapped: string[][]) => Math.max(...wrapped.map((l) => l.length)) * lead + 2 * pad;
    const drawRow = (wrapped: string[][], font: PDFFont, fill?: RGB) => {
      const h = rowHeight(wrapped);
      if (fill) this.page.drawRectangle({ x: this.left, y: this.y - h, width: this.width, height: h, color: fill });
      let x = this.left;
      wrapped.forEach((lines, i) => {
        lines.forEach((line, k) => {
          const w = textWidth(font, line, size);
          const tx = columns[i].align === 'right' ? x + widths[i] - pad - w : x + pad;
          this.page.drawText(line, { x: tx, y: this.y - pad - (k + 1) * lead + size * 0.3, size, font, color: INK });
        });
        x += widths[i];
      });
      this.y -= h;
      this.page.drawLine({
        start: { x: this.left, y: this.y },
        end: { x: this.left + this.width, y: this.y },
        thickness: 0.4,
        color: RULE,
      });
    };
    const header = layoutRow(
      columns.map((c) => c.header),
      this.fonts.bold,
    );
    const drawHeader = () => drawRow(header, this.fonts.bold, HEADER_FILL);
    this.ensure(rowHeight(header) + (rows[0] ? rowHeight(layoutRow(rows[0], this.fonts.regular)) : 0));
    drawHeader();
    for (const row of rows) {
      const wrapped = layoutRow(row, this.fonts.regular);
      const h = rowHeight(wrapped);
      if (this.y - h < this.bottom) {
        this.newPage();
        drawHeader();
      }
      drawRow(wrapped, this.fonts.regular);
    }
    this.space(6);
  }

  /** Draws an image `width` points wide (height from its aspect ratio), centred. */
  image(img: EmbeddedImage, width: number): void {
    const w = Math.min(width, this.width);
    const h = (img.height / img.width) * w;
    this.ensure(h + 30);
    this.y -= h;
    const name = this.page.node.newXObject('Image', img.ref);
    this.page.pushOperators(
      pushGraphicsState(),
      concatTransformationMatrix(w, 0, 0, h, this.left + (this.width - w) / 2, this.y),
      drawObject(name),
      popGraphicsState(),
    );
  }

  /** A shaded box holding wrapped text (cautions). */
  box(text: string, size = 9.5): void {
    const pad = 8;
    const lines = wrapText(text, this.fonts.bold, size, this.width - 2 * pad);
    const h = lines.length * size * 1.35 + 2 * pad;
    this.ensure(h + 4);
    this.page.drawRectangle({
      x: this.left,
      y: this.y - h,
      width: this.width,
      height: h,
      color: rgb(1, 0.96, 0.86),
      borderColor: rgb(0.75, 0.55, 0.1),
      borderWidth: 1,
    });
    lines.forEach((line, i) =>
      this.page.drawText(line, {
        x: this.left + pad,
        y: this.y - pad - (i + 1) * size * 1.35 + size * 0.35,
        size,
        font: this.fonts.bold,
        color: INK,
      }),
    );
    this.y -= h + 8;
  }
}
