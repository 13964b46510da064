// Regenerates shared-core/report/verification.json from test/check-values: npx tsx scripts/write-verification.ts
import { writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { verificationSummary } from '../src-main/verification/summary';

const root = resolve(import.meta.dirname, '..');
writeFileSync(
  resolve(root, 'shared-core/report/verification.json'),
  JSON.stringify(verificationSummary(resolve(root, 'test/check-values')), null, 1) + '\n',
);
