// End-to-end, in Debian's chromium against the browser shell: the uncertainty bands of estimates that
// state input uncertainties are computed in a Web Worker and shown on the card and in the detail; a
// standard uncertainty typed in the estimate editor brings a band, and text that cannot be read is kept
// in its field while the band names the field.
//
// The numbers are checked against runEstimate run in this test process on the same site: this is a
// plumbing check (worker → store → display rounding), not a check of the band itself, which the core's
// own tests check against JCGM 101:2008.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { loadSite, runEstimate, type Site } from '../../shared-core/site';
import { openWorkspaceSession, ROOT, type WorkspaceSession } from './shell-process';
import { nameText } from '../../shared-core/core/vocabulary';

// 1 international foot = 0.3048 m exactly (NIST SP 811, 2008, Appendix B.8)
const FOOT = 0.3048;
const TEXT = readFileSync(join(ROOT, 'examples', 'quillmere-reservoir.gpsite'), 'utf8');
const SITE = loadSite(TEXT);

let session: WorkspaceSession;
let page: Page;

/** The band of one result as runEstimate gives it in this process, for the site with an estimate's uncertainty changed. */
function expectedBand(id: string, result: string, uncertainty?: Record<string, string>) {
  const site: Site = structuredClone(SITE);
  const i = site.estimates.findIndex((e) => e.id === id);
  if (uncertainty) site.estimates[i].uncertainty = uncertainty;
  const band = runEstimate(site, site.estimates[i], i).uncertainty?.bands.find((b) => b.name === result);
  if (!band) throw new Error(`no band of ${result} for ${id}`);
  return band;
}

/** Reads "90 % band 2.52 – 3.522 m" into numbers. */
function parseBandLine(text: string): { coverage: number; low: number; high: number; unit: string } {
  const m = /(\d+(?:\.\d+)?) % band (\S+) – (\S+)\s*(\S*)/.exec(text.replace(/\u202f/g, ' '));
  if (!m) throw new Error(`not a band line: "${text}"`);
  return { coverage: Number(m[1]), low: Number(m[2]), high: Number(m[3]), unit: m[4] };
}

/** A number shown to four significant digits (src-renderer/src/lib/format.ts) is within half a unit of the 4th digit. */
const roundsTo = (shown: number, value: number) => Math.abs(shown - value) <= 5e-4 * Math.abs(value) + 1e-12;

const card = (id: string) => page.locator(`[data-estimate="${id}"]`);
const bandLine = (id: string) => card(id).getByTestId('band-line');
const detail = () => page.getByRole('dialog');

beforeAll(async () => {
  session = await openWorkspaceSession({ 'quillmere-reservoir.gpsite': TEXT });
  ({ page } = session);
});

afterAll(async () => {
  await session?.close();
});

