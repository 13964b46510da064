// End-to-end, in Debian's chromium against the browser shell: one document edited in the workspace gives
// the same numbers on the workspace's cards, in `gprime assess --json` of the saved file and in the report
// written from it (its CSV tables), because all three read one assessment (DEVELOPERS.md, "One way through").
// This is a plumbing check between views; the methods themselves are checked against published values in
// test/check-values.
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';
import { openWorkspaceSession, ROOT, type WorkspaceSession } from './shell-process';

const TEXT = readFileSync(join(ROOT, 'examples', 'quillmere-reservoir.gpsite'), 'utf8');
let session: WorkspaceSession;

beforeAll(async () => {
  session = await openWorkspaceSession({ 'quillmere-reservoir.gpsite': TEXT });
});
afterAll(async () => {
  await session?.close();
});

/** A number shown to four significant digits is within half a unit of the 4th digit of the value. */
const roundsTo = (shown: number, value: number) => Math.abs(shown - value) <= 5e-4 * Math.abs(value) + 1e-12;

describe('the workspace, the CLI and the report agree on an edited document', () => {
  it('an edited outfall discharge gives the same plume results in all three', async () => {
    const { page } = session;
    const reading = (id: string, name: string) =>
      page.locator(`[data-estimate="${id}"] [data-name="${name}"] [data-testid="reading-value"]`);
    await page.getByRole('button', { name: 'Open…', exact: true }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'quillmere-reservoir.gpsite' }).click();
    await expect.poll(() => reading('plume-summer', 'max_rise').count(), { timeout: 20_000 }).toBe(1);
    const before = await reading('plume-summer', 'max_rise').textContent();

    await page.getByRole('button', { name: /^Treatment works outfall/ }).click();
    await page.getByLabel('Effluent discharge (all ports)').fill('0.25 m3/s');
    await page.getByLabel('Effluent discharge (all ports)').press('Tab');
    await expect.poll(() => reading('plume-summer', 'max_rise').textContent(), { timeout: 20_000 }).not.toBe(before);
    const shown = Number(await reading('plume-summer', 'max_rise').textContent());

    await page.getByRole('button', { name: 'Save as…', exact: true }).click();
    await page.getByLabel('File name').fill('edited-outfall');
    await page.getByRole('dialog').getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => page.getByTestId('file-name').textContent()).toBe('edited-outfall.gpsite');
    const file = join(session.folders.workspace, 'edited-outfall.gpsite');
    expect(JSON.parse(readFileSync(file, 'utf8')).features[2].discharge).toBe('0.25 m3/s');

    const cli = runGprime(['assess', file, '--json']);
    const plume = cli.json.estimates.find((e: { id: string }) => e.id === 'plume-summer');
    expect(roundsTo(shown, plume.results.max_rise.value), `${shown} vs ${plume.results.max_rise.value}`).toBe(true);

    const out = mkdtempSync(join(tmpdir(), 'gprime-agree-'));
    const written = runGprime(['assess', file, '--out', join(out, 'r'), '--format', 'csv']);
    expect([0, 3]).toContain(written.code);
    const table = readFileSync(join(out, 'r', 'tables', 'plume-summer.csv'), 'utf8');
    const line = table.split('\n').find((l) => l.startsWith('result,max_rise'))!;
    const fromReport = Number(line.split(',').at(-2));
    expect(roundsTo(fromReport, plume.results.max_rise.value), `${fromReport} vs CLI`).toBe(true);

    // every compliance row: the workspace's verdict, required and achieved dilution are the CLI's, and the
    // report's table holds the same verdicts
    const compliance = readFileSync(join(out, 'r', 'tables', 'compliance.csv'), 'utf8');
    expect(cli.json.compliance.length).toBeGreaterThan(0);
    for (const r of cli.json.compliance) {
      const tr = page.locator(`tr[data-row="${r.constituent}|${r.zone}|${r.condition}"]`);
      expect(await tr.getAttribute('data-verdict')).toBe(r.verdict);
      const cells = await tr.locator('td.num').allTextContents();
      if (r.requiredDilution !== null) expect(roundsTo(Number(cells[0]), r.requiredDilution)).toBe(true);
      const achieved = Number(await tr.locator('td.num .total').textContent());
      if (r.achievedDilution !== null) expect(roundsTo(achieved, r.achievedDilution), `${cells[1]}`).toBe(true);
      expect(compliance).toContain(r.verdict);
    }
  });
});
