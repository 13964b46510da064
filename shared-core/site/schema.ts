import { z } from 'zod';
import { LIMITS } from '../core/limits';

/**
 * The gprime site document (our own format, file extension .gpsite, JSON). A quantity is either a number
 * in SI or the text the user typed with its unit ("30 ft", "450 cfs"): what the user typed is kept as typed.
 */
export const SITE_FORMAT = 'gprime-site';
export const SITE_VERSION = 4;

const id = z
  .string()
  .min(1)
  .max(64)
  .regex(/^[A-Za-z0-9_.-]+$/, 'use letters, digits, "_", "-" or "." only');
const name = z.string().min(1).max(200);
export const quantitySchema = z.union([z.number().finite(), z.string().trim().min(1).max(64)]);
export type QuantityInput = z.infer<typeof quantitySchema>;

export const profileTableSchema = z.object({
  columns: z.array(z.string().min(1)).min(2),
  rows: z
    .array(z.array(z.union([z.number().finite(), z.string(), z.null()])))
    .max(LIMITS.profileRows, `a profile holds at most ${LIMITS.profileRows} rows`),
});

export const conditionSchema = z.object({
  id,
  name,
  profile: profileTableSchema,
  eos: z.enum(['fresh', 'eos80', 'teos10']).optional(),
  /** ambient current speed, uniform over depth [m/s] */
  current: quantitySchema.optional(),
  /** wind speed at 10 m [m/s] */
  wind: quantitySchema.optional(),
  notes: z.string().max(2000).optional(),
});

const portSchema = z.object({ name, depth: quantitySchema, capacity: quantitySchema });

export const intakeSchema = z.object({
  id,
  kind: z.literal('intake'),
  name,
  ports: z.array(portSchema).min(1).max(LIMITS.intakePorts, `an intake has at most ${LIMITS.intakePorts} ports`),
  /** total planned release [m3/s] */
  release: quantitySchema,
  targetTemperature: quantitySchema.optional(),
  /** sink geometry of each port opening */
  sink: z.enum(['line', 'point']).default('point'),
  /** opening width across the flow for a line sink [m] */
  width: quantitySchema.optional(),
});

/**
 * A regulated constituent of an effluent; concentrations are plain numbers in the row's unit. A row `of` the
 * effluent's temperature or salinity takes its effluent value from the outfall's own field (one place to
 * type it), in degC or PSU. The acute criterion applies at the zone of initial dilution, the chronic one at
 * the mixing-zone boundary (U.S. EPA 1991, Technical Support Document, §4.3); either may be absent.
 */
export const constituentSchema = z
  .object({
    name,
    unit: z.string().max(32),
    of: z.enum(['temperature', 'salinity']).optional(),
    effluent: z.number().finite().optional(),
    ambient: z.number().finite(),
    acute: z.number().finite().optional(),
    chronic: z.number().finite().optional(),
  })
  .refine((c) => c.of !== undefined || c.effluent !== undefined, {
    message: 'give the effluent concentration (or link the row to the effluent temperature or salinity)',
    path: ['effluent'],
  })
  .refine((c) => c.of === undefined || c.effluent === undefined, {
    message: 'a row linked to the effluent temperature or salinity takes its effluent value from the outfall',
    path: ['effluent'],
  })
  .refine((c) => c.of === undefined || c.unit === (c.of === 'temperature' ? 'degC' : 'PSU'), {
    message: 'a temperature row is in degC, a salinity row in PSU',
    path: ['unit'],
  });

/**
 * The zones of a permit: the mixing-zone boundary (chronic criteria) as a horizontal distance from the port,
 * and optionally the zone of initial dilution (acute criteria), as a distance or a multiple of the water
 * depth at the port.
 */
export const mixingZoneSchema = z.object({
  distance: quantitySchema,
  zid: z
    .union([z.object({ distance: quantitySchema }), z.object({ depthMultiple: z.number().finite().positive() })])
    .optional(),
});

export const outfallSchema = z.object({
  id,
  kind: z.literal('outfall'),
  name,
  portDepth: quantitySchema,
  diameter: quantitySchema,
  /** discharge of the whole outfall [m3/s], shared equally among its ports */
  discharge: quantitySchema,
  /** vertical angle above horizontal [deg] */
  angle: quantitySchema,
  ports: z
    .number()
    .int()
    .min(1)
    .max(LIMITS.diffuserPorts, `a diffuser has at most ${LIMITS.diffuserPorts} ports`)
    .default(1),
  /** port spacing along a multiport diffuser [m] */
  spacing: quantitySchema.optional(),
  effluent: z.object({
    temperature: quantitySchema,
    salinity: quantitySchema.optional(),
    sediment: quantitySchema.optional(),
  }),
  /** the regulatory mixing-zone boundary, as a distance from the port [m] */
  mixingZone: mixingZoneSchema,
  constituents: z.array(constituentSchema).default([]),
});

