import { qty } from '../core/quantity-text';
import { caution, type Warning } from '../core/warning';
import type { OdeStatus } from '../numerics/ode';
import { interpolateAt } from '../profile/profile';
import type { AmbientWater, Current } from './ambient';
import { centrelineToAverage } from './closure';
import {
  chooseDenseJetDilution,
  denseJetLabCorrelations,
  type DenseJetDilution,
  type DenseJetDilutionChoice,
} from './dense-jet-lab';
import { jetLocalInto, newJetLocal } from './equations';
import type { JetLengthScales } from './length-scales';
import { describeOutcome, pathWarnings, type JetOutcome } from './outcome';
import { prepareJetRun, traceStretch, type JetRun, type Stretch } from './trace';

export interface BuoyantJetInput {
  /** port diameter [m] */
  diameter: number;
  /** exit velocity [m/s] */
  velocity: number;
  /** vertical angle above horizontal [deg], −90 … 90 */
  angle: number;
  /** horizontal angle between the jet and the current [deg]: 0 = with the current, 90 = across it */
  horizontalAngle?: number;
  /** port depth below the surface [m] */
  portDepth: number;
  /** effluent density [kg/m3] */
  effluentDensity: number;
  /** effluent temperature [degC], for the temperature excess along the path */
  effluentTemperature?: number;
  ambient: AmbientWater;
  /** current along +x [m/s], uniform or by depth */
  current?: Current;
  /** bed depth [m] (default: the deepest profile sample, or the uniform ambient's water depth; none otherwise) */
  bedDepth?: number;
  /** port spacing of a multiport diffuser [m]: neighbouring plumes merge when the width reaches it */
  portSpacing?: number;
  /** longest path to follow [m] (default JET_DEFAULT_MAX_PATH, or 100 D or 50 port depths when longer) */
  maxPath?: number;
  /** a dense jet's return-point dilution for compliance (default 'cautious': the smaller of model and laboratory) */
  denseJetDilution?: DenseJetDilutionChoice;
  /** step attempts allowed per integrated segment (default JET_MAX_STEPS); beyond it the status is 'max-steps' */
  maxSteps?: number;
}

/** Named columns of the path, each in SI; `JET_PATH_COLUMNS` gives label and unit. */
export interface JetPath {
  /** distance along the centreline [m] */
  s: number[];
  /** horizontal position: x along the current, y across it [m]; z height above the port [m] */
  x: number[];
  y: number[];
  z: number[];
  /** depth below the surface [m] */
  depth: number[];
  /** horizontal distance from the port √(x²+y²) [m] */
  horizontalDistance: number[];
  /** top-hat radius [m] (Gaussian e-folding width = radius/√2) */
  radius: number[];
  /** centreline (minimum) and flux-average dilution [1] */
  dilutionCentreline: number[];
  dilutionAverage: number[];
  /** jet minus ambient density (top-hat average) [kg/m3] */
  densityExcess: number[];
  /** jet minus ambient temperature (top-hat average) [degC]; absent when temperatures are unknown */
  temperatureExcess?: number[];
}

export const JET_PATH_COLUMNS: Record<keyof JetPath, { label: string; unit: string }> = {
  s: { label: 'Distance along the centreline', unit: 'm' },
  x: { label: 'Distance along the current', unit: 'm' },
  y: { label: 'Distance across the current', unit: 'm' },
  z: { label: 'Height above the port', unit: 'm' },
  depth: { label: 'Depth', unit: 'm' },
  horizontalDistance: { label: 'Horizontal distance from the port', unit: 'm' },
  radius: { label: 'Plume radius (top-hat)', unit: 'm' },
  dilutionCentreline: { label: 'Centreline dilution', unit: '1' },
  dilutionAverage: { label: 'Average dilution', unit: '1' },
  densityExcess: { label: 'Density excess over ambient', unit: 'kg/m3' },
  temperatureExcess: { label: 'Temperature excess over ambient', unit: 'degC' },
};

export type JetEventKind =
  | 'surface contact'
  | 'bed contact'
  | 'return to port level'
  | 'maximum rise'
  | 'lowest point'
  | 'neutral buoyancy'
  | 'plumes merge'
  | 'edge reaches surface'
  | 'edge reaches bed'
  | 'momentum spent'
  | 'end of near field';

/** One event on the path, with the state there. */
export interface JetEvent {
  kind: JetEventKind;
  s: number;
  x: number;
  y: number;
  z: number;
  depth: number;
  horizontalDistance: number;
  radius: number;
  dilutionCentreline: number;
  dilutionAverage: number;
}

export interface JetTrajectory {
  status: OdeStatus;
  message: string;
  /** right-hand-side evaluations over all segments */
  evaluations: number;
  path: JetPath;
  events: JetEvent[];
  outcome: JetOutcome;
  /** the outcome in words */
  outcomeText: string;
  /** the highest centreline point [m above the port] */
  maxRise: number;
  scales: JetLengthScales;
  /** a dense jet's laboratory values and the return-point dilution chosen for compliance (when it returns to port level) */
  denseJet?: DenseJetDilution;
  warnings: Warning[];
}

/**
 * Trajectory and dilution of a round buoyant jet (top-hat integral model; closure in `BUOYANT_JET`).
 * Integrates in s/D with Dormand–Prince 5(4) (numerics/ode.ts) on scaled fluxes; continues through a
 * maximum rise of a dense jet and stops at the surface, the bed, a trapping turning point, or maxPath.
 * @returns the path in named columns, events, outcome in words, status and evaluation count
 * @source see BUOYANT_JET.source
 * @validity Fr ≥ 1; free jet (no boundary attachment); Boussinesq (|Δρ|/ρ ≪ 1)
 */
