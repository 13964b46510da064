import { qty } from '../core/quantity-text';
import { InputError, formatNumber } from '../core/errors';
import { requireInRange } from '../core/range';
import { validityWarnings, type MethodInfo } from '../core/method';
import { caution, note, outsideValidity, uniqueWarnings, type Warning } from '../core/warning';
import { GRAVITY } from '../quantities';
import {
  assembleTrajectory,
  buoyantJetTrajectory,
  type BuoyantJetInput,
  type JetEvent,
  type JetTrajectory,
} from './buoyant-jet';
import { jetStateOf } from './equations';
import { prepareJetRun, traceStretch, type Stretch } from './trace';

export const DIFFUSER_PLUME: MethodInfo = {
  id: 'diffuser-plume',
  title: 'Multiport diffuser: round plumes merging into a line plume (equivalent slot)',
  source:
    'Round plumes: the buoyant-jet integral model (Morton, Taylor & Turner 1956 entrainment; see buoyant-jet). ' +
    'Merging where the plume width 2b reaches the port spacing, then continuation as a line plume with the fluxes per unit ' +
    'length q = Q/s, m = M/s, f = B/s: the merging-plume approach of Wright, S.J., Wong, D.R., Zimmerman, K.E., Wallace, R.B. ' +
    '(1982). Outfall diffuser behavior in stratified ambient fluid. J. Hydraul. Div. ASCE 108(HY4), 483–501. Line (plane) plume: top-hat integral model with Gaussian ' +
    'coefficients α = 0.052 (plane jet, Fischer et al. 1979, Table 9.1) and 0.11 (plane plume, Richardson, J., Hunt, G.R. (2022). ' +
    'What is the entrainment coefficient of a pure turbulent line plume? J. Fluid Mech. 934, A11), both × √2 for top-hat. ' +
    'After merging, the centreline/average dilution ratio of plane Gaussian profiles, λ_p/√(1+λ_p²) with ' +
    'λ_p = 1.24 (plane plume, Fischer et al. 1979, Table 9.1), as for the line plume of Rouse, H., Yih, C.S., ' +
    'Humphreys, H.W. (1952). Gravitational convection from a boundary source. Tellus 4, 201–210. ' +
    'Limits compared with Roberts, P.J.W., Snyder, W.H., Baumgartner, D.J. (1989). Ocean outfalls. I. ' +
    'J. Hydraul. Eng. 115(1), 1–25, and with the single port.',
  equation:
    'round jet until 2b = s; then per unit length, as in still water: d(q)/ds = 2α(Ri)u, d(q u)/ds = (q g′/u) ẑ, d(q Δρ)/ds = (dq/ds)(ρ_a(z) − ρ_ref), ' +
    'q = 2bu, α = α_j + (α_p − α_j)·clamp(Ri/α_p, 0, 1), Ri = g′b e_z/u²; after merging S_c = S_avg·λ_p/√(1+λ_p²), λ_p = 1.24; ' +
    'governing dilution = min(S_merged, S_single port) at the end of the near field',
  validity: {
    froude_current: {
      min: 0,
      max: 100,
      unit: '1',
      note: 'F = u³/b of the line-plume experiments of Roberts, Snyder & Baumgartner (1989)',
    },
  },
  provenance:
    'The merging criterion 2b = s and the slot of equal fluxes are this model’s interpretation of Wright et al. (1982); the ' +
    'plane coefficients and λ_p are as commonly quoted from Fischer et al. (1979) and Richardson & Hunt (2022), not compared ' +
    'with the originals.',
};

export interface DiffuserInput extends Omit<BuoyantJetInput, 'portSpacing' | 'horizontalAngle'> {
  /** port spacing along the diffuser [m] (not needed for a single port) */
  spacing?: number;
  /** number of ports (default: as many as make a long diffuser) */
  ports?: number;
  /** angle between the current and the diffuser axis [deg]: 90 = across the diffuser (the case modelled) */
  currentAngle?: number;
}

export type DiffuserRegime = 'single port' | 'isolated round plumes' | 'merged line plume';

