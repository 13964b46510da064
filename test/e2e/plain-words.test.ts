// End-to-end, in Debian's chromium against the browser shell: the demo workspace reads in words (no code
// identifiers, fields named as the editors label them), US display shows US units in the readings, the unit
// switch is a view setting, outside-validity cards say so, and a new site's starting values are flagged.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openWorkspaceSession, ROOT, type WorkspaceSession } from './shell-process';

const DEMO = readFileSync(join(ROOT, 'examples', 'quillmere-reservoir.gpsite'), 'utf8');
/** snake_case names and site-file paths: what a user should never have to read */
const IDENTIFIER = /\b[a-z]{2,}(?:_[a-z0-9]+)+\b|\b(?:features|conditions|estimates)\[\d+\]|\b[A-Z]\w*Error\b/g;
/** SI units as the workspace prints them */
const SI_UNIT = /^(m|m\/s|m³\/s|m²\/s|kg\/m³|°C|m\/s²)$/;

let session: WorkspaceSession;
let page: Page;

const detail = () => page.getByRole('dialog');
const identifiersIn = async (text: Promise<string>) => [...(await text).matchAll(IDENTIFIER)].map((m) => m[0]);

async function eachDetail(visit: (id: string) => Promise<void>): Promise<void> {
  const ids = await page
    .locator('[data-estimate]')
    .evaluateAll((els) => els.map((e) => e.getAttribute('data-estimate')!));
  expect(ids.length).toBeGreaterThan(5);
  for (const id of ids) {
    await page
      .locator(`[data-estimate="${id}"]`)
      .getByRole('button', { name: /detail/i })
      .click();
    await detail().getByRole('heading').first().waitFor();
    await visit(id);
    await detail().getByRole('button', { name: 'Close' }).click();
  }
}

beforeAll(async () => {
  session = await openWorkspaceSession({ 'quillmere-reservoir.gpsite': DEMO });
  ({ page } = session);
  await page.getByRole('button', { name: 'Open…', exact: true }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'quillmere-reservoir.gpsite' }).click();
  await page.getByTestId('file-name').getByText('quillmere-reservoir.gpsite', { exact: true }).waitFor();
  await page.locator('[data-estimate]').first().waitFor();
});

afterAll(async () => {
  await session?.close();
});

describe('the workspace speaks in words', () => {
  it('shows no code identifiers in the outline, the estimate cards or any detail', async () => {
    await expect.poll(() => page.locator('#readout-title').textContent()).toMatch(/^Estimates/);
    expect(await identifiersIn(page.getByRole('navigation', { name: 'site outline' }).innerText())).toEqual([]);
    expect(await identifiersIn(page.locator('.readouts').innerText())).toEqual([]);
    const found: string[] = [];
    await eachDetail(async (id) => {
      found.push(...(await identifiersIn(detail().innerText())).map((n) => `${id}: ${n}`));
    });
    expect(found).toEqual([]);
  });

  it('labels estimate inputs in words, each with its help', async () => {
    await page
      .getByRole('navigation', { name: 'site outline' })
      .getByRole('button', { name: /^Round buoyant jet/ })
      .first()
      .click();
    await expect.poll(() => page.getByLabel('Port diameter D', { exact: true }).count()).toBe(1);
    expect(await identifiersIn(page.getByRole('region', { name: 'editor' }).innerText())).toEqual([]);
  });

  it('names a field it cannot read as the editor does, with the typed unit once', async () => {
    await page
      .getByRole('navigation', { name: 'site outline' })
      .getByRole('button', { name: /^Treatment works outfall/ })
      .click();
    const port = page.getByLabel('Port depth below the surface');
    await port.fill('30 parsecs');
    const card = page.locator('[data-estimate="plume-summer"]');
    await expect.poll(() => card.textContent()).toContain('Cannot compute');
    const text = (await card.textContent())!;
    expect(text).toContain('Treatment works outfall: Port depth');
    expect(text).not.toMatch(/parsecs" parsecs|features\[/);
    await page.keyboard.press('Control+z');
    await expect.poll(() => card.textContent()).not.toContain('Cannot compute');
  });
});

describe('units are a view setting', () => {
  it('switches to US without an edit; every reading and input is in US units', async () => {
    await page.getByText('US', { exact: true }).click();
    await expect.poll(() => page.locator('.readouts .unit').allTextContents()).toContain('ft');
    expect(await page.getByTestId('file-name').textContent()).not.toContain('unsaved');
    expect(await page.getByRole('button', { name: 'Undo' }).isDisabled()).toBe(true);
    const si = (await page.locator('.readouts .unit').allTextContents()).filter((u) => SI_UNIT.test(u));
    expect(si).toEqual([]);
    const inDetails: string[] = [];
    await eachDetail(async (id) => {
      const units = await detail().locator('.reading .unit').allTextContents();
      inDetails.push(...units.filter((u) => SI_UNIT.test(u)).map((u) => `${id}: ${u}`));
    });
    expect(inDetails).toEqual([]);
    // temperature limits of the compliance table follow the display units
    const captions = await page.locator('.compliance caption').allTextContents();
    expect(captions.filter((c) => c.includes('°C'))).toEqual([]);
    await page.getByText('SI', { exact: true }).click();
  });
});

describe('what the cards say about their results', () => {
  it('says in words when a result lies outside its method’s validity; only such cards are dashed', async () => {
    const cards = page.locator('[data-estimate]');
    const n = await cards.count();
    let dashed = 0;
    for (let i = 0; i < n; i++) {
      const card = cards.nth(i);
      // the callback runs in the page; getComputedStyle is the page's own
      const style = await card.evaluate((el) => (globalThis as any).getComputedStyle(el).borderLeftStyle as string);
      const says = await card.getByTestId('outside-validity').count();
      expect(style === 'dashed', (await card.getAttribute('data-estimate')) ?? '').toBe(says === 1);
      dashed += says;
    }
    expect(dashed).toBeGreaterThan(0);
  });

  it('flags results of a new site as resting on its placeholder profile and starting values', async () => {
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await page.getByLabel('kind of feature to add').selectOption('outfall');
    await page.getByRole('button', { name: '+ Add' }).click();
    const card = page.locator('[data-estimate="outfall-buoyant-jet"]');
    await expect.poll(() => card.getByTestId('placeholder-note').count()).toBe(2);
    await expect.poll(() => card.textContent()).toContain('placeholder profile');
    await expect.poll(() => card.textContent()).toContain('Port diameter');
    await page.getByLabel('Port diameter').fill('0.45');
    await expect.poll(() => card.textContent()).not.toContain('Port diameter,');
  });
});
