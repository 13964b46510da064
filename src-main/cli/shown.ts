import { sentenceIn } from '../../shared-core/units/sentence';
import type { UnitSystem } from '../../shared-core/units/units';
import { UsageError } from './errors';

/**
 * Shared-core text on the terminal: every sentence (warning, error, text result, compliance note) goes through
 * `sentenceIn` in the unit system chosen with `--units si|us` (SI unless chosen), so no quantity token and no
 * quantity in the other system reaches the reader.
 */

/** `--units si|us` taken out of the arguments (given at most once); undefined when absent. */
export function takeUnits(args: readonly string[]): { rest: string[]; units?: UnitSystem } {
  const rest: string[] = [];
  let units: UnitSystem | undefined;
  for (let i = 0; i < args.length; i++) {
    if (args[i] !== '--units') {
      rest.push(args[i]);
      continue;
    }
    const value = args[++i];
    if (value === undefined) throw new UsageError('--units needs a value: si or us');
    if (value !== 'si' && value !== 'us') throw new UsageError(`--units takes si or us, not "${value}"`);
    if (units !== undefined) throw new UsageError('--units is given twice');
    units = value;
  }
  return { rest, units };
}

/** The unit system asked for on a command line, for showing an error before the command could read it (SI otherwise). */
export function unitsAskedFor(argv: readonly string[]): UnitSystem {
  const i = argv.indexOf('--units');
  return argv[i + 1] === 'us' ? 'us' : 'si';
}

/** A copy of plain data with every string shown through `sentenceIn` (numbers stay SI, as the JSON contract says). */
export function withSentencesIn<T>(data: T, system: UnitSystem): T {
  const walk = (v: unknown): unknown => {
    if (typeof v === 'string') return sentenceIn(v, system);
    if (Array.isArray(v)) return v.map(walk);
    if (v && typeof v === 'object') return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, walk(x)]));
    return v;
  };
  return walk(data) as T;
}
