import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { afterAll, describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';
import { sentenceIn } from '../../shared-core/units/sentence';

const out = mkdtempSync(join(tmpdir(), 'gprime-assess-'));
afterAll(() => rmSync(out, { recursive: true, force: true }));

describe('gprime assess --out (real CLI)', () => {
  it('writes PDF, PNG, SVG, CSV and XLSX whose numbers equal `assess --json`', { timeout: 180_000 }, () => {
    const site = 'examples/quillmere-reservoir.gpsite';
    const run = runGprime([
      'assess',
      site,
      '--out',
      out,
      '--format',
      'pdf,png,svg,csv,xlsx',
      '--issue-date',
      '2026-12-01',
    ]);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/Wrote \d+ files to /);
    expect(run.stdout).toContain('Screening estimate only');
    for (const f of ['quillmere-reservoir.pdf', 'quillmere-reservoir.xlsx', 'tables/summary.csv'])
      expect(existsSync(join(out, f)), f).toBe(true);
    const json = runGprime(['assess', site, '--json']).json;
    for (const e of json.estimates) {
      const rows = Papa.parse<Record<string, string>>(readFileSync(join(out, 'tables', `${e.id}.csv`), 'utf8'), {
        header: true,
        skipEmptyLines: true,
      }).data;
      for (const [name, r] of Object.entries(e.results as Record<string, { value: number | string }>)) {
        const row = rows.find((x) => x.section === 'result' && x.name === name)!;
        expect(typeof r.value === 'number' ? Number(row.value) : row.value, `${e.id}.${name}`).toBe(
          typeof r.value === 'number' ? r.value : sentenceIn(r.value, 'si'),
        );
      }
    }
    const text = execFileSync('pdftotext', [join(out, 'quillmere-reservoir.pdf'), '-'], { encoding: 'utf8' }).replace(
      /\s+/g,
      ' ',
    );
    expect(text).toContain(json.siteHash);
    expect(text).toContain(`gprime version ${json.gprimeVersion}`);
    expect(text).toContain('issued 2026-12-01');
    expect(text).not.toMatch(/rev \S+ · draft/);
  });

  it('exits 2 on an issue date that is not a calendar date', () => {
    const run = runGprime([
      'assess',
      'examples/amsel-estuary.gpsite',
      '--out',
      join(out, 'bad-date'),
      '--issue-date',
      '2026-13-45',
    ]);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/--issue-date: "2026-13-45" is not a calendar date YYYY-MM-DD/);
  });

  it('exits 2 on an unknown format', () => {
    const run = runGprime([
      'assess',
      'examples/amsel-estuary.gpsite',
      '--out',
      join(out, 'bad'),
      '--format',
      'pdf,docx',
    ]);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/unknown format "docx"/);
  });
});
