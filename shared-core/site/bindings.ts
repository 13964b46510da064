import type { RawArg } from '../calc/resolve';
import { GRAVITY } from '../quantities';
import { interpolateAt } from '../profile/profile';
import { waterDensity } from '../water/density';
import { si, siOptional, buoyancyFrequencyAt, meanBuoyancyFrequency, type EstimateContext } from './context';
import type { Channel, Estimate, Feature, Inflow, Intake, Outfall } from './schema';
import { regulated } from './compliance';

/**
 * Default arguments of each calc method, taken from the estimate's feature and condition. The
 * estimate's own `params` override them. Methods without a binding take their params only.
 */
type Binding = (ctx: EstimateContext, estimate?: Estimate) => Record<string, RawArg | undefined>;

const at = (ctx: EstimateContext) => `features[${ctx.featureIndex}]`;
const body = (ctx: EstimateContext) => ctx.site.waterBody;

function feature<K extends Feature['kind']>(ctx: EstimateContext, kind: K): Extract<Feature, { kind: K }> | undefined {
  return ctx.feature && ctx.feature.kind === kind ? (ctx.feature as Extract<Feature, { kind: K }>) : undefined;
}

/** Two-layer description of the condition's profile (least-squares fit), for two-layer methods. */
function twoLayer(ctx: EstimateContext) {
  if (!ctx.fit) return {};
  return {
    rho_upper: ctx.fit.rhoUpper,
    rho_lower: ctx.fit.rhoLower,
    upper_thickness: ctx.fit.upperThickness,
    lower_thickness: ctx.fit.lowerThickness,
  };
}

function outfallState(ctx: EstimateContext, o: Outfall) {
  const p = `${at(ctx)}`;
  const portDepth = si(`${p}.portDepth`, o.portDepth, 'm');
  const diameter = si(`${p}.diameter`, o.diameter, 'm');
  const perPort = si(`${p}.discharge`, o.discharge, 'm3/s') / o.ports;
  const salinity = siOptional(`${p}.effluent.salinity`, o.effluent.salinity, 'PSU') ?? 0;
  const effluentDensity = waterDensity({
    temperature: si(`${p}.effluent.temperature`, o.effluent.temperature, 'degC'),
    salinity,
    sediment: siOptional(`${p}.effluent.sediment`, o.effluent.sediment, 'kg/m3') ?? 0,
    eos: salinity > 0 ? (ctx.profile?.eos === 'teos10' ? 'teos10' : 'eos80') : 'fresh',
  }).value;
  const ambientDensity = ctx.profile
    ? interpolateAt(ctx.profile.depth, ctx.profile.density, portDepth)
    : effluentDensity;
  return {
    portDepth,
    diameter,
    velocity: perPort / ((Math.PI * diameter * diameter) / 4),
    effluentDensity,
    ambientDensity,
  };
}

function intakePorts(ctx: EstimateContext, i: Intake): string {
  return i.ports
    .map(
      (port, k) =>
        `${si(`${at(ctx)}.ports[${k}].depth`, port.depth, 'm')}:${si(`${at(ctx)}.ports[${k}].capacity`, port.capacity, 'm3/s')}`,
    )
    .join(',');
}

function inflowGPrime(ctx: EstimateContext, f: Inflow): number | undefined {
  if (!ctx.profile) return undefined;
  const salinity = siOptional(`${at(ctx)}.salinity`, f.salinity, 'PSU') ?? 0;
  const rho = waterDensity({
    temperature: si(`${at(ctx)}.temperature`, f.temperature, 'degC'),
    salinity,
    sediment: siOptional(`${at(ctx)}.sediment`, f.sediment, 'kg/m3') ?? 0,
    eos: salinity > 0 && ctx.profile.eos === 'fresh' ? 'eos80' : ctx.profile.eos,
  }).value;
  return (GRAVITY * (rho - ctx.profile.density[0])) / ctx.profile.density[0]; // ambient (surface) density as reference, as in the river-inflow chain
}

