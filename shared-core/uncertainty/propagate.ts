import { ComputationError, InputError, formatNumber } from '../core/errors';
import { describeRange, inRange } from '../core/range';
import type { MethodInfo } from '../core/method';
import { LIMITS } from '../core/limits';
import { caution, note, type Warning } from '../core/warning';
import { resolveArgs, runCalc, type RawArg } from '../calc/resolve';
import type { CalcArgs, CalcMethod, CalcOutput } from '../calc/types';
import { latinHypercube, normalQuantile, sampleQuantile, seededRandom } from './sampling';

export const MONTE_CARLO_JCGM101: MethodInfo = {
  id: 'monte-carlo-jcgm101',
  title: 'Uncertainty band by Monte Carlo propagation of the input uncertainties',
  equation:
    'x_i,k = x_i + u_i·z_i,k with z_i,k standard normal (Latin hypercube); y_k = f(x_k); band = [Q((1−p)/2), Q((1+p)/2)] of the y_k, p the coverage probability',
  source:
    'JCGM 101:2008. Evaluation of measurement data — Supplement 1 to the "Guide to the expression of uncertainty in measurement" — ' +
    'Propagation of distributions using a Monte Carlo method, §5.9 and §7 (probabilistically symmetric coverage interval); ' +
    'Latin hypercube sampling: McKay, M.D., Beckman, R.J., Conover, W.J. (1979). Technometrics 21, 239–245; ' +
    'sample quantiles: Hyndman, R.J., Fan, Y. (1996). Sample quantiles in statistical packages. Am. Statist. 50, 361–365 (type 7).',
  validity: {},
};

/** One input with its standard uncertainty u (SI, one standard deviation of a normal distribution). */
export interface InputUncertainty {
  name: string;
  standardUncertainty: number;
}

export interface ResultBand {
  name: string;
  unit: string;
  /** the result at the nominal inputs */
  nominal: number;
  mean: number;
  standardDeviation: number;
  low: number;
  median: number;
  high: number;
  /** draws in which the result exists (some results exist only for some outcomes) */
  draws: number;
}

export interface UncertaintyResult {
  coverage: number;
  samples: number;
  /** draws that gave results (the rest fell outside an input's allowed range or failed) */
  evaluated: number;
  inputs: InputUncertainty[];
  bands: ResultBand[];
  warnings: Warning[];
}

export interface PropagationOptions {
  samples?: number;
  seed?: number;
  /** coverage probability of the band, e.g. 0.9 for the 5 %–95 % band */
  coverage?: number;
  /** told how many draws are done, about twenty times per band (the workspace shows it as progress) */
  progress?: (done: number, total: number) => void;
}

/** The kind of a warning: its code and the input it concerns (draws that only change the numbers raise the same kind). */
const warningKind = (w: Warning) => `${w.code}|${w.input ?? ''}`;

const pct = (x: number) => `${formatNumber(Math.round(x * 1000) / 10)} %`;

function checkInputs(method: CalcMethod, base: CalcArgs, inputs: readonly InputUncertainty[]): void {
  const names = new Set<string>();
  for (const { name, standardUncertainty: u } of inputs) {
    const spec = method.params.find((p) => p.name === name);
    const field = `uncertainty of ${name}`;
    if (!spec)
      throw new InputError(
        field,
        name,
        '',
        method.params.map((p) => p.name).join(', '),
        `${method.id} has no parameter "${name}"`,
      );
    if (spec.kind !== 'number')
      throw new InputError(
        field,
        name,
        '',
        'a numeric parameter',
        `${name} is not a number, so it cannot carry an uncertainty`,
      );
    if (typeof base[name] !== 'number')
      throw new InputError(field, name, spec.unit, 'a parameter with a value', `${name} has no value to vary`);
    if (!(Number.isFinite(u) && u >= 0))
      throw new InputError(field, u, spec.unit, '≥ 0', 'a standard uncertainty is a finite number ≥ 0');
    if (names.has(name)) throw new InputError(field, name, '', 'each parameter once', `${name} is given twice`);
    names.add(name);
  }
}

/**
 * Propagates normal input uncertainties through a calc method by Monte Carlo (JCGM 101:2008) and returns,
 * per numeric result, the mean, standard deviation and the probabilistically symmetric band at the
 * coverage probability. Draws that put an input outside its allowed range are left out (the input
 * distribution is truncated there) and counted in a warning; so are draws the method refuses.
 * Deterministic: the same seed gives the same band.
 * @validity the band reflects only the stated input uncertainties, not the method's own model error.
 */
