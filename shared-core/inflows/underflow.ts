import { InputError } from '../core/errors';
import { caution, note, type Warning } from '../core/warning';
import { nonNegative, positive, requireInRange } from '../core/range';
import { validityWarnings, type MethodInfo } from '../core/method';
import { GRAVITY } from '../quantities';
import { solveOde, type OdeStatus } from '../numerics/ode';
import { brentRoot } from '../numerics/roots';
import { interpolateAt, profileBottom, type Profile } from '../profile/profile';
import { entrainment, type EntrainmentLaw } from './entrainment';

export const UNDERFLOW_NORMAL_STATE: MethodInfo = {
  id: 'underflow-ellison-turner1959',
  title: 'Entraining underflow down the reservoir bed to its insertion depth',
  source:
    'Ellison, T.H., Turner, J.S. (1959). Turbulent entrainment in stratified flows. J. Fluid Mech. 6, 423–448 (layer equations and the ' +
    'normal state of a current on a slope, where Ri tanθ = C_D + E(Ri)); stratified ambient and insertion at neutral buoyancy: ' +
    'Fischer, H.B. et al. (1979). Mixing in Inland and Coastal Waters, Ch. 6 (reservoir inflows).',
  equation:
    'dq/dx = E U; d(qρ)/dx = E U ρ_a(d); dt/dx = 1/U; U³ = g′ q sinθ/(C_D + E); g′ = g(ρ − ρ_a(d))/ρ_a(d); d = d₀ + x sinθ; ' +
    'E = E(Ri_n) with Ri_n tanθ = C_D + E(Ri_n); insertion where ρ = ρ_a(d)',
  validity: {
    bed_slope: { min: 0.001, max: 0.2, unit: '1', note: 'reservoir beds and laboratory slopes' },
    drag_coefficient: { min: 0.001, max: 0.02, unit: '1', note: 'bed plus interfacial drag' },
  },
};

/** Default total drag coefficient (bed plus interface), common practice, no source. */
export const DEFAULT_DRAG = 0.005;

export interface UnderflowInput {
  /** discharge entering the underflow, after plunge-line mixing [m3/s] */
  discharge: number;
  /** width of the current (constant) [m] */
  width: number;
  /** density of the current at the start [kg/m3] */
  density: number;
  /** temperature of the current at the start [degC] (tracked as a conservative tracer) */
  temperature: number;
  /** depth where the underflow starts (the plunge depth) [m] */
  startDepth: number;
  /** bed slope tanθ [1] */
  bedSlope: number;
  dragCoefficient?: number;
  law?: EntrainmentLaw;
  /** distance along the bed from the start to a point of interest such as the dam [m] */
  distanceToPoint?: number;
  /** depth of the deepest bed [m]; default: the deepest profile sample */
  bottomDepth?: number;
}

/** Underflow path for charts: every array has one value per accepted integration step. */
export interface UnderflowPath {
  /** distance along the bed from the start [m] */
  distance: number[];
  /** depth of the bed under the current [m] */
  depth: number[];
  /** discharge of the current [m3/s] */
  discharge: number[];
  /** density of the current [kg/m3] */
  density: number[];
  /** temperature of the current [degC] */
  temperature: number[];
  /** travel time from the start [s] */
  time: number[];
}

export interface UnderflowResult {
  path: UnderflowPath;
  /** depth where the current meets water of its own density and leaves the bed [m]; undefined if it reaches the bottom first */
  insertionDepth?: number;
  /** travel time to the point of interest along the bed [s]; undefined when the current leaves the bed before it */
  travelTimeToPoint?: number;
  /** normal-state Richardson number and entrainment coefficient [1] */
  richardson: number;
  entrainment: number;
  status: OdeStatus;
  message: string;
  events: { name: string; distance: number }[];
  evaluations: number;
  warnings: Warning[];
}

/** Normal-state Richardson number of a current on slope tanθ: Ri tanθ = C_D + E(Ri) (Ellison & Turner 1959). */
export function normalRichardson(bedSlope: number, drag: number, law: EntrainmentLaw): number {
  const f = (ri: number) => ri * bedSlope - drag - entrainment(law, ri);
  return brentRoot(f, 0, (drag + 0.1) / bedSlope + 1, 1e-12) as number;
}

/**
 * Integrates an entraining dense current down the bed through a measured ambient profile, in the normal state (gravity
 * balanced by drag and entrainment at each section), until it meets water of its own density (insertion), reaches the
 * deepest bed, or passes the point of interest. Sediment is treated as conservative (no settling or erosion).
 * @returns the path (distance, depth, discharge, density, temperature, time), insertion depth [m], travel time [s]
 */
