// End-to-end, in Debian's chromium against the browser shell: "Copy table" and "Copy image" in an
// estimate's detail put tab-separated text with units and a PNG on the clipboard; the section draws the
// basin's cross-section from the site's area–depth table, and a flat bed without one.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openWorkspaceSession, ROOT, type WorkspaceSession } from './shell-process';

// 1 international foot = 0.3048 m exactly (NIST SP 811, 2008, Appendix B.8)
const FOOT = 0.3048;
// PNG signature and IHDR layout: ISO/IEC 15948:2004 (PNG), clauses 5.2 and 11.2.2
const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

const DEMO = JSON.parse(readFileSync(join(ROOT, 'examples', 'quillmere-reservoir.gpsite'), 'utf8'));
const DEPTH = DEMO.waterBody.depth as number;
// a cone-shaped basin: plan areas of similar, centred outlines, A(d) = A0 (1 − d/D)², so the schematic
// width √(A/A0) must fall on the straight line 1 − d/D (similar figures: areas scale as lengths squared)
const CONE = [0, 8, 16, 24, 32, DEPTH].map((d) => ({ depth: d, area: 3.6e6 * (1 - d / DEPTH) ** 2 }));

let session: WorkspaceSession;
let page: Page;

function siteText(change: (site: any) => void): string {
  const site = structuredClone(DEMO);
  change(site);
  return JSON.stringify(site, null, 2);
}

async function open(name: string): Promise<void> {
  await page.getByRole('button', { name: 'Open…', exact: true }).click();
  await page.getByRole('dialog').getByRole('button', { name }).click();
  await expect.poll(() => page.getByTestId('file-name').textContent()).toBe(name);
}

/** The basin outline as [x, y] pairs: left bank from the surface down, then the right bank back up. */
async function basinOutline(): Promise<number[][]> {
  const pts = await page.getByTestId('basin-outline').getAttribute('points');
  return pts!
    .trim()
    .split(/\s+/)
    .map((p) => p.split(',').map(Number));
}

/** Width at each table depth (top down) and the y of each row, from the drawn outline. */
async function widthsAndLevels(): Promise<{ width: number[]; y: number[] }> {
  const pts = await basinOutline();
  const n = pts.length / 2;
  const left = pts.slice(0, n),
    right = pts.slice(n).reverse();
  return { width: left.map((p, i) => right[i][0] - p[0]), y: left.map((p) => p[1]) };
}

const detail = () => page.getByRole('dialog');

beforeAll(async () => {
  session = await openWorkspaceSession({
    'quillmere-reservoir.gpsite': siteText(() => {}),
    'cone-basin.gpsite': siteText((s) => {
      s.waterBody.hypsography = CONE;
    }),
    'no-table.gpsite': siteText((s) => {
      delete s.waterBody.hypsography;
    }),
  });
  ({ page } = session);
});

afterAll(async () => {
  await session?.close();
});

describe('the basin in the section', () => {
  it('draws the cross-section from the area–depth table: width ∝ √area, depth to scale', async () => {
    await open('quillmere-reservoir.gpsite');
    const table = DEMO.waterBody.hypsography as { depth: number; area: number }[];
    const { width, y } = await widthsAndLevels();
    expect(width.length).toBe(table.length);
    table.forEach((row, i) => {
      // outline points are written to 0.1 px: allow 0.3 px on a width of some 100 px
      expect(
        Math.abs(width[i] - width[0] * Math.sqrt(row.area / table[0].area)),
        `width at ${row.depth} m`,
      ).toBeLessThan(0.3);
      expect(
        Math.abs(y[i] - (y[0] + (row.depth / DEPTH) * (y[table.length - 1] - y[0]))),
        `level of ${row.depth} m`,
      ).toBeLessThan(0.2);
    });
  });

  it('draws a cone-shaped basin as a V with straight banks', async () => {
    await open('cone-basin.gpsite');
    const { width, y } = await widthsAndLevels();
    expect(width.length).toBe(CONE.length);
    CONE.forEach((row, i) =>
      expect(Math.abs(width[i] - width[0] * (1 - row.depth / DEPTH)), `width at ${row.depth} m`).toBeLessThan(0.3),
    );
    expect(width[CONE.length - 1]).toBeLessThan(0.3);
    expect(y[CONE.length - 1]).toBeGreaterThan(y[0]);
  });

  it('keeps the flat bed when the site has no area–depth table', async () => {
    await open('no-table.gpsite');
    await expect.poll(() => page.locator('[data-testid="section-svg"] .bed').count()).toBe(1);
    expect(await page.getByTestId('basin-shape').count()).toBe(0);
  });
});

