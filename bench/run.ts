/**
 * `npm run bench`: speed of gprime against a general-purpose baseline measured in the same run (mathjs solveODE and
 * eigs), and the times the workspace, the CLI and the report take on the demo reservoir. `npm run bench -- --json`
 * (or `npm run bench:json`) prints one JSON object instead of the table: the measured numbers, their targets and
 * whether each is met. Times depend on the machine and its load (printed too); ratios are what to compare.
 */
import { availableParallelism, loadavg } from 'node:os';
import { benchCliStart } from './cli-start';
import type { Measured } from './harness';
import { benchJet } from './jet';
import { benchKernels } from './kernels';
import { benchModes } from './modes';
import { benchMonteCarlo } from './monte-carlo';
import { benchPdf } from './pdf';
import { benchSite } from './site';

/** Targets of the measured numbers: at least (≥) or at most (≤) the value. */
const TARGETS: Record<string, { at: 'least' | 'most'; value: number }> = {
  jet_speedup_vs_mathjs: { at: 'least', value: 100 },
  modes_speedup_vs_dense: { at: 'least', value: 1000 },
  modes_time_exponent: { at: 'most', value: 1.15 },
  site_recompute_ms: { at: 'most', value: 16 },
  edit_recompute_ms: { at: 'most', value: 5 },
  mc_jet_samples_per_s: { at: 'least', value: 20000 },
  mc_speedup_2_workers: { at: 'least', value: 1.7 },
  pdf_report_ms: { at: 'most', value: 3000 },
  cli_start_ratio: { at: 'most', value: 3 },
};

const json = process.argv.includes('--json');
const progress = (what: string) => process.stderr.write(`bench: ${what}…\n`);
const load = loadavg()[0];

const lines: string[] = [];
const values: Record<string, number> = {};
const take = (m: Measured) => {
  Object.assign(values, m.values);
  lines.push(...m.lines);
};
if (!json) {
  progress('kernels');
  lines.push(...benchKernels());
}
progress('buoyant jet');
take(benchJet());
progress('vertical modes (the dense baseline takes a while)');
take(benchModes());
progress('site assessment');
take(benchSite());
progress('Monte Carlo in worker threads');
take(await benchMonteCarlo());
progress('PDF report');
take(await benchPdf());
progress('CLI start');
take(benchCliStart());

const met = (key: string) => {
  const t = TARGETS[key];
  return t.at === 'least' ? values[key] >= t.value : values[key] <= t.value;
};
if (json) {
  const targets = Object.fromEntries(
    Object.entries(TARGETS).map(([k, t]) => [k, { [t.at === 'least' ? 'min' : 'max']: t.value, met: met(k) }]),
  );
  process.stdout.write(JSON.stringify({ ...values, targets, load_average_1min: load }) + '\n');
} else {
  const verdicts = Object.keys(TARGETS).map(
    (k) =>
      `  ${met(k) ? 'met    ' : 'NOT met'} ${k} = ${Number(values[k].toPrecision(4))} (${TARGETS[k].at === 'least' ? '≥' : '≤'} ${TARGETS[k].value})`,
  );
  console.log(
    `gprime benchmarks (median per call; 1-minute load average ${load.toFixed(2)} on ${availableParallelism()} cores)\n` +
      [...lines, '', 'Targets:', ...verdicts].join('\n'),
  );
}
