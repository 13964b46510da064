import { createHash } from 'node:crypto';
import { mkdirSync, renameSync, writeFileSync } from 'node:fs';
import { basename, dirname, extname, join } from 'node:path';
import { assessSite, loadSite, type Assessment } from '../../shared-core/site';
import { buildReportModel, type ReportModel } from '../../shared-core/report/model';
import { slug } from '../../shared-core/report/format';
import { isIssueDate } from '../../shared-core/report/document';
import type { UnitSystem } from '../../shared-core/units/units';
import { GPRIME_VERSION, type LoadedSite } from '../services/site-file';
import { UsageError } from '../cli/errors';
import { DEFAULT_CHART_SIZE, renderChartPng, renderChartRgb, renderChartSvg, type ChartSize } from './chart-render';
import { buildPdf, type ChartPixels } from './pdf-report';
import { buildXlsx, chartCsv, complianceCsv, estimateCsv, summaryCsv } from './tables';

/**
 * The export service shared by the CLI (`gprime assess --out`), the Electron main process and the browser
 * shell: renders the report model to PDF, chart PNG/SVG (+ CSV of each chart's data), CSV and XLSX tables.
 */

export const REPORT_FORMATS = ['pdf', 'png', 'svg', 'csv', 'xlsx'] as const;
export type ReportFormat = (typeof REPORT_FORMATS)[number];

export interface ReportOptions {
  outDir: string;
  formats?: string[];
  units: UnitSystem;
  /** chart size and resolution (default 6.5 × 4.2 in at 300 dpi) */
  chart?: Partial<ChartSize>;
  /** date of issue of the document (YYYY-MM-DD); without it the package is a draft for checking */
  issueDate?: string;
}

/** One output file: path relative to the output folder and its bytes. */
export interface ReportFile {
  path: string;
  bytes: Uint8Array | string;
}

function checkFormats(formats: readonly string[] | undefined): ReportFormat[] {
  if (!formats || formats.length === 0) return [...REPORT_FORMATS];
  const bad = formats.filter((f) => !(REPORT_FORMATS as readonly string[]).includes(f));
  if (bad.length)
    throw new UsageError(
      `--format: unknown format ${bad.map((b) => `"${b}"`).join(', ')}; choose from ${REPORT_FORMATS.join(', ')}`,
    );
  return [...new Set(formats)] as ReportFormat[];
}

/**
 * Renders the report files in memory. `stem` names the PDF and workbook; charts go to charts/, tables to
 * tables/. The same model gives the same files (the PDF and workbook dates are the project date).
 */
export async function renderReport(
  model: ReportModel,
  formats: readonly ReportFormat[],
  stem: string,
  projectDate: string,
  chart: Partial<ChartSize> = {},
): Promise<ReportFile[]> {
  const files: ReportFile[] = [];
  const want = new Set(formats);
  const control = model.documentControl;
  const stamp = `${control.number} rev ${control.revision} · site file SHA-256 ${model.siteHash}`;
  const size = { ...DEFAULT_CHART_SIZE, stamp, ...chart };
  const charts = model.estimates.flatMap((s) => s.charts);
  const pdfCharts = new Map<string, ChartPixels>();
  for (const c of charts) {
    if (want.has('png')) files.push({ path: `charts/${c.id}.png`, bytes: renderChartPng(c, size) });
    if (want.has('svg')) files.push({ path: `charts/${c.id}.svg`, bytes: renderChartSvg(c, size) });
    if (want.size) files.push({ path: `charts/${c.id}.csv`, bytes: chartCsv(c) });
    if (want.has('pdf')) pdfCharts.set(c.id, renderChartRgb(c, { ...size, caption: false, stamp: undefined }));
  }
  if (want.has('pdf')) files.push({ path: `${stem}.pdf`, bytes: await buildPdf(model, pdfCharts, projectDate) });
  if (want.has('xlsx')) files.push({ path: `${stem}.xlsx`, bytes: await buildXlsx(model, projectDate) });
  if (want.has('csv')) {
    files.push({ path: 'tables/summary.csv', bytes: summaryCsv(model) });
    for (const s of model.estimates) files.push({ path: `tables/${slug(s.id, 80)}.csv`, bytes: estimateCsv(s) });
    const compliance = complianceCsv(model);
    if (compliance) files.push({ path: 'tables/compliance.csv', bytes: compliance });
  }
  return files;
}

/** Writes a file atomically (temporary name, then rename) so a reader never sees half a report. */
function writeAtomic(path: string, bytes: Uint8Array | string): void {
  mkdirSync(dirname(path), { recursive: true });
  const tmp = `${path}.${process.pid}.tmp`;
  writeFileSync(tmp, bytes);
  renameSync(tmp, path);
}

/** Writes the report files for an assessment into options.outDir; returns the written paths. */
export async function writeReport(
  loaded: LoadedSite,
  assessment: Assessment,
  options: ReportOptions,
): Promise<string[]> {
  const formats = checkFormats(options.formats);
  if (options.issueDate !== undefined && !isIssueDate(options.issueDate))
    throw new UsageError(`--issue-date: "${options.issueDate}" is not a calendar date YYYY-MM-DD`);
  const model = buildReportModel(assessment, options.units, loaded.site, { issueDate: options.issueDate });
  const stem = slug(basename(loaded.path, extname(loaded.path)) || loaded.site.project.site);
  const files = await renderReport(model, formats, stem, loaded.site.project.date, options.chart);
  mkdirSync(options.outDir, { recursive: true });
  return files.map((f) => {
    const path = join(options.outDir, f.path);
    writeAtomic(path, f.bytes);
    return path;
  });
}

/**
 * The report of a site document given as text (Electron main process and browser shell, through
 * export-in-worker.ts): validates it, assesses it and writes the files. `name` names the output files (e.g. the
 * document's file name); `version` is the gprime version the report names.
 */
export async function exportSiteReport(
  text: string,
  name: string,
  options: ReportOptions,
  version = GPRIME_VERSION,
): Promise<string[]> {
  const site = loadSite(text);
  const hash = createHash('sha256').update(Buffer.from(text, 'utf8')).digest('hex');
  const assessment = assessSite(site, { gprimeVersion: version, siteHash: hash });
  return writeReport({ site, hash, path: name }, assessment, options);
}
