// End-to-end: the Svelte workspace in Debian's chromium against the browser shell (`npm run serve`).
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import { launchChromium, ROOT, startShell, tempFolders, type ShellProcess } from './shell-process';

// 1 international foot = 0.3048 m exactly (NIST SP 811, 2008, Appendix B.8)
const FOOT = 0.3048;
const CSV = readFileSync(join(ROOT, 'examples', 'demo-profile.csv'), 'utf8');
const CSV_ROWS = CSV.split('\n').filter((l) => l.trim() && !l.startsWith('#')).length - 1;

let folders: ReturnType<typeof tempFolders>;
let shell: ShellProcess;
let browser: Browser;
let page: Page;

async function openPage(url: string): Promise<Page> {
  const p = await browser.newPage({ viewport: { width: 1440, height: 900 } });
  p.on('dialog', (d) => void d.accept());
  await p.goto(url);
  await p.getByRole('button', { name: 'New', exact: true }).waitFor();
  return p;
}

/** Number of canvas pixels that are not blank (chart.js drew something). */
async function inkedPixels(canvas: Locator): Promise<number> {
  // the root tsconfig has no DOM types: describe the little of a canvas this needs
  type Canvas = {
    width: number;
    height: number;
    getContext(kind: '2d'): { getImageData(x: number, y: number, w: number, h: number): { data: Uint8ClampedArray } };
  };
  return canvas.evaluate((c) => {
    const el = c as unknown as Canvas;
    const d = el.getContext('2d').getImageData(0, 0, el.width, el.height).data;
    let n = 0;
    for (let i = 3; i < d.length; i += 4) if (d[i] > 0) n++;
    return n;
  });
}

const reading = (estimate: string, name: string) =>
  page.locator(`[data-estimate="${estimate}"] [data-name="${name}"] [data-testid="reading-value"]`);
const readNumber = async (l: Locator) => Number((await l.textContent())!.replace(/\s/g, ''));

beforeAll(async () => {
  folders = tempFolders();
  shell = await startShell(folders.workspace, folders.dataDir);
  browser = await launchChromium();
  page = await openPage(shell.url);
});

afterAll(async () => {
  await browser?.close();
  await shell?.stop();
  folders?.remove();
});

