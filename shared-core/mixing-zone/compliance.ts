import { qty } from '../core/quantity-text';
import { InputError } from '../core/errors';
import { requireInRange, nonNegative } from '../core/range';
import { SCREENING_CAUTION } from '../core/caution';
import { requiredDilution, type LimitKind } from './required-dilution';
import type { BoundaryDilution } from './boundary';

/** One regulated constituent; concentrations in any unit, the same for effluent, ambient and criterion. */
export interface Constituent {
  name: string;
  unit: string;
  effluent: number;
  ambient: number;
  criterion: number;
  limit?: LimitKind;
}

/** One ambient condition (e.g. stratified summer, slack current) with the dilution achieved at the boundary. */
export interface ComplianceCondition {
  name: string;
  /** a number is taken as the centreline dilution at the boundary, reached */
  dilution: BoundaryDilution | number;
  /** ambient concentration per constituent name for this condition (overrides the constituent's ambient) */
  ambient?: Record<string, number>;
}

export type Verdict = 'meets' | 'does not meet' | 'cannot tell';

export interface ComplianceRow {
  condition: string;
  constituent: string;
  unit: string;
  /** required dilution [1]; undefined when the ambient alone fails the criterion */
  requiredDilution?: number;
  /** centreline dilution achieved at the boundary [1] */
  achievedDilution: number;
  /** achieved/required − 1 [1]; undefined with requiredDilution */
  margin?: number;
  verdict: Verdict;
  note: string;
}

/** Constituent for a temperature-excess limit: ΔT at the boundary must not exceed maxExcess [degC]. */
export function temperatureExcessLimit(
  name: string,
  effluentTemperature: number,
  ambientTemperature: number,
  maxExcess: number,
): Constituent {
  const dt = requireInRange('max_temperature_excess', maxExcess, 'degC', { min: 0, minExclusive: true, max: 50 });
  const cool = effluentTemperature < ambientTemperature;
  return {
    name,
    unit: 'degC',
    effluent: effluentTemperature,
    ambient: ambientTemperature,
    criterion: ambientTemperature + (cool ? -dt : dt),
    limit: cool ? 'minimum' : 'maximum',
  };
}

/**
 * Compliance table: one row per condition × constituent. Verdict "meets" when the achieved dilution exceeds
 * the required one by more than the band, "does not meet" when it falls short by more than the band,
 * otherwise "cannot tell"; also "cannot tell" when the near field ends inside the mixing zone short of the
 * required dilution (far-field mixing not modelled).
 * @param uncertainty relative band [1] (default 0.2: a screening band, common practice, no source)
 */
export function complianceTable(
  conditions: readonly ComplianceCondition[],
  constituents: readonly Constituent[],
  uncertainty = 0.2,
): { rows: ComplianceRow[]; caution: string } {
  const band = requireInRange('uncertainty', uncertainty, '1', { ...nonNegative, max: 1 });
  if (!conditions.length)
    throw new InputError('conditions', 0, '', 'at least one', 'give at least one ambient condition');
  if (!constituents.length)
    throw new InputError('constituents', 0, '', 'at least one', 'give at least one constituent');
  const rows: ComplianceRow[] = [];
  for (const cond of conditions) {
    const bd: BoundaryDilution =
      typeof cond.dilution === 'number'
        ? { dilutionCentreline: cond.dilution, dilutionAverage: cond.dilution, reached: true, note: 'dilution given' }
        : cond.dilution;
    const achieved = requireInRange(`dilution of ${cond.name}`, bd.dilutionCentreline, '1', { min: 1 });
    for (const c of constituents) {
      const ambient = cond.ambient?.[c.name] ?? c.ambient;
      const base = { condition: cond.name, constituent: c.name, unit: c.unit, achievedDilution: achieved };
      let req: number;
      try {
        req = requiredDilution(c.effluent, ambient, c.criterion, c.limit).value;
      } catch (e) {
        if (!(e instanceof InputError)) throw e;
        rows.push({
          ...base,
          verdict: 'does not meet',
          note: `the ambient (${qty(ambient, c.unit, 4)}) already fails the criterion (${qty(c.criterion, c.unit, 4)})`,
        });
        continue;
      }
      const margin = achieved / req - 1;
      let verdict: Verdict =
        achieved >= req * (1 + band) ? 'meets' : achieved * (1 + band) < req ? 'does not meet' : 'cannot tell';
      let note = bd.note;
      if (!bd.reached && achieved < req * (1 + band)) {
        verdict = 'cannot tell';
        note = `${bd.note}; the near-field dilution alone is not enough, so the far field decides`;
      }
      rows.push({ ...base, requiredDilution: req, margin, verdict, note });
    }
  }
  return { rows, caution: SCREENING_CAUTION };
}
