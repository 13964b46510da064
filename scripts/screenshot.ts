// Opens the demo site in the browser shell and saves docs/workspace.png (1440×900), plus a 200 % zoom view
// and the detail of an estimate: npx tsx scripts/screenshot.ts
import { copyFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { launchChromium, ROOT, startShell, tempFolders } from '../test/e2e/shell-process';

const folders = tempFolders();
mkdirSync(folders.workspace, { recursive: true });
copyFileSync(
  join(ROOT, 'examples', 'quillmere-reservoir.gpsite'),
  join(folders.workspace, 'quillmere-reservoir.gpsite'),
);
const shell = await startShell(folders.workspace, folders.dataDir);
const browser = await launchChromium();
try {
  const shot = async (zoom: number, file: string, detail = false) => {
    const page = await browser.newPage({
      viewport: { width: Math.round(1440 / zoom), height: Math.round(900 / zoom) },
      deviceScaleFactor: zoom,
    });
    await page.goto(shell.url);
    await page.getByRole('button', { name: 'Open…' }).click();
    await page.getByRole('button', { name: 'quillmere-reservoir.gpsite' }).click();
    await page.getByText('quillmere-reservoir.gpsite', { exact: true }).waitFor();
    // the assessment arrives from its worker: wait for the cards and the profile strip
    await page.locator('[data-estimate]').first().waitFor();
    if (zoom === 1) await page.getByRole('button', { name: 'Treatment works outfall', exact: false }).first().click();
    if (detail)
      await page
        .locator('[data-estimate="plume-summer"]')
        .getByRole('button', { name: /detail/i })
        .click();
    await page.waitForTimeout(400);
    mkdirSync(join(ROOT, 'docs'), { recursive: true });
    await page.screenshot({ path: join(ROOT, 'docs', file) });
    await page.close();
  };
  await shot(1, 'workspace.png');
  await shot(2, 'workspace-zoom200.png');
  await shot(1, 'workspace-detail.png', true);
  process.stdout.write('wrote docs/workspace.png, docs/workspace-zoom200.png, docs/workspace-detail.png\n');
} finally {
  await browser.close();
  await shell.stop();
  folders.remove();
}
