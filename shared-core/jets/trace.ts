import { qty } from '../core/quantity-text';
import { InputError } from '../core/errors';
import { requireInRange, positive } from '../core/range';
import { integrateOde, type OdeEventSet, type OdeStatus } from '../numerics/ode';
import { interpolateAt } from '../profile/profile';
import { GRAVITY } from '../quantities';
import { ambientTables, type AmbientTables } from './ambient';
import type { BuoyantJetInput } from './buoyant-jet';
import type { JetGeometry, JetState } from './closure';
import { jetGaugesInto, jetRhsFor, newJetGauges, scaledState, type JetEquations, type JetGauges } from './equations';
import { jetLengthScales, type JetLengthScales } from './length-scales';
import { EXIT_VELOCITY, PORT_DIAMETER } from './closure';

/** What a jet run needs from its caller: the model's input without the compliance choice. */
export type JetRunInput = Omit<BuoyantJetInput, 'denseJetDilution'>;

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
  /** step attempts allowed per integrated segment */
  maxSteps: number;
  rhoE: number;
  rhoRef: number;
  tRef: number;
  ambient: AmbientTables;
  /** current at the port [m/s] */
  portCurrent: number;
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

/** One integrated stretch of path with a single geometry, states scaled as its equations say. */
export interface Stretch {
  geometry: JetGeometry;
  equations: JetEquations;
  /** volume flux that dilution 1 refers to: Q0 (round) or Q0/spacing (plane) */
  qRef: number;
  s: number[];
  y: number[][];
  fired: { name: string; s: number; y: number[] }[];
  status: OdeStatus;
  /** in words, with the path distance where it stopped early */
  message: string;
  evaluations: number;
}

const deg = Math.PI / 180;
/** step attempts per segment (default) */
export const JET_MAX_STEPS = 20000;
/**
 * Default longest path [m]: long enough for a weakly buoyant plume bent over by a strong current to surface from tens of
 * metres (a 20 m deep port in 0.6 m/s surfaces some 1.4 km downstream); the adaptive steps make a long path cheap.
 */
export const JET_DEFAULT_MAX_PATH = 10000;

/** Validates a run's input and sets up the ambient tables and the port state. */
export function prepareJetRun(input: JetRunInput): JetRun {
  const D = requireInRange('diameter', input.diameter, 'm', PORT_DIAMETER);
  const U = requireInRange('velocity', input.velocity, 'm/s', EXIT_VELOCITY);
  const phi = requireInRange('angle', input.angle, 'deg', { min: -90, max: 90 }) * deg;
  const theta = requireInRange('horizontal_angle', input.horizontalAngle ?? 0, 'deg', { min: -180, max: 180 }) * deg;
  const H = requireInRange('port_depth', input.portDepth, 'm', { ...positive, max: 11000 });
  const rhoE = requireInRange('effluent_density', input.effluentDensity, 'kg/m3', { min: 900, max: 1300 });
  const amb = ambientTables(input.ambient, input.current ?? 0, input.bedDepth);
  // a profile or water depth shallower than the port means the port sits on the bed
  const bed = input.bedDepth === undefined && amb.bedDepth !== undefined ? Math.max(amb.bedDepth, H) : amb.bedDepth;
  if (bed !== undefined && bed < H)
    throw new InputError('bed_depth', bed, 'm', `≥ port depth (${qty(H, 'm')})`, 'the bed must not be above the port');
  const spacing =
    input.portSpacing === undefined ? undefined : requireInRange('port_spacing', input.portSpacing, 'm', positive);
  const tE =
    input.effluentTemperature === undefined
      ? undefined
      : requireInRange('effluent_temperature', input.effluentTemperature, 'degC', { min: -3, max: 100 });
  const sMax =
    input.maxPath === undefined
      ? Math.max(JET_DEFAULT_MAX_PATH, 100 * D, 50 * H)
      : requireInRange('max_path_length', input.maxPath, 'm', positive);
  const maxSteps = requireInRange('max_steps', input.maxSteps ?? JET_MAX_STEPS, '1', { min: 1, max: 1e6 });

  const rhoRef = interpolateAt(amb.depth, amb.density, H),
    tRef = amb.temperature ? interpolateAt(amb.depth, amb.temperature, H) : 0;
  const portCurrent = interpolateAt(amb.currentDepth, amb.currentSpeed, H);
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
    current: portCurrent,
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
    maxSteps,
    rhoE,
    rhoRef,
    tRef,
    ambient: amb,
    portCurrent,
    Q0,
    M0,
    rhoScale,
    tScale,
    start,
    scales,
    returnTerminal: bed === undefined || bed === H,
  };
}

/**
 * The plain-data equations of a stretch: path in port diameters, fluxes in port (or per-length) units. The merged
 * line plume is followed as in still water (no crossflow entrainment, no current momentum): see DIFFUSER_PLUME.
 * The temperature is followed only when the effluent temperature is known.
 */