describe('uncertainty bands in the workspace', () => {
  it('shows the band of the key result on the card of an estimate that states uncertainties', async () => {
    await page.getByRole('button', { name: 'Open…', exact: true }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'quillmere-reservoir.gpsite' }).click();
    await expect.poll(() => page.getByTestId('file-name').textContent()).toBe('quillmere-reservoir.gpsite');
    await expect.poll(() => bandLine('plunge-summer').textContent(), { timeout: 20_000 }).toMatch(/% band/);
    const shown = parseBandLine((await bandLine('plunge-summer').textContent())!);
    const nominal = Number(
      await card('plunge-summer').locator('[data-name="plunge_depth"] [data-testid="reading-value"]').textContent(),
    );
    const band = expectedBand('plunge-summer', 'plunge_depth');
    expect(shown.coverage).toBe(90);
    expect(shown.unit).toBe('m');
    expect(shown.low).toBeLessThan(nominal);
    expect(nominal).toBeLessThan(shown.high);
    expect(roundsTo(shown.low, band.low), `low ${shown.low} vs ${band.low}`).toBe(true);
    expect(roundsTo(shown.high, band.high), `high ${shown.high} vs ${band.high}`).toBe(true);
    await expect.poll(() => bandLine('wind-summer').textContent(), { timeout: 20_000 }).toMatch(/% band/);
  });

  it('shows the band in the display units (US: feet)', async () => {
    await page.getByText('US', { exact: true }).click();
    await expect.poll(() => bandLine('plunge-summer').textContent(), { timeout: 20_000 }).toMatch(/ft$/);
    const shown = parseBandLine((await bandLine('plunge-summer').textContent())!);
    const band = expectedBand('plunge-summer', 'plunge_depth');
    expect(roundsTo(shown.low, band.low / FOOT)).toBe(true);
    expect(roundsTo(shown.high, band.high / FOOT)).toBe(true);
    await page.getByText('SI', { exact: true }).click();
    await expect.poll(() => bandLine('plunge-summer').textContent(), { timeout: 20_000 }).toMatch(/\sm$/);
  });

  it('lists the band in the detail, with its inputs, the note, and in "Copy table"', async () => {
    await card('plunge-summer')
      .getByRole('button', { name: /detail/i })
      .click();
    const block = detail().getByTestId('band-block');
    await expect.poll(() => block.locator('tr[data-name="plunge_depth"] td').count()).toBe(4);
    const [low, median, high] = (await block.locator('tr[data-name="plunge_depth"] td').allTextContents()).map(Number);
    const band = expectedBand('plunge-summer', 'plunge_depth');
    expect(roundsTo(low, band.low) && roundsTo(median, band.median) && roundsTo(high, band.high)).toBe(true);
    // the varied input, named as the workspace names it
    expect(await block.textContent()).toContain(nameText('discharge', 'plunge-depth', 'input'));
    expect(await block.textContent()).toContain(
      'The band covers the stated input uncertainties only, not the error of the method itself.',
    );
    await detail()
      .getByRole('button', { name: /^Copy table/ })
      .click();
    await expect.poll(() => detail().getByTestId('copy-feedback').first().textContent()).toContain('Copied');
    const rows = String(await page.evaluate('navigator.clipboard.readText()'))
      .split('\n')
      .map((l) => l.split('\t'));
    expect(rows).toContainEqual(['90 % band', 'low', 'median', 'high', 'unit']);
    expect(
      rows
        .find((r) => r[0] === 'Plunge depth h_p' && r.length === 5)
        ?.slice(1)
        .map(Number),
    ).toEqual([low, median, high, NaN]);
    await page.screenshot({ path: join(tmpdir(), 'gprime-uncertainty-detail.png') });
    await detail().getByRole('button', { name: 'Close' }).click();
  });

  it('computes a band for an uncertainty typed in the editor, and names the field of one that cannot be read', async () => {
    await page
      .getByRole('navigation', { name: 'site outline' })
      .getByRole('button', { name: /^Dilution required to meet a criterion/ })
      .click();
    await expect
      .poll(() => page.getByRole('heading', { name: 'Input uncertainty (one standard deviation)' }).count())
      .toBe(1);
    const effluent = page.getByLabel(/^± Effluent concentration/);
    expect(await effluent.getAttribute('placeholder')).toContain('10%');
    await effluent.fill('10%');
    await expect.poll(() => bandLine('ammonia-dilution').textContent(), { timeout: 20_000 }).toMatch(/% band/);
    const shown = parseBandLine((await bandLine('ammonia-dilution').textContent())!);
    const band = expectedBand('ammonia-dilution', 'dilution', { effluent: '10%' });
    expect(roundsTo(shown.low, band.low) && roundsTo(shown.high, band.high)).toBe(true);

    const ambient = page.getByLabel(/^± Ambient concentration/);
    await ambient.fill('abc');
    await expect
      .poll(() => bandLine('ammonia-dilution').textContent(), { timeout: 20_000 })
      .toContain('uncertainty of ambient');
    // the error shows at the field it names, and the typed text stays there
    const field = page.locator('.field', { has: ambient });
    await expect.poll(() => field.getByRole('alert').textContent()).toContain('uncertainty of ambient');
    expect(await ambient.getAttribute('aria-invalid')).toBe('true');
    expect(await ambient.inputValue()).toBe('abc');
    await field.getByRole('alert').scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(tmpdir(), 'gprime-uncertainty-editor.png') });

    // emptying the field removes the bad text, and the band comes back
    await ambient.fill('');
    await expect.poll(() => bandLine('ammonia-dilution').textContent(), { timeout: 20_000 }).toMatch(/% band/);
  });

  it('never makes a newer band wait behind a long one', async () => {
    // release-blend optimises the port split on every draw: its band takes minutes, far longer than this test waits
    await page
      .getByRole('navigation', { name: 'site outline' })
      .getByRole('button', { name: /^Port split meeting/ })
      .click();
    await page.getByLabel(/^± Total release \(/).fill('5%');
    await expect.poll(() => bandLine('release-summer').textContent()).toContain('computing band…');
    await page.waitForTimeout(1000); // the long band is running in the worker now
    await page
      .getByRole('navigation', { name: 'site outline' })
      .getByRole('button', { name: /^Dilution required to meet a criterion/ })
      .click();
    await page.getByLabel(/^± Criterion concentration/).fill('0.1');
    await expect.poll(() => bandLine('ammonia-dilution').textContent(), { timeout: 10_000 }).toMatch(/% band/);
    expect(await bandLine('release-summer').textContent()).toContain('computing band…');
    const shown = parseBandLine((await bandLine('ammonia-dilution').textContent())!);
    const band = expectedBand('ammonia-dilution', 'dilution', { effluent: '10%', criterion: '0.1' });
    expect(roundsTo(shown.low, band.low) && roundsTo(shown.high, band.high)).toBe(true);
    // removing the uncertainty removes the band (and stops its computation)
    await page
      .getByRole('navigation', { name: 'site outline' })
      .getByRole('button', { name: /^Port split meeting/ })
      .click();
    await page.getByLabel(/^± Total release \(/).fill('');
    await expect.poll(() => bandLine('release-summer').count()).toBe(0);
  });

  it('an edit undone at once finds its band again, never stuck computing', async () => {
    await page
      .getByRole('navigation', { name: 'site outline' })
      .getByRole('button', { name: /^Dilution required to meet a criterion/ })
      .click();
    const criterion = page.getByLabel(/^± Criterion concentration/);
    await expect.poll(() => bandLine('ammonia-dilution').textContent(), { timeout: 20_000 }).toMatch(/% band/);
    const before = await bandLine('ammonia-dilution').textContent();
    await criterion.fill('0.2');
    await page.keyboard.press('Control+z');
    await expect.poll(() => bandLine('ammonia-dilution').textContent(), { timeout: 10_000 }).toBe(before);
  });

  it('a band can be stopped and computed again on request', async () => {
    await page
      .getByRole('navigation', { name: 'site outline' })
      .getByRole('button', { name: /^Dilution required to meet a criterion/ })
      .click();
    await page.getByLabel(/^± Criterion concentration/).fill('0.15');
    const line = bandLine('ammonia-dilution');
    await line.getByRole('button', { name: 'stop computing the band' }).click();
    await expect.poll(() => line.textContent()).toContain('band stopped');
    await line.getByRole('button', { name: 'Compute band' }).click();
    await expect.poll(() => line.textContent(), { timeout: 20_000 }).toMatch(/% band/);
  });
});