export function underflowEllisonTurner1959(p: Profile, input: UnderflowInput): UnderflowResult {
  const q0 = requireInRange('discharge', input.discharge, 'm3/s', { ...positive, max: 1e5 });
  const b = requireInRange('width', input.width, 'm', { ...positive, max: 1e5 });
  const rho0 = requireInRange('density', input.density, 'kg/m3', { min: 900, max: 2000 });
  const temp0 = requireInRange('temperature', input.temperature, 'degC', { min: -3, max: 60 });
  const bed = requireInRange('bottom_depth', input.bottomDepth ?? profileBottom(p), 'm', { ...positive, max: 11000 });
  const d0 = requireInRange('start_depth', input.startDepth, 'm', { ...nonNegative, max: bed });
  const s = requireInRange('bed_slope', input.bedSlope, '1', { ...positive, max: 1 });
  const cd = requireInRange('drag_coefficient', input.dragCoefficient ?? DEFAULT_DRAG, '1', { ...positive, max: 1 });
  const law = input.law ?? 'parker1987';
  const point =
    input.distanceToPoint === undefined
      ? undefined
      : requireInRange('distance_to_point', input.distanceToPoint, 'm', { ...positive, max: 1e7 });
  const sin = s / Math.sqrt(1 + s * s);
  const ri = normalRichardson(s, cd, law),
    e = entrainment(law, ri);
  const warnings: Warning[] = validityWarnings(UNDERFLOW_NORMAL_STATE, { bed_slope: s, drag_coefficient: cd });
  if (e === 0)
    warnings.push(
      note(
        'no-entrainment',
        'At this slope and drag the normal-state Richardson number exceeds 0.8: the current entrains nothing (Ellison & Turner 1959).',
      ),
    );
  const rhoA = (d: number) => interpolateAt(p.depth, p.density, d);
  const tA = (d: number) => interpolateAt(p.depth, p.temperature, d);
  const depthAt = (x: number) => d0 + x * sin;
  const speed = (q: number, rho: number, d: number) => {
    const g = (GRAVITY * (rho - rhoA(d))) / rhoA(d);
    return g > 0 ? Math.cbrt((g * (q / b) * sin) / (cd + e)) : 0;
  };
  if (rho0 <= rhoA(d0)) {
    throw new InputError(
      'density',
      rho0,
      'kg/m3',
      `> ${rhoA(d0).toFixed(3)} kg/m3 (the ambient at the start depth)`,
      'the current is not denser than the water where it starts: it does not flow down the bed',
    );
  }
  const xEnd = Math.min(point ?? Infinity, (bed - d0) / sin);
  // U → 0 as g′ → 0 at insertion; dt/dx = 1/U is floored at 1 % of the starting speed so the integrable end singularity
  // stays finite (it adds less than a few % of the last step's time)
  const uFloor = 0.01 * speed(q0, rho0, d0);
  const rhs = (_x: number, y: readonly number[]) => {
    const [q, rho, temp] = y,
      d = depthAt(_x),
      u = speed(q, rho, d),
      w = e * u * b;
    return [w, (w * (rhoA(d) - rho)) / q, (w * (tA(d) - temp)) / q, 1 / Math.max(u, uFloor)];
  };
  const sol = solveOde(rhs, 0, [q0, rho0, temp0, 0], xEnd, {
    rtol: 1e-7,
    atol: 1e-9,
    maxSteps: 20000,
    events: [{ name: 'insertion', g: (x, y) => y[1] - rhoA(depthAt(x)), direction: 'falling', terminal: true }],
  });
  const path: UnderflowPath = {
    distance: sol.t,
    depth: sol.t.map(depthAt),
    discharge: sol.y.map((y) => y[0]),
    density: sol.y.map((y) => y[1]),
    temperature: sol.y.map((y) => y[2]),
    time: sol.y.map((y) => y[3]),
  };
  const last = sol.t.length - 1;
  const inserted = sol.status === 'terminal-event';
  const reachedPoint = point !== undefined && sol.status === 'completed' && point <= (bed - d0) / sin;
  if (inserted && point !== undefined)
    warnings.push(
      note(
        'leaves-bed-before-point',
        `The current leaves the bed at ${path.depth[last].toFixed(1)} m depth, ${sol.t[last].toFixed(0)} m from the start, before the point of interest; its travel beyond as an interflow is not estimated here.`,
        'distance',
      ),
    );
  if (!inserted && !reachedPoint && sol.status === 'completed')
    warnings.push(
      note(
        'pools-at-bottom',
        `The current reaches the deepest bed (${bed} m) still denser than the water there: it pools at the bottom.`,
      ),
    );
  if (sol.status === 'max-steps' || sol.status === 'step-failed')
    warnings.push(caution('integration-stopped', `The integration stopped early: ${sol.message}.`));
  return {
    path,
    insertionDepth: inserted ? path.depth[last] : undefined,
    travelTimeToPoint: reachedPoint ? path.time[last] : undefined,
    richardson: ri,
    entrainment: e,
    status: sol.status,
    message: sol.message,
    events: sol.events.map((ev) => ({ name: ev.name, distance: ev.t })),
    evaluations: sol.evaluations,
    warnings,
  };
}