describe('copying from the estimate detail', () => {
  it('"Copy table" puts the results, with units, on the clipboard as tab-separated rows', async () => {
    await open('quillmere-reservoir.gpsite');
    await page
      .locator('[data-estimate="plume-summer"]')
      .getByRole('button', { name: /detail/i })
      .click();
    await detail()
      .getByRole('button', { name: /^Copy table/ })
      .click();
    await expect
      .poll(() => detail().getByTestId('copy-feedback').first().textContent(), { timeout: 15_000, interval: 100 })
      .toContain('Copied');
    const text = String(await page.evaluate('navigator.clipboard.readText()'));
    const rows = text.split('\n').map((l) => l.split('\t'));
    expect(rows[1]).toEqual(['result', 'value', 'unit']);
    const shown = Number(
      (await detail().locator('[data-name="max_rise"] [data-testid="reading-value"]').first().textContent())!.trim(),
    );
    // rows are labelled in the workspace's words, as on screen
    expect(rows.find((r) => r[0] === 'Maximum rise above the port')?.slice(1)).toEqual([String(shown), 'm']);
    expect(rows.find((r) => r[0] === 'Port depth')?.slice(1)).toEqual(['20', 'm']);
    expect(rows.some((r) => r[0] === 'caution' && r[1].startsWith('Screening estimate only'))).toBe(true);
    expect(rows.some((r) => r[0] === 'method' && r[1].startsWith('Round buoyant jet'))).toBe(true);
    expect(rows.flat().filter((c) => /\b[a-z]{2,}_[a-z]{2,}/.test(c))).toEqual([]);
    await detail().getByRole('button', { name: 'Close' }).click();
  });

  it('copies the table in the units on screen (US: feet)', async () => {
    await page.getByText('US', { exact: true }).click();
    await page
      .locator('[data-estimate="plume-summer"]')
      .getByRole('button', { name: /detail/i })
      .click();
    await detail()
      .getByRole('button', { name: /^Copy table/ })
      .click();
    await expect
      .poll(() => detail().getByTestId('copy-feedback').first().textContent(), { timeout: 15_000, interval: 100 })
      .toContain('Copied');
    const rows = String(await page.evaluate('navigator.clipboard.readText()'))
      .split('\n')
      .map((l) => l.split('\t'));
    const port = rows.find((r) => r[0] === 'Port depth')!;
    expect(port[2]).toBe('ft');
    // the demo's port is 20 m deep: 20 / 0.3048 = 65.62 ft, shown to four digits
    expect(Math.abs(Number(port[1]) - 20 / FOOT)).toBeLessThan(0.005);
    await detail().getByRole('button', { name: 'Close' }).click();
    await page.getByText('SI', { exact: true }).click();
  });

  it('"Copy image" puts a PNG of the chart, at three times its screen size, on the clipboard', async () => {
    await page
      .locator('[data-estimate="plume-summer"]')
      .getByRole('button', { name: /detail/i })
      .click();
    const canvas = detail().locator('canvas').first();
    await canvas.waitFor();
    const size = async () =>
      canvas.evaluate((c) => {
        const el = c as unknown as { width: number; height: number; clientWidth: number; clientHeight: number };
        return [el.width, el.height, el.clientWidth, el.clientHeight];
      });
    const before = await size();
    // the feedback beside this very button; a 3× redraw can take seconds on a loaded machine
    const copyImage = detail()
      .locator('.copy', { has: page.getByRole('button', { name: /^Copy image/ }) })
      .first();
    await copyImage.getByRole('button').click();
    await expect
      .poll(() => copyImage.getByTestId('copy-feedback').textContent(), { timeout: 15_000, interval: 100 })
      .toContain('Copied');
    const got = (await page.evaluate(`(async () => {
      const items = await navigator.clipboard.read();
      const types = items.flatMap((i) => i.types);
      const png = new Uint8Array(await (await items[0].getType('image/png')).arrayBuffer());
      return { types, head: Array.from(png.slice(0, 24)), size: png.length };
    })()`)) as { types: string[]; head: number[]; size: number };
    expect(got.types).toContain('image/png');
    expect(got.head.slice(0, 8)).toEqual(PNG_SIGNATURE);
    const be32 = (o: number) =>
      ((got.head[o] << 24) | (got.head[o + 1] << 16) | (got.head[o + 2] << 8) | got.head[o + 3]) >>> 0;
    // IHDR follows the signature: length (4), "IHDR" (4), width (4), height (4)
    expect(String.fromCharCode(...got.head.slice(12, 16))).toBe('IHDR');
    expect(Math.abs(be32(16) - 3 * before[2])).toBeLessThanOrEqual(3);
    expect(Math.abs(be32(20) - 3 * before[3])).toBeLessThanOrEqual(3);
    expect(got.size).toBeGreaterThan(5000);
    // the chart on screen is back at its own resolution
    expect(await size()).toEqual(before);
  });

  it('says so when the clipboard refuses, and keeps the dialog usable', async () => {
    await page.evaluate(
      `navigator.clipboard.writeText = () => Promise.reject(new DOMException('Write permission denied.', 'NotAllowedError'))`,
    );
    await detail()
      .getByRole('button', { name: /^Copy table/ })
      .click();
    const feedback = detail().getByTestId('copy-feedback').first();
    await expect.poll(() => feedback.textContent()).toContain('Not copied');
    expect(await feedback.textContent()).toContain('The clipboard refused the copy');
    await detail().getByRole('button', { name: 'Close' }).click();
    await expect.poll(() => detail().count()).toBe(0);
  });
});
