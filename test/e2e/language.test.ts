// End-to-end, in Debian's chromium against the browser shell: the demo workspace speaks the engineer's
// language. No code identifier (snake_case result names, estimate and method ids, topic slugs) and no
// quantity token reaches the screen; US display shows no SI quantity in readings, warnings, text results
// or chart captions; the band never stays "computing" after an edit and its undo; the estimate detail
// holds at 200 % zoom without sideways scrolling; the readouts follow the selection; an old error leaves the
// status line once later work succeeds; removing a feature says what went with it and undo restores it.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { CALC_METHODS } from '../../shared-core/calc/registry';
import { TOPIC_WORDS } from '../../shared-core/core/vocabulary';
import { loadSite } from '../../shared-core/site';
import { openWorkspaceSession, ROOT, type WorkspaceSession } from './shell-process';

const DEMO = readFileSync(join(ROOT, 'examples', 'quillmere-reservoir.gpsite'), 'utf8');
const SITE = loadSite(DEMO);

/** snake_case names: a result or parameter name shown as code */
const SNAKE = /\b[a-z]{2,}(?:_[a-z0-9]+)+\b/g;
/**
 * ids that mean nothing to a reader: the demo's estimate ids and method ids of more than two words or with a
 * digit ("withdrawal-interference-combined", "withdrawal-limits-bohan-grace1973"). Shorter ids and topic
 * slugs ("far-field", "mixing-zone") are also plain hyphenated words; the method list is checked apart.
 */
const IDS = [
  ...SITE.estimates.map((e) => e.id),
  ...CALC_METHODS.map((m) => m.id).filter((id) => id.split('-').length > 2 || /\d/.test(id)),
];
const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
const ID_PATTERN = new RegExp(`(?<![\\w-])(?:${[...new Set(IDS)].map(escape).join('|')})(?![\\w-])`, 'g');
/** the marks of a quantity token (shared-core/core/quantity-text.ts): shown text never holds them */
const TOKEN = /[\u27e6\u27e7]/;
/** a number followed by an SI unit as the workspace or a sentence would print it */
const SI_QUANTITY = /\d\s?(?:m|m3\/s|m³\/s|m\/s|m2\/s|m²\/s|kg\/m³|kg\/m3|°C|degC)(?![\w²³/])/g;
/** the wind at the standard anemometer height of 10 m (WMO-No. 8, Guide to Instruments and Methods of Observation, Vol. I ch. 5; from memory) is a name, not a reading */
const STANDARD_HEIGHT = /\b(?:wind(?: speed)? at 10 m|10 m wind)\b/gi;

let session: WorkspaceSession;
let page: Page;

const detail = () => page.getByRole('dialog');
const outline = () => page.getByRole('navigation', { name: 'site outline' });
const card = (id: string) => page.locator(`[data-estimate="${id}"]`);
const found = (text: string, pattern: RegExp) => [...text.matchAll(pattern)].map((m) => m[0]);
/** each SI quantity with the words around it, so a failure shows where it stands */
const siQuantities = (text: string) =>
  [...text.replace(STANDARD_HEIGHT, '').matchAll(SI_QUANTITY)].map((m) =>
    text.replace(STANDARD_HEIGHT, '').slice(Math.max(0, m.index - 40), m.index + m[0].length + 10),
  );

async function cardIds(): Promise<string[]> {
  return page.locator('[data-estimate]').evaluateAll((els) => els.map((e) => e.getAttribute('data-estimate')!));
}

/** Opens each estimate's detail in turn (the cards of the condition shown), visits it and closes it. */
async function eachDetail(visit: (id: string) => Promise<void>): Promise<void> {
  const ids = await cardIds();
  expect(ids.length).toBeGreaterThan(5);
  for (const id of ids) {
    await card(id)
      .getByRole('button', { name: /detail/i })
      .click();
    await detail().getByRole('heading').first().waitFor();
    await visit(id);
    await detail().getByRole('button', { name: 'Close' }).click();
  }
}

/** The text of what shows shared-core sentences and values inside `scope`: readings, warnings, problems, captions. */
async function shownValues(scope: ReturnType<Page['locator']>): Promise<string> {
  const parts = await scope
    .locator(
      '.reading .value, .reading .text, .warnings li, .problem, [data-testid="band-line"], [data-testid="chart-caption"], [data-testid="port-table"]',
    )
    .allInnerTexts();
  return parts.join('\n');
}