export function jetEquationsOf(run: JetRun, geometry: JetGeometry): JetEquations {
  const perLength = geometry === 'plane' ? 1 / (run.spacing as number) : 1;
  const qRef = run.Q0 * perLength,
    mRef = run.M0 * perLength,
    D = run.D,
    a = run.ambient;
  return {
    geometry,
    lengthScale: D,
    scale: [D, D, D, qRef, mRef, mRef, mRef, qRef * run.rhoScale, qRef * run.tScale],
    portDepth: run.H,
    rhoRef: run.rhoRef,
    tRef: run.tRef,
    ambientDepth: a.depth,
    ambientDensity: a.density,
    ...(run.tE !== undefined && a.temperature ? { ambientTemperature: a.temperature } : {}),
    currentDepth: geometry === 'plane' ? [0] : a.currentDepth,
    currentSpeed: geometry === 'plane' ? [0] : a.currentSpeed,
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

/** One event along a stretch: its gap (zero where it fires) read from the gauges of the state. */
interface JetEventSpec {
  name: string;
  gap: (g: JetGauges) => number;
  direction: 'rising' | 'falling' | 'either';
  terminal: boolean;
}

/** The events along a stretch, evaluated together from the gauges of the scaled state. */
function stretchEvents(run: JetRun, eq: JetEquations, o: StretchOptions): OdeEventSet {
  const { H, bed, spacing } = run;
  const specs: JetEventSpec[] = [
    { name: 'surface contact', gap: (g) => g.z - H, direction: 'rising', terminal: true },
    { name: 'return to port level', gap: (g) => g.z, direction: 'falling', terminal: run.returnTerminal },
    { name: 'maximum rise', gap: (g) => g.verticalMomentum, direction: 'falling', terminal: true },
    { name: 'lowest point', gap: (g) => g.verticalMomentum, direction: 'rising', terminal: true },
    { name: 'neutral buoyancy', gap: (g) => g.densityExcess, direction: 'either', terminal: false },
    { name: 'momentum spent', gap: (g) => g.speedRatio - 1e-3, direction: 'falling', terminal: true },
    { name: 'edge reaches surface', gap: (g) => g.upperEdge - H, direction: 'rising', terminal: false },
  ];
  if (bed !== undefined && bed > H) {
    specs.push({ name: 'bed contact', gap: (g) => g.z + (bed - H), direction: 'falling', terminal: true });
    specs.push({
      name: 'edge reaches bed',
      gap: (g) => g.lowerEdge + (bed - H),
      direction: 'falling',
      terminal: false,
    });
  }
  if (spacing !== undefined && o.geometry === 'round') {
    const terminal = o.stopAtMerge ?? false;
    specs.push({ name: 'plumes merge', gap: (g) => 2 * g.width - spacing, direction: 'rising', terminal });
  }
  const gauges = newJetGauges();
  return {
    events: specs,
    g: (_t, y, out) => {
      jetGaugesInto(y, eq, gauges);
      for (let i = 0; i < specs.length; i++) out[i] = specs[i].gap(gauges);
    },
  };
}

/**
 * Integrates one stretch of the jet path in s/D with Dormand–Prince 5(4) (numerics/ode.ts) on scaled fluxes; continues
 * through a maximum rise of a dense jet and stops at the surface, the bed, a trapping turning point, or maxPath.
 */
export function traceStretch(run: JetRun, o: StretchOptions): Stretch {
  const D = run.D;
  const eq = jetEquationsOf(run, o.geometry);
  const rhs = jetRhsFor(eq);
  const events = stretchEvents(run, eq, o);
  // integrate in segments: a turning point ends the path only when the jet is trapped (neutral buoyancy passed)
  const ts: number[] = [],
    ys: number[][] = [],
    fired: { name: string; t: number; y: number[] }[] = [];
  let start = o.sStart / D,
    y0 = scaledState(o.start, eq),
    evaluations = 0,
    status: OdeStatus = 'completed',
    message = '';
  for (let seg = 0; seg < 8; seg++) {
    const sol = integrateOde(rhs, start, y0, run.sMax / D, {
      rtol: 1e-8,
      atol: 1e-8,
      h0: 0.01,
      maxSteps: run.maxSteps,
      events,
    });
    evaluations += sol.evaluations;
    status = sol.status;
    message = stopMessage(sol.status, sol.message, sol.t[sol.t.length - 1] * D, run.maxSteps);
    const skip = ts.length ? 1 : 0;
    for (let i = skip; i < sol.t.length; i++) {
      ts.push(sol.t[i]);
      ys.push(sol.y[i]);
    }
    fired.push(...sol.events);
    const last = sol.events[sol.events.length - 1];
    const turning = sol.status === 'terminal-event' && (last.name === 'maximum rise' || last.name === 'lowest point');
    if (!turning || o.neutralPassed || fired.some((e) => e.name === 'neutral buoyancy')) break;
    start = last.t;
    y0 = last.y;
  }
  return {
    geometry: o.geometry,
    equations: eq,
    qRef: eq.scale[3],
    s: ts.map((t) => t * D),
    y: ys,
    fired: fired.map((e) => ({ name: e.name, s: e.t * D, y: e.y })),
    status,
    message,
    evaluations,
  };
}

/** The integrator's stop in the words of the path: where and why it stopped early. */
function stopMessage(status: OdeStatus, message: string, s: number, maxSteps: number): string {
  const at = `${qty(s, 'm', 4)} along the path`;
  if (status === 'max-steps') return `the path integration stopped at its step limit of ${maxSteps} steps at ${at}`;
  if (status === 'step-failed')
    return `the path integration stopped on a failed step at ${at} (${message.replace(/ at t = .*$/, '')})`;
  return message;
}
