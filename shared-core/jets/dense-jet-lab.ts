import { formatNumber } from '../core/errors';
import { validityWarnings, type MethodInfo } from '../core/method';
import { inRange, positive, requireInRange } from '../core/range';
import { caution, note, type Warning } from '../core/warning';

export const DENSE_JET_LAB: MethodInfo = {
  id: 'dense-jet-lab',
  title: 'Inclined dense jet in still water: laboratory correlations for rise, return point and return dilution',
  source:
    'Lai, C.C.K., Lee, J.H.W. (2012). Mixing of inclined dense jets in stationary ambient. J. Hydro-environ. Res. 6, 9–28 ' +
    '(impact dilution S_i/Fr = 1.06 for discharge angles 38°–60° and Fr ≥ 20; LIF measurements at Fr = 10–40). ' +
    'Roberts, P.J.W., Ferrier, A., Daviero, G. (1997). Mixing in inclined dense jets. J. Hydraul. Eng. 123(8), 693–699 ' +
    '(60° jets: terminal rise of the jet top y_t/(DF) = 2.2, impact point x_i/(DF) = 2.4, impact dilution S_i/F = 1.6).',
  equation:
    'F = U/√(g′D), g′ = g(ρ_e − ρ_a)/ρ_a; S_i = 1.06 F (38°–60°, the lower of the two published values); at 60°: ' +
    'z_t = 2.2 D F (top of the jet above the port), x_i = 2.4 D F (horizontal distance where the centreline returns to ' +
    'port level); still, unbounded water',
  provenance:
    'Lai & Lee’s impact dilution was compared with the abstract of their paper; Roberts, Ferrier & Daviero’s 60° coefficients ' +
    'are as commonly quoted, not compared with the paper. The 60° coefficients are applied to jets at 55°–65°, and the ' +
    'impact dilution, with an outside-validity warning, to 30°–70°: an engineering allowance for nozzle angles, not a ' +
    'published range.',
  validity: {
    angle: {
      min: 38,
      max: 60,
      unit: 'deg',
      note: 'discharge angles of the impact-dilution correlation (Lai & Lee 2012)',
    },
    froude: { min: 20, unit: '1', note: 'Fr ≥ 20 of the impact-dilution correlation (Lai & Lee 2012)' },
    current: {
      max: 0,
      unit: 'm/s',
      note: 'the correlations are for still water; a current bends the jet and changes its rise and dilution',
    },
  },
};

/** The angles [deg] for which the 60° rise and return-point coefficients are given (the 60° design, ±5°; see provenance). */
const SIXTY_DEGREE_JETS = { min: 55, max: 65 } as const;
/** Angles [deg] outside which no laboratory value is given at all (extrapolating the 38°–60° range by under 10°). */
const ANY_LAB_VALUE = { min: 30, max: 70 } as const;

/** Laboratory values for one dense jet (SI). */
export interface DenseJetLab {
  /** centreline (minimum) dilution where the jet returns to port level [1] */
  returnDilution: number;
  /** horizontal distance of the return point from the port [m] (60° jets only) */
  returnDistance?: number;
  /** terminal rise of the jet's top (upper edge) above the port [m] (60° jets only) */
  maxRise?: number;
  warnings: Warning[];
}

/**
 * Laboratory correlations for an inclined dense jet in still water (see DENSE_JET_LAB).
 * @param angleDeg [deg] discharge angle above horizontal; @param froude [1] port densimetric Froude number;
 * @param diameter [m] port diameter; @param current [m/s] ambient current at the port
 * @returns the return dilution [1], and at 55°–65° the return distance [m] and terminal rise [m]; undefined outside 30°–70°
 * @source DENSE_JET_LAB.source
 * @validity 38°–60°, Fr ≥ 20, still water (outside-validity warnings otherwise)
 */
export function denseJetLabCorrelations(
  angleDeg: number,
  froude: number,
  diameter: number,
  current = 0,
): DenseJetLab | undefined {
  requireInRange('froude', froude, '1', { ...positive, max: 1e6 });
  requireInRange('diameter', diameter, 'm', positive);
  if (!inRange(angleDeg, ANY_LAB_VALUE)) return undefined;
  const sixty = inRange(angleDeg, SIXTY_DEGREE_JETS);
  return {
    returnDilution: 1.06 * froude,
    ...(sixty ? { returnDistance: 2.4 * diameter * froude, maxRise: 2.2 * diameter * froude } : {}),
    warnings: validityWarnings(DENSE_JET_LAB, { angle: angleDeg, froude, current }),
  };
}

/** Which return-point dilution compliance uses: the smaller of the two, the integral model's, or the laboratory one. */
export type DenseJetDilutionChoice = 'cautious' | 'model' | 'lab';
export const DENSE_JET_DILUTION_CHOICES: readonly DenseJetDilutionChoice[] = ['cautious', 'model', 'lab'];

/** The dilution of a dense jet's return point chosen for compliance, beside the model's and the laboratory's. */
export interface DenseJetDilution {
  choice: DenseJetDilutionChoice;
  lab?: DenseJetLab;
  /** the integral model's centreline dilution at its return point [1] */
  modelReturnDilution: number;
  /** the chosen centreline dilution at the return point [1]: what compliance uses */
  returnDilution: number;
  /** returnDilution ÷ modelReturnDilution: applied to the model's dilution at and beyond its return point */
  factor: number;
  /** the model's return point: path distance and horizontal distance from the port [m] */
  returnPathDistance: number;
  returnHorizontalDistance: number;
  warnings: Warning[];
}

/** The model's return point as the choice needs it. */
export interface ReturnPoint {
  s: number;
  horizontalDistance: number;
  dilutionCentreline: number;
}

/**
 * Chooses the return-point dilution: 'cautious' the smaller of model and laboratory (the model's where the correlation is
 * outside its validity), 'model' the integral model's, 'lab' the laboratory correlation's (the model's, with a note,
 * where no correlation is given).
 */
export function chooseDenseJetDilution(
  choice: DenseJetDilutionChoice,
  ret: ReturnPoint,
  lab: DenseJetLab | undefined,
): DenseJetDilution {
  const model = ret.dilutionCentreline;
  const warnings: Warning[] = [];
  let chosen = model;
  if (lab && choice === 'lab') chosen = lab.returnDilution;
  // outside its own validity (e.g. in a current, which raises the dilution) the correlation does not govern a cautious choice
  if (lab && choice === 'cautious' && lab.warnings.length === 0) chosen = Math.min(model, lab.returnDilution);
  if (!lab && choice === 'lab')
    warnings.push(
      note(
        'dense-jet-lab-unavailable',
        'No laboratory correlation covers this discharge angle (30°–70° only): the integral model’s return dilution is used.',
        'dense_jet_dilution',
      ),
    );
  if (lab && choice === 'lab' && lab.returnDilution > model)
    warnings.push(
      caution(
        'dense-jet-lab-dilution-used',
        `Compliance uses the laboratory return dilution (${formatNumber(Number(lab.returnDilution.toPrecision(3)))}) rather than the integral model’s lower value (${formatNumber(Number(model.toPrecision(3)))}).`,
        'dense_jet_dilution',
      ),
    );
  return {
    choice,
    ...(lab ? { lab } : {}),
    modelReturnDilution: model,
    returnDilution: chosen,
    factor: chosen / model,
    returnPathDistance: ret.s,
    returnHorizontalDistance: ret.horizontalDistance,
    warnings,
  };
}
