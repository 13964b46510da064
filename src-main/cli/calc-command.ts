import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { CALC_METHODS, findCalcMethod } from '../../shared-core/calc/registry';
import { runCalc, type RawArg } from '../../shared-core/calc/resolve';
import { InputError } from '../../shared-core/core/errors';
import { parseProfileCsv } from '../../shared-core/profile/csv';
import { bandsFromTyped, type UncertaintyResult } from '../../shared-core/uncertainty';
import { describeMethods, formatCalcText, formatUncertaintyText } from './format';
import { UsageError, type CommandResult } from './errors';

/** Reads a CSV profile from disk for a 'profile' parameter. */
export function loadProfileFile(field: string, path: string) {
  let text: string;
  try {
    text = readFileSync(resolve(path), 'utf8');
  } catch (e) {
    throw new InputError(
      field,
      path,
      '',
      'a readable CSV file',
      `cannot read "${path}": ${(e as NodeJS.ErrnoException).code ?? String(e)}`,
    );
  }
  return parseProfileCsv(text);
}

/** `gprime calc <method> name=value … [--json]` and `gprime calc --list [--json]`. */
export function calcCommand(args: string[], json: boolean): CommandResult {
  if (args.includes('--list')) {
    const list = describeMethods(CALC_METHODS);
    if (json) return { stdout: JSON.stringify({ methods: list }, null, 2) };
    return {
      stdout: list
        .map(
          (m) =>
            `${m.id.padEnd(22)} ${m.title}\n${' '.repeat(23)}${m.parameters.map((p) => p.name + ('unit' in p && p.unit !== '1' ? ` [${p.unit}]` : '')).join(', ')}`,
        )
        .join('\n'),
    };
  }
  const { rest, sigmas, options } = uncertaintyFlags(args);
  const [id, ...pairs] = rest;
  if (!id) throw new UsageError('gprime calc needs a method id; `gprime calc --list` shows them');
  const method = findCalcMethod(id);
  if (!method)
    throw new UsageError(`unknown method "${id}"; known methods: ${CALC_METHODS.map((m) => m.id).join(', ')}`);
  const raw: Record<string, RawArg> = {};
  for (const pair of pairs) {
    const eq = pair.indexOf('=');
    if (eq <= 0) throw new UsageError(`expected name=value, got "${pair}"`);
    const name = pair.slice(0, eq).trim();
    const value = pair.slice(eq + 1);
    const spec = method.params.find((p) => p.name === name);
    raw[name] = spec?.kind === 'profile' ? loadProfileFile(name, value) : value;
  }
  const out = runCalc(method, raw);
  const band = sigmas.length ? bandsFromTyped(method, raw, Object.fromEntries(sigmas), options) : undefined;
  if (json)
    return {
      stdout: JSON.stringify({
        method: method.id,
        results: out.results,
        warnings: out.warnings,
        sources: out.sources,
        ...(band ? { uncertainty: uncertaintyJson(band) } : {}),
      }),
    };
  return { stdout: formatCalcText(method, out, band && formatUncertaintyText(band)) };
}

/** Splits off `--sigma name=u` (repeatable), `--samples N`, `--seed N` and `--coverage p`. */
function uncertaintyFlags(args: string[]) {
  const rest: string[] = [];
  const sigmas: [string, string][] = [];
  const options: { samples?: number; seed?: number; coverage?: number } = {};
  for (let i = 0; i < args.length; i++) {
    const flag = args[i];
    if (!['--sigma', '--samples', '--seed', '--coverage'].includes(flag)) {
      rest.push(flag);
      continue;
    }
    const value = args[++i];
    if (value === undefined) throw new UsageError(`${flag} needs a value`);
    if (flag === '--sigma') {
      const eq = value.indexOf('=');
      if (eq <= 0)
        throw new UsageError(
          `--sigma expects name=standard uncertainty (e.g. g_prime=0.002 or depth=10%), got "${value}"`,
        );
      const name = value.slice(0, eq).trim();
      if (sigmas.some(([n]) => n === name)) throw new UsageError(`--sigma ${name} is given twice`);
      sigmas.push([name, value.slice(eq + 1)]);
    } else {
      const n = Number(value);
      if (!Number.isFinite(n)) throw new UsageError(`${flag} expects a number, got "${value}"`);
      options[flag.slice(2) as 'samples' | 'seed' | 'coverage'] = n;
    }
  }
  return { rest, sigmas, options };
}

function uncertaintyJson(r: UncertaintyResult) {
  return {
    method: 'monte-carlo-jcgm101',
    coverage: r.coverage,
    samples: r.samples,
    evaluated: r.evaluated,
    inputs: r.inputs.map((i) => ({ name: i.name, standard_uncertainty: i.standardUncertainty })),
    bands: Object.fromEntries(
      r.bands.map((b) => [
        b.name,
        {
          unit: b.unit,
          nominal: b.nominal,
          mean: b.mean,
          standard_deviation: b.standardDeviation,
          low: b.low,
          median: b.median,
          high: b.high,
          draws: b.draws,
        },
      ]),
    ),
    warnings: r.warnings,
  };
}
