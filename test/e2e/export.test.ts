// End-to-end, in Debian's chromium against the browser shell: the calc package is written from the workspace
// (Export… in the top bar) into a new folder of the shell's workspace folder, the panel says where and lists
// the files, the export holds the site as it is on screen (unsaved edit included), the workspace keeps
// answering while the report worker runs, a second click does not start a second export, and the US
// edition is in US customary units. The PDF is read back with poppler's pdftotext.
import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { isAbsolute, join, relative } from 'node:path';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openWorkspaceSession, ROOT, type WorkspaceSession } from './shell-process';

const DEMO = readFileSync(join(ROOT, 'examples', 'quillmere-reservoir.gpsite'), 'utf8');
const EDITED_SITE = 'Quillmere Reservoir, east arm (edited, not saved)';
/** the report worker assesses, draws and lays out the PDF: seconds on a 2-core machine */
const EXPORT_MS = 90_000;

let session: WorkspaceSession;
let page: Page;

const panel = () => page.getByTestId('export-panel');
const reportsDir = () => join(session.folders.workspace, 'reports');
const reportFolders = () => (existsSync(reportsDir()) ? readdirSync(reportsDir()) : []);
const pdfText = (file: string) =>
  execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' })
    .replace(/\s+/g, ' ')
    .replace(/\u00ad/g, '');

/** Whether the PDF text holds the pattern; a miss names the pattern and shows the first page only. */
function expectIn(text: string, pattern: string | RegExp): void {
  const found = typeof pattern === 'string' ? text.includes(pattern) : pattern.test(text);
  expect(found, `${String(pattern)} in the PDF, whose first page reads: ${text.slice(0, 600)}`).toBe(true);
}

/** Waits for the running export to end; an export that failed fails the test with the panel's words. */
async function finished(): Promise<string> {
  const end = panel().locator('[data-testid="export-written"], [data-testid="export-error"]');
  await end.first().waitFor({ timeout: EXPORT_MS });
  const error = panel().getByTestId('export-error');
  if (await error.isVisible()) throw new Error(`the export failed: ${await error.textContent()}`);
  return (await panel().getByTestId('export-folder').textContent())!.trim();
}

/** Chooses the formats and units in the panel, writes the package and returns the folder it names. */
async function writePackage(formats: string[], units: 'SI' | 'US customary'): Promise<string> {
  for (const label of ['PDF calculation sheet', 'CSV tables', 'XLSX workbook', 'Figures as PNG', 'Figures as SVG'])
    await panel().getByLabel(label).setChecked(formats.includes(label));
  await panel()
    .getByRole('radio', { name: new RegExp(`^${units}`) })
    .check();
  await panel().getByRole('button', { name: 'Write the package' }).click();
  return finished();
}

beforeAll(async () => {
  session = await openWorkspaceSession({ 'quillmere-reservoir.gpsite': DEMO });
  ({ page } = session);
  await page.getByRole('button', { name: 'Open…', exact: true }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'quillmere-reservoir.gpsite' }).click();
  await page.getByTestId('file-name').getByText('quillmere-reservoir.gpsite', { exact: true }).waitFor();
  await page.locator('[data-verdict]').first().waitFor({ timeout: EXPORT_MS });
}, 240_000);

afterAll(async () => {
  await session?.close();
});

