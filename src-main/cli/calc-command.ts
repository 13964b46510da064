import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { CALC_METHODS, findCalcMethod } from '../../shared-core/calc/registry';
import { runCalc, type RawArg } from '../../shared-core/calc/resolve';
import type { CalcMethod } from '../../shared-core/calc/types';
import { InputError } from '../../shared-core/core/errors';
import { describeRange } from '../../shared-core/core/range';
import { parseProfileCsv } from '../../shared-core/profile/csv';
import { ProfileError } from '../../shared-core/profile/profile';
import { bandsFromTyped, type UncertaintyResult } from '../../shared-core/uncertainty';
import { describeMethods, formatCalcText, formatUncertaintyText } from './format';
import { calcPairs, uncertaintyFlags } from './calc-args';
import { UsageError, type CommandResult } from './errors';
import { takeUnits, withSentencesIn } from './shown';

/** Why a file cannot be read, in words (the system's code only when it is not a common one). */
const READ_FAILURE: Record<string, string> = {
  ENOENT: 'there is no such file',
  EACCES: 'permission to read it is denied',
  EPERM: 'permission to read it is denied',
  EISDIR: 'it is a folder, not a file',
  ENOTDIR: 'a folder on its path is a file',
};

/** Reads a CSV profile from disk for a 'profile' parameter; a refusal names the parameter and the file. */
export function loadProfileFile(field: string, path: string) {
  let text: string;
  try {
    text = readFileSync(resolve(path), 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = (code && READ_FAILURE[code]) ?? `it cannot be read (${code ?? (e as Error).message})`;
    throw new InputError(field, path, '', 'a readable CSV file', `cannot read "${path}": ${why}`);
  }
  try {
    return parseProfileCsv(text);
  } catch (e) {
    if (!(e instanceof ProfileError)) throw e;
    throw new InputError(field, path, '', 'a profile CSV file', `the profile cannot be read: ${e.message}`);
  }
}

/**
 * runCalc, with a value the parameter could not read as a quantity (not a number, an unknown unit, a unit of another
 * dimension) refused by a message that also names the unit the parameter expects and its allowed range.
 */
function runWithUnitHelp(method: CalcMethod, raw: Record<string, RawArg>) {
  try {
    return runCalc(method, raw);
  } catch (e) {
    const spec = e instanceof InputError ? method.params.find((p) => p.name === e.field) : undefined;
    if (!(e instanceof InputError) || spec?.kind !== 'number' || typeof raw[spec.name] !== 'string') throw e;
    if (typeof e.value !== 'string') throw e; // read, but out of range: the message names the range already
    const range = describeRange(spec.range ?? {}, spec.unit);
    const explained = new InputError(e.field, e.value, e.unit, range);
    explained.message = `${e.message}; allowed range is ${range}`;
    throw explained;
  }
}

/**
 * `gprime calc <method> name=value … [--units si|us] [--json]` and `gprime calc --list [--json]`. With `--units us`
 * the text shows results and sentences in US customary units; JSON keeps SI numbers, its sentences in the system.
 */
export function calcCommand(argv: string[], json: boolean): CommandResult {
  const { rest: args, units } = takeUnits(argv);
  const system = units ?? 'si';
  if (args.includes('--list')) {
    const list = describeMethods(CALC_METHODS);
    if (json) return { stdout: JSON.stringify(withSentencesIn({ methods: list }, system), null, 2) };
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
  const raw = calcPairs(method, pairs, loadProfileFile);
  const out = runWithUnitHelp(method, raw);
  const band = sigmas.length ? bandsFromTyped(method, raw, Object.fromEntries(sigmas), options) : undefined;
  if (json)
    return {
      stdout: JSON.stringify(
        withSentencesIn(
          {
            method: method.id,
            results: out.results,
            warnings: out.warnings,
            sources: out.sources,
            ...(band ? { uncertainty: uncertaintyJson(band) } : {}),
          },
          system,
        ),
      ),
    };
  const inputUnit = (name: string) => {
    const spec = method.params.find((p) => p.name === name);
    return spec?.kind === 'number' ? spec.unit : '1';
  };
  return { stdout: formatCalcText(method, out, band && formatUncertaintyText(band, system, inputUnit), system) };
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
