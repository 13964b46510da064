import { InputError } from '../core/errors';
import { requireInRange, positive } from '../core/range';
import { solveOde, type OdeEvent, type OdeStatus } from '../numerics/ode';
import { GRAVITY } from '../quantities';
import { ambientFunctions, type AmbientFunctions, type AmbientWater, type Current } from './ambient';
import { jetDerivative, localJet, type ClosureContext, type JetGeometry, type JetState } from './closure';
import { jetLengthScales, type JetLengthScales } from './length-scales';

/** What a jet run needs from its caller (see BuoyantJetInput for the meaning of each field). */
export interface JetRunInput {
  diameter: number;
  velocity: number;
  angle: number;
  horizontalAngle?: number;
  portDepth: number;
  effluentDensity: number;
  effluentTemperature?: number;
  ambient: AmbientWater;
  current?: Current;
  bedDepth?: number;
  portSpacing?: number;
  maxPath?: number;
}

/** Validated input and the constants of one run, shared by the round-jet and the merged-diffuser models. */
export interface JetRun {
  D: number;
  U: number;
  H: number;
  angleDeg: number;
  bed?: number;
  spacing?: number;
  tE?: number;
  sMax: number;
  rhoE: number;
  rhoRef: number;
  tRef: number;
  amb: AmbientFunctions;
  ctx: ClosureContext;
  /** port volume flux [m3/s] and kinematic momentum flux [m4/s2] */
  Q0: number;
  M0: number;
  /** density and temperature scales of the scaled state [kg/m3], [K] */
  rhoScale: number;
  tScale: number;
  /** the state at the port */
  start: JetState;
  scales: JetLengthScales;
  returnTerminal: boolean;
}

/** One integrated stretch of path with a single geometry, states in SI. */
export interface Stretch {
  geometry: JetGeometry;
  ctx: ClosureContext;
  /** volume flux that dilution 1 refers to: Q0 (round) or Q0/spacing (plane) */
  qRef: number;
  s: number[];
  states: JetState[];
  fired: { name: string; s: number; state: JetState }[];
  status: OdeStatus;
  message: string;
  evaluations: number;
}

export const STATE_KEYS = ['x', 'y', 'z', 'Q', 'Mx', 'My', 'Mz', 'R', 'Th'] as const;
const deg = Math.PI / 180;

/** Validates a run's input and sets up the ambient, the closure context and the port state. */
export function prepareJetRun(input: JetRunInput): JetRun {
  const D = requireInRange('diameter', input.diameter, 'm', { ...positive, max: 20 });
  const U = requireInRange('velocity', input.velocity, 'm/s', { ...positive, max: 100 });
  const phi = requireInRange('angle', input.angle, 'deg', { min: -90, max: 90 }) * deg;
  const theta = requireInRange('horizontal_angle', input.horizontalAngle ?? 0, 'deg', { min: -180, max: 180 }) * deg;
  const H = requireInRange('port_depth', input.portDepth, 'm', { ...positive, max: 11000 });
  const rhoE = requireInRange('effluent_density', input.effluentDensity, 'kg/m3', { min: 900, max: 1300 });
  const amb = ambientFunctions(input.ambient, input.current ?? 0, input.bedDepth);
  // a profile or water depth shallower than the port means the port sits on the bed
  const bed = input.bedDepth === undefined && amb.bedDepth !== undefined ? Math.max(amb.bedDepth, H) : amb.bedDepth;
  if (bed !== undefined && bed < H)
    throw new InputError('bed_depth', bed, 'm', `≥ port_depth (${H} m)`, 'the bed must not be above the port');
  const spacing =
    input.portSpacing === undefined ? undefined : requireInRange('port_spacing', input.portSpacing, 'm', positive);
  const tE =
    input.effluentTemperature === undefined
      ? undefined
      : requireInRange('effluent_temperature', input.effluentTemperature, 'degC', { min: -3, max: 100 });
  const sMax =
    input.maxPath === undefined ? Math.max(100 * D, 50 * H) : requireInRange('max_path', input.maxPath, 'm', positive);

  const rhoRef = amb.density(H),
    tRef = amb.temperature?.(H) ?? 0;
  const ctx: ClosureContext = {
    portDepth: H,
    rhoRef,
    tRef,
    density: amb.density,
    temperature: amb.temperature,
    current: amb.current,
  };
  const Q0 = (Math.PI * D * D * U) / 4,
    M0 = Q0 * U;
  const rhoScale = Math.max(Math.abs(rhoE - rhoRef), 0.01),
    tScale = tE === undefined ? 1 : Math.max(Math.abs(tE - tRef), 0.01);
  const e0 = [Math.cos(phi) * Math.cos(theta), Math.cos(phi) * Math.sin(theta), Math.sin(phi)];
  const start: JetState = {
    x: 0,
    y: 0,
    z: 0,
    Q: Q0,
    Mx: M0 * e0[0],
    My: M0 * e0[1],
    Mz: M0 * e0[2],
    R: Q0 * (rhoE - rhoRef),
    Th: tE === undefined ? 0 : Q0 * (tE - tRef),
  };
  const gPort = (-GRAVITY * (rhoE - rhoRef)) / rhoRef;
  const scales = jetLengthScales({
    diameter: D,
    velocity: U,
    gPrime: Math.max(-5, Math.min(5, gPort)),
    current: amb.current(H),
  });
  return {
    D,
    U,
    H,
    angleDeg: input.angle,
    bed,
    spacing,
    tE,
    sMax,
    rhoE,
    rhoRef,
    tRef,
    amb,
    ctx,
    Q0,
    M0,
    rhoScale,
    tScale,
    start,
    scales,
    returnTerminal: bed === undefined || bed === H,
  };
}