describe('workspace in the browser shell', () => {
  it('creates a site and takes a depth typed in feet', async () => {
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await page.getByLabel('Name', { exact: true }).first().fill('Lake Orrin (e2e)');
    await expect
      .poll(() => page.getByRole('navigation', { name: 'site outline' }).textContent())
      .toContain('Lake Orrin (e2e)');
    const depth = page.getByLabel('Greatest depth');
    await depth.fill('98 ft');
    // the typed text is kept as typed; the hint shows it in SI (98 × 0.3048 = 29.87 m)
    await expect.poll(() => depth.inputValue()).toBe('98 ft');
    await expect.poll(() => page.locator('.field', { has: depth }).textContent()).toContain('29.87');
  });

  it('imports a CSV profile, draws the profile charts and marks a bad cell at its row and column', async () => {
    await page.getByRole('button', { name: /Condition 1/ }).click();
    await page
      .getByTestId('csv-input')
      .setInputFiles({ name: 'profile.csv', mimeType: 'text/csv', buffer: Buffer.from(CSV) });
    await expect.poll(() => page.locator('table[aria-label="profile samples"] tbody tr').count()).toBe(CSV_ROWS);
    const charts = page.locator('[aria-label="profile charts"] canvas');
    await expect.poll(() => charts.count()).toBeGreaterThanOrEqual(4);
    for (const c of await charts.all()) expect(await inkedPixels(c)).toBeGreaterThan(500);

    const cell = page.getByLabel('row 3, temperature (degC)');
    await cell.fill('warm');
    await expect.poll(() => cell.getAttribute('aria-invalid')).toBe('true');
    await expect(page.locator('td', { has: cell }).textContent()).resolves.toContain('"warm" is not a number');
    await page.keyboard.press('Control+z');
    const third = CSV.split('\n')
      .filter((l) => /^\d/.test(l))[2]
      .split(',')[1];
    await expect.poll(() => cell.inputValue()).toBe(String(Number(third)));
    await expect.poll(() => cell.getAttribute('aria-invalid')).toBeNull();
  });

  it('adds an outfall and an intake; their estimates draw in the section and chart in the detail', async () => {
    const kind = page.getByLabel('kind of feature to add');
    await kind.selectOption('outfall');
    await page.getByRole('button', { name: '+ Add' }).click();
    await kind.selectOption('intake');
    await page.getByRole('button', { name: '+ Add' }).click();
    await page.getByLabel('Target release temperature').fill('54 degF');

    await expect.poll(() => page.locator('[data-estimate="outfall-buoyant-jet"]').count()).toBe(1);
    await expect.poll(() => reading('outfall-buoyant-jet', 'max_rise').count()).toBe(1);
    await expect.poll(() => reading('intake-release-blend', 'temperature').count()).toBe(1);
    await expect.poll(() => page.locator('[data-testid="section-svg"] .plume').count()).toBe(1);
    await expect.poll(() => page.locator('[data-testid="section-svg"] .band').count()).toBeGreaterThan(0);

    for (const id of ['outfall-buoyant-jet', 'intake-release-blend']) {
      await page
        .locator(`[data-estimate="${id}"]`)
        .getByRole('button', { name: /detail/i })
        .click();
      const dialog = page.getByRole('dialog');
      await expect.poll(() => dialog.locator('canvas').count()).toBeGreaterThan(0);
      for (const c of await dialog.locator('canvas').all()) expect(await inkedPixels(c)).toBeGreaterThan(500);
      await expect(dialog.getByRole('note', { name: 'caution' }).textContent()).resolves.toContain(
        'Screening estimate only',
      );
      await dialog.getByRole('button', { name: 'Close' }).click();
    }
  });

  it('switches to US units: fields and readings convert, typed text stays as typed', async () => {
    await page.getByRole('button', { name: /^Outfall 1/ }).click();
    const port = page.getByLabel('Port depth below the surface');
    const siDepth = Number(await port.inputValue());
    const siRise = await readNumber(reading('outfall-buoyant-jet', 'max_rise'));
    await page.getByText('US', { exact: true }).click();
    await expect.poll(async () => Math.abs(Number(await port.inputValue()) - siDepth / FOOT)).toBeLessThan(1e-3);
    await expect.poll(() => page.locator('.field', { has: port }).textContent()).toContain('ft');
    await expect
      .poll(async () => Math.abs((await readNumber(reading('outfall-buoyant-jet', 'max_rise'))) / (siRise / FOOT) - 1))
      .toBeLessThan(2e-3);
    await page.getByRole('button', { name: /^Intake 1/ }).click();
    await expect.poll(() => page.getByLabel('Target release temperature').inputValue()).toBe('54 degF');
    await page.getByText('SI', { exact: true }).click();
    await page.getByRole('button', { name: /^Outfall 1/ }).click();
    await expect.poll(async () => Number(await port.inputValue())).toBeCloseTo(siDepth, 9);
  });

  it('marks a quantity it cannot read with the reason and keeps the text', async () => {
    const port = page.getByLabel('Port depth below the surface');
    await port.fill('60 fx');
    await expect.poll(() => port.getAttribute('aria-invalid')).toBe('true');
    await expect
      .poll(() => page.locator('.field', { has: port }).textContent())
      .toContain('the unit "fx" is not known');
    await expect
      .poll(() => page.locator('[data-estimate="outfall-buoyant-jet"]').textContent())
      .toContain('Cannot compute');
    await port.fill('60 ft');
    await expect.poll(() => port.getAttribute('aria-invalid')).toBeNull();
    await expect.poll(() => page.locator('.field', { has: port }).textContent()).toContain('18.29');
  });

  it('undoes and redoes with the keyboard and the buttons', async () => {
    const diameter = page.getByLabel('Port diameter');
    const before = await diameter.inputValue();
    await diameter.fill('0.45');
    await expect
      .poll(() => page.locator('[data-estimate="outfall-buoyant-jet"] [data-name="max_rise"]').count())
      .toBe(1);
    await page.keyboard.press('Control+z');
    await expect.poll(() => diameter.inputValue()).toBe(before);
    await page.keyboard.press('Control+Shift+z');
    await expect.poll(() => diameter.inputValue()).toBe('0.45');
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => diameter.inputValue()).toBe(before);
    await page.getByRole('button', { name: 'Redo' }).click();
    await expect.poll(() => diameter.inputValue()).toBe('0.45');
    await expect.poll(() => page.getByLabel('Port depth below the surface').inputValue()).toBe('60 ft');
  });

  it('saves, reopens and finds the same document', async () => {
    await page.getByRole('button', { name: 'Save as…', exact: true }).click();
    await page.getByLabel('File name').fill('orrin-e2e');
    await page.getByRole('dialog').getByRole('button', { name: 'Save' }).click();
    const file = join(folders.workspace, 'orrin-e2e.gpsite');
    await expect.poll(() => existsSync(file)).toBe(true);
    await expect.poll(() => page.getByTestId('file-name').textContent()).toBe('orrin-e2e.gpsite');
    const saved = readFileSync(file, 'utf8');
    expect(JSON.parse(saved).features.map((f: { kind: string }) => f.kind)).toEqual(['outfall', 'intake']);
    expect(JSON.parse(saved).features[0].portDepth).toBe('60 ft');

    await page.getByRole('button', { name: 'New', exact: true }).click();
    await expect.poll(() => page.locator('[data-estimate]').count()).toBe(0);
    await page.getByRole('button', { name: 'Open…', exact: true }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'orrin-e2e.gpsite' }).click();
    await expect.poll(() => page.getByTestId('file-name').textContent()).toBe('orrin-e2e.gpsite');
    await page.getByRole('button', { name: /^Outfall 1/ }).click();
    await expect.poll(() => page.getByLabel('Port depth below the surface').inputValue()).toBe('60 ft');
    // saving the reopened document unchanged writes the same bytes
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await expect.poll(() => page.getByTestId('notice').textContent()).toContain('Saved');
    expect(readFileSync(file, 'utf8')).toBe(saved);
  });

  it('offers to recover unsaved work after the shell process is killed', async () => {
    await page.getByRole('button', { name: /Lake Orrin/ }).click();
    await page.getByLabel('Name', { exact: true }).first().fill('Lake Orrin, edited before the crash');
    await expect.poll(() => page.getByTestId('file-name').textContent()).toContain('unsaved');
    // the autosave is debounced; wait until the recovery file holds the edit
    await expect
      .poll(
        () =>
          readdirSync(folders.dataDir).some(
            (n) =>
              statSync(join(folders.dataDir, n)).isFile() &&
              readFileSync(join(folders.dataDir, n), 'utf8').includes('edited before the crash'),
          ),
        { timeout: 10_000 },
      )
      .toBe(true);
    await shell.stop('SIGKILL');
    await page.close();

    shell = await startShell(folders.workspace, folders.dataDir);
    page = await openPage(shell.url);
    const offer = page.getByRole('alertdialog');
    await expect.poll(() => offer.count()).toBe(1);
    await offer.getByRole('button', { name: 'Recover' }).click();
    await expect
      .poll(() => page.getByRole('navigation', { name: 'site outline' }).textContent())
      .toContain('edited before the crash');
    await expect.poll(() => page.getByTestId('file-name').textContent()).toContain('unsaved');
  });
});
