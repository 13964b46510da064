import type { CalcMethod } from '../../shared-core/calc/types';
import type { RawArg } from '../../shared-core/calc/resolve';
import type { PropagationOptions } from '../../shared-core/uncertainty';
import { UsageError } from './errors';

/**
 * The `name=value` pairs of `gprime calc` as raw arguments. A name given twice is refused (never "last wins"); the
 * object has no prototype, so `__proto__=` is an own key that the method then refuses as an unknown parameter.
 */
export function calcPairs(
  method: CalcMethod,
  pairs: readonly string[],
  loadProfile: (name: string, path: string) => RawArg,
): Record<string, RawArg> {
  const raw: Record<string, RawArg> = Object.create(null);
  const typed = new Map<string, string>();
  for (const pair of pairs) {
    const eq = pair.indexOf('=');
    if (eq <= 0) throw new UsageError(`expected name=value, got "${pair}"`);
    const name = pair.slice(0, eq).trim();
    const value = pair.slice(eq + 1);
    const first = typed.get(name);
    if (first !== undefined)
      throw new UsageError(`${name} is given twice ("${first}" and "${value}"); give each parameter once`);
    typed.set(name, value);
    const spec = method.params.find((p) => p.name === name);
    raw[name] = spec?.kind === 'profile' ? loadProfile(name, value) : value;
  }
  return raw;
}

const UNCERTAINTY_FLAGS = ['--sigma', '--samples', '--seed', '--coverage'];
/** A standard uncertainty starts with a number: "0.002", "1 ft", "10%" (not "%" or "ft"). */
const SIGMA_VALUE = /^\s*[-+]?(\d+(?:[.,]\d*)?|[.,]\d+)/;
const WHOLE_NUMBER = /^\d+$/;
const DECIMAL = /^(\d+(\.\d*)?|\.\d+)$/;
/** The generator takes a 32-bit seed; a larger or fractional one would be changed silently. */
const MAX_SEED = 2 ** 32 - 1;

/** Splits off `--sigma name=u` (repeatable), `--samples N`, `--seed N` and `--coverage p`, each checked. */
export function uncertaintyFlags(args: readonly string[]) {
  const rest: string[] = [];
  const sigmas: [string, string][] = [];
  const options: PropagationOptions = {};
  for (let i = 0; i < args.length; i++) {
    const flag = args[i];
    if (!UNCERTAINTY_FLAGS.includes(flag)) {
      rest.push(flag);
      continue;
    }
    const value = args[++i];
    if (value === undefined) throw new UsageError(`${flag} needs a value`);
    if (flag === '--sigma') sigmas.push(sigmaPair(value, sigmas));
    else {
      const key = flag.slice(2) as 'samples' | 'seed' | 'coverage';
      if (options[key] !== undefined) throw new UsageError(`${flag} is given twice`);
      options[key] = optionValue(flag, value);
    }
  }
  if (sigmas.length === 0 && Object.keys(options).length > 0)
    throw new UsageError(
      `${Object.keys(options)
        .map((k) => `--${k}`)
        .join(', ')} needs at least one --sigma name=u`,
    );
  return { rest, sigmas, options };
}

function sigmaPair(value: string, earlier: readonly [string, string][]): [string, string] {
  const eq = value.indexOf('=');
  if (eq <= 0)
    throw new UsageError(`--sigma expects name=standard uncertainty (e.g. g_prime=0.002 or depth=10%), got "${value}"`);
  const name = value.slice(0, eq).trim();
  const u = value.slice(eq + 1);
  if (earlier.some(([n]) => n === name)) throw new UsageError(`--sigma ${name} is given twice`);
  if (!SIGMA_VALUE.test(u))
    throw new UsageError(
      `--sigma ${name}: "${u}" is not a standard uncertainty; give a number ≥ 0, with a unit or % (e.g. ${name}=0.002, ${name}=10%)`,
    );
  return [name, u];
}

function optionValue(flag: string, value: string): number {
  const v = value.trim();
  if (flag === '--coverage') {
    if (!DECIMAL.test(v)) throw new UsageError(`--coverage expects a probability such as 0.9, got "${value}"`);
    return Number(v);
  }
  if (!WHOLE_NUMBER.test(v) || (flag === '--seed' && Number(v) > MAX_SEED))
    throw new UsageError(
      flag === '--seed'
        ? `--seed expects a whole number from 0 to ${MAX_SEED}, got "${value}"`
        : `--samples expects a whole number of draws, got "${value}"`,
    );
  return Number(v);
}