describe('calc package from the workspace (browser shell)', () => {
  it('writes the site as shown, unsaved edit included, into a workspace folder it names, one export at a time', async () => {
    // an edit not saved: the package must hold it, and the panel must say so
    await page.getByLabel('Site', { exact: true }).fill(EDITED_SITE);
    await expect.poll(() => page.getByTestId('file-name').textContent()).toContain('unsaved');
    await page.getByRole('button', { name: 'Export…' }).click();
    await expect.poll(() => panel().getByTestId('export-unsaved').textContent()).toMatch(/unsaved changes/);
    await expect.poll(() => panel().textContent()).toMatch(/under reports\/ in the workspace folder/);

    for (const label of ['XLSX workbook', 'Figures as PNG', 'Figures as SVG'])
      await panel().getByLabel(label).setChecked(false);
    await panel().getByLabel('PDF calculation sheet').setChecked(true);
    await panel().getByLabel('CSV tables').setChecked(true);
    await panel().getByRole('radio', { name: /^SI/ }).check();
    let requests = 0;
    page.on('request', (r) => void (r.url().includes('/api/report.export') && requests++));
    const write = panel().getByRole('button', { name: 'Write the package' });
    await write.click();

    // while the worker runs: progress with elapsed time, no second start, and the workspace still answers
    await panel().getByRole('progressbar').waitFor();
    const writing = panel().getByRole('button', { name: 'Writing…' });
    expect(await writing.getAttribute('aria-disabled')).toBe('true');
    // a second click while running (past Playwright's wait for an enabled button): no second request or folder
    await writing.click({ force: true });
    await page.getByRole('button', { name: 'Exporting…' }).waitFor();
    await page.getByRole('radio', { name: 'Early winter' }).check();
    await expect.poll(() => page.locator('#section-title').textContent()).toContain('Early winter');
    await expect.poll(() => panel().getByTestId('export-elapsed').textContent()).toMatch(/— \d+ s$/);

    const outDir = await finished();
    expect(reportFolders()).toHaveLength(1);
    expect(requests).toBe(1);
    const rel = relative(session.folders.workspace, outDir);
    expect(isAbsolute(rel) || rel.startsWith('..')).toBe(false);
    expect(rel).toMatch(/^reports[\\/]/);

    // every file the panel lists is on disk, and the PDF and the compliance table are among them
    const listed = await panel().getByRole('list', { name: 'files written' }).getByRole('listitem').allTextContents();
    const names = listed.filter((t) => !t.endsWith(')'));
    const pdf = readdirSync(outDir).find((f) => f.endsWith('.pdf'));
    expect(pdf, 'the PDF calc sheet').toBeDefined();
    expect(names).toContain(pdf);
    expect(existsSync(join(outDir, 'tables', 'compliance.csv'))).toBe(true);
    for (const f of readdirSync(join(outDir, 'tables'))) expect(names).toContain(f);
    expect(readdirSync(outDir).some((f) => f.endsWith('.xlsx'))).toBe(false);
    await expect.poll(() => panel().getByTestId('export-written').textContent()).toMatch(/changes not saved/);

    // the PDF holds the edited (unsaved) site name, the SI edition and the compliance verdicts shown on screen
    const text = pdfText(join(outDir, pdf!));
    expectIn(text, EDITED_SITE);
    expectIn(text, /Display units SI\b/);
    const shown = await page
      .locator('[data-verdict]')
      .evaluateAll((rows) => rows.map((r) => r.getAttribute('data-verdict')!));
    expect(shown.length).toBeGreaterThan(0);
    for (const v of new Set(shown)) expectIn(text, v);

    // the CSV's verdicts are the screen's, row for row (one assessment behind both)
    const csv = Papa.parse<Record<string, string>>(readFileSync(join(outDir, 'tables', 'compliance.csv'), 'utf8'), {
      header: true,
      skipEmptyLines: true,
    }).data;
    const verdictColumn = Object.keys(csv[0]).find((k) => /verdict/i.test(k))!;
    expect(csv.map((r) => r[verdictColumn]).sort()).toEqual([...shown].sort());
    // the file on disk was not touched by the export
    expect(readFileSync(join(session.folders.workspace, 'quillmere-reservoir.gpsite'), 'utf8')).toBe(DEMO);
  }, 150_000);

  it('writes the US customary edition into a folder of its own', async () => {
    const outDir = await writePackage(['PDF calculation sheet'], 'US customary');
    expect(reportFolders()).toHaveLength(2);
    await expect.poll(() => panel().getByTestId('export-written').textContent()).toMatch(/US customary units/);
    const pdf = readdirSync(outDir).find((f) => f.endsWith('.pdf'))!;
    expect(readdirSync(outDir).filter((f) => f.endsWith('.csv') || f === 'tables')).toEqual([]);
    const text = pdfText(join(outDir, pdf));
    expectIn(text, EDITED_SITE);
    expectIn(text, /Display units US customary\b/);
    // temperatures in °F (the demo's effluent and ambient temperatures are printed in the compliance table)
    expectIn(text, '°F');
  }, 150_000);

  it('refuses to export while a field holds text the site does not take, naming the field', async () => {
    const depth = page.getByLabel('Greatest depth');
    await depth.fill('-5 m');
    await panel().getByRole('button', { name: 'Write the package' }).click();
    const error = panel().getByTestId('export-error');
    await error.waitFor();
    expect(await error.textContent()).toMatch(/^Not exported: Greatest depth .*-5 m/);
    expect(reportFolders()).toHaveLength(2);
    await depth.fill('38 m');
    await expect.poll(() => page.getByTestId('file-name').textContent()).toContain('unsaved');
  }, 60_000);

  it('says in words why nothing was written when the shell does not answer, and closes with Escape', async () => {
    await session.shell.stop();
    await panel().getByRole('button', { name: 'Write the package' }).click();
    const error = panel().getByTestId('export-error');
    await error.waitFor({ timeout: EXPORT_MS });
    expect(await error.textContent()).toMatch(/^The package was not written: the gprime shell did not answer/);
    expect(await panel().getByRole('button', { name: 'Write the package' }).isEnabled()).toBe(true);
    expect(reportFolders()).toHaveLength(2);
    // Escape closes the panel and gives the focus back to the button that opened it
    await page.keyboard.press('Escape');
    await expect.poll(() => panel().count()).toBe(0);
    await expect
      .poll(() => page.getByRole('button', { name: 'Export…' }).evaluate((b) => b === b.ownerDocument.activeElement))
      .toBe(true);
  }, 150_000);
});