export function buoyantJetTrajectory(input: BuoyantJetInput): JetTrajectory {
  const run = prepareJetRun(input);
  const t = assembleTrajectory(
    run,
    [traceStretch(run, { geometry: 'round', start: run.start, sStart: 0 })],
    input.ambient,
  );
  return withDenseJetLab(t, run, input.denseJetDilution ?? 'cautious');
}

/** A dense jet that returns to port level, with the laboratory correlations and the chosen return dilution added. */
function withDenseJetLab(t: JetTrajectory, run: JetRun, choice: DenseJetDilutionChoice): JetTrajectory {
  const ret = t.events.find((e) => e.kind === 'return to port level');
  if (run.rhoE <= run.rhoRef || !ret) return t;
  const lab = denseJetLabCorrelations(run.angleDeg, run.scales.froude, run.D, run.portCurrent);
  const denseJet = chooseDenseJetDilution(choice, ret, lab);
  // the correlations' validity concerns the estimate only where their dilution is the one used
  const labWarnings = (lab?.warnings ?? []).map((w) =>
    denseJet.factor === 1 ? { ...w, severity: 'note' as const } : w,
  );
  const warnings = [...t.warnings, ...labWarnings, ...denseJet.warnings];
  if (lab?.maxRise !== undefined && lab.maxRise >= run.H)
    warnings.push(
      caution(
        'dense-jet-lab-reaches-surface',
        `Laboratory jets of this Froude number rise ${qty(lab.maxRise, 'm', 3)}, as far as the surface ${qty(run.H, 'm')} above the port: the jet may strike the surface, where neither the model nor the correlations apply.`,
        'port_depth',
      ),
    );
  return { ...t, denseJet, warnings };
}

/**
 * Joins stretches (a round jet, then possibly a merged plane plume) into one trajectory: path columns, events, outcome
 * and warnings. Dilution refers to each stretch's own reference flux (Q0, or Q0/spacing per unit length), so it is
 * continuous where plumes merge; the centreline dilution takes the ratio of each stretch's geometry (round, then plane).
 */
export function assembleTrajectory(run: JetRun, stretches: readonly Stretch[], ambient: AmbientWater): JetTrajectory {
  const { H, tE, tRef } = run;
  const L = newJetLocal();
  const temperature = run.ambient.temperature;
  const withTemperature = tE !== undefined && temperature !== undefined;
  const path: JetPath = {
    s: [],
    x: [],
    y: [],
    z: [],
    depth: [],
    horizontalDistance: [],
    radius: [],
    dilutionCentreline: [],
    dilutionAverage: [],
    densityExcess: [],
    ...(withTemperature ? { temperatureExcess: [] } : {}),
  };
  const pointAt = (st: Stretch, v: readonly number[], s: number) => {
    const eq = st.equations,
      sc = eq.scale;
    jetLocalInto(v, eq, L);
    const x = v[0] * sc[0],
      y = v[1] * sc[1],
      z = v[2] * sc[2],
      Sa = (v[3] * sc[3]) / st.qRef;
    return {
      s,
      x,
      y,
      z,
      depth: H - z,
      horizontalDistance: Math.hypot(x, y),
      radius: L.b,
      dilutionCentreline: Math.max(1, Sa * centrelineToAverage(st.geometry)),
      dilutionAverage: Sa,
    };
  };
  stretches.forEach((st, k) => {
    const sc = st.equations.scale;
    for (let i = k > 0 ? 1 : 0; i < st.s.length; i++) {
      const v = st.y[i],
        p = pointAt(st, v, st.s[i]);
      path.s.push(p.s);
      path.x.push(p.x);
      path.y.push(p.y);
      path.z.push(p.z);
      path.depth.push(p.depth);
      path.horizontalDistance.push(p.horizontalDistance);
      path.radius.push(p.radius);
      path.dilutionCentreline.push(p.dilutionCentreline);
      path.dilutionAverage.push(p.dilutionAverage);
      path.densityExcess.push(L.densityExcess);
      if (withTemperature)
        path.temperatureExcess!.push(
          tRef + (v[8] * sc[8]) / (v[3] * sc[3]) - interpolateAt(run.ambient.depth, temperature, p.depth),
        );
    }
  });
  const events: JetEvent[] = stretches.flatMap((st) =>
    st.fired.map((e) => ({ kind: e.name as JetEventKind, ...pointAt(st, e.y, e.s) })),
  );
  const last = stretches[stretches.length - 1];
  const status = last.status,
    message = last.message;
  if (status === 'terminal-event') events.push({ ...events[events.length - 1], kind: 'end of near field' });
  let maxRise = -Infinity;
  for (const z of path.z) maxRise = Math.max(maxRise, z);
  const outcome = describeOutcome(events, status, maxRise, path);
  const warnings = [
    ...run.ambient.warnings,
    ...run.scales.warnings,
    ...pathWarnings({
      events,
      status,
      message,
      scales: run.scales,
      angleDeg: run.angleDeg,
      dense: run.rhoE > run.rhoRef,
      current: run.portCurrent,
      velocity: run.U,
      profileBottom: profileBottom(ambient),
      portDepth: H,
      merged: stretches.some((st) => st.geometry === 'plane'),
      pathLength: run.sMax,
    }),
  ];
  const evaluations = stretches.reduce((n, st) => n + st.evaluations, 0);
  return {
    status,
    message,
    evaluations,
    path,
    events,
    outcome: outcome.kind,
    outcomeText: outcome.text,
    maxRise,
    scales: run.scales,
    warnings,
  };
}

function profileBottom(a: AmbientWater): number | undefined {
  if (a.kind === 'profile') return a.profile.depth[a.profile.depth.length - 1];
  return a.kind === 'table' ? a.depth[a.depth.length - 1] : undefined;
}