export function propagateMonteCarloJcgm101(
  method: CalcMethod,
  raw: Record<string, RawArg | undefined>,
  inputs: readonly InputUncertainty[],
  options: PropagationOptions = {},
): UncertaintyResult {
  const samples = options.samples ?? 1000;
  const coverage = options.coverage ?? 0.9;
  if (!(Number.isInteger(samples) && samples >= 100 && samples <= LIMITS.monteCarloDraws))
    throw new InputError(
      'samples',
      samples,
      '1',
      `100 … ${LIMITS.monteCarloDraws} (integer)`,
      `the number of Monte Carlo draws is a whole number from 100 to the limit of ${LIMITS.monteCarloDraws} draws per band`,
    );
  if (!(coverage >= 0.5 && coverage <= 0.99)) throw new InputError('coverage', coverage, '1', '0.5 … 0.99');
  if (inputs.length === 0)
    throw new InputError(
      'uncertainties',
      '(none)',
      '',
      'at least one input with a standard uncertainty',
      'name at least one input and its standard uncertainty',
    );
  const base = resolveArgs(method, raw);
  checkInputs(method, base, inputs);
  const nominal = runCalc(method, base);

  const rows = latinHypercube(samples, inputs.length, seededRandom(options.seed ?? 20261202));
  const values = new Map<string, number[]>();
  const outside = new Map<string, number>();
  const warningCounts = new Map<string, { count: number; example: Warning }>();
  let failed = 0,
    firstFailure = '';
  const every = Math.max(1, Math.floor(samples / 20));
  for (const [k, row] of rows.entries()) {
    if (options.progress && k % every === 0) options.progress(k, samples);
    const args: CalcArgs = { ...base };
    let skip = false;
    inputs.forEach((input, d) => {
      const spec = method.params.find((p) => p.name === input.name)!;
      const x = (base[input.name] as number) + input.standardUncertainty * normalQuantile(row[d]);
      if (spec.kind === 'number' && spec.range && !inRange(x, spec.range)) {
        outside.set(input.name, (outside.get(input.name) ?? 0) + 1);
        skip = true;
      }
      args[input.name] = x;
    });
    if (skip) continue;
    let out: CalcOutput;
    try {
      out = runCalc(method, args);
    } catch (e) {
      // a draw the method refuses, or one it cannot compute, is left out and counted
      if (!(e instanceof InputError || e instanceof ComputationError)) throw e;
      failed++;
      firstFailure ||= e.message;
      continue;
    }
    for (const [name, r] of Object.entries(out.results)) {
      if (typeof r.value !== 'number') continue;
      const list = values.get(name) ?? [];
      list.push(r.value);
      values.set(name, list);
    }
    for (const w of out.warnings) {
      const key = warningKind(w);
      const seen = warningCounts.get(key);
      warningCounts.set(key, { count: (seen?.count ?? 0) + 1, example: seen?.example ?? w });
    }
  }

  const evaluated = samples - failed - [...outside.values()].reduce((a, b) => a + b, 0);
  const warnings: Warning[] = [];
  for (const [name, n] of outside) {
    const spec = method.params.find((p) => p.name === name)!;
    const range = spec.kind === 'number' ? describeRange(spec.range ?? {}, spec.unit) : '';
    warnings.push(
      caution(
        'band-draws-truncated',
        `${pct(n / samples)} of the draws put ${name} outside its allowed range ${range} and were left out: the band is for a truncated input distribution.`,
        name,
      ),
    );
  }
  if (failed)
    warnings.push(
      caution('band-draws-failed', `${failed} of ${samples} draws could not be computed (first: ${firstFailure}).`),
    );
  if (evaluated < 0.5 * samples)
    warnings.push(
      caution(
        'band-unreliable',
        `Only ${evaluated} of ${samples} draws gave results: the band is unreliable; reduce the uncertainties or check the inputs.`,
      ),
    );
  const nominalKinds = new Set(nominal.warnings.map(warningKind));
  const occasional = [...warningCounts]
    .filter(([kind]) => !nominalKinds.has(kind))
    .sort((a, b) => b[1].count - a[1].count)
    .slice(0, 3);
  for (const [, { count, example }] of occasional)
    warnings.push({
      code: 'band-occasional-warning',
      severity: example.severity,
      ...(example.input === undefined ? {} : { input: example.input }),
      message: `In ${pct(count / Math.max(evaluated, 1))} of the draws: ${example.message}`,
    });

  const bands: ResultBand[] = [];
  for (const [name, r] of Object.entries(nominal.results)) {
    const list = values.get(name);
    if (typeof r.value !== 'number' || !list || list.length < 2) continue;
    const sorted = [...list].sort((a, b) => a - b);
    const mean = sorted.reduce((a, b) => a + b, 0) / sorted.length;
    const sd = Math.sqrt(sorted.reduce((a, b) => a + (b - mean) ** 2, 0) / (sorted.length - 1));
    if (list.length < evaluated)
      warnings.push(
        note(
          'band-result-partial',
          `${name} exists in only ${pct(list.length / evaluated)} of the draws; its band is of those draws.`,
        ),
      );
    bands.push({
      name,
      unit: r.unit,
      nominal: r.value,
      mean,
      standardDeviation: sd,
      low: sampleQuantile(sorted, (1 - coverage) / 2),
      median: sampleQuantile(sorted, 0.5),
      high: sampleQuantile(sorted, (1 + coverage) / 2),
      draws: list.length,
    });
  }
  return { coverage, samples, evaluated, inputs: [...inputs], bands, warnings };
}
