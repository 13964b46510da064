import { assessSite, SiteFileError, type Assessment } from '../../shared-core/site';
import { keyResultName } from '../../shared-core/calc/types';
import { sentenceIn } from '../../shared-core/units/sentence';
import { formatValue } from '../../shared-core/units/format';
import { qty } from '../../shared-core/core/quantity-text';
import type { UnitSystem } from '../../shared-core/units/units';
import { quantityText } from './format';
import { withSentencesIn } from './shown';
import { readSiteFile, GPRIME_VERSION } from '../services/site-file';
import { checkOutFolder } from './out-folder';
import { EXIT_NOT_ALL_OK, treatAsBadInput, UsageError, type CommandResult } from './errors';

treatAsBadInput(SiteFileError);

/** A short plain-text summary: per estimate its key result and warnings count, in the unit system given. */
export function summariseAssessment(a: Assessment, system: UnitSystem = 'si'): string {
  const say = (text: string) => sentenceIn(text, system);
  const lines = [
    `${a.project.name} — ${a.waterBody}`,
    `gprime ${a.gprimeVersion}, site file sha256 ${a.siteHash.slice(0, 16)}…`,
    '',
  ];
  for (const e of a.estimates) {
    const where = [e.feature?.name, e.condition?.name].filter(Boolean).join(', ');
    if (e.status === 'error') {
      lines.push(`✗ ${e.id} (${e.method}${where ? `; ${where}` : ''}): ${say(e.error ?? '')}`);
      continue;
    }
    if (e.status === 'incomplete')
      lines.push(
        `… ${e.id} (${e.method}${where ? `; ${where}` : ''}): incomplete, ${say(e.incomplete ?? 'stopped early')}`,
      );
    const key = keyResultName(e.results) ?? '';
    const r = e.results[key] ?? { value: '', unit: '' };
    const value = typeof r.value === 'number' ? quantityText(r.value, r.unit, system) : say(r.value);
    const band = e.uncertainty?.bands.find((b) => b.name === key);
    const bandText = band
      ? ` (${Math.round(e.uncertainty!.coverage * 100)} % band ${quantityText(band.low, band.unit, system)} … ${quantityText(band.high, band.unit, system)})`
      : '';
    lines.push(
      `• ${e.id} (${e.method}${where ? `; ${where}` : ''}): ${key} = ${value}${bandText}` +
        (e.warnings.length ? `  [${e.warnings.length} warning${e.warnings.length > 1 ? 's' : ''}]` : ''),
    );
  }
  if (a.checks.length) {
    lines.push('', 'Site checks:');
    for (const w of a.checks) lines.push(`  ! ${say(w.message)}`);
  }
  if (a.compliance.length) {
    lines.push('', 'Mixing-zone compliance (required vs achieved dilution at the boundary):');
    for (const r of a.compliance) {
      const f = (x: number | null) => (x === null ? '—' : formatValue(x));
      const edge = r.boundary === null ? '' : ` at ${sentenceIn(qty(r.boundary, 'm'), system)}`;
      const margin =
        r.margin === null ? '' : `, margin ${r.margin >= 0 ? '+' : '−'}${formatValue(Math.abs(r.margin) * 100, 3)} %`;
      lines.push(
        `  ${r.verdict.padEnd(13)} ${r.feature}, ${r.condition}, ${r.constituent} (${r.zone} zone${edge}): ` +
          `required ${f(r.requiredDilution)}, achieved ${f(r.achievedDilution)}${margin}${r.governing ? ' (governs)' : ''}`,
      );
    }
  }
  lines.push('', a.caution);
  return lines.join('\n');
}

/** Options of `gprime assess`. */
export interface AssessOptions {
  file: string;
  out?: string;
  formats?: string[];
  units?: 'si' | 'us';
  /** the package's issue date (YYYY-MM-DD); without it the package is a draft for checking */
  issueDate?: string;
}

export function parseAssessArgs(args: string[]): AssessOptions {
  const opts: AssessOptions = { file: '' };
  const given = new Set<string>();
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    const value = () => {
      const v = args[++i];
      if (v === undefined) throw new UsageError(`${a} needs a value`);
      return v;
    };
    if (['--out', '--format', '--units', '--issue-date'].includes(a) && given.has(a))
      throw new UsageError(`${a} is given twice`);
    given.add(a);
    if (a === '--out') opts.out = value();
    else if (a === '--issue-date') opts.issueDate = value();
    else if (a === '--format')
      opts.formats = value()
        .split(',')
        .map((s) => s.trim())
        .filter(Boolean);
    else if (a === '--units') {
      const u = value();
      if (u !== 'si' && u !== 'us') throw new UsageError(`--units takes si or us, not "${u}"`);
      opts.units = u;
    } else if (a.startsWith('--')) throw new UsageError(`unknown option ${a}`);
    else if (!opts.file) opts.file = a;
    else throw new UsageError(`unexpected argument "${a}"`);
  }
  if (!opts.file)
    throw new UsageError(
      'gprime assess needs a site file: gprime assess <site file> [--json] [--out <folder>] [--units si|us] [--issue-date YYYY-MM-DD]',
    );
  return opts;
}

/** Exit code 3 and a one-line reason when an estimate is 'error' or 'incomplete'; nothing when all are 'ok'. */
export function assessmentExit(a: Assessment): Pick<CommandResult, 'exitCode' | 'stderr'> {
  const count = (status: string) => a.estimates.filter((e) => e.status === status).length;
  const failed = count('error');
  const incomplete = count('incomplete');
  if (!failed && !incomplete) return {};
  const parts = [failed && `${failed} in error`, incomplete && `${incomplete} incomplete`].filter(Boolean);
  return {
    exitCode: EXIT_NOT_ALL_OK,
    stderr: `${parts.join(' and ')} of ${a.estimates.length} estimates (output written in full; exit code ${EXIT_NOT_ALL_OK})`,
  };
}

/** `gprime assess <site file> [--json]` evaluates every estimate of the site. */
export async function assessCommand(args: string[], json: boolean): Promise<CommandResult> {
  const opts = parseAssessArgs(args);
  if (opts.out) checkOutFolder(opts.out);
  const loaded = readSiteFile(opts.file);
  const assessment = assessSite(loaded.site, { gprimeVersion: GPRIME_VERSION, siteHash: loaded.hash });
  const exit = assessmentExit(assessment);
  // the summary speaks the units of the report it goes with: --units, else the site's own
  const system = opts.units ?? loaded.site.units;
  const shownJson = (extra: object = {}) => JSON.stringify(withSentencesIn({ ...assessment, ...extra }, system));
  if (opts.out) {
    const { writeReport } = await import('../report/write-report');
    const written = await writeReport(loaded, assessment, {
      outDir: opts.out,
      formats: opts.formats,
      units: opts.units ?? loaded.site.units,
      issueDate: opts.issueDate,
    });
    const summary =
      summariseAssessment(assessment, system) +
      `\n\nWrote ${written.length} files to ${opts.out}:\n` +
      written.map((w) => `  ${w}`).join('\n');
    return { stdout: json ? shownJson({ written }) : summary, ...exit };
  }
  return { stdout: json ? shownJson() : summariseAssessment(assessment, system), ...exit };
}
