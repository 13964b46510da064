/**
 * Forward migrations: migrations[v] turns a version-v document into version v + 1.
 * Version 1 held one measured profile at the top level; version 2 holds named ambient conditions;
 * version 3 adds optional input uncertainties to estimates (nothing to convert).
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
};
