import {
  SITE_FORMAT,
  SITE_VERSION,
  type Condition,
  type Estimate,
  type Feature,
  type Site,
} from '../../../shared-core/site/schema';

export type FeatureKind = Feature['kind'];

/** A new, blank site: one condition with a two-sample placeholder profile to replace. */
export function blankSite(): Site {
  return {
    format: SITE_FORMAT,
    version: SITE_VERSION,
    project: { name: 'New screening', site: 'New site', preparedBy: '', checkedBy: '', revision: 'A', date: '' },
    waterBody: { name: 'New water body', kind: 'reservoir', depth: 20 },
    conditions: [blankCondition('condition-1', 'Condition 1')],
    features: [],
    estimates: [],
    units: 'si',
  };
}

export function blankCondition(id: string, name: string): Condition {
  return {
    id,
    name,
    profile: {
      columns: ['depth (m)', 'temperature (degC)', 'salinity (PSU)'],
      rows: [
        [0, 20, 0],
        [10, 12, 0],
      ],
    },
  };
}

/** A new feature with plausible starting values the user is expected to replace. */
export function blankFeature(kind: FeatureKind, id: string, depth: number): Feature {
  const d = (f: number) => Math.round(depth * f * 10) / 10;
  switch (kind) {
    case 'intake':
      return {
        id,
        kind,
        name: 'New intake',
        sink: 'point',
        release: 10,
        ports: [
          { name: 'Port 1', depth: d(0.3), capacity: 10 },
          { name: 'Port 2', depth: d(0.7), capacity: 10 },
        ],
      };
    case 'outfall':
      return {
        id,
        kind,
        name: 'New outfall',
        portDepth: d(0.8),
        diameter: 0.3,
        discharge: 0.2,
        angle: 30,
        ports: 1,
        effluent: { temperature: 20 },
        mixingZone: { distance: 50 },
        constituents: [],
      };
    case 'inflow':
      return { id, kind, name: 'New river inflow', discharge: 20, width: 40, temperature: 12 };
    case 'channel':
      return {
        id,
        kind,
        name: 'New channel',
        form: 'sill',
        depth: d(0.5),
        width: 100,
        seaDensity: 1025,
        riverDensity: 1000,
      };
  }
}

/** The estimates offered by default when a feature is added (method ids of gprime calc). */
export const SUGGESTED: Record<FeatureKind, string[]> = {
  intake: ['withdrawal-layer', 'release-blend'],
  outfall: ['buoyant-jet'],
  inflow: ['plunge-depth', 'underflow'],
  channel: ['exchange-flow'],
};

export function suggestedEstimates(
  kind: FeatureKind,
  featureId: string,
  conditionId: string,
  taken: Set<string>,
): Estimate[] {
  return SUGGESTED[kind].map((method) => {
    const id = uniqueId(`${featureId}-${method}`, taken);
    taken.add(id);
    return { id, method, feature: featureId, condition: conditionId, params: {} };
  });
}

/** An id not in `taken`: base, base-2, base-3 … (letters, digits, - _ . only). */
export function uniqueId(base: string, taken: Set<string>): string {
  const clean =
    base
      .toLowerCase()
      .replace(/[^a-z0-9_.-]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 56) || 'item';
  if (!taken.has(clean)) return clean;
  for (let i = 2; ; i++) if (!taken.has(`${clean}-${i}`)) return `${clean}-${i}`;
}

export const KIND_WORDS: Record<FeatureKind, string> = {
  intake: 'Intake',
  outfall: 'Outfall',
  inflow: 'River inflow',
  channel: 'Channel / sill / lock',
};