export const inflowSchema = z.object({
  id,
  kind: z.literal('inflow'),
  name,
  discharge: quantitySchema,
  width: quantitySchema,
  temperature: quantitySchema,
  salinity: quantitySchema.optional(),
  sediment: quantitySchema.optional(),
  /** bed slope of the reservoir below the plunge point [1] */
  bedSlope: quantitySchema.optional(),
});

export const channelSchema = z.object({
  id,
  kind: z.literal('channel'),
  name,
  /** what the channel is: an estuary mouth, a sill or a navigation lock */
  form: z.enum(['estuary', 'sill', 'contraction', 'lock']),
  depth: quantitySchema,
  width: quantitySchema,
  length: quantitySchema.optional(),
  riverDischarge: quantitySchema.optional(),
  tidalVelocity: quantitySchema.optional(),
  /** density of the sea water and of the river water [kg/m3] */
  seaDensity: quantitySchema.optional(),
  riverDensity: quantitySchema.optional(),
});

export const featureSchema = z.discriminatedUnion('kind', [intakeSchema, outfallSchema, inflowSchema, channelSchema]);

export const estimateSchema = z.object({
  id,
  /** a `gprime calc` method id */
  method: z.string().min(1),
  feature: id.optional(),
  condition: id.optional(),
  /** explicit parameters; they override what the feature and condition supply */
  params: z.record(z.string(), z.union([z.number().finite(), z.string()])).default({}),
  /** standard uncertainties (one standard deviation) of numeric inputs, as typed: "10%", "0.5 ft", "0.002" */
  uncertainty: z.record(z.string(), z.string().max(40)).optional(),
  title: z.string().max(200).optional(),
  /** for required-dilution on an outfall: the constituent (by name) and the zone whose criterion it reads */
  constituent: z.string().max(200).optional(),
  zone: z.enum(['acute', 'chronic']).optional(),
});

export const waterBodySchema = z.object({
  name,
  kind: z.enum(['reservoir', 'lake', 'estuary', 'coastal', 'river']),
  /** maximum depth [m] */
  depth: quantitySchema,
  /** fetch / basin length along the wind [m] */
  length: quantitySchema.optional(),
  width: quantitySchema.optional(),
  /** latitude of the site [deg], north positive: depth from a pressure column of a profile (UNESCO 1983) */
  latitude: quantitySchema.optional(),
  /** hypsographic curve: plan area at each depth below the surface */
  hypsography: z.array(z.object({ depth: quantitySchema, area: quantitySchema })).optional(),
});

export const projectSchema = z.object({
  name,
  site: name,
  preparedBy: z.string().max(200).default(''),
  checkedBy: z.string().max(200).default(''),
  revision: z.string().max(50).default('A'),
  date: z.string().max(50).default(''),
});

export const siteSchema = z.object({
  format: z.literal(SITE_FORMAT),
  version: z.literal(SITE_VERSION),
  project: projectSchema,
  waterBody: waterBodySchema,
  conditions: z.array(conditionSchema).min(1),
  features: z.array(featureSchema).default([]),
  estimates: z.array(estimateSchema).default([]),
  /** unit system of the report and UI display */
  units: z.enum(['si', 'us']).default('si'),
});

export type Site = z.infer<typeof siteSchema>;
export type Condition = z.infer<typeof conditionSchema>;
export type Feature = z.infer<typeof featureSchema>;
export type Intake = z.infer<typeof intakeSchema>;
export type Outfall = z.infer<typeof outfallSchema>;
export type Inflow = z.infer<typeof inflowSchema>;
export type Channel = z.infer<typeof channelSchema>;
export type Estimate = z.infer<typeof estimateSchema>;
export type Constituent = z.infer<typeof constituentSchema>;
export type MixingZone = z.infer<typeof mixingZoneSchema>;
export type ProfileTableInput = z.infer<typeof profileTableSchema>;

/** The JSON Schema of the current version (shipped as shared-core/site/site.schema.json). */
export function siteJsonSchema(): unknown {
  return {
    $id: 'https://gprime.invalid/site.schema.json',
    title: 'gprime site document',
    ...(z.toJSONSchema(siteSchema, { io: 'input' }) as object),
  };
}
