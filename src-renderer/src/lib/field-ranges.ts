import { findCalcMethod } from '../../../shared-core/calc/registry';
import { describeRange, inRange, type Range } from '../../../shared-core/core/range';
import { qty } from '../../../shared-core/core/quantity-text';
import { sentenceIn } from '../../../shared-core/units/sentence';
import type { UnitSystem } from '../../../shared-core/units/units';

/** A parameter of a calc method that a site field supplies (see shared-core/site/bindings.ts). */
export interface FieldUse {
  method: string;
  param: string;
}

/** What the methods a field feeds say about it: the range all of them accept, everyday values, their titles. */
export interface FieldFacts {
  /** the intersection of the methods' hard ranges [SI] */
  range: Range;
  /** the span of the methods' everyday values [SI], when they give one */
  typical?: readonly [number, number];
  methods: string[];
}

/**
 * The facts of a field, read from the calc registry (ParamSpec.range and the methods' everyday ranges),
 * never retyped here: the field refuses exactly what the methods would refuse.
 */
export function fieldFacts(uses: readonly FieldUse[] | undefined): FieldFacts | undefined {
  if (!uses?.length) return undefined;
  const range: Range = {};
  let lo = Infinity,
    hi = -Infinity;
  const methods: string[] = [];
  for (const u of uses) {
    const m = findCalcMethod(u.method);
    const p = m?.params.find((x) => x.name === u.param);
    if (!m || !p || p.kind !== 'number') continue;
    if (!methods.includes(m.title)) methods.push(m.title);
    const r = p.range ?? {};
    if (
      r.min !== undefined &&
      (range.min === undefined || r.min > range.min || (r.min === range.min && r.minExclusive))
    )
      Object.assign(range, { min: r.min, minExclusive: r.minExclusive });
    if (
      r.max !== undefined &&
      (range.max === undefined || r.max < range.max || (r.max === range.max && r.maxExclusive))
    )
      Object.assign(range, { max: r.max, maxExclusive: r.maxExclusive });
    const e = m.everyday?.[u.param];
    if (e) {
      lo = Math.min(lo, e[0]);
      hi = Math.max(hi, e[1]);
    }
  }
  if (!methods.length) return undefined;
  return { range, typical: lo <= hi ? [lo, hi] : undefined, methods };
}

/** Why an SI value is refused by the methods of a field, in the reader's units; '' when it is accepted. */
export function rangeProblem(si: number, siUnit: string, facts: FieldFacts | undefined, system: UnitSystem): string {
  if (!facts || inRange(si, facts.range)) return '';
  const allowed = sentenceIn(describeRange(facts.range, siUnit), system);
  return `${sentenceIn(qty(si, siUnit), system)} is outside what the methods accept (${allowed}); the value is not used`;
}

/** The short help under a field: what it is, its unit, everyday values, the allowed range, the methods using it. */
export function fieldHelp(what: string, siUnit: string, facts: FieldFacts | undefined, system: UnitSystem): string {
  const parts = what ? [what.replace(/\.?$/, '.')] : [];
  if (facts?.typical)
    parts.push(
      `Typical ${sentenceIn(`${qty(facts.typical[0], siUnit)} to ${qty(facts.typical[1], siUnit)}`, system)}.`,
    );
  if (facts && (facts.range.min !== undefined || facts.range.max !== undefined))
    parts.push(`Allowed ${sentenceIn(describeRange(facts.range, siUnit), system)}.`);
  if (facts) parts.push(`Used by: ${facts.methods.join(', ')}.`);
  return parts.join(' ');
}