export interface DiffuserPlume {
  /** round jets, then the merged line plume (the same path as `isolated` when the plumes do not merge) */
  merged: JetTrajectory;
  /** one port with no neighbours */
  isolated: JetTrajectory;
  /** where neighbouring plumes merge (2b = s), when they do */
  merge?: JetEvent;
  regime: DiffuserRegime;
  /** which path gives the governing (smaller) dilution at the end of the near field */
  governing: 'merged' | 'isolated';
  /** governing centreline and flux-average dilution at the end of the near field [1] */
  dilution: number;
  dilutionAverage: number;
  /** highest centreline point of the governing path above the ports [m] */
  riseHeight: number;
  /** F = u³/b with b = g′_port Q_port/s [1]; undefined without spacing */
  froudeCurrent?: number;
  /** diffuser length (n − 1)s [m] when the number of ports is given */
  length?: number;
  /** the regime in words */
  regimeText: string;
  warnings: Warning[];
}

const m = (x: number) => formatNumber(Number(x.toPrecision(3)));

/** The round stretch cut where the plumes merge, as if the merge had stopped the integration there. */
function untilMerge(st: Stretch, merge: Stretch['fired'][number]): Stretch {
  const k = st.s.findIndex((x) => x >= merge.s);
  const end = k < 0 ? st.s.length : k;
  return {
    ...st,
    s: [...st.s.slice(0, end), merge.s],
    y: [...st.y.slice(0, end), merge.y],
    fired: st.fired.slice(0, st.fired.indexOf(merge) + 1),
    status: 'terminal-event',
    message: 'stopped at plumes merge',
  };
}
const endDilution = (t: JetTrajectory, key: 'dilutionCentreline' | 'dilutionAverage') =>
  t.path[key][t.path[key].length - 1];

/**
 * Near field of a multiport diffuser: each port's round buoyant jet is followed until neighbouring plumes merge (top-hat
 * width 2b = s); from there the diffuser is a line plume whose fluxes per unit length are the merged round-plume fluxes
 * divided by the spacing (q = Q/s, m = M/s, f = B/s), followed with the plane closure of closure.ts. Dilution is continuous
 * at merging. Merging can only reduce entrainment, so the governing dilution is the smaller of the merged and the
 * single-port values at the end of the near field (equal when the plumes never merge).
 * @param input port diameter [m], velocity [m/s], angle [deg], port depth [m], densities [kg/m3], ambient, current [m/s],
 *   spacing [m], ports [1], current angle to the diffuser [deg]
 * @returns merged and single-port paths, merging point, regime, governing dilution [1] and rise height [m]
 * @source see DIFFUSER_PLUME.source
 * @validity ports discharging across a current perpendicular to the diffuser; a long diffuser (length ≫ rise height);
 *   F = u³/b ≤ 100; after merging the plume is followed as in still water (the dilution errs low in a current)
 */
