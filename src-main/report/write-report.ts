import type { Assessment } from '../../shared-core/site';
import type { LoadedSite } from '../services/site-file';
import type { UnitSystem } from '../../shared-core/units/units';

export interface ReportOptions {
  outDir: string;
  formats?: string[];
  units: UnitSystem;
}

/** Writes the report files for an assessment; returns the written paths. (Filled in by the report service.) */
export async function writeReport(_loaded: LoadedSite, _assessment: Assessment, _options: ReportOptions): Promise<string[]> {
  throw new Error('report export is not available yet');
}