export interface StretchOptions {
  geometry: JetGeometry;
  /** state at the start of the stretch (fluxes per unit length for 'plane') and its path distance [m] */
  start: JetState;
  sStart: number;
  /** stop where neighbouring round plumes merge (2b = spacing) */
  stopAtMerge?: boolean;
  /** neutral buoyancy was passed on an earlier stretch */
  neutralPassed?: boolean;
}

/**
 * Integrates one stretch of the jet path in s/D with Dormand–Prince 5(4) (numerics/ode.ts) on scaled fluxes; continues
 * through a maximum rise of a dense jet and stops at the surface, the bed, a trapping turning point, or maxPath.
 */
export function traceStretch(run: JetRun, o: StretchOptions): Stretch {
  const { D, H, bed } = run;
  const perLength = o.geometry === 'plane' ? 1 / (run.spacing as number) : 1;
  // the merged line plume is followed as in still water (no crossflow entrainment, no current momentum): see DIFFUSER_PLUME
  const ctx: ClosureContext =
    o.geometry === 'plane' ? { ...run.ctx, geometry: 'plane', current: () => 0 } : { ...run.ctx, geometry: 'round' };
  const qRef = run.Q0 * perLength,
    mRef = run.M0 * perLength;
  const scale = [D, D, D, qRef, mRef, mRef, mRef, qRef * run.rhoScale, qRef * run.tScale];
  const toState = (v: readonly number[]): JetState =>
    Object.fromEntries(STATE_KEYS.map((k, i) => [k, v[i] * scale[i]])) as unknown as JetState;
  const rhs = (_t: number, v: readonly number[]) => {
    const ds = jetDerivative(toState(v), ctx);
    return STATE_KEYS.map((k, i) => (ds[k] * D) / scale[i]);
  };
  const edge = (v: readonly number[], sign: number) => {
    const s = toState(v),
      L = localJet(s, ctx);
    return s.z + sign * L.b * Math.sqrt(Math.max(0, 1 - L.ez * L.ez));
  };
  const events: OdeEvent[] = [
    { name: 'surface contact', g: (_t, v) => v[2] * D - H, direction: 'rising', terminal: true },
    { name: 'return to port level', g: (_t, v) => v[2], direction: 'falling', terminal: run.returnTerminal },
    { name: 'maximum rise', g: (_t, v) => v[6], direction: 'falling', terminal: true },
    { name: 'lowest point', g: (_t, v) => v[6], direction: 'rising', terminal: true },
    { name: 'neutral buoyancy', g: (_t, v) => localJet(toState(v), ctx).densityExcess, direction: 'either' },
    {
      name: 'momentum spent',
      g: (_t, v) => Math.hypot(v[4], v[5], v[6]) / v[3] - 1e-3,
      direction: 'falling',
      terminal: true,
    },
    { name: 'edge reaches surface', g: (_t, v) => edge(v, 1) - H, direction: 'rising' },
  ];
  if (bed !== undefined && bed > H) {
    events.push({ name: 'bed contact', g: (_t, v) => v[2] * D + (bed - H), direction: 'falling', terminal: true });
    events.push({ name: 'edge reaches bed', g: (_t, v) => edge(v, -1) + (bed - H), direction: 'falling' });
  }
  const spacing = run.spacing;
  if (spacing !== undefined && o.geometry === 'round') {
    events.push({
      name: 'plumes merge',
      g: (_t, v) => 2 * localJet(toState(v), ctx).b - spacing,
      direction: 'rising',
      terminal: o.stopAtMerge ?? false,
    });
  }

  // integrate in segments: a turning point ends the path only when the jet is trapped (neutral buoyancy passed)
  const ts: number[] = [],
    ys: number[][] = [],
    fired: { name: string; t: number; y: number[] }[] = [];
  let start = o.sStart / D,
    y0: number[] = STATE_KEYS.map((k, i) => o.start[k] / scale[i]),
    evaluations = 0,
    status: OdeStatus = 'completed',
    message = '';
  for (let seg = 0; seg < 8; seg++) {
    const sol = solveOde(rhs, start, y0, run.sMax / D, { rtol: 1e-8, atol: 1e-10, h0: 0.01, maxSteps: 20000, events });
    evaluations += sol.evaluations;
    status = sol.status;
    message = sol.message;
    const skip = ts.length ? 1 : 0;
    ts.push(...sol.t.slice(skip));
    ys.push(...sol.y.slice(skip));
    fired.push(...sol.events);
    const last = sol.events[sol.events.length - 1];
    const turning = sol.status === 'terminal-event' && (last.name === 'maximum rise' || last.name === 'lowest point');
    if (!turning || o.neutralPassed || fired.some((e) => e.name === 'neutral buoyancy')) break;
    start = last.t;
    y0 = last.y;
  }
  return {
    geometry: o.geometry,
    ctx,
    qRef,
    s: ts.map((t) => t * D),
    states: ys.map(toState),
    fired: fired.map((e) => ({ name: e.name, s: e.t * D, state: toState(e.y) })),
    status,
    message,
    evaluations,
  };
}
