export * from './schema';
export * from './load';
export * from './assess';
export * from './context';
export { boundArgs } from './bindings';
export { SiteAssessor } from './incremental';
export { complianceEstimates, farFieldEstimates, siteCompliance, VERDICT_RULE } from './compliance';
export type { ConditionOutcome } from './conditions';
// reading a profile table as the document holds it (the workspace's CSV import)
export { parseHeader, readCsvTable, type ProfileTable } from '../profile/csv';
export type { ProfileIssue } from '../profile/profile';
export { conditionsFromCsv } from './casts';
