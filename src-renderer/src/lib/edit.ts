import type { Feature, QuantityInput, Site } from '../../../shared-core/site/schema';
import type { FieldUse } from './field-ranges';

/** Sets a property, removing it when the value is undefined (an emptied optional field). */
export function assign<T extends object, K extends keyof T>(obj: T, key: K, value: T[K] | undefined): void {
  if (value === undefined) delete obj[key];
  else obj[key] = value;
}

/** The feature of a draft site with this id and kind (edits go through SiteDocument.change). */
export function draftFeature<K extends Feature['kind']>(d: Site, id: string, kind: K): Extract<Feature, { kind: K }> {
  const f = d.features.find((x) => x.id === id);
  if (!f || f.kind !== kind) throw new Error(`no ${kind} "${id}"`);
  return f as Extract<Feature, { kind: K }>;
}

/** One quantity field of an editor: label, SI unit and how to read and write it on the item. */
export interface QuantitySpec<U> {
  key: string;
  label: string;
  unit: string;
  optional?: boolean;
  help?: string;
  /** the calc parameters the field supplies (their ranges are checked at the field) */
  uses?: readonly FieldUse[];
  get: (item: U) => QuantityInput | undefined;
  set: (item: U, v: QuantityInput | undefined) => void;
}
