// End-to-end: field data in without surprises and nothing typed lost — the Save as question, an emptied
// field, "1,500" in a profile cell, an instrument export imported through the workspace, a heading the
// reader does not know, and recovery after the shell process was killed (Debian chromium, browser shell).
import { spawn } from 'node:child_process';
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, ROOT, tempFolders, type ShellProcess } from './shell-process';

const DEMO = readFileSync(join(ROOT, 'examples', 'quillmere-reservoir.gpsite'), 'utf8');

/** A port free at the moment: the shell is restarted on it, so the page keeps its address (and its storage). */
function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const s = createServer();
    s.once('error', fail);
    s.listen(0, '127.0.0.1', () => {
      const port = (s.address() as { port: number }).port;
      s.close(() => done(port));
    });
  });
}

/** `npm run serve` on a given port (the shared helper picks a random one). */
function startShellOn(port: number, workspace: string, dataDir: string): Promise<ShellProcess> {
  const proc = spawn(
    process.execPath,
    [
      '--import',
      'tsx',
      'src-main/shell/serve.ts',
      '--workspace',
      workspace,
      '--data-dir',
      dataDir,
      '--port',
      `${port}`,
    ],
    { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'], env: { ...process.env, GPRIME_DATA_DIR: dataDir } },
  );
  const exited = new Promise<void>((done) => proc.once('exit', () => done()));
  const stop = async (signal: NodeJS.Signals = 'SIGTERM') => {
    if (proc.exitCode === null && proc.signalCode === null) proc.kill(signal);
    await exited;
  };
  let out = '';
  let err = '';
  proc.stderr!.on('data', (b: Buffer) => (err += b.toString()));
  return new Promise((done, fail) => {
    const timer = setTimeout(() => void stop('SIGKILL').then(() => fail(new Error(`no address\n${err}`))), 120_000);
    proc.stdout!.on('data', (b: Buffer) => {
      out += b.toString();
      const m = /gprime workspace: (http:\/\/127\.0\.0\.1:\d+\/\?token=\S+)/.exec(out);
      if (m) {
        clearTimeout(timer);
        done({ url: m[1], proc, stop });
      }
    });
    proc.once('exit', (code) => {
      clearTimeout(timer);
      fail(new Error(`the shell exited (${code})\n${err}`));
    });
  });
}

let folders: ReturnType<typeof tempFolders>;
let port: number;
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

beforeAll(async () => {
  folders = tempFolders();
  mkdirSync(folders.workspace, { recursive: true });
  writeFileSync(join(folders.workspace, 'quillmere.gpsite'), DEMO);
  port = await freePort();
  shell = await startShellOn(port, folders.workspace, folders.dataDir);
  browser = await launchChromium();
  page = await openPage(shell.url);
}, 180_000);

afterAll(async () => {
  await browser?.close();
  await shell?.stop();
  folders?.remove();
});

const status = () => page.locator('[role="status"], .status').allTextContents();

describe('nothing typed is lost, nothing stale is kept', () => {
  it('asks before Save as replaces an existing site file, and replaces it only when told to', async () => {
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await page.getByLabel('Name', { exact: true }).first().fill('Overwrite check');
    await page.getByRole('button', { name: 'Save as…' }).click();
    await page.getByRole('dialog').getByLabel('File name').fill('quillmere');
    await page.getByRole('dialog').getByRole('button', { name: 'Save', exact: true }).click();
    const question = page.locator('#replace-question');
    await question.waitFor();
    expect(await question.textContent()).toMatch(/“quillmere\.gpsite” is already in the workspace folder/);
    // nothing was written yet
    expect(readFileSync(join(folders.workspace, 'quillmere.gpsite'), 'utf8')).toBe(DEMO);
    await page.getByRole('dialog').getByRole('button', { name: 'Choose another name' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
    expect(readFileSync(join(folders.workspace, 'quillmere.gpsite'), 'utf8')).toBe(DEMO);

    await page.getByRole('button', { name: 'Save as…' }).click();
    await page.getByRole('dialog').getByLabel('File name').fill('quillmere');
    await page.getByRole('dialog').getByRole('button', { name: 'Save', exact: true }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Replace it' }).click();
    await expect
      .poll(() => readFileSync(join(folders.workspace, 'quillmere.gpsite'), 'utf8'))
      .toContain('Overwrite check');
  });

  it('removes an emptied or out-of-range value from the site, says why at the field and refuses to save', async () => {
    await page.getByRole('button', { name: 'New', exact: true }).click();
    const depth = page.getByLabel('Greatest depth');
    await depth.fill('');
    const field = page.locator('.field', { has: depth });
    const error = field.locator('.error');
    await expect.poll(() => error.textContent()).toMatch(/a value is needed/);
    // the input is described by the error element that is really there
    const described = (await depth.getAttribute('aria-describedby'))!.split(' ');
    const errorId = await error.getAttribute('id');
    expect(described).toContain(errorId);
    // the range of the methods, read from them: below the least depth they accept
    await depth.fill('-4 m');
    await expect.poll(() => error.textContent()).toMatch(/outside what the methods accept/);
    expect(await depth.inputValue()).toBe('-4 m'); // the text typed stays in the field
    // help under the field: what, unit range and which methods use it
    expect(await field.locator('.help').textContent()).toMatch(/Used by: .+/);
    await page.keyboard.press('Control+s');
    await page.getByRole('dialog').getByLabel('File name').fill('emptied');
    await page.getByRole('dialog').getByRole('button', { name: 'Save', exact: true }).click();
    await expect.poll(async () => (await status()).join(' ')).toMatch(/Not saved: Greatest depth holds “-4 m”/);
    await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
    await depth.fill('30 m');
    await expect.poll(() => field.locator('.error').count()).toBe(0);
  });

  it('reads "1,500" in a profile cell as fifteen hundred under US units and names both readings otherwise', async () => {
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await page.getByRole('button', { name: /Condition 1/ }).click();
    const cell = page.getByLabel('row 2, depth (m)');
    await cell.fill('1,500');
    const why = page.locator('td', { has: cell }).locator('.why');
    await expect.poll(() => why.textContent(), { timeout: 15_000 }).toMatch(/1500.*1\.5|1\.5.*1500/);
    // under US customary display the decimal mark is a point: "1,500" is grouped thousands
    await page.getByRole('radio', { name: 'US' }).check();
    await cell.fill('1,501');
    await expect.poll(() => why.count(), { timeout: 15_000 }).toBe(0);
    await page.getByRole('radio', { name: 'SI' }).check();
    expect(await cell.inputValue()).toBe('1,501');
  });

  it('imports an instrument export (preamble, date and time, pressure, conductivity, gaps) and says what it did', async () => {
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await page.getByRole('button', { name: /Condition 1/ }).click();
    // an invented logger export: the preamble and the "NaN" gap are the point, not the numbers
    const csv = [
      '* Logger export, invented test cast',
      '* Serial: 0000',
      'Station: X1',
      'Date,Time,Pressure (dbar),Temperature (degC),Conductivity (mS/cm),DO (mg/L)',
      '2026-08-14,09:00:01,1.0,18.2,42.10,8.1',
      '2026-08-14,09:00:02,2.0,18.1,42.15,',
      '2026-08-14,09:00:03,3.0,NaN,42.20,7.9',
      '2026-08-14,09:00:04,4.0,16.5,42.60,7.5',
      '2026-08-14,09:00:05,5.0,14.0,43.00,7.0',
      '2026-08-14,09:00:06,6.0,12.2,43.20,6.8',
    ].join('\n');
    await page
      .getByTestId('csv-input')
      .setInputFiles({ name: 'cast.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await expect.poll(() => page.locator('table[aria-label="profile samples"] tbody tr').count()).toBe(6);
    expect(await page.getByTestId('import-notes').textContent()).toMatch(/Skipped 3 line\(s\)/);
    const notes = page.getByTestId('reading-notes');
    await expect.poll(() => notes.textContent(), { timeout: 15_000 }).toMatch(/Depth from sea pressure/);
    const text = (await notes.textContent())!;
    expect(text).toMatch(/Salinity from in-situ conductivity/);
    expect(text).toMatch(/Skipped row 3/);
    expect(text).not.toMatch(/⟦/); // quantities shown, never raw tokens
  });

  it('takes a 150 000-row logger profile: the table shows it a page at a time and nothing overflows', async () => {
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(String(e)));
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await page.getByRole('button', { name: /Condition 1/ }).click();
    const rows = 150_000;
    const lines = ['depth (m),temperature (degC)'];
    // an invented smooth cast, 0.2 mm apart: 20 °C at the top to 8 °C at 30 m
    for (let i = 0; i < rows; i++) lines.push(`${(i * 0.0002).toFixed(4)},${(20 - (12 * i) / rows).toFixed(4)}`);
    await page
      .getByTestId('csv-input')
      .setInputFiles({ name: 'logger.csv', mimeType: 'text/csv', buffer: Buffer.from(lines.join('\n')) });
    await expect
      .poll(() => page.getByLabel('profile rows shown').textContent(), { timeout: 60_000 })
      .toMatch(/Rows 1–200 of 150000/);
    expect(await page.locator('table[aria-label="profile samples"] tbody tr').count()).toBe(200);
    await page.getByRole('button', { name: 'Next rows' }).click();
    expect(await page.getByLabel('row 201, depth (m)').inputValue()).toBe('0.04');
    await page.waitForTimeout(3000);
    expect(errors.filter((e) => /call stack/i.test(e))).toEqual([]);
  }, 120_000);

  it('asks which column is which when the headings are not recognised', async () => {
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await page.getByRole('button', { name: /Condition 1/ }).click();
    const csv = 'Tiefe;Wassertemp\n0;20,5\n5;18,0\n10;12,5\n';
    await page
      .getByTestId('csv-input')
      .setInputFiles({ name: 'lake.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    const mapping = page.getByTestId('column-mapping');
    await mapping.waitFor({ timeout: 15_000 });
    await mapping.getByLabel('what column “Tiefe” measures').selectOption('depth');
    await mapping.getByLabel('unit of column “Tiefe”').fill('m');
    await mapping.getByLabel('what column “Wassertemp” measures').selectOption('temperature');
    await mapping.getByLabel('unit of column “Wassertemp”').fill('degC');
    await mapping.getByRole('button', { name: 'Use these columns' }).click();
    await expect.poll(() => page.getByTestId('column-mapping').count(), { timeout: 15_000 }).toBe(0);
    expect(await page.getByLabel('column 1 heading (name and unit)').inputValue()).toBe('depth (m)');
    expect(await page.getByLabel('column 2 heading (name and unit)').inputValue()).toBe('temperature (degC)');
  });

  it('says at once that the killed shell stopped answering, keeps the edits and offers them at the next start', async () => {
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await shell.stop('SIGKILL');
    await page.getByLabel('Name', { exact: true }).first().fill('Typed while the shell was down');
    const banner = page.getByTestId('shell-unreachable');
    await banner.waitFor({ timeout: 10_000 });
    expect(await banner.textContent()).toMatch(/not answering.*kept in this browser/s);
    await expect
      .poll(
        () =>
          page.evaluate(() =>
            JSON.stringify(
              Object.entries((globalThis as unknown as { localStorage: Record<string, string> }).localStorage),
            ),
          ),
        { timeout: 10_000 },
      )
      .toContain('Typed while the shell was down');

    shell = await startShellOn(port, folders.workspace, folders.dataDir);
    // the same tab at the same address: its storage is where the edits were kept
    await page.goto(shell.url);
    await page.getByRole('button', { name: 'New', exact: true }).waitFor();
    const offer = page.getByTestId('recovery-offer');
    await offer.waitFor();
    // earlier tests of this file left autosaves in the shell too: the offer kept in this browser is the newest
    expect(await offer.textContent()).toMatch(/kept in this browser/);
    await offer.getByRole('button', { name: 'Recover' }).click();
    await expect
      .poll(() => page.getByLabel('Name', { exact: true }).first().inputValue())
      .toBe('Typed while the shell was down');
    // autosave goes on into this document's recovery file in the shell's data folder now that it answers again
    await page.getByLabel('Name', { exact: true }).first().fill('Typed after the restart');
    const kept = () => {
      try {
        const dir = folders.dataDir;
        return readdirSync(dir)
          .filter((n) => /^recovery-[\w-]+\.json$/.test(n))
          .map((n) => readFileSync(join(dir, n), 'utf8'))
          .join('\n');
      } catch {
        return '';
      }
    };
    await expect.poll(kept, { timeout: 10_000 }).toContain('Typed after the restart');
  }, 180_000);
});
