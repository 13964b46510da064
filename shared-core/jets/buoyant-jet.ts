import { InputError } from '../core/errors';
import { requireInRange, positive } from '../core/range';
import { solveOde, type OdeEvent, type OdeStatus } from '../numerics/ode';
import { GRAVITY } from '../quantities';
import { ambientFunctions, type AmbientWater, type Current } from './ambient';
import { jetDerivative, localJet, CENTRELINE_TO_AVERAGE, type ClosureContext, type JetState } from './closure';
import { jetLengthScales, type JetLengthScales } from './length-scales';
import { describeOutcome, pathWarnings, type JetOutcome } from './outcome';

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
  /** longest path to follow [m] (default max(100 D, 50 port depth)) */
  maxPath?: number;
}

/** Named columns of the path, each in SI; `JET_PATH_COLUMNS` gives label and unit. */
export interface JetPath {
  /** distance along the centreline [m] */
  s: number[];
  /** horizontal position: x along the current, y across it [m]; z height above the port [m] */
  x: number[]; y: number[]; z: number[];
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
  | 'surface contact' | 'bed contact' | 'return to port level' | 'maximum rise' | 'lowest point' | 'neutral buoyancy'
  | 'plumes merge' | 'edge reaches surface' | 'edge reaches bed' | 'momentum spent' | 'end of near field';

/** One event on the path, with the state there. */
export interface JetEvent {
  kind: JetEventKind;
  s: number; x: number; y: number; z: number; depth: number; horizontalDistance: number;
  radius: number; dilutionCentreline: number; dilutionAverage: number;
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
  warnings: string[];
}

const IDX = ['x', 'y', 'z', 'Q', 'Mx', 'My', 'Mz', 'R', 'Th'] as const;
const deg = Math.PI / 180;

/**
 * Trajectory and dilution of a round buoyant jet (top-hat integral model; closure in `BUOYANT_JET`).
 * Integrates in s/D with Dormand–Prince 5(4) (numerics/ode.ts) on scaled fluxes; continues through a
 * maximum rise of a dense jet and stops at the surface, the bed, a trapping turning point, or maxPath.
 * @returns the path in named columns, events, outcome in words, status and evaluation count
 * @source see BUOYANT_JET.source
 * @validity Fr ≥ 1; free jet (no boundary attachment); Boussinesq (|Δρ|/ρ ≪ 1)
 */
export function buoyantJetTrajectory(input: BuoyantJetInput): JetTrajectory {
  const D = requireInRange('diameter', input.diameter, 'm', { ...positive, max: 20 });
  const U = requireInRange('velocity', input.velocity, 'm/s', { ...positive, max: 100 });
  const phi = requireInRange('angle', input.angle, 'deg', { min: -90, max: 90 }) * deg;
  const theta = requireInRange('horizontal_angle', input.horizontalAngle ?? 0, 'deg', { min: -180, max: 180 }) * deg;
  const H = requireInRange('port_depth', input.portDepth, 'm', { ...positive, max: 11000 });
  const rhoE = requireInRange('effluent_density', input.effluentDensity, 'kg/m3', { min: 900, max: 1300 });
  const amb = ambientFunctions(input.ambient, input.current ?? 0, input.bedDepth);
  // a profile or water depth shallower than the port means the port sits on the bed
  const bed = input.bedDepth === undefined && amb.bedDepth !== undefined ? Math.max(amb.bedDepth, H) : amb.bedDepth;
  if (bed !== undefined && bed < H) throw new InputError('bed_depth', bed, 'm', `≥ port_depth (${H} m)`, 'the bed must not be above the port');
  const spacing = input.portSpacing === undefined ? undefined : requireInRange('port_spacing', input.portSpacing, 'm', positive);
  const tE = input.effluentTemperature === undefined ? undefined : requireInRange('effluent_temperature', input.effluentTemperature, 'degC', { min: -3, max: 100 });
  const sMax = input.maxPath === undefined ? Math.max(100 * D, 50 * H) : requireInRange('max_path', input.maxPath, 'm', positive);

  const rhoRef = amb.density(H), tRef = amb.temperature?.(H) ?? 0;
  const ctx: ClosureContext = { portDepth: H, rhoRef, tRef, density: amb.density, temperature: amb.temperature, current: amb.current };
  const Q0 = (Math.PI * D * D * U) / 4, M0 = Q0 * U;
  const rhoScale = Math.max(Math.abs(rhoE - rhoRef), 0.01), tScale = tE === undefined ? 1 : Math.max(Math.abs(tE - tRef), 0.01);
  const scale = [D, D, D, Q0, M0, M0, M0, Q0 * rhoScale, Q0 * tScale];
  const toState = (v: readonly number[]): JetState => Object.fromEntries(IDX.map((k, i) => [k, v[i] * scale[i]])) as unknown as JetState;
  const e0 = [Math.cos(phi) * Math.cos(theta), Math.cos(phi) * Math.sin(theta), Math.sin(phi)];
  const s0: JetState = { x: 0, y: 0, z: 0, Q: Q0, Mx: M0 * e0[0], My: M0 * e0[1], Mz: M0 * e0[2], R: Q0 * (rhoE - rhoRef), Th: tE === undefined ? 0 : Q0 * (tE - tRef) };
  const rhs = (_t: number, v: readonly number[]) => {
    const ds = jetDerivative(toState(v), ctx);
    return IDX.map((k, i) => (ds[k] * D) / scale[i]);
  };
  const gPort = (-GRAVITY * (rhoE - rhoRef)) / rhoRef;
  const scales = jetLengthScales({ diameter: D, velocity: U, gPrime: Math.max(-5, Math.min(5, gPort)), current: amb.current(H) });
  const returnTerminal = bed === undefined || bed === H;
  const edge = (v: readonly number[], sign: number) => { const s = toState(v), L = localJet(s, ctx); return s.z + sign * L.b * Math.sqrt(Math.max(0, 1 - L.ez * L.ez)); };
  const events: OdeEvent[] = [
    { name: 'surface contact', g: (_t, v) => v[2] * D - H, direction: 'rising', terminal: true },
    { name: 'return to port level', g: (_t, v) => v[2], direction: 'falling', terminal: returnTerminal },
    { name: 'maximum rise', g: (_t, v) => v[6], direction: 'falling', terminal: true },
    { name: 'lowest point', g: (_t, v) => v[6], direction: 'rising', terminal: true },
    { name: 'neutral buoyancy', g: (_t, v) => localJet(toState(v), ctx).densityExcess, direction: 'either' },
    { name: 'momentum spent', g: (_t, v) => Math.hypot(v[4], v[5], v[6]) / v[3] - 1e-3, direction: 'falling', terminal: true },
    { name: 'edge reaches surface', g: (_t, v) => edge(v, 1) - H, direction: 'rising' },
  ];
  if (bed !== undefined && bed > H) {
    events.push({ name: 'bed contact', g: (_t, v) => v[2] * D + (bed - H), direction: 'falling', terminal: true });
    events.push({ name: 'edge reaches bed', g: (_t, v) => edge(v, -1) + (bed - H), direction: 'falling' });
  }
  if (spacing !== undefined) events.push({ name: 'plumes merge', g: (_t, v) => 2 * localJet(toState(v), ctx).b - spacing, direction: 'rising' });

  // integrate in segments: a turning point ends the path only when the jet is trapped (neutral buoyancy passed)
  const ts: number[] = [], ys: number[][] = [], fired: { name: string; t: number; y: number[] }[] = [];
  let start = 0, y0: number[] = IDX.map((k, i) => s0[k] / scale[i]), evaluations = 0, status: OdeStatus = 'completed', message = '';
  for (let seg = 0; seg < 8; seg++) {
    const sol = solveOde(rhs, start, y0, sMax / D, { rtol: 1e-8, atol: 1e-10, h0: 0.01, maxSteps: 20000, events });
    evaluations += sol.evaluations; status = sol.status; message = sol.message;
    const skip = ts.length ? 1 : 0;
    ts.push(...sol.t.slice(skip)); ys.push(...sol.y.slice(skip)); fired.push(...sol.events);
    const last = sol.events[sol.events.length - 1];
    const turning = sol.status === 'terminal-event' && (last.name === 'maximum rise' || last.name === 'lowest point');
    if (!turning || fired.some((e) => e.name === 'neutral buoyancy')) break;
    start = last.t; y0 = last.y;
  }
  const pointAt = (v: readonly number[], t: number) => {
    const s = toState(v), L = localJet(s, ctx), Sa = s.Q / Q0;
    return { s: t * D, x: s.x, y: s.y, z: s.z, depth: H - s.z, horizontalDistance: Math.hypot(s.x, s.y), radius: L.b, dilutionCentreline: Math.max(1, Sa * CENTRELINE_TO_AVERAGE), dilutionAverage: Sa, L, state: s };
  };
  const pts = ys.map((v, i) => pointAt(v, ts[i]));
  const path: JetPath = {
    s: pts.map((p) => p.s), x: pts.map((p) => p.x), y: pts.map((p) => p.y), z: pts.map((p) => p.z), depth: pts.map((p) => p.depth),
    horizontalDistance: pts.map((p) => p.horizontalDistance), radius: pts.map((p) => p.radius),
    dilutionCentreline: pts.map((p) => p.dilutionCentreline), dilutionAverage: pts.map((p) => p.dilutionAverage),
    densityExcess: pts.map((p) => p.L.densityExcess),
    ...(tE !== undefined && amb.temperature ? { temperatureExcess: pts.map((p) => tRef + p.state.Th / p.state.Q - amb.temperature!(p.depth)) } : {}),
  };
  const jetEvents: JetEvent[] = fired.map((e) => {
    const { L: _l, state: _s, ...p } = pointAt(e.y, e.t);
    return { kind: e.name as JetEventKind, ...p };
  });
  if (status === 'terminal-event') jetEvents.push({ ...jetEvents[jetEvents.length - 1], kind: 'end of near field' });
  const maxRise = Math.max(...path.z);
  const outcome = describeOutcome(jetEvents, status, maxRise, path, bed === undefined ? undefined : bed - H);
  const warnings = [...amb.warnings, ...scales.warnings, ...pathWarnings({ events: jetEvents, status, message, scales, angleDeg: input.angle, dense: rhoE > rhoRef, current: amb.current(H), velocity: U, profileBottom: profileBottom(input.ambient), portDepth: H })];
  return { status, message, evaluations, path, events: jetEvents, outcome: outcome.kind, outcomeText: outcome.text, maxRise, scales, warnings };
}

function profileBottom(a: AmbientWater): number | undefined {
  if (a.kind === 'profile') return a.profile.depth[a.profile.depth.length - 1];
  return a.kind === 'table' ? a.depth[a.depth.length - 1] : undefined;
}