beforeAll(async () => {
  session = await openWorkspaceSession({ 'quillmere-reservoir.gpsite': DEMO, 'damaged.gpsite': '{ "format": ' });
  ({ page } = session);
  await page.getByRole('button', { name: 'Open…', exact: true }).click();
  await detail().getByRole('button', { name: 'quillmere-reservoir.gpsite' }).click();
  await page.getByTestId('file-name').getByText('quillmere-reservoir.gpsite', { exact: true }).waitFor();
  await page.locator('[data-estimate]').first().waitFor();
});

afterAll(async () => {
  await session?.close();
});

describe('words, not identifiers', () => {
  it('shows no snake_case name, estimate id, method id, topic slug or quantity token, in SI and in US', async () => {
    for (const system of ['SI', 'US']) {
      await page.getByText(system, { exact: true }).click();
      const screen = await page.locator('body').innerText();
      expect(found(screen, SNAKE), system).toEqual([]);
      expect(found(screen, ID_PATTERN), system).toEqual([]);
      expect(TOKEN.test(screen), system).toBe(false);
      const inDetails: string[] = [];
      await eachDetail(async (id) => {
        const text = await detail().innerText();
        inDetails.push(...[...found(text, SNAKE), ...found(text, ID_PATTERN)].map((n) => `${id}: ${n}`));
        if (TOKEN.test(text)) inDetails.push(`${id}: a quantity token`);
      });
      expect(inDetails, system).toEqual([]);
    }
    await page.getByText('SI', { exact: true }).click();
  });

  it('lists the methods with their topics in words', async () => {
    await outline()
      .getByRole('button', { name: /^Port split meeting a release-temperature target/ })
      .click();
    const options = await page.getByRole('region', { name: 'editor' }).locator('select option').allTextContents();
    // each method is offered by its title and its topic in words, e.g. "… (Selective withdrawal)"
    const unworded = CALC_METHODS.filter((m) => !options.includes(`${m.title} (${TOPIC_WORDS[m.topic]})`));
    expect(unworded.map((m) => m.id)).toEqual([]);
  });
});

describe('US display', () => {
  it('shows no SI quantity in the cards, their warnings, text results or the detail', async () => {
    await page.getByText('US', { exact: true }).click();
    await expect.poll(() => page.locator('.readouts .unit').allTextContents()).toContain('ft');
    expect(siQuantities(await shownValues(page.locator('.readouts')))).toEqual([]);
    const inDetails: string[] = [];
    await eachDetail(async (id) => {
      inDetails.push(...siQuantities(await shownValues(detail())).map((q) => `${id}: ${q}`));
    });
    expect(inDetails).toEqual([]);
    await page.getByText('SI', { exact: true }).click();
  });
});

describe('what a card says', () => {
  it('names the ports an intake or outfall estimate uses; a port list reads as a table', async () => {
    // the demo's release split runs on all three ports of the tower; the jet on the outfall's single port
    await expect
      .poll(() => card('release-summer').getByTestId('ports-used').textContent())
      .toContain('Upper port, Middle port, Lower port');
    expect(await card('plume-summer').getByTestId('ports-used').textContent()).toContain('single port');
    await card('release-summer')
      .getByRole('button', { name: /detail/i })
      .click();
    await expect.poll(() => detail().getByTestId('port-table').locator('tbody tr').count()).toBe(3);
    await detail().getByRole('button', { name: 'Close' }).click();
  });

  it('says on the card when a release target cannot be reached, in the units shown', async () => {
    await page.getByText('US', { exact: true }).click();
    await outline()
      .getByRole('button', { name: /^Tower intake/ })
      .click();
    // no port of the demo's tower draws water warmer than its surface (about 76.6 °F in late summer)
    await page.getByLabel('Target release temperature').fill('95 degF');
    const release = card('release-summer');
    await expect.poll(() => release.getByTestId('target-unreachable').count()).toBe(1);
    const warnings = await release.locator('.warnings li').allInnerTexts();
    const refusal = warnings.find((w) => w.includes('cannot be met'));
    expect(refusal).toMatch(/°F/);
    expect(siQuantities(refusal ?? '')).toEqual([]);
    await page.keyboard.press('Control+z');
    await expect.poll(() => release.getByTestId('target-unreachable').count()).toBe(0);
    await page.getByText('SI', { exact: true }).click();
  });

  it('gives each chart a table of its values for screen readers', async () => {
    await card('plume-summer')
      .getByRole('button', { name: /detail/i })
      .click();
    const charts = await detail().locator('canvas').count();
    expect(charts).toBeGreaterThan(0);
    expect(await detail().locator('details.values table').count()).toBe(charts);
    await detail().getByRole('button', { name: 'Close' }).click();
  });
});