export function diffuserPlume(input: DiffuserInput): DiffuserPlume {
  const ports = input.ports === undefined ? undefined : requireInRange('ports', input.ports, '1', { min: 1, max: 500 });
  if (ports !== undefined && !Number.isInteger(ports))
    throw new InputError('ports', ports, '1', 'a whole number of ports');
  const currentAngle =
    input.currentAngle === undefined
      ? undefined
      : requireInRange('current_angle', input.currentAngle, 'deg', { min: 0, max: 90 });
  if (ports === 1) {
    const isolated = buoyantJetTrajectory({ ...input, horizontalAngle: 0 });
    return {
      merged: isolated,
      isolated,
      regime: 'single port',
      governing: 'isolated',
      dilution: endDilution(isolated, 'dilutionCentreline'),
      dilutionAverage: endDilution(isolated, 'dilutionAverage'),
      riseHeight: isolated.maxRise,
      regimeText: 'One port: the single-port buoyant-jet result applies.',
      warnings: isolated.warnings,
    };
  }
  if (input.spacing === undefined)
    throw new InputError(
      'spacing',
      '(missing)',
      'm',
      `> port diameter (${qty(input.diameter, 'm')})`,
      'a diffuser with several ports needs the port spacing',
    );
  const s = requireInRange('spacing', input.spacing, 'm', { min: input.diameter, minExclusive: true, max: 1e4 });
  const run = prepareJetRun({ ...input, horizontalAngle: 0, portSpacing: s });
  // one round path serves both: the single port follows it to its end, the merged plumes only up to merging
  const single = traceStretch(run, { geometry: 'round', start: run.start, sStart: 0 });
  const mergeEvent = single.fired.find((e) => e.name === 'plumes merge');
  const isolated = assembleTrajectory(
    run,
    [{ ...single, fired: single.fired.filter((e) => e !== mergeEvent) }],
    input.ambient,
  );
  const round = mergeEvent ? untilMerge(single, mergeEvent) : single;
  const stretches: Stretch[] = [round];
  if (mergeEvent) {
    const state = jetStateOf(mergeEvent.y, round.equations);
    const per = (k: 'Q' | 'Mx' | 'My' | 'Mz' | 'R' | 'Th') => state[k] / s;
    const start = {
      ...state,
      Q: per('Q'),
      Mx: per('Mx'),
      My: per('My'),
      Mz: per('Mz'),
      R: per('R'),
      Th: per('Th'),
    };
    stretches.push(
      traceStretch(run, {
        geometry: 'plane',
        start,
        sStart: mergeEvent.s,
        neutralPassed: round.fired.some((e) => e.name === 'neutral buoyancy'),
      }),
    );
  }
  const merged = assembleTrajectory(run, stretches, input.ambient);
  const merge = merged.events.find((e) => e.kind === 'plumes merge');
  const governing =
    endDilution(merged, 'dilutionCentreline') <= endDilution(isolated, 'dilutionCentreline') ? 'merged' : 'isolated';
  const g = governing === 'merged' ? merged : isolated;
  const length = ports === undefined ? undefined : (ports - 1) * s;
  const bPort = Math.abs((GRAVITY * (run.rhoRef - run.rhoE)) / run.rhoRef) * (run.Q0 / s);
  const uPort = run.portCurrent;
  const froudeCurrent = bPort > 0 ? uPort ** 3 / bPort : undefined;

  const regime: DiffuserRegime = merge ? 'merged line plume' : 'isolated round plumes';
  const regimeText = merge
    ? `Neighbouring plumes merge ${qty(Math.abs(merge.z), 'm', 3)} ${merge.z >= 0 ? 'above' : 'below'} the ports (${qty(merge.horizontalDistance, 'm', 3)} from them) at a centreline dilution of ${m(merge.dilutionCentreline)}; ` +
      `beyond, the diffuser acts as a line plume of ${qty(run.Q0 / s, 'm2/s', 3)} (flow per length of diffuser).` +
      (governing === 'isolated' ? ' The single-port dilution is the smaller here and governs.' : '')
    : `Neighbouring plumes (spacing ${qty(s, 'm', 3)}) do not merge within the near field: the ports act as isolated round plumes.`;
  const warnings = [...merged.warnings];
  if (froudeCurrent !== undefined)
    warnings.push(...validityWarnings(DIFFUSER_PLUME, { froude_current: froudeCurrent }));
  if (merge && uPort > 0) {
    warnings.push(
      caution(
        'merged-plume-still-water',
        'After merging the line plume is followed as in still water; Roberts, Snyder & Baumgartner (1989) found that a current across the diffuser raises the dilution (for F = u³/b > 0.1) and lowers the rise, so the merged dilution errs low and the rise height high, and the merged plume is not carried downstream.',
        'current',
      ),
    );
  }
  if (uPort > 0 && (currentAngle === undefined || currentAngle < 60)) {
    warnings.push(
      currentAngle === undefined
        ? note(
            'current-direction-assumed',
            'The current is taken across the diffuser (the ports’ plumes side by side); a current along the diffuser sweeps each plume onto the next, which this model does not describe.',
            'current_angle',
          )
        : outsideValidity(
            'current-along-diffuser',
            `The current runs at ${m(currentAngle)}° to the diffuser: plumes are swept onto their downstream neighbours and merge sooner than modelled; the model describes a current across the diffuser (Roberts, Snyder & Baumgartner 1989 found lower dilutions for currents along the diffuser).`,
            'current_angle',
          ),
    );
  }
  if (merge && length !== undefined && length < g.maxRise) {
    warnings.push(
      caution(
        'diffuser-shorter-than-rise',
        `The diffuser (${qty(length, 'm', 3)} long) is shorter than the rise (${qty(g.maxRise, 'm', 3)}): water entrained at its ends makes the plume tend to one round plume of the total flow, so the line-plume continuation errs low (common practice, no source).`,
      ),
    );
  }
  return {
    merged,
    isolated,
    merge,
    regime,
    governing,
    dilution: endDilution(g, 'dilutionCentreline'),
    dilutionAverage: endDilution(g, 'dilutionAverage'),
    riseHeight: g.maxRise,
    froudeCurrent,
    length,
    regimeText,
    warnings: uniqueWarnings(warnings),
  };
}
