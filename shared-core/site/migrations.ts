/**
 * Forward migrations: migrations[v] turns a version-v document into version v + 1.
 * Version 1 held one measured profile at the top level; version 2 holds named ambient conditions;
 * version 3 adds optional input uncertainties to estimates (nothing to convert); version 4 gives constituents
 * acute and chronic criteria (a version-3 criterion is the chronic one, applied at the mixing-zone boundary)
 * and links a temperature or salinity row that repeats the outfall's effluent value to that field.
 */
type Doc = Record<string, unknown>;

export const migrations: Record<number, (doc: Doc) => Doc> = {
  1: (doc) => {
    const { profile, estimates, ...rest } = doc;
    const condition = { id: 'measured', name: 'Measured profile', profile };
    return {
      ...rest,
      version: 2,
      conditions: [condition],
      estimates: Array.isArray(estimates) ? estimates.map((e) => ({ condition: 'measured', ...(e as Doc) })) : [],
    };
  },
  2: (doc) => ({ ...doc, version: 3 }),
  3: (doc) => ({
    ...doc,
    version: 4,
    features: Array.isArray(doc.features) ? doc.features.map((f) => constituentsToV4(f as Doc)) : doc.features,
  }),
};

/** A row that repeats the effluent's own temperature (degC) or salinity (PSU) becomes linked to it. */
function linkedTo(row: Doc, effluent: Doc): 'temperature' | 'salinity' | undefined {
  for (const [of, unit] of [
    ['temperature', 'degC'],
    ['salinity', 'PSU'],
  ] as const) {
    const own = effluent[of];
    const value = typeof own === 'number' ? own : typeof own === 'string' ? Number(own.trim()) : NaN;
    if (row.unit === unit && row.effluent === value && new RegExp(`^${of.slice(0, 4)}`, 'i').test(String(row.name)))
      return of;
  }
  return undefined;
}

function constituentsToV4(f: Doc): Doc {
  if (f.kind !== 'outfall' || !Array.isArray(f.constituents)) return f;
  const effluent = (f.effluent ?? {}) as Doc;
  const constituents = f.constituents.map((c) => {
    const { criterion, effluent: value, ...row } = c as Doc;
    const of = linkedTo(c as Doc, effluent);
    return {
      ...row,
      ...(of ? { of } : { effluent: value }),
      ...(criterion === undefined ? {} : { chronic: criterion }),
    };
  });
  return { ...f, constituents };
}
