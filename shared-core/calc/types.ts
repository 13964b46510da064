import type { Profile } from '../profile/profile';
import type { Range } from '../core/range';
import type { Warning } from '../core/warning';
import type { EstimateModel } from './model';

/**
 * The calc contract shared by the CLI (`gprime calc`), the site file and the UI: a method declares its
 * parameters (SI unit, default, hard range) and result names, and runs on resolved SI arguments.
 */
export type ParamSpec =
  | {
      kind: 'number';
      name: string;
      unit: string;
      description: string;
      default?: number;
      optional?: boolean;
      range?: Range;
    }
  | {
      kind: 'choice';
      name: string;
      description: string;
      choices: readonly string[];
      default?: string;
      optional?: boolean;
    }
  | { kind: 'profile'; name: string; description: string; optional?: boolean }
  | { kind: 'text'; name: string; description: string; default?: string; optional?: boolean };

export interface ResultSpec {
  name: string;
  unit: string;
  description: string;
}

export type ResultValue = { value: number; unit: string } | { value: string; unit: '' };

/** One axis of a chart series: label, SI unit and values. */
export interface SeriesAxis {
  label: string;
  unit: string;
  values: number[];
}

/**
 * A curve for charts (UI, report): x against one or more y columns, all in SI. `depthAxis` marks
 * vertical-section charts where y is a depth drawn downwards (profiles, mode shapes, plume paths).
 */
export interface Series {
  /**
   * stable identifier of what the curve is (kebab-case, e.g. "plume-centreline", "withdrawal-outflow");
   * views find curves by kind, never by title
   */
  kind: string;
  title: string;
  x: SeriesAxis;
  y: SeriesAxis[];
  depthAxis?: boolean;
  /** a short caption for the chart */
  caption?: string;
}

/**
 * Whether a depth chart holds depth in x (a profile: values drawn across, depth down the side) rather
 * than in y (a section: distance across, depth down). Either way depth is drawn downwards.
 */
export function depthInX(s: Series): boolean {
  return !!s.depthAxis && /depth/i.test(s.x.label);
}

/** The result cards and summaries lead with: the first numeric result, else the first one. */
export function keyResultName(results: Record<string, ResultValue>): string | undefined {
  const names = Object.keys(results);
  return names.find((n) => typeof results[n].value === 'number') ?? names[0];
}

export interface CalcOutput {
  results: Record<string, ResultValue>;
  warnings: Warning[];
  sources: string[];
  /** curves for charts; not part of the CLI's JSON contract */
  series?: Series[];
  /** the typed model result the views draw from (a jet's path, a release's withdrawal zones…) */
  model?: EstimateModel;
  /**
   * set when the computation did not finish (an integration stopped at its step limit or on a failed
   * step): the results are partial and the estimate is marked incomplete with this reason
   */
  incomplete?: string;
}

export type CalcArgValue = number | string | Profile;
export type CalcArgs = Record<string, CalcArgValue | undefined>;

export interface CalcMethod {
  id: string;
  title: string;
  /** the topic folder of shared-core it comes from */
  topic: string;
  params: readonly ParamSpec[];
  results: readonly ResultSpec[];
  run(args: CalcArgs): CalcOutput;
  /**
   * everyday argument ranges [SI] for the reliability net (test/core/calc/every-method.test.ts); a number
   * parameter not named here is drawn in its hard range
   */
  everyday?: Readonly<Record<string, readonly [number, number]>>;
  /** groups of parameters of which exactly one is given (e.g. ambient_density or file) */
  oneOf?: readonly (readonly string[])[];
}

/** Typed accessors for resolved arguments (the resolver has validated kinds and ranges). */
export const arg = {
  num(args: CalcArgs, name: string): number {
    return args[name] as number;
  },
  optNum(args: CalcArgs, name: string): number | undefined {
    return args[name] as number | undefined;
  },
  text<T extends string = string>(args: CalcArgs, name: string): T {
    return args[name] as T;
  },
  profile(args: CalcArgs, name = 'file'): Profile | undefined {
    return args[name] as Profile | undefined;
  },
};