function channelArgs(ctx: EstimateContext, c: Channel) {
  const p = at(ctx);
  const depth = si(`${p}.depth`, c.depth, 'm'),
    width = si(`${p}.width`, c.width, 'm');
  const sea = siOptional(`${p}.seaDensity`, c.seaDensity, 'kg/m3'),
    river = siOptional(`${p}.riverDensity`, c.riverDensity, 'kg/m3');
  const q = siOptional(`${p}.riverDischarge`, c.riverDischarge, 'm3/s');
  return {
    depth,
    width,
    g_prime: sea !== undefined && river !== undefined ? (GRAVITY * (sea - river)) / sea : undefined,
    river_discharge: q,
    river_velocity: q === undefined ? undefined : q / (width * depth),
    tidal_velocity: siOptional(`${p}.tidalVelocity`, c.tidalVelocity, 'm/s'),
  };
}

const BINDINGS: Record<string, Binding> = {
  'profile-summary': (ctx) => ({ file: ctx.profile }),
  'vertical-modes': (ctx) => ({ file: ctx.profile }),
  'two-layer-wave': (ctx) => twoLayer(ctx),
  'internal-seiche': (ctx) => ({
    ...twoLayer(ctx),
    basin_length: siOptional('waterBody.length', body(ctx).length, 'm'),
  }),
  wedderburn: (ctx) => ({
    g_prime: ctx.fit?.gPrime,
    upper_thickness: ctx.fit?.upperThickness,
    wind_speed: ctx.condition && siOptional(`conditions[${ctx.conditionIndex}].wind`, ctx.condition.wind, 'm/s'),
    basin_length: siOptional('waterBody.length', body(ctx).length, 'm'),
  }),
  'release-blend': (ctx) => {
    const i = feature(ctx, 'intake');
    if (!i) return { file: ctx.profile };
    return {
      file: ctx.profile,
      ports: intakePorts(ctx, i),
      release: si(`${at(ctx)}.release`, i.release, 'm3/s'),
      target_temperature: siOptional(`${at(ctx)}.targetTemperature`, i.targetTemperature, 'degC'),
    };
  },
  'withdrawal-layer': (ctx) => {
    const i = feature(ctx, 'intake');
    if (!i || !ctx.profile) return {};
    const depth = si(`${at(ctx)}.ports[0].depth`, i.ports[0].depth, 'm');
    return {
      port_depth: depth,
      buoyancy_frequency: buoyancyFrequencyAt(ctx.profile, depth),
      discharge: si(`${at(ctx)}.ports[0].capacity`, i.ports[0].capacity, 'm3/s'),
      sink: i.sink,
      width: siOptional(`${at(ctx)}.width`, i.width, 'm'),
      reservoir_length: siOptional('waterBody.length', body(ctx).length, 'm'),
    };
  },
  'withdrawal-two-layer': (ctx) => {
    const i = feature(ctx, 'intake');
    if (!i || !ctx.fit) return {};
    const depth = si(`${at(ctx)}.ports[0].depth`, i.ports[0].depth, 'm');
    return {
      g_prime: ctx.fit.gPrime,
      interface_distance: Math.abs(depth - ctx.fit.upperThickness),
      port_depth: depth,
      // one port carries the whole planned release; with several, the split is the release blend's
      ...(i.ports.length === 1 ? { planned_discharge: si(`${at(ctx)}.release`, i.release, 'm3/s') } : {}),
      sink: i.sink,
      width: siOptional(`${at(ctx)}.width`, i.width, 'm'),
    };
  },
  'plunge-depth': (ctx) => {
    const f = feature(ctx, 'inflow');
    if (!f) return {};
    return {
      discharge: si(`${at(ctx)}.discharge`, f.discharge, 'm3/s'),
      width: si(`${at(ctx)}.width`, f.width, 'm'),
      g_prime: inflowGPrime(ctx, f),
    };
  },
  underflow: (ctx) => {
    const f = feature(ctx, 'inflow');
    if (!f) return { file: ctx.profile };
    return {
      file: ctx.profile,
      discharge: si(`${at(ctx)}.discharge`, f.discharge, 'm3/s'),
      width: si(`${at(ctx)}.width`, f.width, 'm'),
      temperature: si(`${at(ctx)}.temperature`, f.temperature, 'degC'),
      salinity: siOptional(`${at(ctx)}.salinity`, f.salinity, 'PSU'),
      sediment: siOptional(`${at(ctx)}.sediment`, f.sediment, 'kg/m3'),
      bed_slope: siOptional(`${at(ctx)}.bedSlope`, f.bedSlope, '1'),
    };
  },
  'jet-length-scales': (ctx) => {
    const o = feature(ctx, 'outfall');
    if (!o) return {};
    const s = outfallState(ctx, o);
    return {
      diameter: s.diameter,
      velocity: s.velocity,
      g_prime: (GRAVITY * (s.ambientDensity - s.effluentDensity)) / s.ambientDensity,
      current: ctx.condition && siOptional(`conditions[${ctx.conditionIndex}].current`, ctx.condition.current, 'm/s'),
      buoyancy_frequency: ctx.profile
        ? meanBuoyancyFrequency(ctx.profile, 0, ctx.profile.depth[ctx.profile.depth.length - 1])
        : undefined,
    };
  },
  'buoyant-jet': (ctx) => {
    const o = feature(ctx, 'outfall');
    if (!o) return { file: ctx.profile };
    const s = outfallState(ctx, o);
    return {
      diameter: s.diameter,
      velocity: s.velocity,
      angle: si(`${at(ctx)}.angle`, o.angle, 'deg'),
      port_depth: s.portDepth,
      effluent_density: s.effluentDensity,
      file: ctx.profile,
      current: ctx.condition && siOptional(`conditions[${ctx.conditionIndex}].current`, ctx.condition.current, 'm/s'),
    };
  },
  'diffuser-plume': (ctx) => {
    const o = feature(ctx, 'outfall');
    if (!o) return { file: ctx.profile };
    return {
      ...BINDINGS['buoyant-jet'](ctx),
      ports: o.ports,
      spacing: siOptional(`${at(ctx)}.spacing`, o.spacing, 'm'),
    };
  },
  'required-dilution': (ctx, e) => {
    // the outfall's constituent table is the one source of Ce, Ca and Cc; the estimate's params override them
    const o = feature(ctx, 'outfall');
    if (!o) return {};
    const zone = e?.zone ?? 'chronic';
    const rows = regulated(o, ctx.featureIndex, zone);
    const row = e?.constituent ? rows.find((r) => r.name === e.constituent) : rows[0];
    return row ? { effluent: row.effluent, ambient: row.ambient, criterion: row.criterion } : {};
  },
  'line-plume': (ctx) => {
    const o = feature(ctx, 'outfall');
    if (!o || !ctx.profile) return {};
    const s = outfallState(ctx, o);
    const length = Math.max(1, (o.ports - 1) * (siOptional(`${at(ctx)}.spacing`, o.spacing, 'm') ?? 1));
    return {
      discharge_per_length: si(`${at(ctx)}.discharge`, o.discharge, 'm3/s') / length,
      g_prime: (GRAVITY * (s.ambientDensity - s.effluentDensity)) / s.ambientDensity,
      buoyancy_frequency: meanBuoyancyFrequency(ctx.profile, 0, s.portDepth),
      current: ctx.condition && siOptional(`conditions[${ctx.conditionIndex}].current`, ctx.condition.current, 'm/s'),
    };
  },
  'salt-wedge': (ctx) => {
    const c = feature(ctx, 'channel');
    if (!c) return {};
    const a = channelArgs(ctx, c);
    return { river_velocity: a.river_velocity, depth: a.depth, g_prime: a.g_prime };
  },
  'estuarine-richardson': (ctx) => {
    const c = feature(ctx, 'channel');
    if (!c) return {};
    const a = channelArgs(ctx, c);
    return { g_prime: a.g_prime, river_discharge: a.river_discharge, width: a.width, tidal_velocity: a.tidal_velocity };
  },
  'exchange-flow': (ctx) => {
    const c = feature(ctx, 'channel');
    if (!c) return {};
    const a = channelArgs(ctx, c);
    // the river's discharge is the net flow, outwards with the light upper layer (Armi & Farmer 1986 sign)
    return {
      g_prime: a.g_prime,
      depth: a.depth,
      width: a.width,
      control: c.form === 'sill' ? 'sill' : 'contraction',
      net_discharge: a.river_discharge,
    };
  },
};

/** Default arguments for a method from its context; undefined values are left for the method's own defaults. */
export function boundArgs(methodId: string, ctx: EstimateContext, estimate?: Estimate): Record<string, RawArg> {
  const args = BINDINGS[methodId]?.(ctx, estimate) ?? {};
  return Object.fromEntries(Object.entries(args).filter(([, v]) => v !== undefined)) as Record<string, RawArg>;
}
