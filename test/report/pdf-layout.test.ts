import fontkit from '@pdf-lib/fontkit';
import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { fontBytes } from '../../src-main/report/assets';
import { wrapText } from '../../src-main/report/pdf-layout';
import { TITLE_COLUMNS } from '../../src-main/report/pdf-report';

describe('title block', () => {
  it('holds any SHA-256 (64 of the widest hex digit) on one line and its labels unbroken, on A4 and Letter', async () => {
    const doc = await PDFDocument.create();
    doc.registerFontkit(fontkit);
    const font = await doc.embedFont(fontBytes('DejaVuSans.ttf'), { subset: true });
    const widest = [...'0123456789abcdef'].reduce((a, c) =>
      font.widthOfTextAtSize(c, 9) > font.widthOfTextAtSize(a, 9) ? c : a,
    );
    for (const pageWidth of [595.28, 612]) {
      const content = pageWidth - 2 * 54;
      const cell = (i: number) => TITLE_COLUMNS[i].width * content - 6;
      expect(wrapText(widest.repeat(64), font, 9, cell(1))).toHaveLength(1);
      for (const label of ['Site file SHA-256', 'gprime version', 'Display units', 'Prepared by']) {
        expect(wrapText(label, font, 9, cell(0)), label).toHaveLength(1);
      }
    }
  });
});

describe('wrapping keeps each value with its unit', () => {
  it('never ends a line between a number and its unit, at any width (NIST SP 811 §7.2: a space, not a break)', async () => {
    const doc = await PDFDocument.create();
    doc.registerFontkit(fontkit);
    const font = await doc.embedFont(fontBytes('DejaVuSans.ttf'), { subset: true });
    const text = 'The plume reaches the surface 91.62 ft from the port at 0.0656 ft/s and 4.365×10⁻⁵ m²/s, 12 %.';
    // from the narrowest width that holds the widest value with its unit
    for (let width = 90; width <= 400; width += 7) {
      const lines = wrapText(text, font, 9, width);
      for (const line of lines.slice(0, -1)) expect(line, `width ${width}`).not.toMatch(/(?:^|\s)[\d.×⁻⁰-⁹]+$/);
      expect(lines.join(' ')).toBe(text);
    }
  });
});