describe('no stuck or misleading states', () => {
  it('never leaves a band computing after an edit followed at once by undo', async () => {
    const line = card('plunge-summer').getByTestId('band-line');
    await expect.poll(() => line.textContent(), { timeout: 60_000 }).toMatch(/% band/);
    await outline()
      .getByRole('button', { name: /^Brenn River inflow/ })
      .click();
    const discharge = page.getByLabel('River discharge');
    await discharge.fill('900 cfs');
    await page.keyboard.press('Control+z');
    await expect.poll(() => discharge.inputValue()).toBe('880 cfs');
    await expect.poll(() => line.textContent(), { timeout: 30_000 }).toMatch(/% band/);
    expect(await line.textContent()).not.toContain('computing');
  });

  it('puts the selected feature’s estimates first and opens its editor at the top', async () => {
    await outline()
      .getByRole('button', { name: /^Treatment works outfall/ })
      .click();
    const first = page.locator('[data-estimate]').first();
    await expect.poll(() => first.locator('.where').first().textContent()).toContain('Treatment works outfall');
    const pane = page.locator('#editor-pane');
    await pane.evaluate((el) => (el.scrollTop = el.scrollHeight));
    await outline()
      .getByRole('button', { name: /^Tower intake/ })
      .click();
    await expect.poll(() => first.locator('.where').first().textContent()).toContain('Tower intake');
    await expect.poll(() => pane.evaluate((el) => el.scrollTop)).toBe(0);
  });

  it('clears an old error from the status line once later work succeeds', async () => {
    await page.getByRole('button', { name: 'Open…', exact: true }).click();
    await detail().getByRole('button', { name: 'damaged.gpsite' }).click();
    const notice = page.getByTestId('notice');
    await expect.poll(() => notice.textContent()).toContain('damaged.gpsite');
    expect(await notice.getAttribute('class')).toContain('error');
    await expect.poll(() => page.getByTestId('file-name').textContent()).toContain('quillmere-reservoir.gpsite');
    await outline()
      .getByRole('button', { name: /^Quillmere Reservoir/ })
      .click();
    await page.getByLabel('Name', { exact: true }).first().fill('Quillmere Reservoir (renamed)');
    await expect.poll(() => notice.count()).toBe(0);
    await page.keyboard.press('Control+z');
  });

  it('says what went with a removed feature, and undo restores it', async () => {
    const estimates = SITE.estimates.filter((e) => e.feature === 'river').length;
    await outline().getByRole('button', { name: 'remove Brenn River inflow' }).click();
    await expect
      .poll(() => page.getByTestId('notice').textContent())
      .toContain(`Removed Brenn River inflow and its ${estimates} estimates`);
    await expect.poll(() => card('plunge-summer').count()).toBe(0);
    await page.keyboard.press('Control+z');
    await expect.poll(() => card('plunge-summer').count()).toBe(1);
    await expect.poll(() => outline().textContent()).toContain('Brenn River inflow');
  });
});

describe('at 200 % zoom', () => {
  // a 1440 × 900 window at 200 % zoom lays out 720 × 450 CSS pixels (WCAG 2.1, SC 1.4.4 Resize text and
  // SC 1.4.10 Reflow: content readable without scrolling in two directions)
  it('shows every estimate detail without horizontal scrolling', async () => {
    await page.setViewportSize({ width: 720, height: 450 });
    const wide: string[] = [];
    await eachDetail(async (id) => {
      const m = await detail().evaluate((d) => {
        const el = d as unknown as { scrollWidth: number; clientWidth: number };
        const doc = (globalThis as unknown as { document: { documentElement: { scrollWidth: number } } }).document;
        return { inner: el.scrollWidth - el.clientWidth, page: doc.documentElement.scrollWidth - 720 };
      });
      if (m.inner > 1 || m.page > 1) wide.push(`${id}: ${JSON.stringify(m)}`);
    });
    expect(wide).toEqual([]);
    await page.setViewportSize({ width: 1440, height: 900 });
  });
});
