import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { assessSite } from '../shared-core/site';
import { writeReport } from '../src-main/report/write-report';
import { DEMO_PATH, loadDemo, META } from './demo';
import { medianMsAsync, ms, type Measured } from './harness';

const RUNS = 3;

/** Writing the demo reservoir's PDF calc sheet (charts drawn, fonts embedded), assessment not timed; after one warm-up. */
export async function benchPdf(): Promise<Measured> {
  const site = loadDemo();
  const assessment = assessSite(site, META);
  const loaded = { site, hash: META.siteHash, path: DEMO_PATH };
  const dir = mkdtempSync(join(tmpdir(), 'gprime-bench-'));
  try {
    const write = (run: number) =>
      writeReport(loaded, assessment, { outDir: join(dir, String(run)), formats: ['pdf'], units: site.units });
    await write(-1);
    const t = await medianMsAsync(RUNS, write);
    return {
      values: { pdf_report_ms: t },
      lines: [
        `${'Demo reservoir PDF calc sheet'.padEnd(44)} ${ms(t).padStart(10)}   median of ${RUNS} after a warm-up`,
      ],
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
