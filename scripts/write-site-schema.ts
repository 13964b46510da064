// Regenerates shared-core/site/site.schema.json from the zod schema: npx tsx scripts/write-site-schema.ts
import { writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { siteJsonSchema } from '../shared-core/site/schema';

writeFileSync(
  resolve(import.meta.dirname, '../shared-core/site/site.schema.json'),
  JSON.stringify(siteJsonSchema(), null, 2) + '\n',
);
