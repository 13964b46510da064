import ExcelJS from 'exceljs';
import type { ChartSpec } from '../../shared-core/report/charts';
import type { EstimateSection, QuantityRow, ReportModel } from '../../shared-core/report/model';

/**
 * Tables of inputs and results: one CSV per estimate and one XLSX workbook with a sheet per estimate.
 * Numbers are written as numbers at full precision in the display units; units are in their own column or in
 * the header; workbook cells are typed (numbers as numbers, text as text).
 */

function csvCell(v: string | number | null): string {
  if (v === null) return '';
  if (typeof v === 'number') return Number.isFinite(v) ? String(v) : '';
  return /[",\n\r]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v;
}

export function toCsv(rows: readonly (readonly (string | number | null)[])[]): string {
  return rows.map((r) => r.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

const quantityLine = (section: string) => (q: QuantityRow) => [
  section,
  q.key,
  q.name,
  q.description,
  q.value,
  q.unit === '1' ? '' : q.unit,
];

/** Band rows of the CSV: standard uncertainty of each varied input; low, median and high of each result. */
function uncertaintyLines(s: EstimateSection): (string | number)[][] {
  const u = s.uncertainty;
  if (!u) return [];
  const pc = Math.round(u.coverage * 100);
  const lo = (100 - pc) / 2;
  return [
    ...u.inputs.map((i) => [
      'input standard uncertainty',
      '',
      i.name,
      `one standard deviation (nominal ${i.nominal})`,
      i.standardUncertaintyValue,
      i.unit,
    ]),
    ...u.rows.flatMap((r) => [
      [`band low (${lo} %)`, '', r.name, u.caption, r.values[1], r.unit],
      ['band median', '', r.name, u.caption, r.values[2], r.unit],
      [`band high (${100 - lo} %)`, '', r.name, u.caption, r.values[3], r.unit],
    ]),
    ...u.warnings.map((w) => ['band warning', '', '', '', w, '']),
  ];
}

/** The CSV of one estimate: a row per input and result, then warnings and sources. */
export function estimateCsv(s: EstimateSection): string {
  return toCsv([
    ['section', 'name', 'label', 'description', 'value', 'unit'],
    ...s.inputs.map(quantityLine('input')),
    ...s.results.map(quantityLine('result')),
    ...(s.error ? [['error', '', '', '', s.error, '']] : []),
    ...s.warnings.map((w) => ['warning', '', '', '', w, '']),
    ...uncertaintyLines(s),
    ...s.methods.map((m) => ['source', `[${m.reference}]`, m.title ?? '', m.equation ?? '', m.source, '']),
  ]);
}

/** The CSV of the report header: title block and caution, then the summary of estimates with numeric key results. */
export function summaryCsv(model: ReportModel): string {
  return toCsv([
    ['field', 'value'],
    ...model.titleBlock.map((r) => [r.label, r.value]),
    ['Caution', model.cautions[0]],
    [],
    ['estimate', 'title', 'status', 'key result', 'value', 'unit', 'warnings'],
    ...model.summary.map((r) => [
      r.id,
      r.title,
      r.status,
      r.key?.name ?? r.keyResult,
      r.key?.value ?? null,
      r.key?.shownUnit ?? '',
      r.warnings,
    ]),
  ]);
}

export function chartCsv(c: ChartSpec): string {
  return toCsv([c.table.header, ...c.table.rows]);
}

export function complianceCsv(model: ReportModel): string | null {
  return model.compliance ? toCsv([model.compliance.header, ...model.compliance.values]) : null;
}

/** Excel sheet names: ≤ 31 characters, none of \ / ? * [ ] :, unique. */
function sheetNames(ids: readonly string[]): string[] {
  const used = new Set<string>(['report', 'compliance']);
  return ids.map((id) => {
    const base = id.replace(/[\\/?*[\]:]/g, '-').slice(0, 31) || 'estimate';
    let name = base;
    for (let k = 2; used.has(name.toLowerCase()); k++) name = `${base.slice(0, 28)}~${k}`;
    used.add(name.toLowerCase());
    return name;
  });
}

function addQuantities(ws: ExcelJS.Worksheet, title: string, rows: readonly QuantityRow[]): void {
  ws.addRow([title]).font = { bold: true };
  const head = ws.addRow(['Name', 'Description', 'Value', 'Unit', 'Parameter']);
  head.font = { bold: true };
  for (const q of rows) ws.addRow([q.name, q.description, q.value, q.shownUnit, q.key]);
  ws.addRow([]);
}

function addBands(ws: ExcelJS.Worksheet, s: EstimateSection): void {
  const u = s.uncertainty!;
  ws.addRow(['Uncertainty band', u.caption]).font = { bold: true };
  ws.addRow(['Input', 'Standard uncertainty (one s.d.)', 'Nominal', 'Unit']).font = { bold: true };
  for (const i of u.inputs) ws.addRow([i.name, i.standardUncertaintyValue, i.nominalValue, i.unit]);
  const pc = Math.round(u.coverage * 100);
  ws.addRow([
    'Result',
    'Nominal',
    `Low (${(100 - pc) / 2} %)`,
    'Unit',
    'Median',
    `High (${100 - (100 - pc) / 2} %)`,
  ]).font = { bold: true };
  for (const r of u.rows) ws.addRow([r.name, r.values[0], r.values[1], r.unit, r.values[2], r.values[3]]);
  for (const w of u.warnings) ws.addRow(['', w]);
  ws.addRow([]);
}

/** The workbook: a "Report" sheet (title block, caution, summary), one sheet per estimate, compliance. */
export async function buildXlsx(model: ReportModel, projectDate: string): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  const t = Date.parse(projectDate);
  const date = Number.isFinite(t) ? new Date(t) : new Date(Date.UTC(2000, 0, 1));
  wb.creator = `gprime ${model.gprimeVersion}`;
  wb.created = date;
  wb.modified = date;
  const report = wb.addWorksheet('Report');
  report.columns = [{ width: 24 }, { width: 90 }];
  report.addRow([model.title]).font = { bold: true, size: 14 };
  report.addRow([model.subtitle]);
  report.addRow([]);
  for (const r of model.titleBlock) report.addRow([r.label, r.value]);
  report.addRow([]);
  const caution = report.addRow(['Caution', model.cautions[0]]);
  caution.font = { bold: true };
  caution.alignment = { wrapText: true, vertical: 'top' };
  report.addRow([]);
  report.addRow(['Estimate', 'Key result', 'Value', 'Unit', 'Warnings']).font = { bold: true };
  for (const r of model.summary)
    report.addRow([r.id, r.key?.name ?? r.keyResult, r.key?.value ?? null, r.key?.shownUnit ?? '', r.warnings]);

  const names = sheetNames(model.estimates.map((s) => s.id));
  model.estimates.forEach((s, i) => {
    const ws = wb.addWorksheet(names[i]);
    ws.columns = [{ width: 24 }, { width: 60 }, { width: 18 }, { width: 12 }];
    ws.addRow([s.title]).font = { bold: true, size: 12 };
    ws.addRow(['Estimate id', s.id]);
    ws.addRow(['Method', `${s.methodTitle} (${s.method})`]);
    if (s.feature) ws.addRow(['Feature', s.feature]);
    if (s.condition) ws.addRow(['Condition', s.condition]);
    if (s.error) ws.addRow(['Not computed', s.error]);
    ws.addRow([]);
    addQuantities(ws, 'Inputs', s.inputs);
    if (s.status === 'ok') addQuantities(ws, 'Results', s.results);
    if (s.uncertainty) addBands(ws, s);
    ws.addRow(['Validity warnings']).font = { bold: true };
    for (const w of s.warnings) ws.addRow(['', w]);
    if (!s.warnings.length) ws.addRow(['', 'none']);
    ws.addRow([]);
    ws.addRow(['Sources']).font = { bold: true };
    for (const m of s.methods) ws.addRow([`[${m.reference}] ${m.title ?? ''}`.trim(), m.source]);
    ws.getColumn(2).alignment = { wrapText: true, vertical: 'top' };
  });
  if (model.compliance) {
    const ws = wb.addWorksheet('Compliance');
    ws.addRow(model.compliance.header).font = { bold: true };
    for (const r of model.compliance.values) ws.addRow(r);
    ws.columns.forEach((c) => (c.width = 16));
  }
  return Buffer.from(await wb.xlsx.writeBuffer());
}
